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
    private static readonly UnitDefinition[] Definitions =
    [
        .. UnitCatalog.All
            .Where(u => RuleDimension(u.Dimension) is not null)
            .Select(u => new UnitDefinition(u.Symbol, RuleDimension(u.Dimension)!.Value, u.ScaleToSi, u.OffsetToSi)),
    ];

    /// <summary>The rule language's dimension for a catalogue dimension, or null for those no point or argument has.</summary>
    private static Dimension? RuleDimension(PhysicalDimension dimension) => dimension switch
    {
        PhysicalDimension.Dimensionless => Dimension.Dimensionless,
        PhysicalDimension.Length => Dimension.Length,
        PhysicalDimension.Duration => Dimension.Duration,
        PhysicalDimension.Speed => Dimension.Speed,
        PhysicalDimension.Temperature => Dimension.Temperature,
        PhysicalDimension.Power => Dimension.Power,
        PhysicalDimension.Energy => Dimension.Energy,
        PhysicalDimension.Angle => Dimension.Angle,
        PhysicalDimension.Voltage => Dimension.Voltage,
        PhysicalDimension.Current => Dimension.Current,
        PhysicalDimension.Pressure => Dimension.Pressure,
        PhysicalDimension.Mass => Dimension.Mass,
        PhysicalDimension.Frequency => Dimension.Frequency,
        _ => null,
    };

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
