namespace DescentOps.Scenarios.Model;

/// <summary>The surface station that relays tether telemetry home.</summary>
public sealed record StationModel(string Name, double ForwardingDelayS);
