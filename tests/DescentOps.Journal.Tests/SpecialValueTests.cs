using System.Text;
using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Journal.Tests;

public sealed class SpecialValueTests
{
    public static TheoryData<double, string> Doubles => new()
    {
        { double.NaN, "\"NaN\"" },
        { double.PositiveInfinity, "\"Infinity\"" },
        { double.NegativeInfinity, "\"-Infinity\"" },
        { -0.0, "-0.0" },
        { 0.0, "0.0" },
        { 1e-300, "1E-300" },
        { 0.1, "0.1" },
        { 1.0, "1.0" },
        { double.MaxValue, "1.7976931348623157E+308" },
        { double.Epsilon, "5E-324" },
        { -123456789.125, "-123456789.125" },
    };

    [Theory]
    [MemberData(nameof(Doubles))]
    public void A_double_field_is_spelled_as_documented_and_reads_back_bit_for_bit(double value, string spelling)
    {
        var (line, data) = RoundTrip(RecordField.Of("v", value));

        Assert.Contains($"\"data\":{{\"v\":{spelling}}}", line);
        var field = Assert.Single(data);
        Assert.Equal(RecordFieldKind.Number, field.Kind);
        Assert.Equal(BitConverter.DoubleToInt64Bits(value), BitConverter.DoubleToInt64Bits(field.Number));
    }

    [Theory]
    [InlineData("NaN")]
    [InlineData("Infinity")]
    [InlineData("-Infinity")]
    [InlineData("1.5")]
    [InlineData("")]
    public void Text_that_spells_a_number_stays_text(string text)
    {
        var (_, data) = RoundTrip(RecordField.Of("v", text));

        var field = Assert.Single(data);
        Assert.Equal(RecordFieldKind.Text, field.Kind);
        Assert.Equal(text, field.Text);
    }

    [Fact]
    public void Control_characters_are_escaped_and_other_characters_kept_as_UTF8()
    {
        var (line, data) = RoundTrip(RecordField.Of("v", "\u0001\u001f\b\f\r\n\t\"\\ é ж \u2028 /"));

        Assert.Contains("\"v\":\"\\u0001\\u001f\\b\\f\\r\\n\\t\\\"\\\\ é ж \u2028 /\"", line);
        Assert.Equal("\u0001\u001f\b\f\r\n\t\"\\ é ж \u2028 /", Assert.Single(data).Text);
    }

    [Theory]
    [InlineData(long.MinValue)]
    [InlineData(long.MaxValue)]
    [InlineData(0L)]
    public void Integers_stay_integers(long value)
    {
        var (line, data) = RoundTrip(RecordField.Of("v", value));

        Assert.Contains($"\"v\":{value}}}", line);
        var field = Assert.Single(data);
        Assert.Equal(RecordFieldKind.Integer, field.Kind);
        Assert.Equal(value, field.Integer);
    }

    [Fact]
    public void Special_doubles_in_the_manifest_and_summary_round_trip()
    {
        var manifest = JournalSamples.Manifest() with { UntilSeconds = double.PositiveInfinity };
        var summary = JournalSamples.Summary() with { FinalTimeS = -0.0 };

        var entries = JournalSamples.ReadAll(JournalSamples.Write(manifest, [], summary), out _);

        Assert.Equal(double.PositiveInfinity, Assert.IsType<ManifestEntry>(entries[0]).Manifest.UntilSeconds);
        Assert.Equal(BitConverter.DoubleToInt64Bits(-0.0), BitConverter.DoubleToInt64Bits(Assert.IsType<SummaryEntry>(entries[1]).Summary.FinalTimeS));
    }

    private static (string EventLine, IReadOnlyList<RecordField> Data) RoundTrip(RecordField field)
    {
        var record = new JournalRecord(SimTime.Epoch, new ComponentId("probe"), "probe.test", Severity.Debug, [field]);
        var bytes = JournalSamples.Write(JournalSamples.Manifest(), [record], JournalSamples.Summary());

        Assert.True(JournalVerifier.Verify(new MemoryStream(bytes)).Ok);
        var entries = JournalSamples.ReadAll(bytes, out _);
        return (Encoding.UTF8.GetString(JournalSamples.SplitLines(bytes)[1]), Assert.IsType<EventEntry>(entries[1]).Data);
    }
}
