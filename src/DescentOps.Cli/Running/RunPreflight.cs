using System.Globalization;
using DescentOps.Cli.Commands;
using DescentOps.Mission.Running;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Running;

/// <summary>What <c>run</c> checks before it writes anything: what the run would stop on, and the log's size.</summary>
internal static class RunPreflight
{
    /// <summary>Throws a located <see cref="ScenarioException"/> or a <see cref="UsageException"/>; returns when the run may start.</summary>
    /// <param name="scenario">The scenario to run.</param>
    /// <param name="untilS">The run's time limit.</param>
    /// <param name="untilOption">The option that set the time limit, or null when it is the scenario's own.</param>
    /// <param name="noLogLimit">The user asked for a run whatever its log's size.</param>
    public static void Check(Scenario scenario, double untilS, string? untilOption, bool noLogLimit)
    {
        var errors = MissionPreflight.Errors(scenario);
        if (errors.Count > 0) throw new ScenarioException(errors);
        var bytes = LogSizeEstimate.UpperBoundBytes(scenario, untilS);
        if (noLogLimit || bytes <= LogSizeEstimate.DefaultLimitBytes) return;
        var interval = scenario.Probe.TelemetryIntervalS;
        var limitSource = untilOption ?? $"run.until in {scenario.SourceName}";
        throw new UsageException(string.Create(CultureInfo.InvariantCulture,
            $"the log could grow to {LogSizeEstimate.Describe(bytes)} (a frame every {interval:G4} s for {untilS / 86400:G4} d, {limitSource}), more than the {LogSizeEstimate.Describe(LogSizeEstimate.DefaultLimitBytes)} a run writes unless asked: shorten the time limit with --until, or pass {RunCommand.NoLogLimitOption}"));
    }
}
