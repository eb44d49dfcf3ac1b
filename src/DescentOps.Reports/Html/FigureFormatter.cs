using System.Globalization;
using DescentOps.Records;

namespace DescentOps.Reports.Html;

/// <summary>
/// Turns the summary's SI fields into the figures an operator reads. The unit comes from the field name's
/// suffix (the project's naming rule), so a figure the runner adds later is shown sensibly without a change here.
/// </summary>
public static class FigureFormatter
{
    private static readonly Dictionary<string, string> Labels = new(StringComparer.Ordinal)
    {
        ["breakthrough_t_s"] = "time to breakthrough",
        ["final_depth_m"] = "final depth",
        ["energy_used_j"] = "energy used",
        ["faults_injected"] = "faults injected",
        ["frames_sent"] = "telemetry frames sent",
        ["frames_received_on_ground"] = "frames received on ground",
        ["frames_lost"] = "frames lost",
        ["vehicle_profiles"] = "vehicle profiles",
        ["events_delivered"] = "events delivered",
        ["records_written"] = "events logged",
        ["component_failures"] = "component failures",
    };

    public static SummaryFigure Format(RecordField field) => new(Label(field.Name), Value(field));

    /// <summary>Summary fields that are a pass/fail criterion's verdict or measure (<c>criterion.NAME...</c>).</summary>
    public static bool IsCriterion(string name) =>
        name.StartsWith("criterion.", StringComparison.Ordinal) || name.StartsWith("criteria.", StringComparison.Ordinal);

    /// <summary>A criterion's name from its summary field (<c>criterion.on-time</c> → <c>on-time</c>).</summary>
    public static string CriterionName(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        foreach (var prefix in new[] { "criterion.", "criteria." })
        {
            if (name.StartsWith(prefix, StringComparison.Ordinal)) return name[prefix.Length..];
        }

        return name;
    }

    /// <summary>A criterion's verdict as the run summary prints it: "met" or "NOT met" for a boolean, the value otherwise.</summary>
    public static string Verdict(RecordField field) =>
        field.Kind == RecordFieldKind.Boolean ? (field.Integer != 0 ? "met" : "NOT met") : Value(field);

    public static string Label(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (Labels.TryGetValue(name, out var label)) return label;
        // fault.NAME.detected_after_s → "fault NAME: detected after"; criterion.NAME.x → "NAME: x".
        foreach (var prefix in new[] { "fault.", "criterion.", "criteria." })
        {
            if (!name.StartsWith(prefix, StringComparison.Ordinal)) continue;
            var last = name.LastIndexOf('.');
            if (last <= prefix.Length) break;
            var owner = name[prefix.Length..last];
            var lead = prefix == "fault." ? "fault " + owner : owner;
            return $"{lead}: {Label(name[(last + 1)..])}";
        }

        foreach (var suffix in new[] { "_t_s", "_s", "_j", "_m", "_w", "_k", "_pa", "_m_s" })
        {
            if (name.EndsWith(suffix, StringComparison.Ordinal) && name.Length > suffix.Length)
            {
                name = name[..^suffix.Length];
                break;
            }
        }

        return name.Replace('_', ' ');
    }

    public static string Value(RecordField field) => field.Kind switch
    {
        RecordFieldKind.Number => Number(field.Name, field.Number),
        RecordFieldKind.Integer => field.Integer.ToString(CultureInfo.InvariantCulture),
        RecordFieldKind.Boolean => field.Integer != 0 ? "yes" : "no",
        _ => field.Text ?? "",
    };

    /// <summary>A time in seconds as days with the exact seconds beside it, as the run command prints it.</summary>
    public static string Duration(double seconds) =>
        string.Create(CultureInfo.InvariantCulture, $"{seconds / 86_400:F3} d ({seconds:F0} s)");

    /// <summary>A number to six significant digits in plain notation (no exponent), trailing zeros dropped.</summary>
    public static string Plain(double value)
    {
        if (!double.IsFinite(value)) return DataJson.Number(value);
        if (value == 0) return "0";
        var decimals = Math.Clamp(5 - (int)Math.Floor(Math.Log10(Math.Abs(value))), 0, 15);
        var text = Math.Round(value, decimals).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return text.Contains('.', StringComparison.Ordinal) ? text.TrimEnd('0').TrimEnd('.') : text;
    }

    /// <summary>
    /// What a missing value means, said in words: an instant or a delay that never came ("never"), a time at which
    /// something would have been reached ("not reached"); an infinity keeps its sign in words.
    /// </summary>
    public static string Missing(string name, double value)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (double.IsPositiveInfinity(value)) return "unbounded";
        if (double.IsNegativeInfinity(value)) return "unbounded (negative)";
        if (name.EndsWith("_t_s", StringComparison.Ordinal) || name.Contains("breakthrough", StringComparison.Ordinal)) return "not reached";
        if (name.EndsWith("_after_s", StringComparison.Ordinal) || name.EndsWith("_s", StringComparison.Ordinal)) return "never";
        return "none";
    }

    private static string Number(string name, double value)
    {
        if (!double.IsFinite(value)) return Missing(name, value);
        if (name.EndsWith("_m_s", StringComparison.Ordinal)) return string.Create(CultureInfo.InvariantCulture, $"{Plain(value)} m/s");
        if (name.EndsWith("_s", StringComparison.Ordinal)) return Duration(value);
        if (name.EndsWith("_j", StringComparison.Ordinal)) return string.Create(CultureInfo.InvariantCulture, $"{value / 3.6e9:F2} MWh ({value:F0} J)");
        if (name.EndsWith("_m", StringComparison.Ordinal)) return string.Create(CultureInfo.InvariantCulture, $"{value:F1} m");
        if (name.EndsWith("_w", StringComparison.Ordinal)) return string.Create(CultureInfo.InvariantCulture, $"{Plain(value)} W");
        if (name.EndsWith("_k", StringComparison.Ordinal)) return string.Create(CultureInfo.InvariantCulture, $"{value:F1} K");
        return Plain(value);
    }
}
