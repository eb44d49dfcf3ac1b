using System.Text.Encodings.Web;
using System.Text.Json;
using DescentOps.Records;

namespace DescentOps.Cli.Output;

/// <summary>
/// The <c>--json</c> answer of a command: exactly one JSON object on stdout, snake_case names, SI values; a value
/// that does not exist (a breakthrough never reached, a fault never detected, NaN in a log) is <c>null</c>, never text.
/// </summary>
public static class JsonOutput
{
    private static readonly JsonWriterOptions Options = new() { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    public static void Write(Action<Utf8JsonWriter> body) => Write(Console.Out, body);

    public static void Write(TextWriter output, Action<Utf8JsonWriter> body)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(body);
        using var buffer = new MemoryStream();
        using (var writer = new Utf8JsonWriter(buffer, Options))
        {
            writer.WriteStartObject();
            body(writer);
            writer.WriteEndObject();
        }

        output.WriteLine(System.Text.Encoding.UTF8.GetString(buffer.ToArray()));
        output.Flush();
    }

    /// <summary>A number, or null when it is missing or not finite.</summary>
    public static void Number(this Utf8JsonWriter writer, string name, double? value)
    {
        ArgumentNullException.ThrowIfNull(writer);
        if (value is { } v && double.IsFinite(v)) writer.WriteNumber(name, v);
        else writer.WriteNull(name);
    }

    /// <summary>A text, or null.</summary>
    public static void Text(this Utf8JsonWriter writer, string name, string? value)
    {
        ArgumentNullException.ThrowIfNull(writer);
        if (value is null) writer.WriteNull(name);
        else writer.WriteString(name, value);
    }

    /// <summary>A log field as its JSON value (a non-finite number as null); a missing field as null.</summary>
    public static void Field(this Utf8JsonWriter writer, string name, RecordField? field)
    {
        ArgumentNullException.ThrowIfNull(writer);
        if (field is not { } f)
        {
            writer.WriteNull(name);
            return;
        }

        switch (f.Kind)
        {
            case RecordFieldKind.Number: writer.Number(name, f.Number); break;
            case RecordFieldKind.Integer: writer.WriteNumber(name, f.Integer); break;
            case RecordFieldKind.Boolean: writer.WriteBoolean(name, f.Integer != 0); break;
            default: writer.Text(name, f.Text); break;
        }
    }
}
