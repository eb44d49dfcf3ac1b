using System.Globalization;
using System.Text.Json;
using DescentOps.Records;

namespace DescentOps.Journal;

/// <summary>
/// Reads one journal line back into a typed entry. Members are matched by name, so a reader does not depend
/// on their order, but <c>type</c> must come first: it decides what the rest of the line means.
/// </summary>
internal static class JournalLineParser
{
    /// <exception cref="InvalidDataException">The line is not a well-formed journal line.</exception>
    public static JournalEntry Parse(ReadOnlySpan<byte> line, long lineNumber)
    {
        try
        {
            var json = new Utf8JsonReader(line);
            Expect(ref json, JsonTokenType.StartObject);
            Expect(ref json, JsonTokenType.PropertyName);
            if (!json.ValueTextEquals("type"u8))
            {
                throw new InvalidDataException("the first member is not \"type\"");
            }

            Expect(ref json, JsonTokenType.String);
            JournalEntry entry;
            if (json.ValueTextEquals("event"u8))
            {
                entry = ParseEvent(ref json, lineNumber);
            }
            else if (json.ValueTextEquals("manifest"u8))
            {
                entry = ParseManifest(ref json, lineNumber);
            }
            else if (json.ValueTextEquals("summary"u8))
            {
                entry = ParseSummary(ref json, lineNumber);
            }
            else
            {
                throw new InvalidDataException($"unknown line type \"{json.GetString()}\"");
            }

            if (json.Read())
            {
                throw new InvalidDataException("text follows the line's object");
            }

            return entry;
        }
        catch (Exception exception) when (exception is JsonException or InvalidDataException or FormatException or InvalidOperationException or OverflowException)
        {
            throw new InvalidDataException($"Journal line {lineNumber} cannot be read: {exception.Message}", exception);
        }
    }

    private static EventEntry ParseEvent(ref Utf8JsonReader json, long lineNumber)
    {
        long? sequence = null;
        double? time = null;
        string? source = null, kind = null;
        Severity? severity = null;
        IReadOnlyList<RecordField>? data = null;
        while (NextMember(ref json))
        {
            if (json.ValueTextEquals("seq"u8)) { json.Read(); sequence = ReadInteger(ref json); }
            else if (json.ValueTextEquals("t"u8)) { json.Read(); time = ReadDouble(ref json); }
            else if (json.ValueTextEquals("source"u8)) { json.Read(); source = ReadString(ref json); }
            else if (json.ValueTextEquals("kind"u8)) { json.Read(); kind = ReadString(ref json); }
            else if (json.ValueTextEquals("severity"u8)) { json.Read(); severity = JournalFormat.ParseSeverity(ReadString(ref json)); }
            else if (json.ValueTextEquals("data"u8)) { data = ReadFields(ref json); }
            else { json.Read(); json.Skip(); }
        }

        return new EventEntry(
            lineNumber,
            sequence ?? throw Missing("seq"),
            time ?? throw Missing("t"),
            source ?? throw Missing("source"),
            kind ?? throw Missing("kind"),
            severity ?? throw Missing("severity"),
            data ?? throw Missing("data"));
    }

    private static ManifestEntry ParseManifest(ref Utf8JsonReader json, long lineNumber)
    {
        string? format = null, toolVersion = null, scenarioName = null, sha256 = null, scenarioText = null, random = null;
        long? seed = null;
        double? until = null;
        IReadOnlyList<RecordField> extra = [];
        while (NextMember(ref json))
        {
            if (json.ValueTextEquals("format"u8)) { json.Read(); format = ReadString(ref json); }
            else if (json.ValueTextEquals("tool_version"u8)) { json.Read(); toolVersion = ReadString(ref json); }
            else if (json.ValueTextEquals("scenario_name"u8)) { json.Read(); scenarioName = ReadString(ref json); }
            else if (json.ValueTextEquals("scenario_sha256"u8)) { json.Read(); sha256 = ReadString(ref json); }
            else if (json.ValueTextEquals("scenario_text"u8)) { json.Read(); scenarioText = ReadString(ref json); }
            else if (json.ValueTextEquals("seed"u8)) { json.Read(); seed = ReadInteger(ref json); }
            else if (json.ValueTextEquals("until_s"u8)) { json.Read(); until = ReadDouble(ref json); }
            else if (json.ValueTextEquals("random"u8)) { json.Read(); random = ReadString(ref json); }
            else if (json.ValueTextEquals("extra"u8)) { extra = ReadFields(ref json); }
            else { json.Read(); json.Skip(); }
        }

        if (format != JournalFormat.FormatId)
        {
            throw new InvalidDataException($"format \"{format}\" is not \"{JournalFormat.FormatId}\"");
        }

        var manifest = new RunManifest(
            toolVersion ?? throw Missing("tool_version"),
            scenarioName ?? throw Missing("scenario_name"),
            scenarioText ?? throw Missing("scenario_text"),
            seed ?? throw Missing("seed"),
            until ?? throw Missing("until_s"),
            random ?? throw Missing("random"))
        {
            Extra = extra,
        };

        // The chain already guards the text; this catches a writer that hashed something else.
        if (sha256 != manifest.ScenarioSha256)
        {
            throw new InvalidDataException("scenario_sha256 does not match scenario_text");
        }

        return new ManifestEntry(lineNumber, manifest);
    }

