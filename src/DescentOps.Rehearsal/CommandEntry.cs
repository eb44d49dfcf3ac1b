using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Text;

namespace DescentOps.Rehearsal;

/// <summary>
/// A telecommand typed at the console in the rule language's own words (<c>send probe.wall set_power(power = 4 kW)</c>),
/// checked by the rule checker against the mission's catalogue before it may go. The text is set as the only action of
/// a one-rule set, so every check a rule's command gets applies; errors are moved back to the typed line's columns.
/// </summary>
public static class CommandEntry
{
    public const int MaxLength = 400;
    public const string SourceName = "command";

    private const string Prefix = "    ";

    /// <summary>The command as data, or null with the checker's located message in <paramref name="error"/>.</summary>
    public static CommandAction? Check(string text, TelemetryCatalogue catalogue, out string error)
    {
        error = "";
        if (string.IsNullOrWhiteSpace(text))
        {
            error = $"{SourceName}:1:1: error: empty command; write 'send TARGET COMMAND(ARGUMENT = VALUE)'";
            return null;
        }

        if (text.Length > MaxLength)
        {
            error = $"{SourceName}:1:{MaxLength + 1}: error: a command is at most {MaxLength} characters";
            return null;
        }

        var bad = text.IndexOfAny(['{', '}', '\n', '\r', '#']);
        if (bad >= 0)
        {
            error = $"{SourceName}:1:{bad + 1}: error: '{Printable(text[bad])}' cannot appear in a command";
            return null;
        }

        var trimmed = text.Trim();
        if (!trimmed.StartsWith("send ", StringComparison.Ordinal))
        {
            error = $"{SourceName}:1:{text.Length - text.TrimStart().Length + 1}: error: a telecommand starts with 'send'";
            return null;
        }

        // The condition is never evaluated; it only makes a well-formed rule around the command.
        var ruleText = "rule console {\n  runs on ground\n  severity info\n  when probe.depth above 0 m\n  then {\n" + Prefix + text + "\n  }\n}\n";
        var result = RuleChecker.CheckSource(new RuleSource(SourceName, ruleText), catalogue);
        if (result.Errors.Count > 0)
        {
            var first = result.Errors[0];
            var column = first.Location.Line == 6 ? Math.Max(1, first.Location.Column - Prefix.Length) : 1;
            error = $"{SourceName}:1:{column}: error {first.Code}: {first.Message}";
            return null;
        }

        var actions = result.RuleSet!.Rules.Single().Actions;
        if (actions is [SendAction send]) return send.Command;
        error = $"{SourceName}:1:1: error: give exactly one 'send'";
        return null;
    }

    private static string Printable(char c) => c switch { '\n' => "\\n", '\r' => "\\r", _ => c.ToString() };
}
