using System.Globalization;
using System.Net;
using System.Text;
using System.Text.Json.Nodes;
using DescentOps.Reports.Html;
using DescentOps.Reports.Plotting;
using ScottPlot;

namespace DescentOps.Campaigns;

/// <summary>
/// The campaign's page, self-contained like the run report (inline style, inline SVG plots in the embedded fonts, a
/// content security policy that fetches nothing): success with its interval per variant, the distribution of
/// breakthrough times, success against each uncertain input, detection and recovery times per fault, rule coverage and
/// the runs where variants disagree.
/// </summary>
public static class CampaignReport
{
    private static readonly Color[] Colours =
    [
        Color.FromHex("#1d4e89"), Color.FromHex("#c05a12"), Color.FromHex("#2a7f62"), Color.FromHex("#8c2f5a"), Color.FromHex("#5b4a9e"),
    ];

    public static string Render(JsonObject summary, IReadOnlyList<RunRecord> runs)
    {
        var c = CultureInfo.InvariantCulture;
        var variants = summary["variants"]!.AsArray().Select(v => v!["name"]!.GetValue<string>()).ToList();
        var html = new StringBuilder();
        void Line(string s) => html.Append(s).Append('\n');
        Line("<!DOCTYPE html>");
        Line("<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">");
        Line("<head>");
        Line("<meta charset=\"utf-8\" />");
        Line("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; style-src 'unsafe-inline'\" />");
        Line("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\" />");
        Line($"<title>Campaign: {E(summary["scenario"]?.GetValue<string>())}</title>");
        Line($"<style>{ReportStyle.Css} td.n {{ text-align: right; }}</style>");
        Line("</head>");
        Line("<body>");
        Line("<header>");
        Line($"<h1>Campaign: {E(summary["scenario"]?.GetValue<string>())}</h1>");
        Line($"<p class=\"run\">seed {summary["seed"]} · {runs.Count.ToString(c)} runs stored · written by {E(summary["tool_version"]?.GetValue<string>())}</p>");
        Line("</header>");

        Line("<h2>Success per variant</h2>");
        Line("<p>A run succeeds when it completes and meets every criterion. Intervals: 95 %, Wilson 1927.</p>");
        Line("<table><thead><tr><th>variant</th><th>runs</th><th>successes</th><th>rate</th><th>95 % interval</th><th>median breakthrough</th></tr></thead><tbody>");
        foreach (var v in summary["variants"]!.AsArray())
        {
            var ci = v!["success_ci95"]!.AsArray();
            var median = v["breakthrough_quantiles"]!.AsArray().First(q => q!["p"]!.GetValue<double>() == 0.5)!["t_s"];
            Line(string.Create(c, $"<tr><td>{E(v["name"]!.GetValue<string>())}</td><td class=\"n\">{v["runs"]}</td><td class=\"n\">{v["successes"]}</td><td class=\"n\">{Rate(v["success_rate"])}</td><td class=\"n\">{ci[0]!.GetValue<double>():P1} to {ci[1]!.GetValue<double>():P1}</td><td class=\"n\">{(median is null ? "not reached" : $"{median.GetValue<double>() / 86400:F2} d")}</td></tr>"));
        }

        Line("</tbody></table>");
        Line(SuccessPlot(summary));

        foreach (var pair in summary["pairs"]!.AsArray())
        {
            var ci = pair!["difference_ci95"]!.AsArray();
            Line($"<h2>{E(pair["first"]!.GetValue<string>())} against {E(pair["second"]!.GetValue<string>())}</h2>");
            Line(string.Create(c, $"<p>On {pair["runs"]} common seeds: both succeed {pair["both"]}, only the first {pair["first_only"]}, only the second {pair["second_only"]}, neither {pair["neither"]}. Difference in success {pair["difference"]!.GetValue<double>():+0.0%;-0.0%;0.0%} (95 % interval {ci[0]!.GetValue<double>():+0.0%;-0.0%;0.0%} to {ci[1]!.GetValue<double>():+0.0%;-0.0%;0.0%}, Newcombe 1998); exact McNemar p = {pair["mcnemar_p"]!.GetValue<double>():G3}.</p>"));
            var rows = pair["disagreeing_runs"]!.AsArray();
            if (rows.Count > 0)
            {
                Line("<p>Runs where they disagree (regenerate one with <code>descentops campaign log DIR --run I --variant V</code>):</p>");
                Line($"<table><thead><tr><th>run</th><th>seed</th><th>{E(pair["first"]!.GetValue<string>())}</th><th>{E(pair["second"]!.GetValue<string>())}</th></tr></thead><tbody>");
                foreach (var row in rows.Take(200))
                {
                    Line($"<tr><td class=\"n\">{row!["run"]}</td><td class=\"n\">{row["seed"]}</td><td>{Verdict(row[pair["first"]!.GetValue<string>()])}</td><td>{Verdict(row[pair["second"]!.GetValue<string>()])}</td></tr>");
                }

                Line("</tbody></table>");
                if (rows.Count > 200) Line($"<p>… and {rows.Count - 200} more in summary.json.</p>");
            }
        }

        if (summary["variants"]!.AsArray().Any(v => v!["landers"] is not null)) LanderSection(summary, Line);

        Line("<h2>Breakthrough times</h2>");
        Line(Ecdf("Breakthrough time (share of runs that broke through by then)", "days", variants.Select(v => (v, runs.Where(r => r.Variant == v && r.BreakthroughTimeS is not null).Select(r => r.BreakthroughTimeS!.Value / 86400).ToList(), runs.Count(r => r.Variant == v))).ToList()));

        var inputs = runs.SelectMany(r => r.Inputs).Select(i => i.Path).Distinct().ToList();
        if (inputs.Count > 0)
        {
            Line("<h2>Success against the uncertain inputs</h2>");
            Line("<p>Success rate in five bins of equal count of each drawn input: where a rule set breaks.</p>");
            foreach (var path in inputs) Line(InputPlot(path, variants, runs));
        }

        var faults = runs.SelectMany(r => r.Faults).Select(f => f.Fault).Distinct().ToList();
        if (faults.Count > 0)
        {
            Line("<h2>Fault detection and recovery</h2>");
            Line("<p>Detection: the first firing of a rule that reads a point the fault affects or names the fault. Recovery: a return held 6 h. Runs where it never happened are left out of the curve but counted in its denominator.</p>");
            foreach (var fault in faults)
            {
                foreach (var (what, pick) in new (string, Func<Mission.Running.FaultMeasure, double?>)[] { ("detection", f => f.DetectedAfterS), ("recovery", f => f.RecoveredAfterS) })
                {
                    var series = variants.Select(v =>
                    {
                        var measures = runs.Where(r => r.Variant == v).SelectMany(r => r.Faults.Where(f => f.Fault == fault).Take(1)).ToList();
                        return (v, measures.Where(m => pick(m) is not null).Select(m => pick(m)!.Value / 3600).ToList(), measures.Count);
                    }).ToList();
                    Line(Ecdf($"{fault}: time to {what}", "hours after the fault began", series));
                }
            }
        }

        Line("<h2>Rule coverage</h2>");
        Line("<p>Runs in which each rule fired, and in which it acted (fired, escalated or continued), as <code>descentops check SCENARIO --coverage LOG</code> reads one run's log.</p>");
        Line("<table><thead><tr><th>variant</th><th>rule</th><th>runs in which it fired</th><th>runs in which it acted</th></tr></thead><tbody>");
        foreach (var v in summary["variants"]!.AsArray())
        {
            var actedIn = v!["rules_acted_in_runs"]?.AsObject();
            foreach (var (rule, count) in v["rules_fired_in_runs"]!.AsObject())
            {
                var n = count!.GetValue<int>();
                var a = actedIn?[rule]?.GetValue<int>() ?? 0;
                Line($"<tr><td>{E(v["name"]!.GetValue<string>())}</td><td>{E(rule)}</td><td class=\"n\">{Never(n)}</td><td class=\"n\">{Never(a)}</td></tr>");
            }
        }

        Line("</tbody></table>");
        if (summary["variants"]!.AsArray().Any(v => v!["procedure_branches"]?.AsArray().Count > 0))
        {
            Line("<h2>Procedure branches</h2>");
            Line("<p>Each step's branches (every step can pass; a step that waits can be late; a step with a check can fail) and the runs that took each at least once.</p>");
            Line("<table><thead><tr><th>variant</th><th>procedure</th><th>step</th><th>branch</th><th>runs that took it</th><th>times taken</th></tr></thead><tbody>");
            foreach (var v in summary["variants"]!.AsArray())
            {
                foreach (var branch in v!["procedure_branches"]!.AsArray())
                {
                    Line($"<tr><td>{E(v["name"]!.GetValue<string>())}</td><td>{E(branch!["procedure"]!.GetValue<string>())}</td><td>{E(branch["step"]!.GetValue<string>())}</td><td>{E(branch["branch"]!.GetValue<string>())}</td><td class=\"n\">{Never(branch["runs"]!.GetValue<int>())}</td><td class=\"n\">{branch["taken"]}</td></tr>");
                }
            }

            Line("</tbody></table>");
        }

        Line("<h2>Cautions</h2>");
        foreach (var paragraph in Cautions.Paragraphs) Line($"<p>{E(paragraph)}</p>");
        Line("<footer><p>Made by DescentOps from campaign.sqlite; figures come from the stored runs alone.</p></footer>");
        Line("</body>");
        Line("</html>");
        return html.ToString();
    }

    /// <summary>Per lander and variant: each rate with its Wilson interval, median breakthrough and final depth with order-statistic intervals; a plot of the success rates.</summary>
    private static void LanderSection(JsonObject summary, Action<string> line)
    {
        var c = CultureInfo.InvariantCulture;
        line("<h2>Per lander</h2>");
        line("<p>Each lander's own figures. A lander succeeds when the run completes and it meets every criterion judged on it (those naming it and those asked of every or any lander). Stalled: its probe froze in at least once. Station dead: its station had failed and not recovered when the run ended. Intervals: 95 %, Wilson 1927 for rates, order statistics for medians.</p>");
        static string Share(JsonNode lander, string stem)
        {
            var ci = lander[stem + "_ci95"]!.AsArray();
            return string.Create(CultureInfo.InvariantCulture, $"{Rate(lander[stem + "_rate"])} ({ci[0]!.GetValue<double>():P1} to {ci[1]!.GetValue<double>():P1})");
        }

        static string Median(JsonNode? estimate, JsonArray ci, double scale, string unit, string format)
        {
            string Show(JsonNode? x) => x is null ? "?" : (x.GetValue<double>() / scale).ToString(format, CultureInfo.InvariantCulture);
            return estimate is null ? "not reached" : $"{Show(estimate)} {unit} ({Show(ci[0])} to {Show(ci[1])})";
        }

        foreach (var v in summary["variants"]!.AsArray())
        {
            if (v!["landers"] is not JsonArray landers) continue;
            line($"<h3>{E(v["name"]!.GetValue<string>())}</h3>");
            line("<table><thead><tr><th>lander</th><th>runs</th><th>success</th><th>reached the ocean</th><th>stalled</th><th>station dead</th><th>median breakthrough</th><th>median final depth</th></tr></thead><tbody>");
            foreach (var lander in landers)
            {
                var median = lander!["breakthrough_quantiles"]!.AsArray().First(q => q!["p"]!.GetValue<double>() == 0.5)!;
                line(string.Create(c, $"<tr><td>{E(lander["name"]!.GetValue<string>())}</td><td class=\"n\">{lander["runs"]}</td><td class=\"n\">{Share(lander, "success")}</td><td class=\"n\">{Share(lander, "reached_ocean")}</td><td class=\"n\">{Share(lander, "stalled")}</td><td class=\"n\">{Share(lander, "station_dead")}</td><td class=\"n\">{Median(median["t_s"], median["ci95"]!.AsArray(), 86400, "d", "F2")}</td><td class=\"n\">{Median(lander["final_depth_median_m"], lander["final_depth_median_ci95"]!.AsArray(), 1, "m", "F1")}</td></tr>"));
            }

            line("</tbody></table>");
            var criteria = landers.SelectMany(l => l!["criteria_passed"]!.AsObject().Select(p => p.Key)).Distinct().ToList();
            if (criteria.Count > 0)
            {
                line($"<table><thead><tr><th>lander</th>{string.Concat(criteria.Select(x => $"<th>{E(x)}</th>"))}</tr></thead><tbody>");
                foreach (var lander in landers)
                {
                    var passed = lander!["criteria_passed"]!.AsObject();
                    line($"<tr><td>{E(lander["name"]!.GetValue<string>())}</td>{string.Concat(criteria.Select(x => $"<td class=\"n\">{(passed[x] is { } k ? $"{k} of {lander["runs"]}" : "not judged")}</td>"))}</tr>");
                }

                line("</tbody></table>");
            }
        }

