namespace DescentOps.Rules.Syntax;

/// <summary>How serious the situation a rule reacts to is, in the four levels of on-board event reporting.</summary>
public enum RuleSeverity
{
    Info,
    Low,
    Medium,
    High,
}
