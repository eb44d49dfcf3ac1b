namespace DescentOps.Mission.Running;

/// <summary>Whether a rule acted in a run (fired, escalated or continued), as <c>check SCENARIO --coverage LOG</c> counts it.</summary>
public sealed record RuleCoverage(string Rule, bool Acted);
