using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>The syntax tree of one rule text: what parsed, even when other parts had errors.</summary>
public sealed record RuleSetSyntax(
    string SourceName,
    AutonomyLevel? Autonomy,
    SourceLocation AutonomyLocation,
    IReadOnlyList<RuleSyntax> Rules,
    IReadOnlyList<ExclusionSyntax> Exclusions)
{
    /// <summary>Names of rules left out because of syntax errors, so the checker does not call references to them unknown.</summary>
    public IReadOnlyList<string> RulesWithErrors { get; init; } = [];
}
