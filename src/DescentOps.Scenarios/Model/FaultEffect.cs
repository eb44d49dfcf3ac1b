namespace DescentOps.Scenarios.Model;

/// <summary>
/// What a fault does: one of a closed set of effects, each with exactly the data it needs (the constructors are
/// private, so no other effect exists). <see cref="Kind"/> is the effect's name in the scenario file and the logs.
/// </summary>
public abstract record FaultEffect
{
    private FaultEffect()
    {
    }

    public abstract FaultKind Kind { get; }

    /// <summary>Available heater power falls to <paramref name="RemainingFraction"/> of its value.</summary>
    public sealed record PowerDip(double RemainingFraction) : FaultEffect
    {
        public override FaultKind Kind => FaultKind.PowerDip;
    }

    /// <summary>One half of the head heater keeps <paramref name="RemainingFraction"/> of its power.</summary>
    public sealed record HeaterSegmentFailure(double RemainingFraction) : FaultEffect
    {
        public override FaultKind Kind => FaultKind.HeaterSegmentFailure;
    }

    /// <summary>The hot-water jets keep <paramref name="RemainingFraction"/> of their heat at the hole's bottom.</summary>
    public sealed record CloggedNozzle(double RemainingFraction) : FaultEffect
    {
        public override FaultKind Kind => FaultKind.CloggedNozzle;
    }

    /// <summary>The tilt jumps by <paramref name="AngleRad"/>.</summary>
    public sealed record TiltKick(double AngleRad) : FaultEffect
    {
        public override FaultKind Kind => FaultKind.TiltKick;
    }

    /// <summary>The fibre parts at the depth reached.</summary>
    public sealed record TetherBreak : FaultEffect
    {
        public override FaultKind Kind => FaultKind.TetherBreak;
    }

    /// <summary>The spool jams and the paying-out fibre snaps.</summary>
    public sealed record SpoolJam : FaultEffect
    {
        public override FaultKind Kind => FaultKind.SpoolJam;
    }

    /// <summary>Dropped relay number <paramref name="RelayNumber"/> (1 is the first dropped, nearest the surface) fails.</summary>
    public sealed record RelayFailure(int RelayNumber) : FaultEffect
    {
        public override FaultKind Kind => FaultKind.RelayFailure;
    }

    /// <summary>The surface station stops relaying.</summary>
    public sealed record StationFailure : FaultEffect
    {
        public override FaultKind Kind => FaultKind.StationFailure;
    }

    /// <summary>A discharge resets the station, which relays nothing until the fault's duration is over.</summary>
    public sealed record StationUpset : FaultEffect
    {
        public override FaultKind Kind => FaultKind.StationUpset;
    }

    /// <summary>
    /// A vehicle meets what can lose it; a failing battery keeps <paramref name="RemainingFraction"/> of its charge.
    /// </summary>
    public sealed record VehicleLoss(string Vehicle, VehicleLossCause Cause, double RemainingFraction) : FaultEffect
    {
        public override FaultKind Kind => FaultKind.VehicleLoss;
    }

    /// <summary>A telemetry point that lies: the four sensor faults share the point they act on.</summary>
    public abstract record SensorFault : FaultEffect
    {
        private protected SensorFault(string point) => Point = point;

        public string Point { get; }
    }

    /// <summary>The point repeats <paramref name="ValueSi"/>, or its true reading when the fault began if none is given.</summary>
    public sealed record SensorStuck(string Point, double? ValueSi) : SensorFault(Point)
    {
        public override FaultKind Kind => FaultKind.SensorStuck;
    }

    /// <summary>The point reports its true value plus <paramref name="OffsetSi"/>.</summary>
    public sealed record SensorBias(string Point, double OffsetSi) : SensorFault(Point)
    {
        public override FaultKind Kind => FaultKind.SensorBias;
    }

    /// <summary>The point reports its true value plus normal noise of standard deviation <paramref name="SigmaSi"/>.</summary>
    public sealed record SensorNoise(string Point, double SigmaSi) : SensorFault(Point)
    {
        public override FaultKind Kind => FaultKind.SensorNoise;
    }

    /// <summary>The point is missing from every frame.</summary>
    public sealed record SensorDropout(string Point) : SensorFault(Point)
    {
        public override FaultKind Kind => FaultKind.SensorDropout;
    }
}
