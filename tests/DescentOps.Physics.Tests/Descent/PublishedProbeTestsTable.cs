using DescentOps.Physics.Descent;
using Xunit;
using Xunit.Abstractions;

namespace DescentOps.Physics.Tests.Descent;

/// <summary>
/// The steady descent model against published tests of thermal melt probes. No parameter of the model is fitted to
/// this table: the physics is the reference note's (IAPWS ice, k = 651/T, close-contact melting after Shreve 1962 and
/// Moallemi et al. 1986 bounded by boiling, lateral loss after Aamot 1967), and each row takes only what its source
/// states. Where a source gives no mass, the laboratory default of <c>physics descent</c> is used (2000 kg/m³ · πR²ℓ, a
/// rule of thumb). Goal: every case within 25 %.
/// </summary>
/// <remarks>
/// Found with the search tool (abstracts and report summaries; the full texts were not available):
/// <list type="bullet">
/// <item>Philberth (1976), in Ice-Core Drilling (ed. Splettstoesser), 117-131: two probes, full inputs (rows below).</item>
/// <item>Gillet, Rado, Marec, Maitre, Perrin and Ricou (1984), Proc. Second International Workshop/Symposium on Ice
/// Drilling Technology, CRREL Special Report 84-34, 95-99: a 43 mm hot point with 2250 W on the head, 5-8 m/h in a
/// fluid-filled hole. The ice temperature is not stated, so the model is run at both ends of the range of deep polar
/// drilling sites (218 K and 253 K, an assumption) and both must land within 25 % of the middle of the measured range.</item>
/// </list>
/// Further published tests found give a power and a speed or an efficiency but not the diameter (Colgan et al. 2023,
/// Geosci. Instrum. Method. Data Syst. 12, 121: 35 % laboratory and 15 % field efficiency at 6 kW; Heinen et al. 2021,
/// Ann. Glaciol.: 8.8 cm³/(W h) against an ideal 10.5-11.8; Winebrenner et al. 2014, AGU Fall Meeting: 2.2 kW for 400 m
/// in some 120 h and 8 m/h at 4.5 kW; LaChapelle 1963, J. Glaciol. 4(35): 5-6 m/h at 220 W in temperate ice; do Vale
/// Pereira et al., laboratory probes in 79 K ice under vacuum and in 253 K ice: 5.3-59 cm/h at 120-1135 W), a diameter
/// and speed but no power (Gillet 1975, J. Glaciol. 14(70): 25 mm holes at 15 m/h and more in temperate ice), or a
/// diameter and length but no power or speed (Philberth 1972, CRREL TL 373: about 10 cm by 2 m). The model's head
/// efficiency depends on the diameter (0.37 to 0.92 at 2 kW in temperate ice for radii of 2 to 8 cm), so none of them
/// can be run without inventing the missing input; they are listed here, not in the table. The table therefore holds
/// three published tests (four rows), short of the five the issue asks for.
/// </remarks>
public class PublishedProbeTestsTable(ITestOutputHelper output)
{
    public static TheoryData<string, double, double, double, double, double> Cases => new()
    {
        // Philberth (1976): probes of 10.8 cm diameter, about 2.5 m (probe II) and 3 m (probe I) long, 3.7 kW maximum
        // power, 2 m/h; ice -29 to -30 °C after cooling (we take -29 °C). The probe is filled with a dielectric fluid
        // that carries the heater's heat to the whole body (its published description), so the side is paid from the
        // heater before the head melts ahead (headHeatsBody).
        { "Philberth 1976, probe II", 0.054, 2.5, 3700.0, 244.15, 2.0 },
        { "Philberth 1976, probe I", 0.054, 3.0, 3700.0, 244.15, 2.0 },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Model_speed_against_measured_speed(string source, double radiusM, double lengthM, double powerW, double iceK, double measuredMPerH)
    {
        var geometry = new ProbeGeometry(radiusM, lengthM, 2000.0 * Math.PI * radiusM * radiusM * lengthM);
        var s = SteadyDescent.Solve(geometry, powerW, 0.0, iceK, 101325.0, 9.80665, null, SteadyDescent.DefaultDesignGapM, headHeatsBody: true);
        var modelMPerH = s.VelocityMPerS * 3600.0;
        var error = (modelMPerH - measuredMPerH) / measuredMPerH;
        output.WriteLine(FormattableString.Invariant($"{source}: measured {measuredMPerH:F2} m/h, model {modelMPerH:F2} m/h, error {error:+0.0%;-0.0%}"));
        Assert.False(s.Side!.Held);
        Assert.InRange(error, -0.25, 0.25);
    }

    [Theory]
    [InlineData(218.15)]
    [InlineData(253.15)]
    public void Hot_point_in_a_fluid_filled_hole(double iceK)
    {
        // Gillet et al. (1984): 43 mm, 2250 W on the head, 5-8 m/h. A hot point on a cable in a hole kept open by its
        // fluid: no wall heat, and whether the side refreezes does not matter; the head's speed does not depend on the
        // body's length, only on the load, for which the laboratory default of a 2 m body stands in (an assumption).
        const double radiusM = 0.0215, lengthM = 2.0, powerW = 2250.0, measuredMPerH = 6.5;
        var geometry = new ProbeGeometry(radiusM, lengthM, 2000.0 * Math.PI * radiusM * radiusM * lengthM);
        var s = SteadyDescent.Solve(geometry, powerW, 0.0, iceK, 101325.0, 9.80665);
        var modelMPerH = s.VelocityMPerS * 3600.0;
        var error = (modelMPerH - measuredMPerH) / measuredMPerH;
        output.WriteLine(FormattableString.Invariant($"Gillet et al. 1984 at {iceK} K (assumed): measured 5-8 m/h (middle {measuredMPerH:F2}), model {modelMPerH:F2} m/h, error {error:+0.0%;-0.0%}"));
        Assert.InRange(error, -0.25, 0.25);
    }
}
