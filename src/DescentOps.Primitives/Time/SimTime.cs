using System.Globalization;

namespace DescentOps.Primitives.Time;

/// <summary>
/// An instant of simulated time: microsecond ticks since the scenario's epoch (the start of the run).
/// Instants and durations are different types so that adding two instants does not compile.
/// </summary>
/// <remarks>This type is an immutable value type.</remarks>
public readonly record struct SimTime(long Ticks) : IComparable<SimTime>
{
    public static SimTime Epoch => default;
    public static SimTime MaxValue => new(long.MaxValue);

    public double SecondsSinceEpoch => Ticks / (double)SimDuration.TicksPerSecond;

    public SimDuration SinceEpoch => new(Ticks);

    public static SimTime FromSecondsSinceEpoch(double seconds) => Epoch + SimDuration.FromSeconds(seconds);

    public static SimTime operator +(SimTime t, SimDuration d) => new(checked(t.Ticks + d.Ticks));
    public static SimTime operator -(SimTime t, SimDuration d) => new(checked(t.Ticks - d.Ticks));
    public static SimDuration operator -(SimTime a, SimTime b) => new(checked(a.Ticks - b.Ticks));
    public static bool operator <(SimTime a, SimTime b) => a.Ticks < b.Ticks;
    public static bool operator >(SimTime a, SimTime b) => a.Ticks > b.Ticks;
    public static bool operator <=(SimTime a, SimTime b) => a.Ticks <= b.Ticks;
    public static bool operator >=(SimTime a, SimTime b) => a.Ticks >= b.Ticks;

    public static SimTime Min(SimTime a, SimTime b) => a <= b ? a : b;
    public static SimTime Max(SimTime a, SimTime b) => a >= b ? a : b;

    public int CompareTo(SimTime other) => Ticks.CompareTo(other.Ticks);

    public override string ToString() => "T+" + SecondsSinceEpoch.ToString("R", CultureInfo.InvariantCulture) + " s";
}