    private static SummaryEntry ParseSummary(ref Utf8JsonReader json, long lineNumber)
    {
        string? outcome = null, reason = null;
        double? finalTime = null;
        long? events = null;
        IReadOnlyList<RecordField>? data = null;
        while (NextMember(ref json))
        {
            if (json.ValueTextEquals("outcome"u8)) { json.Read(); outcome = ReadString(ref json); }
            else if (json.ValueTextEquals("reason"u8)) { json.Read(); reason = ReadString(ref json); }
            else if (json.ValueTextEquals("final_t"u8)) { json.Read(); finalTime = ReadDouble(ref json); }
            else if (json.ValueTextEquals("events"u8)) { json.Read(); events = ReadInteger(ref json); }
            else if (json.ValueTextEquals("data"u8)) { data = ReadFields(ref json); }
            else { json.Read(); json.Skip(); }
        }

        var summary = new RunSummary(
            outcome ?? throw Missing("outcome"),
            reason ?? throw Missing("reason"),
            finalTime ?? throw Missing("final_t"),
            data ?? throw Missing("data"));
        return new SummaryEntry(lineNumber, summary, events ?? throw Missing("events"));
    }

    /// <summary>Moves to the next member name of the current object; false at its end.</summary>
    private static bool NextMember(ref Utf8JsonReader json)
    {
        if (!json.Read())
        {
            throw new InvalidDataException("the line ends inside its object");
        }

        return json.TokenType switch
        {
            JsonTokenType.PropertyName => true,
            JsonTokenType.EndObject => false,
            _ => throw new InvalidDataException($"expected a member name, found {json.TokenType}"),
        };
    }

    /// <summary>
    /// Reads an object of fields, inferring each kind from its JSON spelling: a number with a point or an
    /// exponent is a double, one without is an integer (the writer guarantees the difference), true/false is
    /// a boolean, an unescaped "NaN"/"Infinity"/"-Infinity" is a double, and any other string is text.
    /// </summary>
    private static List<RecordField> ReadFields(ref Utf8JsonReader json)
    {
        Expect(ref json, JsonTokenType.StartObject);
        var fields = new List<RecordField>();
        while (NextMember(ref json))
        {
            var name = json.GetString()!;
            json.Read();
            fields.Add(json.TokenType switch
            {
                JsonTokenType.Number when IsIntegerSpelling(json.ValueSpan) => RecordField.Of(name, json.GetInt64()),
                JsonTokenType.Number => RecordField.Of(name, ParseDouble(json.ValueSpan)),
                JsonTokenType.True => RecordField.Of(name, true),
                JsonTokenType.False => RecordField.Of(name, false),
                JsonTokenType.String when TrySpecialDouble(ref json, out var special) => RecordField.Of(name, special),
                JsonTokenType.String => RecordField.Of(name, json.GetString()!),
                _ => throw new InvalidDataException($"field \"{name}\" has a {json.TokenType} value"),
            });
        }

        return fields;
    }

    private static double ReadDouble(ref Utf8JsonReader json) => json.TokenType switch
    {
        JsonTokenType.Number => ParseDouble(json.ValueSpan),
        JsonTokenType.String when TrySpecialDouble(ref json, out var special) => special,
        _ => throw new InvalidDataException($"expected a number, found {json.TokenType}"),
    };

    private static long ReadInteger(ref Utf8JsonReader json) =>
        json.TokenType == JsonTokenType.Number && IsIntegerSpelling(json.ValueSpan)
            ? json.GetInt64()
            : throw new InvalidDataException($"expected an integer, found {json.TokenType}");

    private static string ReadString(ref Utf8JsonReader json) =>
        json.TokenType == JsonTokenType.String
            ? json.GetString()!
            : throw new InvalidDataException($"expected a string, found {json.TokenType}");

    private static bool IsIntegerSpelling(ReadOnlySpan<byte> number) => number.IndexOfAny((byte)'.', (byte)'e', (byte)'E') < 0;

    // double.Parse rather than Utf8JsonReader.GetDouble: the runtime's parser is the documented exact inverse
    // of the "R" formatting used by the writer, including the sign of -0.0.
    private static double ParseDouble(ReadOnlySpan<byte> number) =>
        double.Parse(number, NumberStyles.Float, CultureInfo.InvariantCulture);

    private static bool TrySpecialDouble(ref Utf8JsonReader json, out double value)
    {
        value = 0;
        if (json.ValueIsEscaped)
        {
            return false;
        }

        var text = json.ValueSpan;
        if (text.SequenceEqual("NaN"u8)) { value = double.NaN; }
        else if (text.SequenceEqual("Infinity"u8)) { value = double.PositiveInfinity; }
        else if (text.SequenceEqual("-Infinity"u8)) { value = double.NegativeInfinity; }
        else { return false; }

        return true;
    }

    private static void Expect(ref Utf8JsonReader json, JsonTokenType type)
    {
        if (!json.Read() || json.TokenType != type)
        {
            throw new InvalidDataException($"expected {type}");
        }
    }

    private static InvalidDataException Missing(string member) => new($"the member \"{member}\" is missing");
}
