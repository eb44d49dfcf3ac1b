using System.Globalization;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Mission.Autonomy;

/// <summary>
/// Runs a rule set on a recorded telemetry trace, as a test of the rules alone: every rule, on board or on the ground,
/// sees each row at its time (no link, no light time), the rows taken whole, and nothing it sends acts on the trace.
/// A trace is a table with a <c>t_s</c> column and one column per point, named as the catalogue names it (SI values)
/// or as the export's <c>telemetry.csv</c> names the probe's logged values (<see cref="ExportColumns"/>). An empty
/// cell is no sample; columns that are neither are ignored.
/// </summary>
public static class TraceReplay
{
    /// <summary>The columns of <c>probe.telemetry</c> records (and so of the export's telemetry.csv) that are points, all in SI.</summary>
    public static IReadOnlyDictionary<string, string> ExportColumns { get; } = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["depth_m"] = "probe.depth",
        ["velocity_m_s"] = "probe.velocity",
        ["ice_temperature_k"] = "probe.ice_temperature",
        ["head_power_w"] = "probe.head_power",
        ["wall_power_w"] = "probe.wall_power",
        ["energy_used_j"] = "probe.energy_used",
        ["tilt_rad"] = "probe.tilt",
        ["buffer_fill"] = "probe.buffer_fill",
        ["battery_soc"] = "probe.battery_soc",
        ["bus_power_available_w"] = "probe.bus_power_available",
        ["regime"] = "probe.regime",
    };

    /// <summary>The header of the rows the rule-only Run returns, as a CSV file of expected rows has it.</summary>
    public static IReadOnlyList<string> Header { get; } = ["t_s", "rule", "kind", "commands"];

    /// <summary>
    /// The points each column feeds (null: ignored), after checking the header: a <c>t_s</c> column, and no point fed twice.
    /// Problems are returned as messages naming the column.
    /// </summary>
    public static IReadOnlyList<string?> Columns(IReadOnlyList<string> header, TelemetryCatalogue catalogue, List<string> problems)
    {
        var points = new string?[header.Count];
        var fed = new HashSet<string>(StringComparer.Ordinal);
        if (!header.Contains("t_s")) problems.Add("no 't_s' column (simulated seconds)");
        for (var i = 0; i < header.Count; i++)
        {
            var name = header[i];
            var point = catalogue.FindPoint(name) is { } spec ? spec.Name : ExportColumns.GetValueOrDefault(name);
            if (point is null) continue;
            if (catalogue.FindPoint(point) is { TrueStateOnly: true })
            {
                problems.Add($"column '{name}' is true state ('{point}'), which rules never see");
                continue;
            }

            if (!fed.Add(point))
            {
                problems.Add($"column '{name}' feeds '{point}', which an earlier column already feeds");
                continue;
            }

            points[i] = point;
        }

        return points;
    }

    /// <summary>
    /// Feeds the rows in order and returns what the rules did, one row per firing, escalation or continuation:
    /// time (shortest round-trip seconds), rule, kind and the commands sent. Rows must not go back in time.
    /// </summary>
    public static IReadOnlyList<IReadOnlyList<string>> Run(
        CompiledRuleSet rules, TelemetryCatalogue catalogue, IReadOnlyList<string> header, IEnumerable<(int Line, IReadOnlyList<string> Cells)> rows, List<string> problems) =>
        Run(rules, [], catalogue, header, rows, problems, []);

    /// <summary>
    /// As <see cref="Run(CompiledRuleSet, TelemetryCatalogue, IReadOnlyList{string}, IEnumerable{ValueTuple{int, IReadOnlyList{string}}}, List{string})"/>,
    /// with the scenario's procedures run as the ground runs them (each row a frame reaching the ground at its time): a
    /// rule's start starts one, and each step that starts, ends or finishes the procedure is a row
    /// (<c>procedure NAME</c>, <c>step STEP passed</c>, its command). The step verdicts go to <paramref name="verdicts"/>.
    /// </summary>
    public static IReadOnlyList<IReadOnlyList<string>> Run(
        CompiledRuleSet rules, IReadOnlyList<Procedures.CompiledProcedure> procedures, TelemetryCatalogue catalogue, IReadOnlyList<string> header,
        IEnumerable<(int Line, IReadOnlyList<string> Cells)> rows, List<string> problems, List<(string Procedure, string Step, Procedures.StepVerdict Verdict)> verdicts)
    {
        var points = Columns(header, catalogue, problems);
        var output = new List<IReadOnlyList<string>>();
        if (problems.Count > 0) return output;
        var time = header.ToList().IndexOf("t_s");
        var evaluator = new RuleEvaluator(rules, new RuleScheduler());
        var desk = new Procedures.ProcedureDesk(procedures);
        var starts = new List<(string Procedure, string By)>();
        evaluator.Outputs.Subscribe(o =>
        {
            var row = o switch
            {
                RuleFiring f => Row(f.Time, f.Rule, "fired", f.Commands),
                RuleEscalation e => Row(e.Time, e.Rule, $"escalated-{e.Level}", e.Commands),
                RuleContinuation c => Row(c.Time, c.Rule, "continued", c.Commands),
                _ => null,
            };
            if (row is not null) output.Add(row);
            var commands = o switch { RuleFiring f => f.Commands, RuleEscalation e => e.Commands, RuleContinuation c => c.Commands, _ => [] };
            foreach (var command in commands)
            {
                if (StartProcedureAction.ProcedureOf(command) is { } procedure) starts.Add((procedure, o.Rule));
            }
        });

        void Take(IReadOnlyList<Procedures.ProcedureOutput> outputs)
        {
            foreach (var o in outputs)
            {
                var row = o switch
                {
                    Procedures.StepStarted s => Row(s.Time, $"procedure {s.Procedure}", $"step {s.Step} started", s.Send is { } c ? [c] : []),
                    Procedures.StepEnded e => Row(e.Time, $"procedure {e.Procedure}", $"step {e.Step} {Procedures.ProcedureRunner.Word(e.Verdict)}", []),
                    Procedures.ProcedureFinished f => Row(f.Time, $"procedure {f.Procedure}", f.Outcome == Procedures.ProcedureOutcome.Done ? "done" : "aborted", []),
                    _ => null,
                };
                if (row is not null) output.Add(row);
                if (o is Procedures.StepEnded ended) verdicts.Add((ended.Procedure, ended.Step, ended.Verdict));
            }
        }

        void StartAll(SimTime at)
        {
            foreach (var (procedure, by) in starts) Take(desk.Start(desk.IndexOf(procedure), by, at));
            starts.Clear();
        }

        var last = SimTime.Epoch;
        foreach (var (line, cells) in rows)
        {
            if (cells.Count != header.Count)
            {
                problems.Add($"line {line}: {cells.Count} cells, the header has {header.Count}");
                return output;
            }

            if (!double.TryParse(cells[time], NumberStyles.Float, CultureInfo.InvariantCulture, out var seconds) || !double.IsFinite(seconds) || seconds < 0)
            {
                problems.Add($"line {line}, column 't_s': '{cells[time]}' is not a time in seconds");
                return output;
            }

            var at = SimTime.FromSecondsSinceEpoch(seconds);
            if (at < last)
            {
                problems.Add($"line {line}, column 't_s': {seconds.ToString("R", CultureInfo.InvariantCulture)} s is earlier than the row before");
                return output;
            }

            last = at;
            // Steps whose time ran out before this row are late first, at their deadline.
            while (desk.NextDeadline is { } deadline && deadline < at) Take(desk.OnWake(deadline));
            var samples = new List<TelemetrySample>();
            for (var i = 0; i < cells.Count; i++)
            {
                if (points[i] is not { } point || cells[i].Length == 0) continue;
                if (catalogue.FindPoint(point) is DiscretePointSpec)
                {
                    samples.Add(new TelemetrySample(point, at, new DiscreteValue(cells[i])));
                }
                else if (double.TryParse(cells[i], NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && double.IsFinite(value))
                {
                    samples.Add(new TelemetrySample(point, at, new NumericValue(value)));
                }
                else
                {
                    problems.Add($"line {line}, column '{header[i]}': '{cells[i]}' is not a number");
                    return output;
                }
            }

            // As on the ground: the procedures see the row before the rules can start one.
            Take(desk.OnFrame(samples, at));
            evaluator.Submit(samples);
            StartAll(at);
        }

        evaluator.AdvanceTo(last);
        StartAll(last);
        evaluator.Dispose();
        return output;
    }

    private static string[] Row(SimTime time, string rule, string kind, IReadOnlyList<CommandAction> commands) =>
        [time.SecondsSinceEpoch.ToString("R", CultureInfo.InvariantCulture), rule, kind, string.Join("; ", commands)];
}
