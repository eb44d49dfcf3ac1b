namespace DescentOps.Scenarios.Model;

/// <summary>The faults a scenario can schedule. Names are the scenario file's words.</summary>
public enum FaultKind
{
    /// <summary>Available heater power falls to a fraction for a time.</summary>
    PowerDip,

    /// <summary>The fibre parts at the depth reached: no frame crosses it again.</summary>
    TetherBreak,

    /// <summary>The surface station stops relaying.</summary>
    StationFailure,

    /// <summary>A telemetry point keeps reporting one value (the given one, or its reading when the fault began).</summary>
    SensorStuck,

    /// <summary>A telemetry point reports its true value plus a constant offset.</summary>
    SensorBias,

    /// <summary>A telemetry point is missing from every frame.</summary>
    SensorDropout,

    /// <summary>A telemetry point reports its true value plus normal noise of the given standard deviation, drawn each frame.</summary>
    SensorNoise,

    /// <summary>One half of the head heater keeps only part of its power: the head melts unevenly and the probe turns.</summary>
    HeaterSegmentFailure,

    /// <summary>A sudden change of tilt as the head meets a debris band or an inclined layer.</summary>
    TiltKick,

    /// <summary>A discharge resets the surface station, which relays nothing until its recovery time (the fault's duration) is over.</summary>
    StationUpset,

    /// <summary>A vehicle meets what can lose it: a failing battery, entrapment, or the loss of its acoustic link.</summary>
    VehicleLoss,

    /// <summary>A dropped radio relay stops receiving and sending; the frames it holds wait in it.</summary>
    RelayFailure,

    /// <summary>The spool jams and the paying-out fibre snaps: a tether break with its own cause.</summary>
    SpoolJam,

    /// <summary>A clogged nozzle: the hot-water jets keep only a share of their heat at the hole's bottom; the rest is lost up the hole.</summary>
    CloggedNozzle,
}
