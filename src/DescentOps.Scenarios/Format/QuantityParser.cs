using DescentOps.Primitives.Units;

namespace DescentOps.Scenarios.Format;

/// <summary>
/// Reads "12 cm", "5kW", "250K", "400 d" into SI numbers against the one unit table (<see cref="UnitCatalog"/>),
/// strictly: no decimal commas or digit grouping, no case folding of units, nothing that is not finite. Shared by
/// the scenario loader and the command line so both accept exactly the same spellings.
/// </summary>
public static class QuantityParser
{
    public static bool TryParseSi(QuantityKind kind, string text, out double valueSi, out string error)
    {
        if (kind == QuantityKind.AbsorbedDoseRate) return TryParseDoseRate(text.Trim(), out valueSi, out error);
        // A share needs no unit: "0.5" is a half, as "50 %" is.
        double? bare = kind == QuantityKind.Ratio ? 1.0 : null;
        return QuantityText.TryParseSi(text, kind.Dimension(), kind.Word(), out valueSi, out error, bare);
    }

    /// <summary>A dose over one unit of a duration, split at the last '/': "0.5 Gy/d" is 0.5 Gy per day.</summary>
    private static bool TryParseDoseRate(string text, out double valueSi, out string error)
    {
        var slash = text.LastIndexOf('/');
        if (slash > 0
            && QuantityText.TryParseSi(text[..slash], PhysicalDimension.AbsorbedDose, "dose", out var doseGy, out var doseError)
            && UnitCatalog.TryFind(text[(slash + 1)..].Trim(), PhysicalDimension.Duration, out var per))
        {
            valueSi = doseGy / per.ToSi(1.0);
            error = "";
            return true;
        }

        valueSi = double.NaN;
        error = slash > 0 && StrictNumber.WhyNot(text, StrictNumber.Length(text)) is { } why
            ? why
            : $"'{text}' is not a dose rate (a dose over a duration: {QuantityKind.AbsorbedDoseRate.ExampleUnits()})";
        return false;
    }
}
