namespace DescentOps.Mission.Messages;

/// <summary>A procedure's start time has come (its index in the mission's procedures).</summary>
public sealed record ProcedureDue(int Index);
