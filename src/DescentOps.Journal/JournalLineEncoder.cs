using System.Buffers;
using System.Globalization;
using System.Text.Encodings.Web;
using System.Text.Json;
using DescentOps.Engine.Journaling;

namespace DescentOps.Journal;

/// <summary>
/// Turns manifest, events and summary into chained journal lines, one at a time, in one reusable buffer.
/// Each line is built whole before anyone sees it: a record that fails half way through (a lone surrogate in a
/// text field, say) leaves no fragment behind and does not advance the chain, so the journal can still be
/// finished with a summary that reports the failure.
/// </summary>
/// <remarks>
/// Byte-for-byte reproducibility rests on three choices: a fixed encoder (the relaxed one, so scenario text
/// keeps its quotes and non-ASCII letters readable instead of turning into <c>\u</c> escapes), no indentation,
/// and our own number spelling (see <see cref="WriteDoubleValue"/>).
/// </remarks>
internal sealed class JournalLineEncoder : IDisposable
{
    private static readonly JsonEncodedText Type = JsonEncodedText.Encode("type");
    private static readonly JsonEncodedText Manifest = JsonEncodedText.Encode("manifest");
    private static readonly JsonEncodedText Event = JsonEncodedText.Encode("event");
    private static readonly JsonEncodedText Summary = JsonEncodedText.Encode("summary");
    private static readonly JsonEncodedText Format = JsonEncodedText.Encode("format");
    private static readonly JsonEncodedText FormatId = JsonEncodedText.Encode(JournalFormat.FormatId);
    private static readonly JsonEncodedText ToolVersion = JsonEncodedText.Encode("tool_version");
    private static readonly JsonEncodedText ScenarioName = JsonEncodedText.Encode("scenario_name");
    private static readonly JsonEncodedText ScenarioSha256 = JsonEncodedText.Encode("scenario_sha256");
    private static readonly JsonEncodedText ScenarioText = JsonEncodedText.Encode("scenario_text");
    private static readonly JsonEncodedText Seed = JsonEncodedText.Encode("seed");
    private static readonly JsonEncodedText UntilS = JsonEncodedText.Encode("until_s");
    private static readonly JsonEncodedText Random = JsonEncodedText.Encode("random");
    private static readonly JsonEncodedText Extra = JsonEncodedText.Encode("extra");
    private static readonly JsonEncodedText Seq = JsonEncodedText.Encode("seq");
    private static readonly JsonEncodedText T = JsonEncodedText.Encode("t");
    private static readonly JsonEncodedText Source = JsonEncodedText.Encode("source");
    private static readonly JsonEncodedText Kind = JsonEncodedText.Encode("kind");
    private static readonly JsonEncodedText SeverityName = JsonEncodedText.Encode("severity");
    private static readonly JsonEncodedText Data = JsonEncodedText.Encode("data");
    private static readonly JsonEncodedText Outcome = JsonEncodedText.Encode("outcome");
    private static readonly JsonEncodedText Reason = JsonEncodedText.Encode("reason");
    private static readonly JsonEncodedText FinalT = JsonEncodedText.Encode("final_t");
    private static readonly JsonEncodedText Events = JsonEncodedText.Encode("events");
    private static readonly JsonEncodedText Chain = JsonEncodedText.Encode("chain");

    private static readonly JsonWriterOptions WriterOptions = new()
    {
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        Indented = false,
    };

    private readonly ArrayBufferWriter<byte> _buffer;
    private readonly Utf8JsonWriter _json;
    private readonly JournalChain _chain = new();

    public JournalLineEncoder(int initialCapacity)
    {
        _buffer = new ArrayBufferWriter<byte>(initialCapacity);
        _json = new Utf8JsonWriter(_buffer, WriterOptions);
    }

    public long EventCount { get; private set; }

    /// <summary>Returns the complete line, newline included; valid until the next call.</summary>
    public ReadOnlySpan<byte> EncodeManifest(RunManifest manifest)
    {
        BeginLine(Manifest);
        _json.WriteString(Format, FormatId);
        _json.WriteString(ToolVersion, manifest.ToolVersion);
        _json.WriteString(ScenarioName, manifest.ScenarioName);
        _json.WriteString(ScenarioSha256, manifest.ScenarioSha256);
        _json.WriteString(ScenarioText, manifest.ScenarioText);
        _json.WriteNumber(Seed, manifest.Seed);
        _json.WritePropertyName(UntilS);
        WriteDoubleValue(manifest.UntilSeconds);
        _json.WriteString(Random, manifest.RandomAlgorithm);
        if (manifest.Extra.Count > 0)
        {
            WriteFields(Extra, manifest.Extra);
        }

        return EndLine();
    }

