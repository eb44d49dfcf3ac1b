using DescentOps.Scenarios.Loading;

namespace DescentOps.Scenarios.Model;

/// <summary>
/// The recovery rules written in a scenario: their text, and where that text starts in the scenario file so that a
/// rule error can be reported at its place in the file (line of the text's first line, and the indentation removed).
/// </summary>
public sealed record RulesSource(string Text, SourceLocation FirstLine, int IndentColumns)
{
    /// <summary>Exact positions for every character of the text, whatever the YAML style; when absent, lines and indentation.</summary>
    public ScalarPositionMap? Positions { get; init; }

    public static RulesSource None { get; } = new("", new SourceLocation("", 1, 1), 0);

    public bool IsEmpty => Text.Trim().Length == 0;

    /// <summary>Maps a line and column within <see cref="Text"/> (1-based) to the scenario file.</summary>
    public SourceLocation InFile(int line, int column)
    {
        if (Positions is null) return new(FirstLine.File, FirstLine.Line + line - 1, column + IndentColumns);
        var (fileLine, fileColumn) = Positions.InFile(line, column);
        return new(FirstLine.File, fileLine, fileColumn);
    }
}
