using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Onboard;

/// <summary>The instants a sensor is read: whole multiples of its interval from the start of the run.</summary>
public readonly record struct SampleGrid(long IntervalTicks)
{
    /// <summary>The first sample instant at or after <paramref name="time"/>.</summary>
    public SimTime AtOrAfter(SimTime time)
    {
        var k = (time.Ticks + IntervalTicks - 1) / IntervalTicks;
        return new SimTime(k * IntervalTicks);
    }

    /// <summary>The first sample instant strictly after <paramref name="time"/>.</summary>
    public SimTime After(SimTime time) => new((time.Ticks / IntervalTicks + 1) * IntervalTicks);
}
