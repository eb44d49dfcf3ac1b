using System.Security.Cryptography;
using DescentOps.Journal;
using DescentOps.Primitives.Time;
using DescentOps.Rehearsal;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Running;

/// <summary>
/// Prepares a rehearsal session the one way the command and the tests do: a fresh run of a scenario, or a logged run
/// re-run to an instant (with the console inputs it had by then) and handed over there. The log is opened under its
/// partial name and completes when the session ends.
/// </summary>
public static class RehearsalLaunch
{
    public static RehearsalSession Prepare(Scenario scenario, double pace, string logPath, LoggedRun? from = null, double? atS = null)
    {
        RunManifest manifest;
        IReadOnlyList<Engine.Running.ExternalInput> prior = [];
        if (from is not null)
        {
            var at = atS ?? throw new UsageException("--from needs --at: the instant to re-run to.");
            if (at < 0 || at >= from.Manifest.UntilSeconds) throw new UsageException($"--at: {at} s is outside the logged run (0 to {from.Manifest.UntilSeconds} s).");
            var sha = Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(from.Path)));
            manifest = RehearsalLog.Mark(from.Manifest with { ToolVersion = ToolInfo.Version }, sha, at);
            prior = RehearsalLog.IsRehearsal(from.Manifest)
                ? [.. RehearsalLog.ReadInputs(from.Path, SimTime.FromSecondsSinceEpoch(at)).Where(i => ((OperatorInput)i.Payload).Kind != OperatorInputKind.End)]
                : [];
            scenario = from.Scenario;
        }
        else
        {
            manifest = RehearsalLog.Mark(Commands.RunCommand.ManifestFor(scenario, scenario.Run.Seed, scenario.Run.UntilS));
        }

        var writer = JournalWriter.Create(logPath, manifest);
        try
        {
            return new RehearsalSession(new SessionSetup(scenario, manifest, writer, pace) { FromAtS = atS, PriorInputs = prior });
        }
        catch
        {
            writer.Abandon();
            throw;
        }
    }

    /// <summary>logs/NAME-rehearsal-seedN.jsonl, or with -2, -3... when that exists: a rehearsal never replaces a log.</summary>
    public static string DefaultLogPath(Scenario scenario, long seed)
    {
        var stem = Path.Combine("logs", $"{scenario.Name}-rehearsal-seed{seed}");
        var path = stem + ".jsonl";
        for (var n = 2; File.Exists(path) || File.Exists(path + JournalWriter.PartialSuffix); n++) path = $"{stem}-{n}.jsonl";
        return Path.GetFullPath(path);
    }
}
