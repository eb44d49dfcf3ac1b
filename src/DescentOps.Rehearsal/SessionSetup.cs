using DescentOps.Engine.Running;
using DescentOps.Journal;
using DescentOps.Scenarios.Model;

namespace DescentOps.Rehearsal;

/// <summary>
/// Everything a rehearsal starts from: the scenario and manifest, the journal it writes, the pace, and when it continues
/// a logged run, the instant to re-run to and the inputs given before it.
/// </summary>
public sealed record SessionSetup(Scenario Scenario, RunManifest Manifest, JournalWriter Journal, double Pace)
{
    public bool StartPaused { get; init; }

    public double? FromAtS { get; init; }

    public IReadOnlyList<ExternalInput> PriorInputs { get; init; } = [];

    /// <summary>Most rounds handled per tick, so a tick stays short; beyond it the simulation falls behind the pace.</summary>
    public int MaxRoundsPerTick { get; init; } = 20_000;
}
