namespace DescentOps.Primitives.Units;

/// <summary>
/// Reads a quantity written as a number and a unit ("12 cm", "5kW", "-20 °C", "6.1e8 km") into SI, against the
/// <see cref="UnitCatalog"/>. The one parser behind scenario fields and command-line options; the rule language
/// reads its numbers with <see cref="StrictNumber"/> and its units from the same catalogue.
/// </summary>
public static class QuantityText
{
    /// <summary>
    /// Reads <paramref name="text"/> as a <paramref name="dimension"/>. With <paramref name="bareNumberScale"/>, a number
    /// without a unit is accepted and multiplied by it (a share: "0.5"); otherwise a unit is required.
    /// </summary>
    public static bool TryParseSi(string text, PhysicalDimension dimension, string dimensionName, out double valueSi, out string error, double? bareNumberScale = null)
    {
        valueSi = double.NaN;
        var trimmed = text.Trim();
        var length = StrictNumber.Length(trimmed);
        if (StrictNumber.WhyNot(trimmed, length) is { } why)
        {
            error = why;
            return false;
        }

        if (length == 0)
        {
            error = $"'{trimmed}' is not a {dimensionName}: it must start with a number (units: {Examples(dimension)})";
            return false;
        }

        if (!StrictNumber.TryConvert(trimmed.AsSpan(0, length), out var number, out error)) return false;
        var unit = trimmed[length..].TrimStart(' ', '\t');
        if (unit.Length == 0)
        {
            if (bareNumberScale is { } scale)
            {
                valueSi = number * scale;
                error = "";
                return true;
            }

            var first = UnitCatalog.SymbolsOf(dimension).FirstOrDefault() ?? "";
            error = $"a unit is required, e.g. '{trimmed} {first}'";
            return false;
        }

        if (!UnitCatalog.TryFind(unit, dimension, out var symbol))
        {
            error = UnknownUnit(trimmed, unit, dimension, dimensionName);
            return false;
        }

        valueSi = symbol.ToSi(number);
        if (double.IsFinite(valueSi))
        {
            error = "";
            return true;
        }

        valueSi = double.NaN;
        error = $"'{trimmed}' is too large: in SI units it lies beyond ±1.8e308";
        return false;
    }

    /// <summary>The symbols accepted for a dimension, comma-separated.</summary>
    public static string Examples(PhysicalDimension dimension) => string.Join(", ", UnitCatalog.SymbolsOf(dimension));

    private static string UnknownUnit(string text, string unit, PhysicalDimension dimension, string dimensionName)
    {
        if (UnitCatalog.CaseNeighbour(unit, dimension) is { } neighbour)
        {
            return $"'{text}' is not a {dimensionName}: unit symbols are case-sensitive, '{unit}' is not '{neighbour}' (units: {Examples(dimension)})";
        }

        var others = UnitCatalog.WithSymbol(unit);
        var other = others.Count > 0 ? others[0] : null;
        var what = other is null ? "" : $": '{unit}' measures {Words(other.Dimension)}";
        return $"'{text}' is not a {dimensionName}{what} (units: {Examples(dimension)})";
    }

    private static string Words(PhysicalDimension dimension) => dimension switch
    {
        PhysicalDimension.MassFraction => "a mass fraction",
        PhysicalDimension.AbsorbedDose => "an absorbed dose",
        PhysicalDimension.Dimensionless => "a share",
        PhysicalDimension.Acceleration => "an acceleration",
        PhysicalDimension.Energy => "an energy",
        PhysicalDimension.Angle => "an angle",
        _ => "a " + dimension.ToString().ToLowerInvariant(),
    };
}
