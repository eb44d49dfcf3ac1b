using System.Text.RegularExpressions;

namespace DescentOps.Cli.Output;

/// <summary>
/// Parse errors in words a user reads: the parser names the .NET type it wanted ("System.Nullable`1[System.Int64]");
/// the user is told what to write instead.
/// </summary>
public static partial class ParseErrorText
{
    public static string Clean(string message)
    {
        ArgumentNullException.ThrowIfNull(message);
        var match = TypedParseError().Match(message);
        if (!match.Success) return StripTypeNames(message);
        var (value, symbol, type) = (match.Groups["value"].Value, match.Groups["symbol"].Value, match.Groups["type"].Value);
        return $"{symbol}: '{value}' is not {Expected(type)}.";
    }

    private static string Expected(string type) =>
        type.Contains("Int", StringComparison.Ordinal) ? "a whole number"
        : type.Contains("Double", StringComparison.Ordinal) || type.Contains("Single", StringComparison.Ordinal) || type.Contains("Decimal", StringComparison.Ordinal) ? "a number"
        : type.Contains("Boolean", StringComparison.Ordinal) ? "true or false"
        : "a value this option accepts (see --help)";

    private static string StripTypeNames(string message) => TypeName().Replace(message, "a value");

    [GeneratedRegex(@"Cannot parse argument '(?<value>.*)' for (?:option|argument) '(?<symbol>[^']*)' as expected type '(?<type>[^']*)'\.?")]
    private static partial Regex TypedParseError();

    [GeneratedRegex(@"'System\.[A-Za-z0-9_.`\[\], =]*'")]
    private static partial Regex TypeName();
}
