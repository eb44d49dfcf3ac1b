using System.CommandLine;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Faults;
using DescentOps.Mission.Running;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Text;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Commands;

/// <summary>
/// <c>descentops check RULES-OR-SCENARIO</c>: checks recovery rules before a run. A scenario file is checked
/// whole (its fields, then its rules block, located in the scenario file); a rule-set file is checked against the
/// catalogue of the mission named by <c>--scenario</c> (the built-in default when omitted).
/// </summary>
public static class CheckCommand
{
    public static Command Create()
    {
        var fileArgument = new Argument<string>("RULES-OR-SCENARIO") { Description = "A scenario file (.yaml) or a rule-set file (.dorules)." };
        var scenarioOption = new Option<string?>("--scenario") { Description = "For a rule-set file: the scenario whose telemetry points and commands the rules may use (default: the built-in default)." };
        var command = new Command("check", "Check recovery rules: syntax, unknown points or commands, unit mismatches, out-of-range thresholds, conflicts, rules that can never fire.")
        {
            fileArgument, scenarioOption,
        };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(fileArgument)!;
            if (!File.Exists(path)) throw new FileNotFoundException($"no such file: {path}", path);
            var isRuleSet = path.EndsWith(".dorules", StringComparison.OrdinalIgnoreCase);
            Scenario scenario;
            RuleCheckResult result;
            Func<SourceLocation, string> where;
            var scenarioWarnings = new List<DescentOps.Scenarios.Loading.ScenarioError>();
            if (isRuleSet)
            {
                scenario = ScenarioSource.Load(parse.GetValue(scenarioOption));
                result = RuleChecker.CheckSource(new RuleSource(path, File.ReadAllText(path)), MissionCatalogue.For(scenario));
                where = l => l.ToString();
            }
            else
            {
                scenario = ScenarioSource.Load(path);
                var triggerErrors = FaultConditions.Check(scenario, out _);
                foreach (var error in triggerErrors) Console.Out.WriteLine($"error: {error}");
                if (triggerErrors.Count > 0)
                {
                    Console.Out.WriteLine($"{path}: {triggerErrors.Count} errors in fault trigger conditions");
                    return (int)ExitCode.InvalidInput;
                }

                // Everything a run would refuse once under way is refused here too.
                var preflight = MissionPreflight.Errors(scenario);
                foreach (var error in preflight) Console.Out.WriteLine($"error: {error}");
                if (preflight.Count > 0)
                {
                    Console.Out.WriteLine($"{path}: {preflight.Count} errors a run would stop on");
                    return (int)ExitCode.InvalidInput;
                }

                scenarioWarnings.AddRange(MissionPreflight.Warnings(scenario));
                var logBytes = LogSizeEstimate.UpperBoundBytes(scenario, scenario.Run.UntilS);
                if (logBytes > LogSizeEstimate.DefaultLimitBytes)
                {
                    scenarioWarnings.Add(new(scenario.LocationOf("run.until"), "run.until", $"the log may grow to {LogSizeEstimate.Describe(logBytes)} by the time limit; 'run' refuses that unless given {RunCommand.NoLogLimitOption}"));
                }

                if (scenario.Rules.IsEmpty)
                {
                    foreach (var warning in scenarioWarnings) Console.Out.WriteLine($"warning: {warning}");
                    Console.Out.WriteLine($"{path}: scenario valid{(scenarioWarnings.Count > 0 ? $", {scenarioWarnings.Count} warnings" : "")}; it holds no rules");
                    return (int)ExitCode.Ok;
                }

                result = MissionRules.Check(scenario);
                where = l => scenario.Rules.InFile(l.Line, l.Column).ToString();
            }

            foreach (var error in result.Errors) Console.Out.WriteLine($"error: {where(error.Location)}: {error.Code}: {error.Message}");
            if (result.Warnings.Count + scenarioWarnings.Count > 0)
            {
                Console.Out.WriteLine();
                foreach (var warning in scenarioWarnings) Console.Out.WriteLine($"warning: {warning}");
                foreach (var warning in result.Warnings) Console.Out.WriteLine($"warning: {where(warning.Location)}: {warning.Code}: {warning.Message}");
            }

            var rules = result.RuleSet?.Rules.Count ?? 0;
            Console.Out.WriteLine($"{path}: {result.Errors.Count} errors, {result.Warnings.Count + scenarioWarnings.Count} warnings{(result.Succeeded ? $", {rules} rules ready" : "")}");
            return (int)(result.Succeeded ? ExitCode.Ok : ExitCode.InvalidInput);
        });
        return command;
    }
}
