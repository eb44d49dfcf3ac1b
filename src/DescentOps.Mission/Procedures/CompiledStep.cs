using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// One checked step: the command it sends, the conditions it waits for and expects (each a one-rule set of the rule
/// language), how long it waits, and where it goes on passing and on failing (a step index, or <see cref="Done"/> /
/// <see cref="Abort"/>).
/// </summary>
public sealed record CompiledStep(
    string Name,
    CommandAction? Send,
    CompiledRule? WaitFor,
    SimDuration? Within,
    CompiledRule? Expect,
    int OnPass,
    int OnFail)
{
    /// <summary>Whether a person confirms (or skips) the step before its command goes.</summary>
    public bool Confirm { get; init; }

    public const int Done = -1;
    public const int Abort = -2;

    /// <summary>Whether the step watches frames (a wait or a check); a step that does not passes as soon as it has sent.</summary>
    public bool Watches => WaitFor is not null || Expect is not null;
}
