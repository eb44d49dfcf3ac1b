using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Evaluation;

/// <summary>The part of a sequence after a wait. Level is 0 for the 'then' block, else the escalation level.</summary>
public sealed record RuleContinuation(SimTime Time, string Rule, int Firing, int Level, IReadOnlyList<CommandAction> Commands) : RuleOutput(Time, Rule);
