namespace DescentOps.Rules.Text;

/// <summary>One located problem in rule text.</summary>
public sealed record RuleDiagnostic(SourceLocation Location, DiagnosticSeverity Severity, DiagnosticCode Code, string Message)
{
    public override string ToString() =>
        $"{Location}: {(Severity == DiagnosticSeverity.Error ? "error" : "warning")} {Code}: {Message}";
}
