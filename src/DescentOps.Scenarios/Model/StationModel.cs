namespace DescentOps.Scenarios.Model;

/// <summary>
/// The surface station that relays tether telemetry home. Every part after the forwarding delay is optional: without
/// them the station never fails on its own, always sees home and never holds the probe back. A queue capacity of
/// null means the station can hold any number of frames or commands while the link is down.
/// </summary>
public sealed record StationModel(
    string Name,
    double ForwardingDelayS,
    StationRadiationModel? Radiation = null,
    StationLinkModel? Link = null,
    SurfaceDwellModel? Dwell = null,
    StationChargingModel? Charging = null,
    long? FrameQueueCapacity = null,
    long? CommandQueueCapacity = null)
{
    /// <summary>The default silence before the ground takes the station for dead: a rule of thumb of ours.</summary>
    public const double DefaultSilenceTimeoutS = 600.0;

    /// <summary>How long the ground hears nothing from the station, with home in view, before it takes it for dead.</summary>
    public double SilenceTimeoutS { get; init; } = DefaultSilenceTimeoutS;
}
