using D = DescentOps.Primitives.Units.PhysicalDimension;

namespace DescentOps.Primitives.Units;

/// <summary>
/// The one table of unit symbols that scenario files, command-line options and rule text accept. Symbols are
/// case-sensitive and never folded ("M" is not "m"; "mW" is not "MW"); a symbol may stand for two dimensions only
/// where the field says which ("rad" is an angle, or a dose where a dose is asked for).
/// </summary>
public static class UnitCatalog
{
    private const double Au = 1.495978707e11; // IAU 2012 Resolution B2: the astronomical unit, exactly, in metres.

    private static readonly UnitSymbol[] Symbols =
    [
        UnitSymbol.Scaled("m", D.Length, 1.0),
        UnitSymbol.Scaled("km", D.Length, 1e3),
        UnitSymbol.Scaled("cm", D.Length, 1e-2),
        UnitSymbol.Scaled("mm", D.Length, 1e-3),
        UnitSymbol.Scaled("µm", D.Length, 1e-6),
        UnitSymbol.Scaled("nm", D.Length, 1e-9),
        UnitSymbol.Scaled("au", D.Length, Au),

        UnitSymbol.Scaled("s", D.Duration, 1.0),
        UnitSymbol.Scaled("ms", D.Duration, 1e-3),
        UnitSymbol.Scaled("µs", D.Duration, 1e-6),
        UnitSymbol.Scaled("min", D.Duration, 60.0),
        UnitSymbol.Scaled("h", D.Duration, 3600.0),
        new("d", D.Duration, 86400.0, 0.0, v => v * 24 * 3600),
        new("wk", D.Duration, 604800.0, 0.0, v => v * 7 * 24 * 3600),
        new("yr", D.Duration, 31536000.0, 0.0, v => v * 365 * 24 * 3600),

        UnitSymbol.Scaled("m/s", D.Speed, 1.0),
        UnitSymbol.Scaled("km/s", D.Speed, 1e3),
        UnitSymbol.Scaled("cm/s", D.Speed, 1e-2),
        UnitSymbol.Scaled("mm/s", D.Speed, 1e-3),
        new("m/min", D.Speed, 1.0 / 60, 0.0, v => v / 60),
        new("m/h", D.Speed, 1.0 / 3600, 0.0, v => v / 3600),
        new("km/h", D.Speed, 1e3 / 3600, 0.0, v => v / 3600 * 1e3),
        new("cm/h", D.Speed, 1e-2 / 3600, 0.0, v => v / 3600 * 1e-2),
        new("mm/h", D.Speed, 1e-3 / 3600, 0.0, v => v / 3600 * 1e-3),

        UnitSymbol.Scaled("m/s^2", D.Acceleration, 1.0),
        UnitSymbol.Scaled("m/s²", D.Acceleration, 1.0),

        UnitSymbol.Scaled("K", D.Temperature, 1.0),
        new("°C", D.Temperature, 1.0, 273.15, v => v + 273.15),
        new("degC", D.Temperature, 1.0, 273.15, v => v + 273.15),

        DecimalPower("W", 1.0, 1m),
        DecimalPower("mW", 1e-3, 1e-3m),
        DecimalPower("kW", 1e3, 1e3m),
        DecimalPower("MW", 1e6, 1e6m),
        DecimalPower("GW", 1e9, 1e9m),

        UnitSymbol.Scaled("J", D.Energy, 1.0),
        UnitSymbol.Scaled("kJ", D.Energy, 1e3),
        UnitSymbol.Scaled("MJ", D.Energy, 1e6),
        UnitSymbol.Scaled("GJ", D.Energy, 1e9),
        UnitSymbol.Scaled("Wh", D.Energy, 3600.0),
        new("kWh", D.Energy, 3.6e6, 0.0, v => v * 3600 * 1e3),
        new("MWh", D.Energy, 3.6e9, 0.0, v => v * 3600 * 1e6),

        UnitSymbol.Scaled("rad", D.Angle, 1.0),
        new("deg", D.Angle, Math.PI / 180, 0.0, v => v / 180 * Math.PI),
        new("°", D.Angle, Math.PI / 180, 0.0, v => v / 180 * Math.PI),

        UnitSymbol.Scaled("V", D.Voltage, 1.0),
        UnitSymbol.Scaled("mV", D.Voltage, 1e-3),
        UnitSymbol.Scaled("kV", D.Voltage, 1e3),
        UnitSymbol.Scaled("A", D.Current, 1.0),
        UnitSymbol.Scaled("mA", D.Current, 1e-3),

        UnitSymbol.Scaled("Pa", D.Pressure, 1.0),
        UnitSymbol.Scaled("hPa", D.Pressure, 1e2),
        UnitSymbol.Scaled("kPa", D.Pressure, 1e3),
        UnitSymbol.Scaled("MPa", D.Pressure, 1e6),
        UnitSymbol.Scaled("GPa", D.Pressure, 1e9),
        UnitSymbol.Scaled("bar", D.Pressure, 1e5),
        new("mbar", D.Pressure, 1e2, 0.0, v => v * 1e5 * 1e-3),
        new("dbar", D.Pressure, 1e4, 0.0, v => v * 1e5 * 1e-1),

        UnitSymbol.Scaled("kg", D.Mass, 1.0),
        new("g", D.Mass, 1e-3, 0.0, v => v / 1e3),
        UnitSymbol.Scaled("t", D.Mass, 1e3),

        UnitSymbol.Scaled("Hz", D.Frequency, 1.0),
        UnitSymbol.Scaled("kHz", D.Frequency, 1e3),
        UnitSymbol.Scaled("MHz", D.Frequency, 1e6),
        UnitSymbol.Scaled("GHz", D.Frequency, 1e9),

        new("g/kg", D.MassFraction, 1e-3, 0.0, v => v / 1e3),
        new("kg/kg", D.MassFraction, 1.0, 0.0, v => v / 1e3 * 1e3),
        new("%", D.MassFraction, 1e-2, 0.0, v => v / 1e2),

        UnitSymbol.Scaled("Gy", D.AbsorbedDose, 1.0),
        UnitSymbol.Scaled("mGy", D.AbsorbedDose, 1e-3),
        UnitSymbol.Scaled("kGy", D.AbsorbedDose, 1e3),
        new("rad", D.AbsorbedDose, 1e-2, 0.0, v => v / 100),
        new("mrad", D.AbsorbedDose, 1e-5, 0.0, v => v / 100 * 1e-3),
        new("krad", D.AbsorbedDose, 10.0, 0.0, v => v / 100 * 1e3),

        UnitSymbol.Scaled("kg/m³", D.Density, 1.0),
        UnitSymbol.Scaled("kg/m^3", D.Density, 1.0),
        new("g/cm³", D.Density, 1e3, 0.0, v => v / 1e-3),
        new("g/cm^3", D.Density, 1e3, 0.0, v => v / 1e-3),

        new("%", D.Dimensionless, 1e-2, 0.0, v => v / 1e2),
    ];

