using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"exclusive TARGET (rule-a, rule-b)": these rules may share the actuator; whoever holds it first keeps it.</summary>
public sealed record ExclusionSyntax(NameSyntax Target, IReadOnlyList<NameSyntax> Rules, SourceLocation Location);
