using System.Text;

namespace DescentOps.Reports.Tests;

/// <summary>A small RFC 4180 reader for the tests, written apart from the exporter so it checks it.</summary>
internal static class CsvRows
{
    public static List<string[]> Read(string path)
    {
        var text = File.ReadAllText(path);
        var rows = new List<string[]>();
        var row = new List<string>();
        var cell = new StringBuilder();
        var quoted = false;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < text.Length && text[i + 1] == '"') { cell.Append('"'); i++; }
                else if (c == '"') quoted = false;
                else cell.Append(c);
                continue;
            }

            switch (c)
            {
                case '"': quoted = true; break;
                case ',': row.Add(cell.ToString()); cell.Clear(); break;
                case '\r': break;
                case '\n':
                    row.Add(cell.ToString());
                    cell.Clear();
                    rows.Add([.. row]);
                    row.Clear();
                    break;
                default: cell.Append(c); break;
            }
        }

        Assert.False(quoted, "a quoted cell is never closed");
        Assert.Equal(0, cell.Length + row.Count); // every row ends with a line break
        return rows;
    }
}
