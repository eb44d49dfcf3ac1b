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
    long? CommandQueueCapacity = null);
