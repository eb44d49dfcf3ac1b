using DescentOps.Primitives.Units;

namespace DescentOps.Rules.Units;

/// <summary>
/// The unit symbols rule text may use: those of the shared <see cref="UnitCatalog"/> (the table scenario files and the
/// command line read) whose dimension a telemetry point or command argument can have. Rule text must resolve a unit
/// without knowing what it is for, and the catalogue gives every symbol one meaning per dimension ("m" is a metre,
/// never a minute; "rad" is an angle here, as rules have no doses). Rates are built from any unit over any time unit
/// ("kW/min", "K/h"), and a temperature rate is a difference. Symbols are case-sensitive ("mW" is a milliwatt, "MW"
/// a megawatt).
/// </summary>
public static class UnitTable
{
    /// <summary>The dimensions a telemetry point or command argument can have; the catalogue's others (doses, densities, ...) are not rule units.</summary>
    private static readonly HashSet<PhysicalDimension> RuleDimensions =
    [
        PhysicalDimension.Dimensionless, PhysicalDimension.Length, PhysicalDimension.Duration, PhysicalDimension.Speed,
        PhysicalDimension.Temperature, PhysicalDimension.Power, PhysicalDimension.Energy, PhysicalDimension.Angle,
        PhysicalDimension.Voltage, PhysicalDimension.Current, PhysicalDimension.Pressure, PhysicalDimension.Mass,
        PhysicalDimension.Frequency,
    ];

    private static readonly UnitSymbol[] Definitions = [.. UnitCatalog.All.Where(u => RuleDimensions.Contains(u.Dimension))];

    private static readonly Dictionary<string, UnitSymbol> BySymbol = Definitions.ToDictionary(d => d.Symbol, StringComparer.Ordinal);

    public static IReadOnlyList<UnitSymbol> All => Definitions;

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

        if (!BySymbol.TryGetValue(unit[(slash + 1)..], out var time) || time.Dimension != PhysicalDimension.Duration)
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

    /// <summary>The coherent SI unit of a dimension ("W", "m/s", "K"), or "" for a dimensionless number.</summary>
    public static string SiSymbol(PhysicalDimension dimension) =>
        dimension == PhysicalDimension.Dimensionless
            ? ""
            : Definitions.FirstOrDefault(d => d.Dimension == dimension && d.ScaleToSi == 1.0 && d.OffsetToSi == 0.0)?.Symbol ?? "";

    /// <summary>A unit to suggest in messages for a dimension.</summary>
    public static string Example(QuantityDimension dimension)
    {
        var normalized = dimension.Normalized;
        if (normalized.Base == PhysicalDimension.Speed && !normalized.PerSecond)
        {
            return "m/h";
        }

        var symbol = Definitions.FirstOrDefault(d => d.Dimension == normalized.Base)?.Symbol ?? "";
        return normalized.PerSecond ? symbol + "/h" : symbol;
    }
}
