namespace DescentOps.Mission.Running;

/// <summary>One branch of a procedure step (<c>passed</c>, <c>late</c> or <c>failed</c>, the log's words) and how often a run took it.</summary>
public sealed record BranchCoverage(string Procedure, string Step, string Branch, int Taken);
