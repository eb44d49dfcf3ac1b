using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation;

/// <summary>
/// Everything the evaluator says, in one ordered stream, so that a journal records firings, commands and state
/// changes in the order they happened. Rule is empty for events about input rather than a rule.
/// </summary>
public abstract record RuleOutput(SimTime Time, string Rule);
