namespace DescentOps.Mission.Messages;

/// <summary>The probe's head has reached the depth of fault number <see cref="FaultIndex"/>'s trigger.</summary>
public sealed record DepthTriggerReached(int FaultIndex, double DepthM);
