using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation.Monitors;

namespace DescentOps.Rules.Evaluation;

/// <summary>
/// The live state of one rule. An episode is a stretch during which the condition holds; the rule fires at
/// most once per episode, and not again within its cooldown.
/// </summary>
internal sealed class RuleRuntime(CompiledRule rule, int index)
{
    public CompiledRule Rule { get; } = rule;

    /// <summary>Declaration order; breaks ties between rules of equal priority.</summary>
    public int Index { get; } = index;

    public ConditionMonitor Monitor { get; } = ConditionMonitor.Build(rule.Condition);

    public bool Enabled { get; set; } = rule.StartsEnabled;

    public bool EpisodeActive { get; set; }

    public bool FiredThisEpisode { get; set; }

    public bool HeldByCooldownThisEpisode { get; set; }

    public int Firings { get; set; }

    public SimTime? LastFiringTime { get; set; }

    public IReadOnlyList<TelemetrySample> LastEvidence { get; set; } = [];

    public IDisposable? WakeUp { get; set; }

    public SimTime? WakeUpTime { get; set; }

    /// <summary>Escalations not yet due; withdrawn when the condition clears.</summary>
    public List<IDisposable> PendingEscalations { get; } = [];

    /// <summary>Sequence parts after a wait; they run to the end unless the rule is disabled.</summary>
    public List<IDisposable> PendingContinuations { get; } = [];
}
