namespace DescentOps.Mission.Messages;

/// <summary>
/// A frame of the probe's true readings (no sensor fault applied), sent to the fault injector when a fault waits for a
/// condition: faults act on what is, never on what a lying sensor says.
/// </summary>
public sealed record TrueStateFrame(TelemetryFrame Frame);
