using DescentOps.Records;

namespace DescentOps.Journal;

/// <summary>
/// Turns manifest, events and summary into chained journal lines, one at a time, in one reusable buffer.
/// Each line is built whole before anyone sees it: a record that fails half way through (a lone surrogate in
/// a text field, an undefined severity) leaves no fragment behind and does not advance the chain, so the
/// journal can still be finished with a summary that reports the failure.
/// </summary>
/// <remarks>
/// Members are written in a fixed order with no whitespace, and every value through
/// <see cref="Utf8LineBuilder"/>, so the same input gives the same bytes in every process. The hot path,
/// <see cref="EncodeEvent"/>, allocates nothing.
/// </remarks>
internal sealed class JournalLineEncoder
{
    private readonly Utf8LineBuilder _line;
    private readonly JournalChain _chain = new();

    public JournalLineEncoder(int initialCapacity)
    {
        _line = new Utf8LineBuilder(initialCapacity);
    }

    public long EventCount { get; private set; }

    /// <summary>Returns the complete line, newline included; valid until the next call.</summary>
    public ReadOnlySpan<byte> EncodeManifest(RunManifest manifest)
    {
        _line.Clear();
        _line.Append("{\"type\":\"manifest\",\"format\":\""u8);
        _line.Append(JournalFormat.Utf8FormatId);
        _line.Append("\",\"tool_version\":"u8);
        _line.AppendString(manifest.ToolVersion);
        _line.Append(",\"scenario_name\":"u8);
        _line.AppendString(manifest.ScenarioName);
        _line.Append(",\"scenario_sha256\":"u8);
        _line.AppendString(manifest.ScenarioSha256);
        _line.Append(",\"scenario_text\":"u8);
        _line.AppendString(manifest.ScenarioText);
        _line.Append(",\"seed\":"u8);
        _line.AppendInteger(manifest.Seed);
        _line.Append(",\"until_s\":"u8);
        _line.AppendDouble(manifest.UntilSeconds);
        _line.Append(",\"random\":"u8);
        _line.AppendString(manifest.RandomAlgorithm);
        if (manifest.Extra.Count > 0)
        {
            _line.Append(",\"extra\":"u8);
            AppendFields(manifest.Extra);
        }

        return EndLine();
    }

    /// <summary>Returns the complete line, newline included; valid until the next call.</summary>
    public ReadOnlySpan<byte> EncodeEvent(JournalRecord record)
    {
        _line.Clear();
        _line.Append("{\"type\":\"event\",\"seq\":"u8);
        _line.AppendInteger(EventCount + 1);
        _line.Append(",\"t\":"u8);
        _line.AppendMicrosecondsAsSeconds(record.Time.Ticks);
        _line.Append(",\"source\":"u8);
        _line.AppendString(record.Source.Name);
        _line.Append(",\"kind\":"u8);
        _line.AppendString(record.Kind);
        _line.Append(",\"severity\":\""u8);
        _line.Append(JournalFormat.Utf8Severity(record.Severity));
        _line.Append("\",\"data\":"u8);
        AppendFields(record.Fields);
        var line = EndLine();

        // Counted only once the line is complete, so a record that fails to encode does not use up a number.
        EventCount++;
        return line;
    }

    /// <summary>Returns the complete line, newline included; valid until the next call.</summary>
    public ReadOnlySpan<byte> EncodeSummary(RunSummary summary)
    {
        _line.Clear();
        _line.Append("{\"type\":\"summary\",\"outcome\":"u8);
        _line.AppendString(summary.OutcomeKind);
        _line.Append(",\"reason\":"u8);
        _line.AppendString(summary.Reason);
        _line.Append(",\"final_t\":"u8);
        _line.AppendDouble(summary.FinalTimeS);
        _line.Append(",\"events\":"u8);
        _line.AppendInteger(EventCount);
        _line.Append(",\"data\":"u8);
        AppendFields(summary.Data);
        return EndLine();
    }

    private ReadOnlySpan<byte> EndLine()
    {
        _chain.Advance(_line.Written);
        _line.Append(JournalFormat.ChainSeparator);
        _line.Append(_chain.CurrentHex);
        _line.Append(JournalFormat.LineEnd);
        _line.Append(JournalFormat.NewLine);
        return _line.Written;
    }

    private void AppendFields(IReadOnlyList<RecordField> fields)
    {
        _line.Append((byte)'{');

        // An indexed loop: foreach over IReadOnlyList<T> would box the enumerator on every event.
        for (var i = 0; i < fields.Count; i++)
        {
            var field = fields[i];
            if (i > 0)
            {
                _line.Append((byte)',');
            }

            _line.AppendString(field.Name);
            _line.Append((byte)':');
            switch (field.Kind)
            {
                case RecordFieldKind.Number:
                    _line.AppendDouble(field.Number);
                    break;
                case RecordFieldKind.Integer:
                    _line.AppendInteger(field.Integer);
                    break;
                case RecordFieldKind.Boolean:
                    _line.AppendBoolean(field.Integer != 0);
                    break;
                case RecordFieldKind.Text:
                    AppendText(field.Text ?? throw new ArgumentException($"Text field '{field.Name}' has no value.", nameof(fields)));
                    break;
                default:
                    throw new ArgumentOutOfRangeException(nameof(fields), field.Kind, $"Field '{field.Name}' has an unknown kind.");
            }
        }

        _line.Append((byte)'}');
    }

    /// <summary>
    /// A text value that happens to spell NaN or an infinity is written with its first character escaped, so
    /// that the reader, which takes only unescaped spellings as doubles, still reads it back as text.
    /// </summary>
    private void AppendText(string text)
    {
        switch (text)
        {
            case JournalFormat.NaN:
                _line.Append("\"\\u004EaN\""u8);
                break;
            case JournalFormat.PositiveInfinity:
                _line.Append("\"\\u0049nfinity\""u8);
                break;
            case JournalFormat.NegativeInfinity:
                _line.Append("\"\\u002DInfinity\""u8);
                break;
            default:
                _line.AppendString(text);
                break;
        }
    }
}