    /// <summary>Returns the complete line, newline included; valid until the next call.</summary>
    public ReadOnlySpan<byte> EncodeEvent(JournalRecord record)
    {
        BeginLine(Event);
        _json.WriteNumber(Seq, EventCount + 1);
        _json.WritePropertyName(T);
        WriteDoubleValue(record.Time.SecondsSinceEpoch);
        _json.WriteString(Source, record.Source.Name);
        _json.WriteString(Kind, record.Kind);
        _json.WriteString(SeverityName, JournalFormat.EncodedSeverity(record.Severity));
        WriteFields(Data, record.Fields);
        var line = EndLine();

        // Counted only once the line is complete, so a record that fails to encode does not use up a number.
        EventCount++;
        return line;
    }

    /// <summary>Returns the complete line, newline included; valid until the next call.</summary>
    public ReadOnlySpan<byte> EncodeSummary(RunSummary summary)
    {
        BeginLine(Summary);
        _json.WriteString(Outcome, summary.OutcomeKind);
        _json.WriteString(Reason, summary.Reason);
        _json.WritePropertyName(FinalT);
        WriteDoubleValue(summary.FinalTimeS);
        _json.WriteNumber(Events, EventCount);
        WriteFields(Data, summary.Data);
        return EndLine();
    }

    public void Dispose() => _json.Dispose();

    private void BeginLine(JsonEncodedText type)
    {
        _buffer.ResetWrittenCount();
        _json.Reset();
        _json.WriteStartObject();
        _json.WriteString(Type, type);
    }

    private ReadOnlySpan<byte> EndLine()
    {
        _json.Flush();
        _chain.Advance(_buffer.WrittenSpan);
        _json.WriteString(Chain, _chain.CurrentHex);
        _json.WriteEndObject();
        _json.Flush();
        _buffer.GetSpan(1)[0] = JournalFormat.NewLine;
        _buffer.Advance(1);
        return _buffer.WrittenSpan;
    }

    private void WriteFields(JsonEncodedText name, IReadOnlyList<RecordField> fields)
    {
        _json.WriteStartObject(name);

        // An indexed loop: foreach over IReadOnlyList<T> would box the enumerator on every event.
        for (var i = 0; i < fields.Count; i++)
        {
            var field = fields[i];
            _json.WritePropertyName(field.Name);
            switch (field.Kind)
            {
                case RecordFieldKind.Number:
                    WriteDoubleValue(field.Number);
                    break;
                case RecordFieldKind.Integer:
                    _json.WriteNumberValue(field.Integer);
                    break;
                case RecordFieldKind.Boolean:
                    _json.WriteBooleanValue(field.Integer != 0);
                    break;
                case RecordFieldKind.Text:
                    WriteTextValue(field.Text ?? throw new ArgumentException($"Text field '{field.Name}' has no value."));
                    break;
                default:
                    throw new ArgumentOutOfRangeException(nameof(fields), field.Kind, $"Field '{field.Name}' has an unknown kind.");
            }
        }

        _json.WriteEndObject();
    }

    /// <summary>
    /// Shortest round-trip spelling, invariant culture, with ".0" added when that spelling has neither a point
    /// nor an exponent: a reader can then tell a double from an integer by its text alone, so field kinds
    /// survive the round trip (and -0.0 keeps its sign as "-0.0"). NaN and the infinities, which JSON cannot
    /// spell as numbers, become the strings <see cref="JournalFormat.NaN"/> and friends.
    /// </summary>
    private void WriteDoubleValue(double value)
    {
        if (!double.IsFinite(value))
        {
            _json.WriteStringValue(double.IsNaN(value) ? JournalFormat.NaN
                : value > 0 ? JournalFormat.PositiveInfinity : JournalFormat.NegativeInfinity);
            return;
        }

        // The longest shortest-round-trip double is 24 characters ("-2.2250738585072014E-308"); 32 leaves room for ".0".
        Span<byte> text = stackalloc byte[32];
        if (!value.TryFormat(text, out var length, "R", CultureInfo.InvariantCulture))
        {
            throw new InvalidOperationException($"Could not format {value:R}.");
        }

        if (text[..length].IndexOfAny((byte)'.', (byte)'E', (byte)'e') < 0)
        {
            text[length++] = (byte)'.';
            text[length++] = (byte)'0';
        }

        _json.WriteRawValue(text[..length], skipInputValidation: true);
    }

    /// <summary>
    /// A text value that happens to spell NaN or an infinity is written with its first character escaped, so
    /// that the reader, which takes only unescaped spellings as doubles, still reads it back as text.
    /// </summary>
    private void WriteTextValue(string text)
    {
        switch (text)
        {
            case JournalFormat.NaN:
                _json.WriteRawValue("\"\\u004EaN\""u8, skipInputValidation: true);
                break;
            case JournalFormat.PositiveInfinity:
                _json.WriteRawValue("\"\\u0049nfinity\""u8, skipInputValidation: true);
                break;
            case JournalFormat.NegativeInfinity:
                _json.WriteRawValue("\"\\u002DInfinity\""u8, skipInputValidation: true);
                break;
            default:
                _json.WriteStringValue(text);
                break;
        }
    }
}
