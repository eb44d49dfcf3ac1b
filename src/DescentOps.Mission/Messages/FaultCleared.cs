using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Messages;

/// <summary>Tells the component that a fault with a duration has ended.</summary>
public sealed record FaultCleared(FaultModel Fault);
