using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;

namespace DescentOps.Rules.Evaluation;

/// <summary>
/// A rule fired: the samples that satisfied its condition and the commands to send now (those before the first
/// wait that were not blocked by another rule's hold on an actuator). Firing counts the rule's firings from 1.
/// </summary>
public sealed record RuleFiring(
    SimTime Time,
    string Rule,
    RuleSeverity Severity,
    Placement Placement,
    int Priority,
    int Firing,
    IReadOnlyList<TelemetrySample> Evidence,
    IReadOnlyList<CommandAction> Commands) : RuleOutput(Time, Rule);
