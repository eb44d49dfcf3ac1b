using System.Reflection;
using DescentOps.Engine.Components;
using DescentOps.Engine.Randomness;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

/// <summary>The engine is built with overflow checking: a counter at its limit fails loudly instead of wrapping to a negative number that would reorder events.</summary>
public sealed class SequenceOverflowTests
{
    [Fact]
    public void A_sender_sequence_number_at_its_limit_is_an_error_not_a_wrap()
    {
        var self = new ComponentId("probe");
        var context = ComponentContext.Detached(self, new RandomStream(1, self), SimTime.Epoch);
        var sequence = typeof(ComponentContext).GetField("_nextSequence", BindingFlags.Instance | BindingFlags.NonPublic)!;
        sequence.SetValue(context, long.MaxValue - 1);

        context.ScheduleSelf(SimDuration.Zero, "last");
        Assert.Equal(long.MaxValue - 1, context.Scheduled.Single().Key.SenderSequence);
        Assert.Throws<OverflowException>(() => context.ScheduleSelf(SimDuration.Zero, "one too many"));
    }
}
