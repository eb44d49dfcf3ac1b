namespace DescentOps.Mission.Procedures;

/// <summary>The state a transition leads to and what it produced, in order.</summary>
public sealed record ProcedureTransition(ProcedureRun Run, IReadOnlyList<ProcedureOutput> Outputs);
