using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Messages;

/// <summary>Tells the failing component that a fault now acts on it.</summary>
public sealed record FaultStarted(FaultModel Fault);
