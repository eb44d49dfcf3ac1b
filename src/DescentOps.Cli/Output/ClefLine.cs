using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using DescentOps.Records;
using DescentOps.Journal;

namespace DescentOps.Cli.Output;

/// <summary>
/// One event in the Compact Log Event Format (CLEF: one JSON object a line, reserved names beginning with '@'), the
/// open format that general structured-log viewers read. <c>@t</c> is <see cref="Epoch"/> plus the simulated time
/// (the run's clock starts at zero; <c>sim_t_s</c> keeps the seconds), <c>@mt</c> the template
/// <c>{source}: {kind}</c>, <c>@l</c> the nearest CLEF level (left out for Information, as the format allows); the
/// event's own severity, sequence number and data fields follow as properties, a non-finite number as null.
/// </summary>
public static class ClefLine
{
    /// <summary>The instant simulated time zero is shown at, unless the user names another.</summary>
    public static readonly DateTimeOffset Epoch = DateTimeOffset.UnixEpoch;

    private static readonly JsonWriterOptions Options = new() { Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    /// <summary>The CLEF level for a severity: debug, information, warning, error (alarm), fatal (critical).</summary>
    public static string? Level(Severity severity) => severity switch
    {
        Severity.Debug => "Debug",
        Severity.Info or Severity.Notice => null,
        Severity.Warning => "Warning",
        Severity.Alarm => "Error",
        _ => "Fatal",
    };

    public static string Format(EventEntry e, DateTimeOffset epoch)
    {
        ArgumentNullException.ThrowIfNull(e);
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer, Options))
        {
            w.WriteStartObject();
            var ticks = checked((long)Math.Round(e.TimeSeconds * TimeSpan.TicksPerSecond));
            w.WriteString("@t", epoch.AddTicks(ticks).ToString("yyyy-MM-ddTHH:mm:ss.fffffffZ", CultureInfo.InvariantCulture));
            w.WriteString("@mt", "{source}: {kind}");
            if (Level(e.Severity) is { } level) w.WriteString("@l", level);
            w.WriteString("source", e.Source);
            w.WriteString("kind", e.Kind);
            w.WriteString("severity", e.Severity.ToString().ToLowerInvariant());
            w.WriteNumber("seq", e.Sequence);
            w.WriteNumber("sim_t_s", e.TimeSeconds);
            foreach (var field in e.Data)
            {
                // CLEF reserves names that begin with '@'; a property of that name is written with the '@' doubled.
                var name = field.Name.StartsWith('@') ? "@" + field.Name : field.Name;
                if (name is "source" or "kind" or "severity" or "seq" or "sim_t_s") name = "data_" + name;
                w.Field(name, field);
            }

            w.WriteEndObject();
        }

        return Encoding.UTF8.GetString(buffer.ToArray());
    }
}
