using System.Globalization;
using DescentOps.Records;

namespace DescentOps.Reports.Export;

/// <summary>RFC 4180 cells: quoted only when they hold a comma, a quote or a line break; quotes doubled.</summary>
public static class CsvText
{
    public const string RowEnd = "\r\n";

    public static string Cell(string? text)
    {
        if (string.IsNullOrEmpty(text)) return "";
        return text.AsSpan().IndexOfAny(",\"\r\n") < 0 ? text : "\"" + text.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"";
    }

    /// <summary>A field's value as a cell, numbers spelled as in the journal so nothing is lost on the way.</summary>
    public static string Cell(RecordField field) => field.Kind switch
    {
        RecordFieldKind.Number => DataJson.Number(field.Number),
        RecordFieldKind.Integer => field.Integer.ToString(CultureInfo.InvariantCulture),
        RecordFieldKind.Boolean => field.Integer != 0 ? "true" : "false",
        _ => Cell(field.Text),
    };

    public static string Row(IEnumerable<string> cells) => string.Join(',', cells) + RowEnd;
}
