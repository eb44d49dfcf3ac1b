using System.Globalization;
using System.Text.RegularExpressions;
using UnitsNet;

namespace DescentOps.Scenarios.Format;

/// <summary>
/// Reads "12 cm", "5kW", "250K", "400 d" into SI numbers with UnitsNet, culture-invariant. Shared by the
/// scenario loader and the command line so both accept exactly the same spellings.
/// </summary>
public static partial class QuantityParser
{
    public static bool TryParseSi(QuantityKind kind, string text, out double valueSi, out string error)
    {
        var trimmed = text.Trim();
        if (kind == QuantityKind.AbsorbedDoseRate) return TryParseDoseRate(trimmed, out valueSi, out error);
        if (kind == QuantityKind.Ratio && NumberOnly().IsMatch(trimmed))
        {
            // A share needs no unit: "0.5" is a half, as "50 %" is.
            valueSi = double.Parse(trimmed, CultureInfo.InvariantCulture);
            error = "";
            return true;
        }

        if (Quantity.TryParse(CultureInfo.InvariantCulture, kind.UnitsNetType(), trimmed, out IQuantity? quantity))
        {
            // UnitsNet's base unit is SI for every kind used here except angles (degrees there, radians here).
            Enum target = kind == QuantityKind.Angle ? UnitsNet.Units.AngleUnit.Radian : quantity.QuantityInfo.BaseUnitInfo.Value;
            valueSi = (double)UnitConverter.Convert(quantity.Value, quantity.Unit, target);
            if (double.IsFinite(valueSi))
            {
                error = "";
                return true;
            }
        }

        valueSi = double.NaN;
        error = NumberOnly().IsMatch(trimmed)
            ? $"a unit is required, e.g. '{trimmed} {kind.ExampleUnits().Split(',')[0]}'"
            : $"'{text}' is not a {kind.ToString().ToLowerInvariant()} (units: {kind.ExampleUnits()})";
        return false;
    }

    /// <summary>A dose over one unit of a duration, split at the last '/': "0.5 Gy/d" is 0.5 Gy per day.</summary>
    private static bool TryParseDoseRate(string text, out double valueSi, out string error)
    {
        var slash = text.LastIndexOf('/');
        if (slash > 0
            && TryParseSi(QuantityKind.AbsorbedDose, text[..slash], out var doseGy, out _)
            && TryParseSi(QuantityKind.Duration, "1 " + text[(slash + 1)..].Trim(), out var perS, out _)
            && perS > 0)
        {
            valueSi = doseGy / perS;
            error = "";
            return true;
        }

        valueSi = double.NaN;
        error = $"'{text}' is not a dose rate (a dose over a duration: {QuantityKind.AbsorbedDoseRate.ExampleUnits()})";
        return false;
    }

    [GeneratedRegex(@"^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$")]
    private static partial Regex NumberOnly();
}
