using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Checking;

/// <summary>
/// The rule set's rule names as the checker learns them: declared ones, and those of rules the parser rejected (known
/// to exist, so a reference to one is not reported a second time).
/// </summary>
internal sealed class RuleNames
{
    private readonly HashSet<string> _declared = new(StringComparer.Ordinal);
    private readonly HashSet<string> _withErrors;
    private readonly DiagnosticList _diagnostics;

    public RuleNames(IEnumerable<string> rulesWithErrors, DiagnosticList diagnostics)
    {
        _withErrors = new HashSet<string>(rulesWithErrors, StringComparer.Ordinal);
        _diagnostics = diagnostics;
    }

    /// <summary>Declares <paramref name="name"/>; false when a rule of that name exists already.</summary>
    public bool Declare(string name) => _declared.Add(name) && !_withErrors.Contains(name);

    public bool Known(NameSyntax name)
    {
        if (_declared.Contains(name.Text) || _withErrors.Contains(name.Text))
        {
            return true;
        }

        _diagnostics.Error(DiagnosticCode.UnknownRule, name.Location, $"unknown rule '{name.Text}'");
        return false;
    }
}
