using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Evaluation;

/// <summary>
/// An escalation step came due with the condition still holding: Level counts the rule's escalation blocks
/// from 1; Evidence is what the latest evaluation saw.
/// </summary>
public sealed record RuleEscalation(
    SimTime Time,
    string Rule,
    int Firing,
    int Level,
    IReadOnlyList<TelemetrySample> Evidence,
    IReadOnlyList<CommandAction> Commands) : RuleOutput(Time, Rule);
