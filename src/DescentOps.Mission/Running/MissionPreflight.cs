using System.Globalization;
using DescentOps.Engine.Running;
using DescentOps.Mission.Probe;
using DescentOps.Physics.Descent;
using DescentOps.Records;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Running;

/// <summary>
/// What a run would refuse once under way, found before it starts, and what is legal but almost certainly a mistake.
/// The run refuses a scenario when a model it builds throws: the descent model over the whole shell (the probe
/// evaluates it at every depth node it reaches), the components, and their start. So the preflight does exactly
/// that: first the run envelope (every model at the extreme states the scenario takes it to, refused with field, value,
/// model and range), then it integrates the descent at full power from the surface to the ocean with the run's own model, builds
/// the components and runs the first telemetry interval with a journal that keeps nothing. <c>check</c> and
/// <c>run</c> both call it, so <c>check</c> accepts nothing <c>run</c> then rejects.
/// </summary>
public static class MissionPreflight
{
    /// <summary>Errors that a run would end on; each names its field and place.</summary>
    public static IReadOnlyList<ScenarioError> Errors(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        if (scenario.Landers.Count > 0) return PerLander(scenario, Errors);
        var errors = new List<ScenarioError>(RunEnvelope.Errors(scenario));
        if (errors.Count > 0) return errors;
        try
        {
            var model = ProbeDescentFactory.Model(scenario);
            _ = ShellCrossing.Integrate(model, scenario.Probe.HeadPowerW, scenario.Probe.WallPowerW);
            // A probe that stops or is shed of its heaters runs the same model at no power.
            _ = model.Rate(0.0, 0.0, 0.0);
            _ = model.Rate(scenario.Shell.ThicknessM, 0.0, 0.0);
        }
        catch (ArgumentException exception)
        {
            errors.Add(Located(scenario, exception));
            return errors;
        }

        try
        {
            // The first telemetry interval of the run itself, without rules (their errors are the rule checker's).
            var sink = NullJournalSink.Instance;
            var start = scenario with { Rules = RulesSource.None, Telecommands = [], RuleUplinks = [], Procedures = [] };
            var summary = MissionRunner.RunAsync(start, scenario.Run.Seed, scenario.Probe.TelemetryIntervalS, sink, KernelChoice.Sequential).GetAwaiter().GetResult();
            if (summary.Outcome.Kind is RunOutcomeKind.ComponentFailed or RunOutcomeKind.KernelFault)
            {
                var reason = summary.Outcome.Reason;
                var parameter = System.Text.RegularExpressions.Regex.Match(reason, @"\(Parameter '([^']+)'\)");
                var path = RangeRefusal.FieldOf(parameter.Success ? parameter.Groups[1].Value : null);
                errors.Add(RangeRefusal.Error(scenario, path, $"it would stop at its start: {reason.Split(" (Parameter", StringSplitOptions.None)[0].Split('\n')[0]}"));
            }
        }
        catch (ArgumentException exception)
        {
            errors.Add(Located(scenario, exception));
        }

        return errors;
    }

    /// <summary>Warnings: values a run accepts that almost certainly do not say what their author meant.</summary>
    public static IReadOnlyList<ScenarioError> Warnings(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        if (scenario.Landers.Count > 0) return PerLander(scenario, Warnings);
        var c = CultureInfo.InvariantCulture;
        var warnings = new List<ScenarioError>();
        void Warn(string path, string message) => warnings.Add(new ScenarioError(scenario.LocationOf(path), path, message));

        if (scenario.Tether.LengthM < scenario.Shell.ThicknessM)
        {
            Warn("tether.length", string.Create(c, $"the fibre ({scenario.Tether.LengthM:G4} m) is shorter than the shell ({scenario.Shell.ThicknessM:G4} m): it runs out before the probe reaches the ocean"));
        }

        var heaters = scenario.Probe.HeadPowerW + scenario.Probe.WallPowerW;
        if (scenario.Power is null && scenario.Probe.ElectronicsPowerW > heaters)
        {
            Warn("probe.electronics_power", string.Create(c, $"{scenario.Probe.ElectronicsPowerW:0.###} W of electronics is more than the heaters' {heaters:0.###} W; without a power section it only adds to the energy used and changes nothing else (a unit slip?)"));
        }

        if (scenario.Body.DistanceToGroundM == 0)
        {
            Warn("body.distance_to_ground", "a distance home of 0 gives the ground team no light time: ground rules act as if they were on board");
        }

        for (var i = 0; i < scenario.Faults.Count; i++)
        {
            var fault = scenario.Faults[i];
            if (fault.Start is FaultStart.AtTime { AtS: var at } && at >= scenario.Run.UntilS)
            {
                Warn($"faults[{i}].at", string.Create(c, $"fault '{fault.Name}' starts at {at / 86400:G4} d, at or after the run's time limit ({scenario.Run.UntilS / 86400:G4} d): it never happens"));
            }

            if (fault.Start is FaultStart.AtRandom { NotBeforeS: var notBefore } && notBefore >= scenario.Run.UntilS)
            {
                Warn($"faults[{i}].not_before", string.Create(c, $"fault '{fault.Name}' cannot start before {notBefore / 86400:G4} d, at or after the run's time limit: it never happens"));
            }

            if (fault.Start is FaultStart.AtDepth { DepthM: var depth } && depth >= scenario.Shell.ThicknessM)
            {
                Warn($"faults[{i}].at_depth", string.Create(c, $"fault '{fault.Name}' starts at {depth:G4} m, at or below the shell's {scenario.Shell.ThicknessM:G4} m: it never happens"));
            }
        }

        return warnings;
    }

    /// <summary>Each lander's view checked alone (its components are its own), its paths put back under the lander.</summary>
    private static ScenarioError[] PerLander(Scenario scenario, Func<Scenario, IReadOnlyList<ScenarioError>> check) =>
    [
        .. scenario.Landers.SelectMany((lander, i) => check(lander.View).Select(e =>
            Scenarios.Format.LanderFormat.OwnSections.Contains(e.FieldPath.Split('.', '[')[0]) ? e with { FieldPath = $"landers[{i}].{e.FieldPath}" } : e)),
    ];

    /// <summary>A model's refusal, at the field that most likely set the value it refused.</summary>
    private static ScenarioError Located(Scenario scenario, ArgumentException exception) =>
        RangeRefusal.Error(scenario, RangeRefusal.FieldOf(exception.ParamName), exception);
}
