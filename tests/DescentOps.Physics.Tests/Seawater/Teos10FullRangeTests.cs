using DescentOps.Physics.Seawater;
using Xunit;
using Xunit.Abstractions;

namespace DescentOps.Physics.Tests.Seawater;

/// <summary>
/// TEOS-10 against the reference library over the whole ocean under a shell: GSW 3.6.16 (Debian python3-gsw),
/// S_A 0–42 g/kg, 0–10000 dbar, freezing point to 40 °C (shared/reference/teos10-seawater-full-range.csv, made by
/// tools/golden/make_teos10_tables.py). Both sides evaluate the same published coefficients, so the tolerances are
/// those of double-precision arithmetic and of the iterations, far below any physical meaning.
/// </summary>
public class Teos10FullRangeTests(ITestOutputHelper output)
{
    private const double K0 = 273.15;
    private static readonly IReadOnlyList<double[]> Rows = GoldenTable.Read("teos10-seawater-full-range.csv");

    [Fact]
    public void Table_covers_fresh_water_and_one_hundred_megapascals()
    {
        Assert.True(Rows.Count > 1500);
        Assert.Contains(Rows, r => r[0] == 0.0 && r[1] == 10000.0 && r[2] == r[9]);
        Assert.Contains(Rows, r => r[0] == 42.0 && r[1] == 10000.0);
        Assert.Contains(Rows, r => r[2] < -10.0); // water at its freezing point under 100 MPa
    }

    [Fact]
    public void Freezing_temperature_matches_the_library()
    {
        var worst = 0.0;
        foreach (var r in Rows)
        {
            var tf = Teos10Seawater.FreezingTemperatureK(r[0], r[1] * 1e4);
            worst = Math.Max(worst, Math.Abs(tf - (r[9] + K0)));
            Approx.Abs(r[9] + K0, tf, 1e-8, $"t_freezing S_A {r[0]}, p {r[1]}");
            Approx.Abs(r[10] + K0, FreezingTemperature.ConservativeK(r[0], r[1] * 1e4), 1e-8, $"CT_freezing S_A {r[0]}, p {r[1]}");
        }

        output.WriteLine($"freezing temperature: worst difference {worst:E2} K over {Rows.Count} states");
    }

    [Fact]
    public void Conservative_and_potential_temperature_match_the_library()
    {
        foreach (var r in Rows)
        {
            var state = Teos10Seawater.At(r[0], r[1] * 1e4, r[2] + K0);
            Approx.Abs(r[3] + K0, state.ConservativeTemperatureK, 1e-8, $"CT S_A {r[0]}, t {r[2]}, p {r[1]}");
            Approx.Abs(r[4] + K0, state.PotentialTemperatureK, 1e-8, $"pt0 S_A {r[0]}, t {r[2]}, p {r[1]}");
            Approx.Abs(r[2] + K0, ConservativeTemperature.ToInSituK(r[0], state.ConservativeTemperatureK, r[1] * 1e4), 1e-8, $"t from CT S_A {r[0]}, t {r[2]}, p {r[1]}");
        }
    }

    [Fact]
    public void Gibbs_function_density_and_sound_speed_match_the_library()
    {
        foreach (var r in Rows)
        {
            var state = Teos10Seawater.At(r[0], r[1] * 1e4, r[2] + K0);
            Approx.Rel(r[5], state.DensityKgPerM3, 1e-12, $"rho_t_exact S_A {r[0]}, t {r[2]}, p {r[1]}");
            Approx.Rel(r[6], state.SoundSpeedMPerS, 1e-11, $"sound_speed_t_exact S_A {r[0]}, t {r[2]}, p {r[1]}");
        }
    }

