using System.Buffers.Text;

namespace DescentOps.Journal.Comparison;

/// <summary>Finds the simulated time of a raw journal line without parsing the whole line.</summary>
public static class JournalLineTime
{
    private static ReadOnlySpan<byte> EventTime => ",\"t\":"u8;
    private static ReadOnlySpan<byte> SummaryTime => ",\"final_t\":"u8;

    public static double? Of(ReadOnlySpan<byte> line)
    {
        var key = line.StartsWith(JournalFormat.SummaryPrefix) ? SummaryTime : EventTime;
        var at = line.IndexOf(key);
        if (at < 0) return null;
        var rest = line[(at + key.Length)..];
        return Utf8Parser.TryParse(rest, out double value, out _) ? value : null;
    }
}
