using DescentOps.Mission.Autonomy;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Text;
using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;
using SourceLocation = DescentOps.Scenarios.Loading.SourceLocation;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// Checks a scenario's procedures against the mission, as rules are checked: each command as a rule's send, each
/// condition as a rule's condition (same words, units, ranges; sensed points only), each goto against the steps;
/// steps that no path reaches and steps that loop without waiting are errors. Errors are located at the field's
/// place in the scenario file, with its field path.
/// </summary>
public static class MissionProcedures
{
    private const string WaitRule = "step-wait";
    private const string CheckRule = "step-check";
    private const string ConditionPrefix = "when ";

    /// <summary>The line of the wrapper text that holds the condition (1-based).</summary>
    private const int ConditionLine = 4;

    /// <summary>The procedures' errors; with landers, each lander's (its own procedures are named under it).</summary>
    public static IReadOnlyList<ScenarioError> Errors(Scenario scenario)
    {
        if (scenario.Landers.Count > 0) return [.. scenario.Landers.SelectMany(l => Errors(l.View)).Distinct()];
        var errors = new List<ScenarioError>();
        _ = Check(scenario, errors);
        return errors;
    }

    /// <summary>The checked procedures; located errors are thrown.</summary>
    public static IReadOnlyList<CompiledProcedure> Compile(Scenario scenario)
    {
        var errors = new List<ScenarioError>();
        var compiled = Check(scenario, errors);
        return errors.Count > 0 ? throw new ScenarioException(errors) : compiled;
    }

    private static List<CompiledProcedure> Check(Scenario scenario, List<ScenarioError> errors)
    {
        var compiled = new List<CompiledProcedure>();
        if (scenario.Procedures.Count == 0) return compiled;
        var catalogue = MissionCatalogue.For(scenario);
        var names = new HashSet<string>(StringComparer.Ordinal);
        foreach (var procedure in scenario.Procedures)
        {
            var before = errors.Count;
            if (!names.Add(procedure.Name)) Error(scenario, errors, procedure.FieldPath + ".name", $"a procedure named '{procedure.Name}' is already defined");
            var stepNames = new Dictionary<string, int>(StringComparer.Ordinal);
            for (var k = 0; k < procedure.Steps.Count; k++)
            {
                var step = procedure.Steps[k];
                if (step.Name is ProceduresFormat.Done or ProceduresFormat.Abort)
                {
                    Error(scenario, errors, step.FieldPath + ".name", $"'{step.Name}' is a goto word ('{ProceduresFormat.Done}' ends the procedure as done, '{ProceduresFormat.Abort}' as aborted); name the step otherwise");
                }
                else if (!stepNames.TryAdd(step.Name, k))
                {
                    Error(scenario, errors, step.FieldPath + ".name", $"procedure '{procedure.Name}' already has a step named '{step.Name}'");
                }
            }

            var steps = new List<CompiledStep>();
            for (var k = 0; k < procedure.Steps.Count; k++)
            {
                if (CheckStep(scenario, catalogue, procedure, k, stepNames, errors) is { } step) steps.Add(step);
            }

            if (errors.Count > before) continue;
            var checkedProcedure = new CompiledProcedure(procedure.Name, procedure.StartAtS, steps, procedure.FieldPath);
            CheckPaths(scenario, checkedProcedure, procedure, errors);
            if (errors.Count == before) compiled.Add(checkedProcedure);
        }

        return compiled;
    }

    private static CompiledStep? CheckStep(Scenario scenario, Rules.Catalogue.TelemetryCatalogue catalogue, ProcedureModel procedure, int index, Dictionary<string, int> stepNames, List<ScenarioError> errors)
    {
        var step = procedure.Steps[index];
        var before = errors.Count;
        CommandAction? send = null;
        if (step.Send is { } text)
        {
            var at = scenario.LocationOf(step.FieldPath + ".send");
            var (command, problems) = RuleChecker.CheckCommand(new RuleSource(at.File, text.ReplaceLineEndings(" ")), catalogue);
            foreach (var p in problems) errors.Add(new ScenarioError(Shift(scenario, at, p.Location.Column), step.FieldPath + ".send", $"{p.Code}: {p.Message}"));
            send = command;
        }

        var wait = step.WaitFor is { } waitText ? Condition(scenario, catalogue, WaitRule, waitText, step.FieldPath + ".wait_for", errors) : null;
        var check = step.Expect is { } checkText ? Condition(scenario, catalogue, CheckRule, checkText, step.FieldPath + ".expect", errors) : null;
        var watches = step.WaitFor is not null || step.Expect is not null;
        if (watches && step.WithinS is null)
        {
            Error(scenario, errors, step.FieldPath + ".name", $"step '{step.Name}' waits for a frame ({(step.WaitFor is null ? "expect" : "wait_for")}) and needs 'within': how long the ground waits before the step is late");
        }
        else if (!watches && step.WithinS is not null)
        {
            Error(scenario, errors, step.FieldPath + ".within", $"step '{step.Name}' has 'within' but nothing to wait for: give 'wait_for' or 'expect', or leave 'within' out");
        }

        var onPass = Goto(scenario, step.OnPass, index + 1 < procedure.Steps.Count ? index + 1 : CompiledStep.Done, stepNames, step.FieldPath + ".on_pass", procedure.Name, errors);
        var onFail = Goto(scenario, step.OnFail, CompiledStep.Abort, stepNames, step.FieldPath + ".on_fail", procedure.Name, errors);
        if (errors.Count > before) return null;
        return new CompiledStep(step.Name, send, wait, step.WithinS is { } s ? SimDuration.FromSeconds(s) : null, check, onPass, onFail) { Confirm = step.Confirm };
    }