    /// <summary>
    /// Powers were always read in decimal arithmetic (the number rounded to 15 significant digits, scaled exactly, then
    /// back to a double): kept so that every power in an existing scenario reads to the same double. Beyond decimal's
    /// range (7.9e28) the double product is used.
    /// </summary>
    private static UnitSymbol DecimalPower(string symbol, double scaleToSi, decimal decimalScale) =>
        new(symbol, D.Power, scaleToSi, 0.0, v => Math.Abs(v) * Math.Max(scaleToSi, 1.0) < 7.9e27 ? (double)((decimal)v * decimalScale) : v * scaleToSi);

    private static readonly Dictionary<(string, PhysicalDimension), UnitSymbol> ByKey =
        Symbols.ToDictionary(u => (u.Symbol, u.Dimension));

    private static readonly Dictionary<string, UnitSymbol[]> BySymbol =
        Symbols.GroupBy(u => u.Symbol, StringComparer.Ordinal).ToDictionary(g => g.Key, g => g.ToArray(), StringComparer.Ordinal);

    public static IReadOnlyList<UnitSymbol> All => Symbols;

    /// <summary>The unit <paramref name="symbol"/> of <paramref name="dimension"/>, matched exactly (no case folding).</summary>
    public static bool TryFind(string symbol, PhysicalDimension dimension, out UnitSymbol unit) =>
        ByKey.TryGetValue((symbol, dimension), out unit!);

    /// <summary>Every dimension <paramref name="symbol"/> stands for, matched exactly.</summary>
    public static IReadOnlyList<UnitSymbol> WithSymbol(string symbol) =>
        BySymbol.TryGetValue(symbol, out var units) ? units : [];

    /// <summary>The symbols of a dimension, in table order (for messages and the schema).</summary>
    public static IEnumerable<string> SymbolsOf(PhysicalDimension dimension) =>
        Symbols.Where(u => u.Dimension == dimension).Select(u => u.Symbol);

    /// <summary>A symbol that differs from <paramref name="symbol"/> only in case, to suggest in a message ("M" → "m").</summary>
    public static string? CaseNeighbour(string symbol, PhysicalDimension dimension) =>
        Symbols.FirstOrDefault(u => u.Dimension == dimension && string.Equals(u.Symbol, symbol, StringComparison.OrdinalIgnoreCase))?.Symbol;
}
