namespace DescentOps.Mission.Messages;

/// <summary>
/// The station's carrier came up or went down (the station came back, or died or began a reset), as it reaches the
/// ground a light time later. Sent only when a ground rule or procedure reads the station's points.
/// </summary>
public sealed record StationCarrier(bool On);