        line(LanderPlot(summary));
    }

    private static string LanderPlot(JsonObject summary)
    {
        var variants = summary["variants"]!.AsArray().Where(v => v!["landers"] is JsonArray).ToList();
        var names = variants.SelectMany(v => v!["landers"]!.AsArray().Select(l => l!["name"]!.GetValue<string>())).Distinct().ToList();
        return Svg("Success per lander with its 95 % interval", "lander", "share of runs in which the lander succeeded", plot =>
        {
            for (var i = 0; i < variants.Count; i++)
            {
                var colour = Colours[i % Colours.Length];
                var offset = variants.Count == 1 ? 0 : -0.2 + (0.4 * i / (variants.Count - 1));
                var xs = new List<double>();
                var ys = new List<double>();
                foreach (var lander in variants[i]!["landers"]!.AsArray())
                {
                    var x = names.IndexOf(lander!["name"]!.GetValue<string>()) + offset;
                    var ci = lander["success_ci95"]!.AsArray();
                    var bar = plot.Add.Line(x, ci[0]!.GetValue<double>(), x, ci[1]!.GetValue<double>());
                    bar.Color = colour;
                    bar.LineWidth = 3;
                    xs.Add(x);
                    ys.Add(lander["success_rate"]?.GetValue<double>() ?? 0);
                }

                var dots = plot.Add.ScatterPoints(xs.ToArray(), ys.ToArray(), colour);
                dots.MarkerSize = 10;
                dots.LegendText = variants[i]!["name"]!.GetValue<string>();
            }

            plot.Axes.Bottom.SetTicks([.. Enumerable.Range(0, names.Count).Select(i => (double)i)], [.. names]);
            plot.Axes.SetLimits(-0.5, names.Count - 0.5, 0, 1.05);
            plot.ShowLegend(Alignment.LowerRight);
        });
    }

    private static string SuccessPlot(JsonObject summary)
    {
        var variants = summary["variants"]!.AsArray();
        return Svg("Success rate with its 95 % interval", "variant", "share of runs that succeeded", plot =>
        {
            for (var i = 0; i < variants.Count; i++)
            {
                var v = variants[i]!;
                var ci = v["success_ci95"]!.AsArray();
                var rate = v["success_rate"]?.GetValue<double>() ?? 0;
                var colour = Colours[i % Colours.Length];
                var bar = plot.Add.Line(i, ci[0]!.GetValue<double>(), i, ci[1]!.GetValue<double>());
                bar.Color = colour;
                bar.LineWidth = 3;
                var dot = plot.Add.Scatter(new double[] { i }, new double[] { rate }, colour);
                dot.MarkerSize = 10;
                dot.LegendText = v["name"]!.GetValue<string>();
            }

            plot.Axes.Bottom.SetTicks([.. Enumerable.Range(0, variants.Count).Select(i => (double)i)], [.. variants.Select(v => v!["name"]!.GetValue<string>())]);
            plot.Axes.SetLimits(-0.5, variants.Count - 0.5, 0, 1.05);
            plot.ShowLegend(Alignment.LowerRight);
        });
    }

    private static string Ecdf(string title, string xLabel, List<(string Variant, List<double> Values, int Total)> series)
    {
        if (series.All(s => s.Values.Count == 0)) return $"<p class=\"note\">{E(title)}: no run reached it.</p>";
        return Svg(title, xLabel, "share of runs", plot =>
        {
            for (var i = 0; i < series.Count; i++)
            {
                var (variant, values, total) = series[i];
                if (values.Count == 0 || total == 0) continue;
                var xs = values.OrderBy(x => x).ToArray();
                var ys = xs.Select((_, k) => (k + 1) / (double)total).ToArray();
                var line = plot.Add.ScatterLine(xs, ys, Colours[i % Colours.Length]);
                line.ConnectStyle = ConnectStyle.StepHorizontal;
                line.LineWidth = 1.6f;
                line.LegendText = variant;
            }

            plot.Axes.SetLimitsY(0, 1.05);
            plot.ShowLegend(Alignment.LowerRight);
        });
    }

    private static string InputPlot(string path, List<string> variants, IReadOnlyList<RunRecord> runs)
    {
        return Svg($"Success against {path}", path + " (SI)", "success rate in the bin", plot =>
        {
            for (var i = 0; i < variants.Count; i++)
            {
                var points = runs.Where(r => r.Variant == variants[i]).Select(r => (X: r.Inputs.FirstOrDefault(x => x.Path == path)?.ValueSi, r.Success)).Where(p => p.X is not null).OrderBy(p => p.X).ToList();
                if (points.Count == 0) continue;
                var bins = Math.Min(5, points.Count);
                var xs = new double[bins];
                var ys = new double[bins];
                for (var b = 0; b < bins; b++)
                {
                    var part = points.Skip(b * points.Count / bins).Take(((b + 1) * points.Count / bins) - (b * points.Count / bins)).ToList();
                    xs[b] = part.Average(p => p.X!.Value);
                    ys[b] = part.Count(p => p.Success) / (double)part.Count;
                }

                var line = plot.Add.Scatter(xs, ys, Colours[i % Colours.Length]);
                line.LegendText = variants[i];
            }

            plot.Axes.SetLimitsY(-0.05, 1.05);
            plot.ShowLegend(Alignment.LowerRight);
        });
    }

    private static string Svg(string title, string xLabel, string yLabel, Action<Plot> draw)
    {
        PlotFonts.Ensure();
        using var plot = new Plot();
        plot.Title(title);
        plot.XLabel(xLabel);
        plot.YLabel(yLabel);
        draw(plot);
        var svg = plot.GetSvgXml(SvgPlotRenderer.WidthPx, SvgPlotRenderer.HeightPx);
        if (!svg.Contains("<text", StringComparison.Ordinal)) throw new InvalidOperationException($"Plot '{title}' was drawn without any text: ScottPlot found no usable font.");
        var start = svg.IndexOf("<svg", StringComparison.Ordinal);
        return $"<figure class=\"plot\">{(start >= 0 ? svg[start..] : svg)}</figure>";
    }

    private static string Never(int runs) => runs == 0 ? "<strong>never</strong>" : runs.ToString(CultureInfo.InvariantCulture);

    private static string Rate(JsonNode? node) => node is null ? "-" : node.GetValue<double>().ToString("P1", CultureInfo.InvariantCulture);

    private static string Verdict(JsonNode? node) => node?.GetValue<bool>() == true ? "success" : "failure";

    private static string E(string? text) => WebUtility.HtmlEncode(text ?? "");
}
