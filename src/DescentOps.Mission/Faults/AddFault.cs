using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Faults;

/// <summary>
/// A fault given while the run goes (by a supervisor at a console): it starts at its <c>AtS</c>, at its depth, or at
/// once when it names neither. It is numbered after the scenario's own faults.
/// </summary>
public sealed record AddFault(FaultModel Fault);
