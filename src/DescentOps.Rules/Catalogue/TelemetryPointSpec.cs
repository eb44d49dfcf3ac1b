namespace DescentOps.Rules.Catalogue;

/// <summary>A telemetry point the mission publishes, by name.</summary>
public abstract record TelemetryPointSpec(string Name);
