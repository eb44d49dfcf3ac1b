using System.Text.Json;
using DescentOps.Journal.Comparison;

namespace DescentOps.Cli.Output;

/// <summary>
/// A <see cref="JournalDivergence"/> in a command's <c>--json</c> answer: the same keys wherever one appears
/// (<c>replay</c>'s <c>divergence</c>, <c>diff</c>'s <c>first_divergence</c>). Side a is the first log (for
/// <c>replay</c>, the log on disk), side b the second (for <c>replay</c>, the re-run).
/// </summary>
public static class JournalDivergenceOutput
{
    /// <summary>
    /// The divergence as an object named <paramref name="name"/>: its 1-based line, the simulated time on each side
    /// and each side's text (null where that side has no time, or has ended); null when there is no divergence.
    /// </summary>
    public static void Divergence(this Utf8JsonWriter writer, string name, JournalDivergence? divergence)
    {
        ArgumentNullException.ThrowIfNull(writer);
        if (divergence is not { } d)
        {
            writer.WriteNull(name);
            return;
        }

        writer.WriteStartObject(name);
        writer.WriteNumber("line", d.Line);
        writer.Number("time_a_s", d.TimeA);
        writer.Number("time_b_s", d.TimeB);
        writer.Text("text_a", d.LineA);
        writer.Text("text_b", d.LineB);
        writer.WriteEndObject();
    }
}
