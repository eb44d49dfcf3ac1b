using System.Globalization;
using System.Text.Encodings.Web;
using System.Text.Json;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// The answer of a <c>physics</c> subcommand, in order: printed as an aligned table for a person, or as exactly one
/// JSON object (snake_case names, SI values, culture-invariant) for a script. Both come from the same entries, so
/// the table can never show a value the JSON does not.
/// </summary>
internal sealed class PhysicsReport(string title)
{
    private readonly List<PhysicsReportEntry> _entries = [];

    /// <summary>The short form of the README's cautions, printed under every table.</summary>
    public const string Caution = "Published models with stated limits, for rehearsal only: DescentOps certifies nothing (see README, Cautions).";

    public string Title { get; } = title;

    public IReadOnlyList<PhysicsReportEntry> Entries => _entries;

    /// <summary>A number; a non-finite one (a stalled probe's crossing time, a melting point where no liquid exists) is written as JSON null.</summary>
    public PhysicsReport Number(string jsonName, string label, double value, string unit)
    {
        _entries.Add(new PhysicsReportEntry(jsonName, label, unit, value, null, null, null));
        return this;
    }

    public PhysicsReport Text(string jsonName, string label, string value)
    {
        _entries.Add(new PhysicsReportEntry(jsonName, label, "", null, value, null, null));
        return this;
    }

    public PhysicsReport Flag(string jsonName, string label, bool value)
    {
        _entries.Add(new PhysicsReportEntry(jsonName, label, "", null, null, value, null));
        return this;
    }

    public PhysicsReport Section(string jsonName, string label, PhysicsReport section)
    {
        _entries.Add(new PhysicsReportEntry(jsonName, label, "", null, null, null, section));
        return this;
    }

    public void Write(TextWriter output, bool json)
    {
        ArgumentNullException.ThrowIfNull(output);
        if (json) WriteJson(output);
        else WriteTable(output);
    }

    private void WriteJson(TextWriter output)
    {
        using var buffer = new MemoryStream();
        // Relaxed escaping keeps units such as "m²" readable; the output is never embedded in HTML.
        var options = new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };
        using (var writer = new Utf8JsonWriter(buffer, options))
        {
            WriteObject(writer, this);
        }

        output.WriteLine(System.Text.Encoding.UTF8.GetString(buffer.ToArray()));
    }

    private static void WriteObject(Utf8JsonWriter writer, PhysicsReport report)
    {
        writer.WriteStartObject();
        foreach (var entry in report._entries)
        {
            writer.WritePropertyName(entry.JsonName);
            if (entry.Section is { } section) WriteObject(writer, section);
            else if (entry.Flag is { } flag) writer.WriteBooleanValue(flag);
            else if (entry.Text is { } text) writer.WriteStringValue(text);
            else if (entry.Number is { } number && double.IsFinite(number)) writer.WriteNumberValue(number);
            else writer.WriteNullValue();
        }

        writer.WriteEndObject();
    }

    private void WriteTable(TextWriter output)
    {
        output.WriteLine(Title);
        var rows = new List<(string Label, string Value, string Unit)>();
        Collect(this, "", rows);
        var labelWidth = rows.Max(r => r.Label.Length) + 2;
        var valueWidth = rows.Max(r => r.Value.Length);
        foreach (var (label, value, unit) in rows)
        {
            // Values right-aligned in one column so that magnitudes line up; a section heading has none.
            output.WriteLine($"  {label.PadRight(labelWidth)}{value.PadLeft(value.Length > 0 ? valueWidth : 0)} {unit}".TrimEnd());
        }

        // Every printout carries the project's caution (README, "Cautions"); the JSON stays a bare object for scripts.
        output.WriteLine(Caution);
    }

    private static void Collect(PhysicsReport report, string indent, List<(string, string, string)> rows)
    {
        foreach (var entry in report._entries)
        {
            if (entry.Section is { } section)
            {
                rows.Add((indent + entry.Label, "", ""));
                Collect(section, indent + "  ", rows);
                continue;
            }

            var value = entry switch
            {
                { Flag: { } flag } => flag ? "yes" : "no",
                { Text: { } text } => text,
                { Number: { } number } when double.IsFinite(number) => number.ToString("G6", CultureInfo.InvariantCulture),
                { Number: { } number } when double.IsInfinity(number) => "infinite",
                _ => "n/a",
            };
            rows.Add((indent + entry.Label, value, double.IsFinite(entry.Number ?? 0) ? entry.Unit : ""));
        }
    }
}
