using DescentOps.Rules.Syntax;

namespace DescentOps.Rules.Compiled;

/// <summary>A comparison with its bounds in SI. Above and below are strict; a band includes its ends.</summary>
public sealed record Threshold(Comparison Kind, double LowerSi, double UpperSi)
{
    public static Threshold Above(double si) => new(Comparison.Above, si, double.PositiveInfinity);

    public static Threshold Below(double si) => new(Comparison.Below, double.NegativeInfinity, si);

    public bool Holds(double valueSi) => Kind switch
    {
        Comparison.Above => valueSi > LowerSi,
        Comparison.Below => valueSi < UpperSi,
        Comparison.Inside => valueSi >= LowerSi && valueSi <= UpperSi,
        Comparison.Outside => valueSi < LowerSi || valueSi > UpperSi,
        _ => false,
    };
}
