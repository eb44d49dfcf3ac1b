using System.CommandLine;
using DescentOps.Cli.Output;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Faults;
using DescentOps.Mission.Running;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Text;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Commands;

/// <summary>
/// <c>descentops check RULES-OR-SCENARIO</c>: checks recovery rules before a run. A scenario (a file or a built-in
/// name) is checked whole (its fields, then its rules block, located in the scenario file); a rule-set file is
/// checked against the catalogue of the mission named by <c>--scenario</c> (the built-in default when omitted).
/// </summary>
public static class CheckCommand
{
    private sealed record Finding(string Where, string Code, string Message);

    public static Command Create()
    {
        var fileArgument = new Argument<string>("RULES-OR-SCENARIO") { Description = "A scenario file (.yaml), a built-in scenario's name, or a rule-set file (.dorules)." };
        var scenarioOption = new Option<string?>("--scenario", "-S") { Description = "For a rule-set file: the scenario (file or built-in name) whose telemetry points and commands the rules may use (default: the built-in default).", HelpName = "SCENARIO" };
        var jsonOption = CommonOptions.Json();
        var traceOption = new Option<string?>("--trace") { Description = "Run the rules on a recorded telemetry trace (a CSV with t_s and point columns; the export's telemetry.csv is one) and print what they did as CSV.", HelpName = "TRACE.csv" };
        var coverageOption = new Option<string?>("--coverage") { Description = "For a scenario: which of its rules acted and which branches of its procedures a run's or a branch's log took.", HelpName = "LOG.jsonl" };
        var expectOption = new Option<string?>("--expect") { Description = "With --trace: compare what the rules did with these rows (a CSV as --trace prints it); exit 8 when they differ.", HelpName = "EXPECTED.csv" };
        var command = new Command("check", "Check recovery rules: syntax, unknown points or commands, unit mismatches, out-of-range thresholds, conflicts, rules that can never fire.")
        {
            fileArgument, scenarioOption, jsonOption, traceOption, expectOption, coverageOption,
        };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(fileArgument)!;
            var json = parse.GetValue(jsonOption);
            var isRuleSet = path.EndsWith(".dorules", StringComparison.OrdinalIgnoreCase);
            var trace = parse.GetValue(traceOption);
            var expect = parse.GetValue(expectOption);
            if (expect is not null && trace is null) throw new UsageException("--expect compares the rows of a trace: give --trace too");
            if (trace is not null && !isRuleSet) throw new UsageException("--trace runs a rule-set file (.dorules) on a trace");
            if (trace is not null) return RunTrace(path, ScenarioSource.Load(parse.GetValue(scenarioOption)), trace, expect);
            if (parse.GetValue(coverageOption) is { } log)
            {
                if (isRuleSet) throw new UsageException("--coverage reads a run's log against its scenario: give the scenario, not a rule-set file");
                return Coverage(ScenarioSource.Load(path), log);
            }

            var errors = new List<Finding>();
            var warnings = new List<Finding>();
            var rules = 0;
            if (isRuleSet)
            {
                if (!File.Exists(path)) throw new FileNotFoundException($"no such file: {path}", path);
                var scenario = ScenarioSource.Load(parse.GetValue(scenarioOption));
                var result = RuleChecker.CheckSource(new RuleSource(path, File.ReadAllText(path)), MissionCatalogue.For(scenario));
                Collect(result, l => l.ToString(), errors, warnings);
                rules = result.Succeeded ? result.RuleSet?.Rules.Count ?? 0 : 0;
            }
            else
            {
                var scenario = ScenarioSource.Load(path);
                var triggerErrors = FaultConditions.Check(scenario, out _);
                foreach (var error in triggerErrors) errors.Add(new Finding("", "", error.ToString()));
                // Everything a run would refuse once under way is refused here too.
                if (triggerErrors.Count == 0)
                {
                    foreach (var error in MissionPreflight.Errors(scenario)) errors.Add(new Finding("", "", error.ToString()));
                    foreach (var warning in MissionPreflight.Warnings(scenario)) warnings.Add(new Finding("", "", warning.ToString()));
                    var logBytes = LogSizeEstimate.UpperBoundBytes(scenario, scenario.Run.UntilS);
                    if (logBytes > LogSizeEstimate.DefaultLimitBytes)
                    {
                        warnings.Add(new Finding("", "", new DescentOps.Scenarios.Loading.ScenarioError(scenario.LocationOf("run.until"), "run.until", $"the log may grow to {LogSizeEstimate.Describe(logBytes)} by the time limit; 'run' refuses that unless given {RunCommand.NoLogLimitOption}").ToString()));
                    }
                }

                if (errors.Count == 0 && !scenario.Rules.IsEmpty)
                {
                    var result = MissionRules.Check(scenario);
                    Collect(result, l => scenario.Rules.InFile(l.Line, l.Column).ToString(), errors, warnings);
                    rules = result.Succeeded ? result.RuleSet?.Rules.Count ?? 0 : 0;
                }

                // The mission's own rules across landers, against every lander's qualified points and targets; the field is named.
                if (errors.Count == 0 && !scenario.MissionRules.IsEmpty)
                {
                    var result = MissionDeskRules.Check(scenario);
                    Collect(result, l => $"{scenario.MissionRules.InFile(l.Line, l.Column)}: field 'mission_rules'", errors, warnings);
                    rules += result.Succeeded ? result.RuleSet?.Rules.Count ?? 0 : 0;
                }

                // Time-tagged telecommands are checked as a rule's send is.
                foreach (var error in MissionTimeline.Errors(scenario)) errors.Add(new Finding("", "", error.ToString()));

                // Procedures: their commands and conditions as a rule's, their gotos against their steps.
                foreach (var error in Mission.Procedures.MissionProcedures.Errors(scenario)) errors.Add(new Finding("", "", error.ToString()));
            }

            if (json) WriteJson(path, errors, warnings, rules);
            else Print(path, errors, warnings, rules);
            return (int)(errors.Count == 0 ? ExitCode.Ok : ExitCode.InvalidInput);
        });
        return command;
    }

    /// <summary>
    /// <c>check RULES --trace TRACE [--expect EXPECTED]</c>: the rules on a recorded trace. Without EXPECTED the rows go
    /// to standard output as CSV (save them as the expected rows of a test); with it, the two are compared row by row.
    /// </summary>
    private static int RunTrace(string rulesPath, Scenario scenario, string tracePath, string? expectPath)
    {
        if (!File.Exists(rulesPath)) throw new FileNotFoundException($"no such file: {rulesPath}", rulesPath);
        var catalogue = MissionCatalogue.For(scenario);
        var result = RuleChecker.CheckSource(new RuleSource(rulesPath, File.ReadAllText(rulesPath)), catalogue);
        if (result.RuleSet is not { } rules)
        {
            foreach (var error in result.Errors) Console.Error.WriteLine($"error: {error.Location}: {error.Code}: {error.Message}");
            return (int)ExitCode.InvalidInput;
        }

        var problems = new List<string>();
        // The scenario's procedures run on the trace too, started by the rules' 'start'.
        var procedures = Mission.Procedures.MissionProcedures.Compile(scenario);
        var verdicts = new List<(string Procedure, string Step, Mission.Procedures.StepVerdict Verdict)>();
        IReadOnlyList<IReadOnlyList<string>> rows;
        List<IReadOnlyList<string>>? expected = null;
        try
        {
            var table = Files.CsvTable.Open(tracePath);
            rows = TraceReplay.Run(rules, procedures, catalogue, table.Header, table.Rows(), problems, verdicts);
            if (expectPath is not null)
            {
                var expectedTable = Files.CsvTable.Open(expectPath);
                if (!expectedTable.Header.SequenceEqual(TraceReplay.Header))
                {
                    problems.Add($"{expectPath}: the header must be {string.Join(",", TraceReplay.Header)}");
                }

                expected = [.. expectedTable.Rows().Select(r => r.Cells)];
            }
        }
        catch (InvalidDataException exception)
        {
            problems.Add(exception.Message);
            rows = [];
        }

        if (problems.Count > 0)
        {
            foreach (var problem in problems) Console.Error.WriteLine($"error: {(problem.StartsWith(tracePath, StringComparison.Ordinal) || problem.StartsWith(expectPath ?? "\0", StringComparison.Ordinal) ? "" : tracePath + ": ")}{problem}");
            return (int)ExitCode.InvalidInput;
        }

        var silent = rules.Rules.Select(r => r.Name).Where(n => rows.All(r => r[1] != n)).ToList();
        var coverage = silent.Count == 0 ? "every rule acted" : $"never acted: {string.Join(", ", silent)}";
        var branches = Mission.Procedures.ProcedureCoverage.Of(procedures, verdicts);
        if (expected is null)
        {
            Console.Out.Write(Reports.Export.CsvText.Row([.. TraceReplay.Header]));
            foreach (var row in rows) Console.Out.Write(Reports.Export.CsvText.Row([.. row.Select(c => Reports.Export.CsvText.Cell(c))]));
            // Coverage goes to the error stream, so the rows on standard output stay a CSV file of expected rows.
            Console.Error.WriteLine($"coverage: {rules.Rules.Count - silent.Count} of {rules.Rules.Count} rules acted; {coverage}");
            foreach (var line in Mission.Procedures.ProcedureCoverage.Lines(branches)) Console.Error.WriteLine($"coverage: {line}");
            return (int)ExitCode.Ok;
        }

        static string Key(IReadOnlyList<string> row) => string.Join("\u001f", row);
        var actualKeys = rows.Select(Key).ToList();
        var expectedKeys = expected.Select(Key).ToList();
        if (actualKeys.SequenceEqual(expectedKeys, StringComparer.Ordinal))
        {
            Console.Out.WriteLine($"{tracePath}: {rows.Count} rows as expected; {coverage}");
            foreach (var line in Mission.Procedures.ProcedureCoverage.Lines(branches)) Console.Out.WriteLine($"  {line}");
            return (int)ExitCode.Ok;
        }

        var missing = expectedKeys.Except(actualKeys, StringComparer.Ordinal).ToList();
        var unexpected = actualKeys.Except(expectedKeys, StringComparer.Ordinal).ToList();
        Console.Out.WriteLine($"{tracePath}: the rules did not do what {expectPath} expects ({rows.Count} rows, {expected.Count} expected); {coverage}");
        foreach (var line in Mission.Procedures.ProcedureCoverage.Lines(branches)) Console.Out.WriteLine($"  {line}");
        foreach (var row in missing.Take(20)) Console.Out.WriteLine($"  expected, not done: {row.Replace("\u001f", ",", StringComparison.Ordinal)}");
        foreach (var row in unexpected.Take(20)) Console.Out.WriteLine($"  done, not expected: {row.Replace("\u001f", ",", StringComparison.Ordinal)}");
        if (missing.Count == 0 && unexpected.Count == 0) Console.Out.WriteLine("  the same rows in another order");
        return (int)ExitCode.RunsDiffer;
    }

    /// <summary><c>check SCENARIO --coverage LOG</c>: the rules that acted and the procedure branches taken in a run's log.</summary>
    private static int Coverage(Scenario scenario, string logPath)
    {
        if (!File.Exists(logPath)) throw new FileNotFoundException($"no such file: {logPath}", logPath);
        var procedures = Mission.Running.PreparedRun.CoveredProcedures(scenario);
        var tally = new Mission.Running.CoverageTally();
        using (var reader = Journal.JournalReader.Open(logPath))
        {
            foreach (var e in reader.ReadAll().OfType<Journal.EventEntry>()) tally.Observe(e.Kind, e.Data);
        }

        var acted = tally.Rules(Mission.Running.PreparedRun.CoveredRules(scenario));
        var silent = acted.Where(r => !r.Acted).Select(r => r.Rule).ToList();
        Console.Out.WriteLine($"{logPath}: {acted.Count - silent.Count} of {acted.Count} rules acted{(silent.Count == 0 ? "" : $"; never acted: {string.Join(", ", silent)}")}");
        foreach (var line in Mission.Procedures.ProcedureCoverage.Lines(tally.BranchCounts(procedures))) Console.Out.WriteLine($"  {line}");
        return (int)ExitCode.Ok;
    }

    private static void Collect(RuleCheckResult result, Func<SourceLocation, string> where, List<Finding> errors, List<Finding> warnings)
    {
        foreach (var error in result.Errors) errors.Add(new Finding(where(error.Location), error.Code.ToString(), error.Message));
        foreach (var warning in result.Warnings) warnings.Add(new Finding(where(warning.Location), warning.Code.ToString(), warning.Message));
    }

    private static void Print(string path, List<Finding> errors, List<Finding> warnings, int rules)
    {
        foreach (var error in errors) Console.Out.WriteLine(Line("error", error));
        if (warnings.Count > 0)
        {
            Console.Out.WriteLine();
            foreach (var warning in warnings) Console.Out.WriteLine(Line("warning", warning));
        }

        Console.Out.WriteLine($"{path}: {errors.Count} errors, {warnings.Count} warnings{(errors.Count == 0 ? $", {rules} rules ready" : "")}");
    }

    private static string Line(string label, Finding f) =>
        f.Where.Length == 0 ? $"{label}: {f.Message}" : $"{label}: {f.Where}: {f.Code}: {f.Message}";

    private static void WriteJson(string path, List<Finding> errors, List<Finding> warnings, int rules) => JsonOutput.Write(w =>
    {
        w.WriteString("file", path);
        w.WriteBoolean("ok", errors.Count == 0);
        w.WriteNumber("rules", rules);
        foreach (var (name, findings) in new[] { ("errors", errors), ("warnings", warnings) })
        {
            w.WriteStartArray(name);
            foreach (var f in findings)
            {
                w.WriteStartObject();
                w.Text("location", f.Where.Length == 0 ? null : f.Where);
                w.Text("code", f.Code.Length == 0 ? null : f.Code);
                w.WriteString("message", f.Message);
                w.WriteEndObject();
            }

            w.WriteEndArray();
        }
    });
}
