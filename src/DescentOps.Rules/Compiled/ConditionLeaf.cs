namespace DescentOps.Rules.Compiled;

/// <summary>
/// One check at the bottom of a condition (a limit, a rate, a step, a state), with whether a persistence counted in
/// samples encloses it and whether a time-since or a latch does (their verdicts depend on history, not only on the
/// check's own verdict now). <see cref="Of(CompiledCondition)"/> walks a condition through its connectives,
/// persistences, time-since events and latches, depth first in the order written: the one walk every reader of a
/// rule's checks shares.
/// </summary>
public readonly record struct ConditionLeaf(CompiledCondition Check, bool CountedInSamples, bool UnderTimeSinceOrLatch)
{
    public static IEnumerable<ConditionLeaf> Of(CompiledCondition condition) => Of(condition, false, false);

    private static IEnumerable<ConditionLeaf> Of(CompiledCondition condition, bool counted, bool timed)
    {
        IEnumerable<CompiledCondition>? operands = condition switch
        {
            AllOfCondition all => all.Operands,
            AnyOfCondition any => any.Operands,
            NotCondition not => [not.Operand],
            HoldsForDurationCondition duration => [duration.Operand],
            HoldsForSamplesCondition samples => [samples.Operand],
            TimeSinceCondition since => [since.Event],
            LatchedCondition latched => [latched.Operand],
            _ => null,
        };
        if (operands is null) return [new ConditionLeaf(condition, counted, timed)];
        var innerCounted = counted || condition is HoldsForSamplesCondition;
        var innerTimed = timed || condition is TimeSinceCondition or LatchedCondition;
        return operands.SelectMany(operand => Of(operand, innerCounted, innerTimed));
    }
}
