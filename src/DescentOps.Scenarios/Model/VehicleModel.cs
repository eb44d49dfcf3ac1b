namespace DescentOps.Scenarios.Model;

/// <summary>
/// A vehicle carried by the probe and released at breakthrough. <see cref="SpeedVariation"/> is the standard deviation,
/// as a fraction of the speed, of the speed made good over one leg: currents under the ice help on some legs and
/// hinder on others. Without a <see cref="Dock"/> the vehicle works until its reserve and stops where it is (the
/// original behaviour); with one it comes home by the dock's battery rule, recharges and goes out again.
/// <see cref="PropulsionPowerW"/> and <see cref="SpeedMPerS"/> describe a propeller vehicle (the power from its hull
/// when <see cref="Hull"/> is given); a glider takes its speed from <see cref="Glider"/>.
/// </summary>
public sealed record VehicleModel(
    string Name,
    double BatteryEnergyJ,
    double ReserveFraction,
    double HotelPowerW,
    double PropulsionPowerW,
    double SpeedMPerS,
    double ProfileDepthM,
    double SpeedVariation,
    VehicleKind Kind = VehicleKind.Propeller,
    VehicleTask Task = VehicleTask.WaterColumn,
    double HeadingRad = 0.0,
    double TrackLengthM = VehicleModel.DefaultTrackLengthM,
    double SampleTimeS = VehicleModel.DefaultSampleTimeS,
    GliderSettings? Glider = null,
    HullSettings? Hull = null,
    OceanCurrent? Current = null,
    NavigationSettings? Navigation = null,
    DockSettings? Dock = null,
    double MaxOutOfRangeS = VehicleModel.DefaultMaxOutOfRangeS)
{
    /// <summary>Transect length of mapping and survey tasks when none is given: 500 m (a modelling default, no source).</summary>
    public const double DefaultTrackLengthM = 500.0;

    /// <summary>Time on station of a sampling task when none is given: 30 min (a modelling default, no source).</summary>
    public const double DefaultSampleTimeS = 1800.0;

    /// <summary>Longest silence before a vehicle is given up when none is given: one day (a rule of thumb of ours, no source).</summary>
    public const double DefaultMaxOutOfRangeS = 86_400.0;

    /// <summary>True when any field beyond the original profiling vehicle is in use.</summary>
    public bool UsesExtendedModel =>
        Kind != VehicleKind.Propeller || Task != VehicleTask.WaterColumn || Hull is not null || Current is not null || Navigation is not null || Dock is not null;
}
