using DescentOps.Rules.Text;

namespace DescentOps.Rules.Checking;

/// <summary>The diagnostics one check collects, in the order they are found (the checker sorts them by place at the end).</summary>
internal sealed class DiagnosticList
{
    private readonly List<RuleDiagnostic> _items = [];

    public IReadOnlyList<RuleDiagnostic> Items => _items;

    public void AddRange(IEnumerable<RuleDiagnostic> diagnostics) => _items.AddRange(diagnostics);

    public void Error(DiagnosticCode code, SourceLocation location, string message) =>
        _items.Add(new RuleDiagnostic(location, DiagnosticSeverity.Error, code, message));

    public void Warning(DiagnosticCode code, SourceLocation location, string message) =>
        _items.Add(new RuleDiagnostic(location, DiagnosticSeverity.Warning, code, message));
}
