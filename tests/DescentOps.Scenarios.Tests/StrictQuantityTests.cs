using System.Globalization;
using System.Text.RegularExpressions;
using DescentOps.Primitives.Units;
using DescentOps.Scenarios.Format;

namespace DescentOps.Scenarios.Tests;

/// <summary>Quantities are read one strict way: what could be misread is refused with the reason, at its place.</summary>
public sealed partial class StrictQuantityTests
{
    [Theory]
    [InlineData("  radius: 12 cm", "  radius: 1,5 cm", "probe.radius", "comma")]
    [InlineData("  thickness: 2.5 km", "  thickness: 2,5 km", "shell.thickness", "comma")]
    [InlineData("  length: 3.2 km", "  length: 3 200 m", "tether.length", "grouping")]
    [InlineData("  length: 3.2 km", "  length: 3_200 m", "tether.length", "grouping")]
    [InlineData("  length: 2.4 m", "  length: 2.4 M", "probe.length", "case-sensitive, 'M' is not 'm'")]
    [InlineData("  head_power: 6 kW", "  head_power: 6 kw", "probe.head_power", "case-sensitive, 'kw' is not 'kW'")]
    [InlineData("  radius: 12 cm", "  radius: NaN cm", "probe.radius", "not a finite number")]
    [InlineData("  radius: 12 cm", "  radius: Infinity cm", "probe.radius", "not a finite number")]
    [InlineData("  radius: 12 cm", "  radius: 1e309 cm", "probe.radius", "too large")]
    [InlineData("  until: 400 d", "  until: 1e308 d", "run.until", "too large")]
    [InlineData("  distance_to_ground: 1.08e9 km", "  distance_to_ground: 1e308 km", "body.distance_to_ground", "too large")]
    [InlineData("    remaining_fraction: 0.4", "    remaining_fraction: .nan", "faults[0].remaining_fraction", "not a finite number")]
    [InlineData("    remaining_fraction: 0.4", "    remaining_fraction: 0,4", "faults[0].remaining_fraction", "comma")]
    [InlineData("  seed: 20261202", "  seed: 20,261,202", "run.seed", "comma")]
    public void A_value_that_could_be_misread_is_refused_with_the_reason(string line, string replacement, string field, string reason)
    {
        var text = ScenarioText.DefaultWith(line, replacement);
        var error = MalformedScenarioTests.SingleError(text);
        Assert.Equal(field, error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, replacement.Trim()), error.Location.Line);
        Assert.Contains(reason, error.Message);
    }

    [Theory]
    // Definitions of the units: 1 wk = 7 d = 604800 s; 1 yr = 365 d; 1 au = 149597870700 m (IAU 2012 B2);
    // 1 dbar = 1e4 Pa; 1 rad (dose) = 0.01 Gy; 0 °C = 273.15 K.
    [InlineData(QuantityKind.Duration, "1 wk", 604800.0)]
    [InlineData(QuantityKind.Duration, "2 yr", 63072000.0)]
    [InlineData(QuantityKind.Length, "1 au", 149597870700.0)]
    [InlineData(QuantityKind.Length, "2.5km", 2500.0)]
    [InlineData(QuantityKind.Pressure, "500 dbar", 5e6)]
    [InlineData(QuantityKind.AbsorbedDose, "30 krad", 300.0)]
    [InlineData(QuantityKind.Angle, "180 deg", Math.PI)]
    [InlineData(QuantityKind.Temperature, "0 °C", 273.15)]
    [InlineData(QuantityKind.Ratio, "0.5", 0.5)]
    [InlineData(QuantityKind.Ratio, "50 %", 0.5)]
    public void Units_read_by_their_definitions(QuantityKind kind, string text, double expectedSi)
    {
        Assert.True(QuantityParser.TryParseSi(kind, text, out var si, out var error), error);
        Assert.Equal(expectedSi, si, 1e-12 * Math.Abs(expectedSi));
    }

    /// <summary>
    /// The reference is UnitsNet 5.75.1, the library that read scenario files before our own table: every symbol both
    /// know reads every value of the built-in scenarios and a spread of random values to the very same double, so a
    /// scenario's SI values, and hence its logs, do not move by a bit.
    /// </summary>
    [Fact]
    public void Every_symbol_reads_to_the_double_the_reference_library_reads()
    {
        var culture = CultureInfo.InvariantCulture;
        var numbers = new List<string>();
        foreach (var file in Directory.GetFiles("scenarios", "*.yaml"))
        {
            numbers.AddRange(NumberInScenario().Matches(File.ReadAllText(file)).Select(m => m.Groups[1].Value));
        }

        var random = new Random(20261202);
        for (var i = 0; i < 400; i++)
        {
            numbers.Add(Math.Round(random.NextDouble() * Math.Pow(10, random.Next(-4, 9)), random.Next(0, 7)).ToString("R", culture));
        }

        var compared = 0;
        foreach (var unit in UnitCatalog.All)
        {
            if (ReferenceType(unit.Dimension) is not { } type || unit.Symbol == "degC") continue;
            foreach (var number in numbers.Distinct())
            {
                var text = number + " " + unit.Symbol;
                Assert.True(UnitsNet.Quantity.TryParse(culture, type, text, out UnitsNet.IQuantity? quantity), text);
                Enum target = unit.Dimension == PhysicalDimension.Angle ? UnitsNet.Units.AngleUnit.Radian : quantity!.QuantityInfo.BaseUnitInfo.Value;
                var expected = (double)UnitsNet.UnitConverter.Convert(quantity!.Value, quantity.Unit, target);
                Assert.True(QuantityText.TryParseSi(text, unit.Dimension, "value", out var ours, out var error, unit.Dimension == PhysicalDimension.Dimensionless ? 1.0 : null), error);
                Assert.True(BitConverter.DoubleToInt64Bits(expected) == BitConverter.DoubleToInt64Bits(ours), $"{text}: reference {expected:R}, ours {ours:R}");
                compared++;
            }
        }

        Assert.True(compared > 20_000, $"{compared} comparisons");
    }

    private static Type? ReferenceType(PhysicalDimension dimension) => dimension switch
    {
        PhysicalDimension.Length => typeof(UnitsNet.Length),
        PhysicalDimension.Duration => typeof(UnitsNet.Duration),
        PhysicalDimension.Speed => typeof(UnitsNet.Speed),
        PhysicalDimension.Acceleration => typeof(UnitsNet.Acceleration),
        PhysicalDimension.Temperature => typeof(UnitsNet.Temperature),
        PhysicalDimension.Power => typeof(UnitsNet.Power),
        PhysicalDimension.Energy => typeof(UnitsNet.Energy),
        PhysicalDimension.Angle => typeof(UnitsNet.Angle),
        PhysicalDimension.Pressure => typeof(UnitsNet.Pressure),
        PhysicalDimension.Mass => typeof(UnitsNet.Mass),
        PhysicalDimension.Frequency => typeof(UnitsNet.Frequency),
        PhysicalDimension.MassFraction => typeof(UnitsNet.MassFraction),
        PhysicalDimension.AbsorbedDose => typeof(UnitsNet.AbsorbedDoseOfIonizingRadiation),
        PhysicalDimension.Density => typeof(UnitsNet.Density),
        PhysicalDimension.Dimensionless => typeof(UnitsNet.Ratio),
        _ => null,
    };

    [GeneratedRegex(@":\s*(-?[0-9][0-9.]*(?:e[+-]?[0-9]+)?)\s*[A-Za-z°%]")]
    private static partial Regex NumberInScenario();
}
