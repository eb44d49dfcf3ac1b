namespace DescentOps.Rules.Text;

/// <summary>Errors make a rule set unusable; warnings describe rules that are valid but cannot do their job.</summary>
public enum DiagnosticSeverity
{
    Error,
    Warning,
}
