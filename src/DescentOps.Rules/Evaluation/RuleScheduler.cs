using System.Reactive.Concurrency;
using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation;

/// <summary>
/// Rx virtual time in simulation ticks. The simulation kernel owns the clock: it calls
/// <see cref="VirtualTimeSchedulerBase{TAbsolute,TRelative}.AdvanceTo"/> as simulated time passes, and scheduled
/// rule steps run inside that call, in due-time order and, at equal times, in the order they were scheduled.
/// Nothing here reads a wall clock.
/// </summary>
public sealed class RuleScheduler : VirtualTimeScheduler<SimTime, SimDuration>
{
    public RuleScheduler()
        : this(SimTime.Epoch)
    {
    }

    public RuleScheduler(SimTime initialClock)
        : base(initialClock, Comparer<SimTime>.Default)
    {
    }

    /// <summary>
    /// When the earliest pending rule step is due (a persistence period ending, a wait, an escalation), so the
    /// kernel can wake the rules exactly then instead of at the next sample; null when nothing is pending.
    /// </summary>
    public SimTime? NextDueTime => GetNext() is { } item ? item.DueTime : null;

    /// <summary>Saturates instead of overflowing, so a far-future step simply never comes due.</summary>
    protected override SimTime Add(SimTime absolute, SimDuration relative)
    {
        var ticks = relative.Ticks > 0 && absolute.Ticks > long.MaxValue - relative.Ticks ? long.MaxValue
            : relative.Ticks < 0 && absolute.Ticks < long.MinValue - relative.Ticks ? long.MinValue
            : absolute.Ticks + relative.Ticks;
        return new SimTime(ticks);
    }

    /// <summary>Rx's IScheduler.Now wants a DateTimeOffset: the epoch is mapped to the Unix epoch, for display only.</summary>
    protected override DateTimeOffset ToDateTimeOffset(SimTime absolute)
    {
        const long hundredNanosecondsPerTick = 10;
        var limit = (DateTimeOffset.MaxValue.Ticks - DateTimeOffset.UnixEpoch.Ticks) / hundredNanosecondsPerTick;
        var lowLimit = (DateTimeOffset.MinValue.Ticks - DateTimeOffset.UnixEpoch.Ticks) / hundredNanosecondsPerTick;
        var ticks = Math.Clamp(absolute.Ticks, lowLimit, limit);
        return DateTimeOffset.UnixEpoch.AddTicks(ticks * hundredNanosecondsPerTick);
    }

    protected override SimDuration ToRelative(TimeSpan timeSpan) => new(timeSpan.Ticks / 10);
}
