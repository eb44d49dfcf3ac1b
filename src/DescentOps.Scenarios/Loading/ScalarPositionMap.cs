namespace DescentOps.Scenarios.Loading;

/// <summary>
/// Where each character of a YAML scalar's value stands in the file. A literal block keeps lines and strips a fixed
/// indentation, but a folded block joins lines, a quoted scalar folds its line breaks and unescapes, and an
/// indentation indicator ('|2') fixes an indentation the first line need not show; so positions are found by walking
/// the value and the raw text side by side: a value character is matched to the next raw character equal to it, a
/// folded space or line break to the raw line break it stands for, an escape to its backslash. Indentation, quotes and
/// the header are skipped on the way.
/// </summary>
public sealed class ScalarPositionMap
{
    private readonly int[] _lines;
    private readonly int[] _columns;
    private readonly int[] _valueLineStarts;

    private ScalarPositionMap(int[] lines, int[] columns, int[] valueLineStarts)
    {
        _lines = lines;
        _columns = columns;
        _valueLineStarts = valueLineStarts;
    }

    /// <param name="fileText">The whole file.</param>
    /// <param name="start">The scalar's first character in the file (its indicator or quote), 1-based line and column.</param>
    /// <param name="value">The scalar's value as parsed.</param>
    public static ScalarPositionMap Build(string fileText, SourceLocation start, string value)
    {
        var fileLineStarts = new List<int> { 0 };
        for (var i = 0; i < fileText.Length; i++)
        {
            if (fileText[i] == '\n') fileLineStarts.Add(i + 1);
        }

        var raw = Math.Min(fileText.Length, fileLineStarts[Math.Clamp(start.Line - 1, 0, fileLineStarts.Count - 1)] + start.Column - 1);
        var style = raw < fileText.Length ? fileText[raw] : ' ';
        if (style is '|' or '>')
        {
            // The value starts on the line after the header ("|", "|2", ">-", and a possible comment).
            var lineEnd = fileText.IndexOf('\n', raw);
            raw = lineEnd < 0 ? fileText.Length : lineEnd + 1;
        }
        else if (style is '"' or '\'')
        {
            raw++;
        }

        var lines = new int[value.Length];
        var columns = new int[value.Length];
        var line = 0;
        while (line + 1 < fileLineStarts.Count && fileLineStarts[line + 1] <= raw) line++;
        for (var k = 0; k < value.Length; k++)
        {
            var v = value[k];
            while (raw < fileText.Length)
            {
                var r = fileText[raw];
                var matched = r == v
                    || (r == '\\' && style == '"')
                    || ((v is ' ' or '\n') && r == '\n');
                if (matched) break;
                if (r == '\n') line++;
                raw++;
            }

            lines[k] = line + 1;
            columns[k] = raw - fileLineStarts[Math.Min(line, fileLineStarts.Count - 1)] + 1;
            if (raw < fileText.Length)
            {
                var consumed = fileText[raw] == '\\' && style == '"' && v != '\\' ? 2 : (fileText[raw] == '\'' && style == '\'' && v == '\'' ? 2 : 1);
                for (var j = 0; j < consumed && raw < fileText.Length; j++)
                {
                    if (fileText[raw] == '\n') line++;
                    raw++;
                }
            }
        }

        var valueLineStarts = new List<int> { 0 };
        for (var i = 0; i < value.Length; i++)
        {
            if (value[i] == '\n') valueLineStarts.Add(i + 1);
        }

        return new ScalarPositionMap(lines, columns, [.. valueLineStarts]);
    }

    /// <summary>The file position of the value's 1-based <paramref name="line"/> and <paramref name="column"/>.</summary>
    public (int Line, int Column) InFile(int line, int column)
    {
        if (_lines.Length == 0) return (1, 1);
        var lineStart = _valueLineStarts[Math.Clamp(line - 1, 0, _valueLineStarts.Length - 1)];
        var index = lineStart + Math.Max(0, column - 1);
        if (index < _lines.Length) return (_lines[index], _columns[index]);
        // Past the end (the end-of-text token): just after the last character.
        return (_lines[^1], _columns[^1] + index - _lines.Length + 1);
    }
}
