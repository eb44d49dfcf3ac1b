namespace DescentOps.Scenarios.Campaign;

/// <summary>
/// One uncertain scenario value, its parameters in SI: normal (A mean, B sd), lognormal (A ln of the median, B sd of
/// the log), uniform (A low, B high), triangular (A low, B mode, C high). Draws outside [MinSi, MaxSi] (the field's
/// valid range) are drawn again, so normal and lognormal are truncated to it. <see cref="Unit"/> is the SI symbol the
/// drawn value is written with ("" for a plain number).
/// </summary>
public sealed record UncertainInput(string Path, UncertainDistribution Distribution, double A, double B, double C, double MinSi, double MaxSi, bool MinExclusive, string Unit)
{
    public bool InRange(double value) => (MinExclusive ? value > MinSi : value >= MinSi) && value <= MaxSi;
}
