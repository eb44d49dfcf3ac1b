using System.Globalization;

namespace DescentOps.Reports.Plotting;

/// <summary>The unit the report's times are read in, chosen from the run's length so the numbers stay readable.</summary>
/// <param name="Symbol">As written after a number and on the axis (<c>min</c>, <c>h</c>, <c>d</c>).</param>
/// <param name="Seconds">Seconds in one unit.</param>
public sealed record TimeUnit(string Symbol, double Seconds)
{
    public static TimeUnit Minutes { get; } = new("min", 60);

    public static TimeUnit Hours { get; } = new("h", 3_600);

    public static TimeUnit Days { get; } = new("d", 86_400);

    /// <summary>Minutes up to 3 h, hours up to 3 d, days beyond: the axis then spans a few to some hundreds of units.</summary>
    public static TimeUnit For(double lengthS) => lengthS <= 3 * 3_600 ? Minutes : lengthS <= 3 * 86_400 ? Hours : Days;

    public double FromDays(double days) => days * 86_400 / Seconds;

    public string Format(double seconds) => (seconds / Seconds).ToString(Symbol == "d" ? "F3" : "F2", CultureInfo.InvariantCulture);
}
