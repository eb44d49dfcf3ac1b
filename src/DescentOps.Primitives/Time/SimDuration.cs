using System.Globalization;

namespace DescentOps.Primitives.Time;

/// <summary>
/// A span of simulated time as a whole number of microsecond ticks. Integer ticks keep event ordering exact
/// (no two runs can disagree on whether two events coincide), and a microsecond resolves a light-time or a
/// fibre delay while a signed 64-bit count still spans about 292,000 years.
/// </summary>
/// <remarks>This type is an immutable value type.</remarks>
public readonly record struct SimDuration(long Ticks) : IComparable<SimDuration>
{
    /// <summary>Ticks in one second of simulated time.</summary>
    public const long TicksPerSecond = 1_000_000;

    public static SimDuration Zero => default;
    public static SimDuration MaxValue => new(long.MaxValue);

    public double TotalSeconds => Ticks / (double)TicksPerSecond;
    public double TotalHours => TotalSeconds / 3600.0;
    public double TotalDays => TotalSeconds / 86400.0;

    /// <summary>Rounds to the nearest tick; refuses NaN, infinities and spans beyond the tick range.</summary>
    public static SimDuration FromSeconds(double seconds)
    {
        if (double.IsNaN(seconds) || double.IsInfinity(seconds) || Math.Abs(seconds) >= long.MaxValue / (double)TicksPerSecond)
        {
            throw new ArgumentOutOfRangeException(nameof(seconds), seconds, "A simulated duration must be finite and within ±9.2e12 s.");
        }

        return new SimDuration((long)Math.Round(seconds * TicksPerSecond, MidpointRounding.ToEven));
    }

    public static SimDuration FromMinutes(double minutes) => FromSeconds(minutes * 60.0);
    public static SimDuration FromHours(double hours) => FromSeconds(hours * 3600.0);
    public static SimDuration FromDays(double days) => FromSeconds(days * 86400.0);

    public static SimDuration operator +(SimDuration a, SimDuration b) => new(checked(a.Ticks + b.Ticks));
    public static SimDuration operator -(SimDuration a, SimDuration b) => new(checked(a.Ticks - b.Ticks));
    public static SimDuration operator -(SimDuration a) => new(checked(-a.Ticks));
    public static SimDuration operator *(SimDuration a, long factor) => new(checked(a.Ticks * factor));
    public static bool operator <(SimDuration a, SimDuration b) => a.Ticks < b.Ticks;
    public static bool operator >(SimDuration a, SimDuration b) => a.Ticks > b.Ticks;
    public static bool operator <=(SimDuration a, SimDuration b) => a.Ticks <= b.Ticks;
    public static bool operator >=(SimDuration a, SimDuration b) => a.Ticks >= b.Ticks;

    public int CompareTo(SimDuration other) => Ticks.CompareTo(other.Ticks);

    /// <summary>Seconds with round-trip precision, culture-invariant: the form the journal uses.</summary>
    public override string ToString() => TotalSeconds.ToString("R", CultureInfo.InvariantCulture) + " s";
}
