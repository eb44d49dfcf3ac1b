using System.Text;
using DescentOps.Records;

namespace DescentOps.Journal;

/// <summary>
/// The fixed spellings of the journal format, shared by the writer, the reader and the verifier so the three
/// cannot drift apart.
/// </summary>
internal static class JournalFormat
{
    /// <summary>Bumped whenever a line's layout or the chain rule changes meaning.</summary>
    public const string FormatId = "descentops-journal/1";

    public static readonly byte[] Utf8FormatId = Encoding.UTF8.GetBytes(FormatId);

    /// <summary>What precedes the chain value; everything before it is what the chain hashes.</summary>
    public static ReadOnlySpan<byte> ChainSeparator => ",\"chain\":\""u8;

    /// <summary>What follows the chain value: the closing quote and the closing brace of the line's object.</summary>
    public static ReadOnlySpan<byte> LineEnd => "\"}"u8;

    /// <summary>A 128-bit hash as lowercase hex: two characters per byte.</summary>
    public const int ChainHexLength = 32;

    /// <summary><c>,"chain":"</c> (10 bytes) + 32 hex digits + <c>"}</c> (2 bytes).</summary>
    public static int ChainSuffixLength => ChainSeparator.Length + ChainHexLength + LineEnd.Length;

    public const byte NewLine = (byte)'\n';

    public static ReadOnlySpan<byte> ManifestPrefix => "{\"type\":\"manifest\","u8;
    public static ReadOnlySpan<byte> EventPrefix => "{\"type\":\"event\","u8;
    public static ReadOnlySpan<byte> SummaryPrefix => "{\"type\":\"summary\","u8;

    // JSON has no literal for these doubles, so they are written as strings with exactly these spellings.
    public const string NaN = "NaN";
    public const string PositiveInfinity = "Infinity";
    public const string NegativeInfinity = "-Infinity";

    private static readonly string[] SeverityNames = ["debug", "info", "notice", "warning", "alarm", "critical"];

    private static readonly byte[][] Utf8SeverityNames = Array.ConvertAll(SeverityNames, Encoding.UTF8.GetBytes);

    /// <summary>The severity's name as UTF-8; it needs no JSON escaping.</summary>
    public static ReadOnlySpan<byte> Utf8Severity(Severity severity)
    {
        var index = (int)severity;
        if ((uint)index >= (uint)Utf8SeverityNames.Length)
        {
            throw new ArgumentOutOfRangeException(nameof(severity), severity, "Not a defined severity.");
        }

        return Utf8SeverityNames[index];
    }

    public static Severity ParseSeverity(string name)
    {
        var index = Array.IndexOf(SeverityNames, name);
        if (index < 0)
        {
            throw new InvalidDataException($"Unknown severity '{name}'.");
        }

        return (Severity)index;
    }
}
