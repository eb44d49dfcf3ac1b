using System.Globalization;

namespace DescentOps.Rules.Evaluation;

/// <summary>A measured value in the point's SI unit.</summary>
public sealed record NumericValue(double ValueSi) : TelemetryValue
{
    public override string ToString() => ValueSi.ToString("R", CultureInfo.InvariantCulture);
}