    [Fact]
    public void Polynomial_density_and_sound_speed_match_the_library()
    {
        double worstRho = 0, worstC = 0, fitRho = 0, fitC = 0;
        foreach (var r in Rows)
        {
            var state = Teos10Seawater.At(r[0], r[1] * 1e4, r[2] + K0);
            Approx.Rel(r[7], state.PolynomialDensityKgPerM3, 1e-11, $"rho S_A {r[0]}, t {r[2]}, p {r[1]}");
            Approx.Rel(r[8], state.PolynomialSoundSpeedMPerS, 1e-10, $"sound_speed S_A {r[0]}, t {r[2]}, p {r[1]}");
            worstRho = Math.Max(worstRho, Math.Abs(state.PolynomialDensityKgPerM3 - r[7]));
            worstC = Math.Max(worstC, Math.Abs(state.PolynomialSoundSpeedMPerS - r[8]));
            fitRho = Math.Max(fitRho, Math.Abs(r[7] - r[5]));
            fitC = Math.Max(fitC, Math.Abs(r[8] - r[6]));
        }

        output.WriteLine($"75-term vs library: density {worstRho:E2} kg/m³, sound speed {worstC:E2} m/s; the fit itself vs the Gibbs function: {fitRho:F4} kg/m³, {fitC:F3} m/s");
    }

    [Fact]
    public void Polynomial_stays_close_to_the_Gibbs_function_over_the_range()
    {
        // Roquet et al. (2015) fitted the 75-term polynomial to the Gibbs function; the library's own pair of values shows
        // how far apart they are over this grid (fresh water at 100 MPa near freezing is the worst corner). The bound is
        // the table's largest gap rounded up, so a slip in either implementation would still show.
        foreach (var r in Rows)
        {
            var state = Teos10Seawater.At(r[0], r[1] * 1e4, r[2] + K0);
            Approx.Abs(state.DensityKgPerM3, state.PolynomialDensityKgPerM3, (MaxGap(5, 7) * 1.001) + 1e-9, $"S_A {r[0]}, t {r[2]}, p {r[1]}");
            Approx.Abs(state.SoundSpeedMPerS, state.PolynomialSoundSpeedMPerS, (MaxGap(6, 8) * 1.001) + 1e-9, $"S_A {r[0]}, t {r[2]}, p {r[1]}");
        }
    }

    [Fact]
    public void The_standard_ocean_is_the_reference_state_of_TEOS10()
    {
        // IOC, SCOR and IAPSO (2010), section 2.6: specific enthalpy and entropy of Standard Seawater are zero at
        // S_A = 35.16504 g/kg, t = 0 °C and p = 0 (sea pressure); hence its Conservative Temperature is 0 °C. The published
        // coefficients are rounded to 15 digits, which leaves h at −3.3e-4 J/kg (8e-8 K of Θ) and s at −1.2e-6 J/(kg K): the tolerances say so.
        var g = SeawaterGibbsFunction.Evaluate(35.16504, K0, 0.0);
        Approx.Abs(0.0, g.EnthalpyJPerKg, 1e-3, "h");
        Approx.Abs(0.0, g.EntropyJPerKgK, 2e-6, "s (−1.2e-6 J/(kg K) from the same rounding)");
        Approx.Abs(K0, ConservativeTemperature.FromInSituK(35.16504, K0, 0.0), 1e-6, "CT");
    }

    [Fact]
    public void Fresh_water_freezes_at_the_normal_melting_point_of_ice()
    {
        // IAPWS R10-06 (2009), Table 6: ice Ih melts at 273.152519 K under 101325 Pa absolute, i.e. zero sea pressure; with
        // the pure-water part of TEOS-10 the air-free freezing point of fresh water must land there (to the table's 6 decimals).
        Approx.Abs(273.152519, Teos10Seawater.FreezingTemperatureK(0.0, 0.0), 1e-6, "fresh water at 0 dbar");
    }

    [Fact]
    public void Colder_than_freezing_is_refused_with_its_range()
    {
        var freezing = Teos10Seawater.FreezingTemperatureK(35.16504, 24.2e6);
        var refusal = Assert.Throws<ModelRangeException>(() => Teos10Seawater.At(35.16504, 24.2e6, freezing - 0.01));
        Assert.Equal("temperature", refusal.Range.Quantity);
        Assert.Equal(freezing, refusal.Range.Minimum);
        Assert.Contains("TEOS-10", refusal.Sentence, StringComparison.Ordinal);
        Assert.Throws<ModelRangeException>(() => Teos10Seawater.FreezingTemperatureK(35.0, 100.1e6));
        Assert.Throws<ModelRangeException>(() => Teos10Seawater.FreezingTemperatureK(42.5, 0.0));
    }

    private static double MaxGap(int exact, int polynomial) => Rows.Max(r => Math.Abs(r[exact] - r[polynomial]));
}