    private static int Goto(Scenario scenario, string? target, int byDefault, Dictionary<string, int> steps, string fieldPath, string procedure, List<ScenarioError> errors)
    {
        switch (target)
        {
            case null:
                return byDefault;
            case ProceduresFormat.Done:
                return CompiledStep.Done;
            case ProceduresFormat.Abort:
                return CompiledStep.Abort;
        }

        if (steps.TryGetValue(target, out var index)) return index;
        Error(scenario, errors, fieldPath, $"procedure '{procedure}' has no step '{target}'; its steps are {string.Join(", ", steps.Keys)} (or '{ProceduresFormat.Done}', '{ProceduresFormat.Abort}')");
        return CompiledStep.Abort;
    }

    /// <summary>Every step must be reachable from the first, and steps that wait for nothing must not pass round in a loop.</summary>
    private static void CheckPaths(Scenario scenario, CompiledProcedure compiled, ProcedureModel procedure, List<ScenarioError> errors)
    {
        var reached = new bool[compiled.Steps.Count];
        var frontier = new Stack<int>([0]);
        while (frontier.TryPop(out var i))
        {
            if (i < 0 || reached[i]) continue;
            reached[i] = true;
            frontier.Push(compiled.Steps[i].OnPass);
            if (compiled.Steps[i].Watches) frontier.Push(compiled.Steps[i].OnFail);
        }

        for (var i = 0; i < reached.Length; i++)
        {
            if (!reached[i]) Error(scenario, errors, procedure.Steps[i].FieldPath + ".name", $"no path of procedure '{compiled.Name}' reaches step '{compiled.Steps[i].Name}' (a step that waits for nothing always passes, so its on_fail is never taken)");
        }

        for (var i = 0; i < compiled.Steps.Count; i++)
        {
            var seen = new HashSet<int>();
            for (var j = i; j >= 0 && !compiled.Steps[j].Watches; j = compiled.Steps[j].OnPass)
            {
                if (!seen.Add(j))
                {
                    Error(scenario, errors, procedure.Steps[i].FieldPath + ".on_pass", $"steps of procedure '{compiled.Name}' go round from '{compiled.Steps[i].Name}' without waiting for anything; give one of them 'wait_for' or 'expect'");
                    return;
                }
            }
        }
    }

    /// <summary>A condition checked as a ground rule's (sensed points only), compiled as a one-rule set.</summary>
    private static CompiledRule? Condition(Scenario scenario, Rules.Catalogue.TelemetryCatalogue catalogue, string rule, string condition, string fieldPath, List<ScenarioError> errors)
    {
        var at = scenario.LocationOf(fieldPath);
        // Braces would close the wrapper's condition and open rule text of the author's own.
        var brace = condition.IndexOfAny(['{', '}']);
        if (brace >= 0)
        {
            errors.Add(new ScenarioError(Shift(scenario, at, brace + 1), fieldPath, $"a condition holds no '{condition[brace]}': write the condition alone"));
            return null;
        }

        var wrapped = $"rule {rule} {{\nruns on ground\nseverity info\n{ConditionPrefix}{condition.ReplaceLineEndings(" ")}\nthen {{ }}\n}}\n";
        var result = RuleChecker.CheckSource(new RuleSource(at.File, wrapped), catalogue);
        if (result.RuleSet is { Rules: [var compiled] }) return compiled;
        foreach (var e in result.Errors)
        {
            var where = e.Location.Line == ConditionLine && e.Location.Column > ConditionPrefix.Length ? Shift(scenario, at, e.Location.Column - ConditionPrefix.Length) : at;
            errors.Add(new ScenarioError(where, fieldPath, $"{e.Code}: {e.Message}"));
        }

        return null;
    }

    /// <summary>The place of column <paramref name="column"/> (1-based) of a one-line value that starts at <paramref name="at"/> (one more when quoted).</summary>
    private static SourceLocation Shift(Scenario scenario, SourceLocation at, int column)
    {
        var lines = scenario.SourceText.Split('\n');
        var text = at.Line - 1 < lines.Length ? lines[at.Line - 1] : "";
        var quoted = at.Column - 1 < text.Length && text[at.Column - 1] is '"' or '\'';
        return at with { Column = at.Column + column - 1 + (quoted ? 1 : 0) };
    }

    private static void Error(Scenario scenario, List<ScenarioError> errors, string fieldPath, string message) =>
        errors.Add(new ScenarioError(scenario.LocationOf(fieldPath), fieldPath, message));
}
