namespace DescentOps.Rules.Syntax;

/// <summary>Where a rule is evaluated. The evaluator is the same; the mission decides how telemetry and commands travel.</summary>
public enum Placement
{
    Board,
    Ground,
}
