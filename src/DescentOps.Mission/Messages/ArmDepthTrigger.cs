namespace DescentOps.Mission.Messages;

/// <summary>Asks the probe to report when its head reaches a depth: the trigger of fault number <see cref="FaultIndex"/>.</summary>
public sealed record ArmDepthTrigger(int FaultIndex, double DepthM);
