using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using DescentOps.Records;

namespace DescentOps.Reports;

/// <summary>
/// An event's data as one JSON object, for a CSV cell or a database column. Doubles keep the journal's rules:
/// shortest round trip, a <c>.0</c> on integral values so the type survives, and the non-finite values as the
/// strings the journal uses, because JSON has no spelling for them.
/// </summary>
public static class DataJson
{
    private static readonly JsonWriterOptions Options = new() { Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    public static string Of(IReadOnlyList<RecordField> fields)
    {
        ArgumentNullException.ThrowIfNull(fields);
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, Options))
        {
            json.WriteStartObject();
            foreach (var field in fields)
            {
                json.WritePropertyName(field.Name);
                switch (field.Kind)
                {
                    case RecordFieldKind.Number when double.IsFinite(field.Number):
                        json.WriteRawValue(Number(field.Number), skipInputValidation: true);
                        break;
                    case RecordFieldKind.Number:
                        json.WriteStringValue(Number(field.Number));
                        break;
                    case RecordFieldKind.Integer:
                        json.WriteNumberValue(field.Integer);
                        break;
                    case RecordFieldKind.Boolean:
                        json.WriteBooleanValue(field.Integer != 0);
                        break;
                    default:
                        json.WriteStringValue(field.Text);
                        break;
                }
            }

            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    /// <summary>A double as the journal spells it ("NaN", "Infinity" and "-Infinity" for the non-finite ones).</summary>
    public static string Number(double value)
    {
        if (double.IsNaN(value)) return "NaN";
        if (double.IsPositiveInfinity(value)) return "Infinity";
        if (double.IsNegativeInfinity(value)) return "-Infinity";
        var text = value.ToString("R", CultureInfo.InvariantCulture);
        return text.AsSpan().IndexOfAny('.', 'E') < 0 ? text + ".0" : text;
    }
}
