namespace DescentOps.Rules.Units;

/// <summary>
/// The unit symbols rule text may use. The table is our own rather than a general unit library's because rule
/// text must resolve a unit without knowing what it is for ("m" must be a metre, never a minute), must build
/// rates from any unit over any time unit ("kW/min", "K/h"), and must treat a temperature rate as a difference.
/// Symbols are case-sensitive ("mW" is a milliwatt, "MW" a megawatt).
/// </summary>
public static class UnitTable
{
    private static readonly UnitDefinition[] Definitions =
    [
        new("m", Dimension.Length, 1.0),
        new("km", Dimension.Length, 1000.0),
        new("cm", Dimension.Length, 0.01),
        new("mm", Dimension.Length, 0.001),
        new("s", Dimension.Duration, 1.0),
        new("ms", Dimension.Duration, 0.001),
        new("min", Dimension.Duration, 60.0),
        new("h", Dimension.Duration, 3600.0),
        new("d", Dimension.Duration, 86400.0),
        new("K", Dimension.Temperature, 1.0),
        new("°C", Dimension.Temperature, 1.0, 273.15),
        new("degC", Dimension.Temperature, 1.0, 273.15),
        new("W", Dimension.Power, 1.0),
        new("mW", Dimension.Power, 0.001),
        new("kW", Dimension.Power, 1000.0),
        new("MW", Dimension.Power, 1.0e6),
        new("J", Dimension.Energy, 1.0),
        new("kJ", Dimension.Energy, 1000.0),
        new("MJ", Dimension.Energy, 1.0e6),
        new("Wh", Dimension.Energy, 3600.0),
        new("kWh", Dimension.Energy, 3.6e6),
        new("rad", Dimension.Angle, 1.0),
        new("deg", Dimension.Angle, Math.PI / 180.0),
        new("°", Dimension.Angle, Math.PI / 180.0),
        new("V", Dimension.Voltage, 1.0),
        new("mV", Dimension.Voltage, 0.001),
        new("kV", Dimension.Voltage, 1000.0),
        new("A", Dimension.Current, 1.0),
        new("mA", Dimension.Current, 0.001),
        new("Pa", Dimension.Pressure, 1.0),
        new("kPa", Dimension.Pressure, 1000.0),
        new("MPa", Dimension.Pressure, 1.0e6),
        new("bar", Dimension.Pressure, 1.0e5),
        new("kg", Dimension.Mass, 1.0),
        new("g", Dimension.Mass, 0.001),
        new("Hz", Dimension.Frequency, 1.0),
        new("kHz", Dimension.Frequency, 1000.0),
        new("%", Dimension.Dimensionless, 0.01),
    ];

    private static readonly Dictionary<string, UnitDefinition> BySymbol = Definitions.ToDictionary(d => d.Symbol, StringComparer.Ordinal);

    public static IReadOnlyList<UnitDefinition> All => Definitions;

    /// <summary>Resolves "kW", "°C", "m/h", "K/min"; a rate is any non-rate unit over a time unit.</summary>
    public static bool TryResolve(string unit, out ResolvedUnit resolved)
    {
        resolved = default;
        if (BySymbol.TryGetValue(unit, out var plain))
        {
            resolved = new ResolvedUnit(QuantityDimension.Of(plain.Dimension), plain.ScaleToSi, plain.OffsetToSi);
            return true;
        }

        var slash = unit.LastIndexOf('/');
        if (slash <= 0 || slash == unit.Length - 1)
        {
            return false;
        }

        if (!BySymbol.TryGetValue(unit[(slash + 1)..], out var time) || time.Dimension != Dimension.Duration)
        {
            return false;
        }

        if (!TryResolve(unit[..slash], out var numerator) || numerator.Dimension.PerSecond)
        {
            return false;
        }

        resolved = new ResolvedUnit(numerator.Dimension.Rate, numerator.ScaleToSi / time.ScaleToSi, 0.0);
        return true;
    }

    /// <summary>A unit to suggest in messages for a dimension.</summary>
    public static string Example(QuantityDimension dimension)
    {
        var normalized = dimension.Normalized;
        if (normalized.Base == Dimension.Speed && !normalized.PerSecond)
        {
            return "m/h";
        }

        var symbol = Definitions.FirstOrDefault(d => d.Dimension == normalized.Base)?.Symbol ?? "";
        return normalized.PerSecond ? symbol + "/h" : symbol;
    }
}
