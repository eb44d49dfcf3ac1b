using System.Text;

namespace DescentOps.Cli.Files;

/// <summary>
/// Reads a CSV file as the export writes it (RFC 4180: commas, double-quoted cells with doubled quotes, a header row).
/// Hostile input is bounded: cells, rows and line length are capped, and a problem names the file and line.
/// </summary>
public sealed class CsvTable
{
    public const int MaxColumns = 1000;
    public const int MaxLineChars = 1 << 20;
    public const long MaxRows = 50_000_000;

    private CsvTable(IReadOnlyList<string> header, string path)
    {
        Header = header;
        Path = path;
    }

    public IReadOnlyList<string> Header { get; }

    public string Path { get; }

    /// <summary>Opens the file and reads its header; the rows are read lazily by <see cref="Rows"/>.</summary>
    public static CsvTable Open(string path)
    {
        if (!File.Exists(path)) throw new FileNotFoundException($"no such file: {path}", path);
        using var reader = new StreamReader(path, Encoding.UTF8);
        var header = reader.ReadLine() is { } first ? Split(first, path, 1) : throw new InvalidDataException($"{path}: the file is empty; a header row is expected");
        return new CsvTable(header, path);
    }

    /// <summary>The data rows with their line numbers (the header is line 1).</summary>
    public IEnumerable<(int Line, IReadOnlyList<string> Cells)> Rows()
    {
        using var reader = new StreamReader(Path, Encoding.UTF8);
        reader.ReadLine();
        var line = 1;
        while (reader.ReadLine() is { } text)
        {
            line++;
            if (line > MaxRows) throw new InvalidDataException($"{Path}: more than {MaxRows} rows");
            if (text.Length == 0) continue;
            yield return (line, Split(text, Path, line));
        }
    }

    private static string[] Split(string text, string path, int line)
    {
        if (text.Length > MaxLineChars) throw new InvalidDataException($"{path}:{line}: the line is longer than {MaxLineChars} characters");
        var cells = new List<string>();
        var cell = new StringBuilder();
        var quoted = false;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < text.Length && text[i + 1] == '"')
                {
                    cell.Append('"');
                    i++;
                }
                else if (c == '"')
                {
                    quoted = false;
                }
                else
                {
                    cell.Append(c);
                }
            }
            else if (c == '"' && cell.Length == 0)
            {
                quoted = true;
            }
            else if (c == ',')
            {
                cells.Add(cell.ToString());
                cell.Clear();
                if (cells.Count > MaxColumns) throw new InvalidDataException($"{path}:{line}: more than {MaxColumns} columns");
            }
            else if (c != '\r')
            {
                cell.Append(c);
            }
        }

        if (quoted) throw new InvalidDataException($"{path}:{line}: a quoted cell is not closed (a cell may not span lines)");
        cells.Add(cell.ToString());
        return [.. cells];
    }
}
