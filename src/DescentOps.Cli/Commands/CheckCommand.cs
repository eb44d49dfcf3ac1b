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
        var command = new Command("check", "Check recovery rules: syntax, unknown points or commands, unit mismatches, out-of-range thresholds, conflicts, rules that can never fire.")
        {
            fileArgument, scenarioOption, jsonOption,
        };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(fileArgument)!;
            var json = parse.GetValue(jsonOption);
            var isRuleSet = path.EndsWith(".dorules", StringComparison.OrdinalIgnoreCase);
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

                // Time-tagged telecommands are checked as a rule's send is.
                foreach (var error in MissionTimeline.Errors(scenario)) errors.Add(new Finding("", "", error.ToString()));
            }

            if (json) WriteJson(path, errors, warnings, rules);
            else Print(path, errors, warnings, rules);
            return (int)(errors.Count == 0 ? ExitCode.Ok : ExitCode.InvalidInput);
        });
        return command;
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
