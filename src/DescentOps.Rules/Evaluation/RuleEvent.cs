using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation;

/// <summary>A rule's state change, or a refused input, with a human-readable detail for the journal.</summary>
public sealed record RuleEvent(SimTime Time, string Rule, RuleEventKind Kind, string Detail) : RuleOutput(Time, Rule);
