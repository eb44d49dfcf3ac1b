namespace DescentOps.Mission.Messages;

/// <summary>A person at the console (<see cref="By"/>, console input <see cref="Number"/>) confirmed or skipped a procedure's step.</summary>
public sealed record ProcedureStepAnswer(string Procedure, string Step, bool Confirmed, string By, long Number);
