using System.Globalization;
using System.Text.Json;
using DescentOps.Mission.Probe;
using DescentOps.Physics.Descent;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;
using MathNet.Numerics;

namespace DescentOps.Mission.Tests;

/// <summary>
/// <c>descentops physics ...</c> as a script meets it: the JSON field names, values against published check values
/// or an independent computation (the source is named beside each number), and refusals with exit codes.
/// </summary>
public sealed class PhysicsCommandTests
{
    private const double SpeedOfLightMPerS = 299_792_458.0;

    // ---- ice ----

    [Fact]
    public async Task Ice_matches_the_IAPWS_R1006_check_values_at_the_triple_point()
    {
        var ice = await JsonAsync("ice", "--temperature", "273.16 K", "--pressure", "611.657 Pa");
        AssertFields(ice, "temperature_k", "pressure_pa", "density_kg_m3", "heat_capacity_j_kg_k", "thermal_conductivity_w_m_k", "melting_temperature_k", "sublimation_pressure_pa");
        // IAPWS R10-06(2009) Table 6, T = 273.16 K, p = 611.657 Pa: ρ = 916.709492200 kg/m³, c_p = 2096.78431622 J/(kg·K).
        // (The often-quoted 916.72 kg/m³ is the same table's row at 101325 Pa, checked below.)
        AssertRelative(916.709492200, Number(ice, "density_kg_m3"), 1e-9);
        AssertRelative(2096.78431622, Number(ice, "heat_capacity_j_kg_k"), 1e-9);
        // The triple point is on both curves of IAPWS R14-08: T_m(p_t) = 273.16 K and p_subl(T_t) = 611.657 Pa.
        AssertRelative(273.16, Number(ice, "melting_temperature_k"), 1e-12);
        AssertRelative(611.657, Number(ice, "sublimation_pressure_pa"), 1e-9);
        // Andersson and Inaba (2005) fit k = 632/T + 0.38 − 0.00197·T, evaluated by hand at 273.16 K.
        AssertRelative((632.0 / 273.16) + 0.38 - (0.00197 * 273.16), Number(ice, "thermal_conductivity_w_m_k"), 1e-12);
    }

    [Fact]
    public async Task Ice_matches_the_IAPWS_R1006_check_values_at_the_normal_melting_point_and_under_high_pressure()
    {
        // IAPWS R10-06 Table 6, T = 273.152519 K, p = 101325 Pa: ρ = 916.721463419 kg/m³, c_p = 2096.71391024 J/(kg·K).
        var normal = await JsonAsync("ice", "--temperature", "273.152519 K", "--pressure", "101325 Pa");
        AssertRelative(916.721463419, Number(normal, "density_kg_m3"), 1e-9);
        AssertRelative(2096.71391024, Number(normal, "heat_capacity_j_kg_k"), 1e-9);
        // The same table's temperature is the normal melting point of R10-06 with IAPWS-95; the R14-08 melting
        // curve, a separate correlation, reproduces it to its stated uncertainty (a few mK).
        Assert.Equal(273.152519, Number(normal, "melting_temperature_k"), 3e-3);

        // IAPWS R10-06 Table 6, T = 100 K, p = 100 MPa: ρ = 941.678203297 kg/m³, c_p = 866.333195517 J/(kg·K).
        var cold = await JsonAsync("ice", "--temperature", "100 K", "--pressure", "100 MPa");
        AssertRelative(941.678203297, Number(cold, "density_kg_m3"), 1e-9);
        AssertRelative(866.333195517, Number(cold, "heat_capacity_j_kg_k"), 1e-9);
    }

    [Fact]
    public async Task Ice_phase_boundaries_match_the_IAPWS_R1408_check_values()
    {
        // IAPWS R14-08(2011) Table 3 (check values): ice Ih melts at 260 K under p = 138.268 MPa, and the
        // sublimation pressure at 230 K is 8.94735 Pa. The pressure is given to 1 kPa, which moves T_m by < 1e-4 K.
        var ice = await JsonAsync("ice", "--temperature", "230 K", "--pressure", "138.268 MPa");
        Assert.Equal(260.0, Number(ice, "melting_temperature_k"), 2e-4);
        AssertRelative(8.94735, Number(ice, "sublimation_pressure_pa"), 1e-5);
    }

    [Fact]
    public async Task Ice_below_the_triple_point_pressure_has_no_melting_temperature()
    {
        // No liquid exists below 611.657 Pa: the answer is null, not an error and not an extrapolated number.
        var ice = await JsonAsync("ice", "--temperature", "120 K", "--pressure", "0 Pa");
        Assert.Equal(JsonValueKind.Null, ice.GetProperty("melting_temperature_k").ValueKind);
        Assert.True(Number(ice, "density_kg_m3") > 920.0); // cold ice is denser than at its melting point (R10-06)
    }

    // ---- descent ----

    [Fact]
    public async Task Descent_power_breakdown_sums_to_the_power_in()
    {
        var d = await JsonAsync("descent", "--radius", "12 cm", "--length", "2.4 m", "--head-power", "6 kW", "--wall-power", "3 kW",
            "--temperature", "200 K", "--pressure", "1 MPa", "--mass", "210 kg", "--gravity", "1.0 m/s^2");
        AssertFields(d, "velocity_m_s", "sensible_w", "latent_w", "lateral_loss_w", "wall_surplus_w", "power_in_w");
        var sinks = Number(d, "sensible_w") + Number(d, "latent_w") + Number(d, "lateral_loss_w") + Number(d, "wall_surplus_w");
        Assert.Equal(9000.0, Number(d, "power_in_w"));
        AssertRelative(9000.0, sinks, 1e-8); // DescentSolution's contract: to the head fixed point's 1e-9
        Assert.InRange(Number(d, "velocity_m_s"), 1e-5, Number(d, "ideal_velocity_m_s"));
    }

    [Fact]
    public async Task Descent_latent_power_is_the_melt_rate_times_the_published_latent_heat()
    {
        // Just above the triple-point pressure (at p_t itself water boils at its melting point, so the boiling-bounded
        // film cannot melt at all: issue 12), at 1 kPa. Independent pieces: the ice density at the far-field state from
        // the ice subcommand (R10-06), and the latent heat of fusion at the triple point, 333 426.5 J/kg (Feistel and
        // Wagner 2006, from R10-06 with IAPWS-95), i.e. latent_w = ρ·πR²·v·L. Between p_t and 1 kPa the melting point
        // moves by 3e-5 K (Clapeyron slope -7.4e-8 K/Pa) and L by far less than 1 J/kg, well inside the 5e-4 tolerance.
        string[] state = ["--temperature", "250 K", "--pressure", "1 kPa"];
        var d = await JsonAsync(["descent", "--radius", "10 cm", "--length", "2 m", "--head-power", "4 kW", "--wall-power", "2 kW", .. state]);
        var rho = Number(await JsonAsync(["ice", .. state]), "density_kg_m3");
        var meltRateKgPerS = rho * Math.PI * 0.1 * 0.1 * Number(d, "velocity_m_s");
        Assert.True(meltRateKgPerS > 0);
        AssertRelative(333_426.5, Number(d, "latent_w") / meltRateKgPerS, 5e-4);
        // Sensible over latent is the Stefan number, which the refreeze subcommand reports for the same ice.
        var meltingK = Number(d, "melting_temperature_k").ToString("R", CultureInfo.InvariantCulture) + " K";
        var refreeze = await JsonAsync("refreeze", "--gap", "1 mm", "--temperature", "250 K", "--melting-temperature", meltingK);
        AssertRelative(Number(refreeze, "stefan_number"), Number(d, "sensible_w") / Number(d, "latent_w"), 1e-6);
    }

    [Fact]
    public async Task A_descent_with_too_little_power_stalls_and_loses_everything_sideways()
    {
        var d = await JsonAsync("descent", "--radius", "12 cm", "--length", "2.4 m", "--head-power", "50 W", "--temperature", "100 K", "--pressure", "1 MPa");
        Assert.True(d.GetProperty("stalled").GetBoolean());
        Assert.Equal(0.0, Number(d, "velocity_m_s"));
        Assert.Equal(50.0, Number(d, "lateral_loss_w"));
    }

    // ---- refreeze ----

    [Fact]
    public async Task Refreeze_front_constant_solves_the_Neumann_equation_and_time_goes_as_the_gap_squared()
    {
        var r = await JsonAsync("refreeze", "--gap", "0.5 mm", "--temperature", "200 K");
        AssertFields(r, "stefan_number", "front_constant", "freeze_time_s");
        var ste = Number(r, "stefan_number");
        var lambda = Number(r, "front_constant");
        // Carslaw and Jaeger (1959) §11.2, liquid at T_m freezing onto ice at T∞: λ√π·exp(λ²)·(1 + erf λ) = Ste.
        AssertRelative(ste, lambda * Math.Sqrt(Math.PI) * Math.Exp(lambda * lambda) * (1.0 + SpecialFunctions.Erf(lambda)), 1e-9);
        // s = 2λ√(κt): with the same ice, twice the gap takes four times as long.
        var wide = await JsonAsync("refreeze", "--gap", "1 mm", "--temperature", "200 K");
        AssertRelative(4.0 * Number(r, "freeze_time_s"), Number(wide, "freeze_time_s"), 1e-9);
    }

    [Fact]
    public async Task Refreeze_Stefan_number_is_the_integrated_heat_capacity_over_the_latent_heat()
    {
        // Independent: Ste = ∫c_p dT / L from 200 K to 273.16 K, with c_p from the ice subcommand (R10-06) by
        // Simpson's rule on four intervals, and L = 333 426.5 J/kg at the triple point (Feistel and Wagner 2006).
        var r = await JsonAsync("refreeze", "--gap", "1 mm", "--temperature", "200 K", "--melting-temperature", "273.16 K");
        const int intervals = 4;
        var h = (273.16 - 200.0) / intervals;
        var integral = 0.0;
        for (var i = 0; i <= intervals; i++)
        {
            var t = 200.0 + (i * h);
            var cp = Number(await JsonAsync("ice", "--temperature", t.ToString("R", CultureInfo.InvariantCulture) + " K", "--pressure", "611.657 Pa"), "heat_capacity_j_kg_k");
            integral += (i == 0 || i == intervals ? 1.0 : (i % 2 == 1 ? 4.0 : 2.0)) * cp;
        }

        AssertRelative(integral * h / 3.0 / 333_426.5, Number(r, "stefan_number"), 1e-3);
    }

    [Fact]
    public async Task Refreeze_around_a_probe_states_its_geometry_and_a_thin_gap_freezes_as_the_planar_variable_property_front()
    {
        // A 0.1 mm gap around a 5 cm probe is nearly flat (gap/R = 0.002), so with no earlier exposure the cylinder's time
        // must approach the planar front it reports: s = 2λ′√t reaching the gap, t = (w/2λ′)² (computed here).
        var r = await JsonAsync("refreeze", "--geometry", "cylinder", "--radius", "5 cm", "--gap", "0.1 mm", "--temperature", "200 K");
        Assert.Equal("cylinder", r.GetProperty("geometry").GetString());
        AssertFields(r, "stefan_number", "front_constant", "variable_property_front_m_per_root_s", "freeze_time_s");
        var front = Number(r, "variable_property_front_m_per_root_s");
        var planarS = Math.Pow(0.1e-3 / (2.0 * front), 2);
        AssertRelative(planarS, Number(r, "freeze_time_s"), 0.02);
        // The planar geometry has no variable-property field: it is the constant-property Neumann case.
        var planar = await JsonAsync("refreeze", "--gap", "0.1 mm", "--temperature", "200 K");
        Assert.False(planar.TryGetProperty("variable_property_front_m_per_root_s", out _));
    }

    // ---- crossing ----

    [Fact]
    public async Task Crossing_agrees_with_an_independent_quadrature_and_with_the_simulators_breakthrough()
    {
        // A fault-free copy of the default scenario: the simulated probe then runs at full power all the way.
        var text = MissionHarness.DefaultText;
        var faults = text.IndexOf("faults:", StringComparison.Ordinal);
        var run = text.IndexOf("run:", StringComparison.Ordinal);
        Assert.True(faults > 0 && run > faults);
        text = text[..faults] + "faults: []\n\n" + text[run..];
        var folder = ToolProcess.NewTempDirectory();
        var path = Path.Combine(folder, "nofault.yaml");
        await File.WriteAllTextAsync(path, text);

        var c = await JsonAsync("crossing", path);
        AssertFields(c, "time_s", "energy_j", "regimes");
        var time = Number(c, "time_s");
        var regimes = c.GetProperty("regimes");
        var sublimating = Number(regimes, "sublimating");
        var melting = Number(regimes, "melting");
        Assert.True(sublimating > 0 && melting > sublimating); // the airless surface: a few metres of sublimation first
        AssertRelative(time, sublimating + melting, 1e-12);
        var scenario = ScenarioLoader.LoadText(text, "nofault.yaml");
        var p = scenario.Probe;
        AssertRelative((p.HeadPowerW + p.WallPowerW + p.ElectronicsPowerW) * time, Number(c, "energy_j"), 1e-12);

        // Independent quadrature of the same model: midpoint rule on 1/v, in about 0.25 m steps on each side of the
        // liquid-onset depth, where the speed jumps from sublimating to melting.
        var model = ProbeDescentFactory.Model(scenario);
        var midpoint = Midpoint(model, 0.0, model.LiquidOnsetDepthM) + Midpoint(model, model.LiquidOnsetDepthM, scenario.Shell.ThicknessM);
        double Midpoint(ProbeDescentModel m, double top, double bottom)
        {
            var steps = (int)Math.Ceiling((bottom - top) / 0.25);
            var h = (bottom - top) / steps;
            var sum = 0.0;
            for (var i = 0; i < steps; i++) sum += h / m.Rate(top + ((i + 0.5) * h), p.HeadPowerW, p.WallPowerW).VelocityMPerS;
            return sum;
        }

        AssertRelative(midpoint, time, 1e-4);

        // The simulator holds each speed for one telemetry interval; its breakthrough lands within 0.1 % of the integral.
        var (summary, _) = await MissionHarness.RunAsync(scenario);
        Assert.NotNull(summary.BreakthroughTimeS);
        AssertRelative(time, summary.BreakthroughTimeS!.Value, 1e-3);
    }

    [Fact]
    public async Task Crossing_uses_the_same_model_as_the_probe()
    {
        var scenario = BuiltInScenarios.Default();
        var c = await JsonAsync("crossing", BuiltInScenarios.DefaultName);
        var direct = ShellCrossing.Integrate(ProbeDescentFactory.Model(scenario), scenario.Probe.HeadPowerW, scenario.Probe.WallPowerW);
        Assert.Equal(direct.TimeS, Number(c, "time_s"));
        Assert.Equal(ProbeDescentFactory.Model(scenario).LiquidOnsetDepthM, Number(c, "liquid_onset_depth_m"));
    }

    [Fact]
    public async Task A_probe_that_cannot_melt_has_no_crossing_time()
    {
        var text = TestScenario.Of(MissionHarness.DefaultText, "weak.yaml").Set("probe.head_power", "20 W").Set("probe.wall_power", "0 W").Text;
        var path = Path.Combine(ToolProcess.NewTempDirectory(), "weak.yaml");
        await File.WriteAllTextAsync(path, text);
        var c = await JsonAsync("crossing", path);
        Assert.Equal(JsonValueKind.Null, c.GetProperty("time_s").ValueKind);
        Assert.True(Number(c, "stall_depth_m") >= 0);
    }

    // ---- seawater ----

    [Fact]
    public async Task Seawater_freezing_point_matches_the_UNESCO1983_check_value()
    {
        // UNESCO (1983) Tech. Pap. Mar. Sci. 44, freezing point check value: S = 40, p = 500 dbar → −2.588567 °C.
        var w = await JsonAsync("seawater", "--salinity", "40", "--pressure", "500 dbar", "--temperature", "0 °C", "--standard", "eos-80");
        AssertFields(w, "freezing_temperature_k", "sound_speed_m_s", "density_kg_m3");
        Assert.Equal(273.15 - 2.588567, Number(w, "freezing_temperature_k"), 1e-6);
    }

    [Fact]
    public async Task Seawater_density_matches_the_EOS80_check_value_and_salinity_units_agree()
    {
        // EOS-80 check values (Millero and Poisson 1981, UNESCO 1983): ρ(S = 35, t68 = 5 °C, p = 0) = 1027.67547 kg/m³.
        // The formula is on IPTS-68: 5 °C there is 5/1.00024 °C on ITS-90 (Saunders 1990).
        var t90 = (273.15 + (5.0 / 1.00024)).ToString("R", CultureInfo.InvariantCulture) + " K";
        var psu = await JsonAsync("seawater", "--salinity", "35 psu", "--pressure", "0 Pa", "--temperature", t90, "--standard", "eos-80");
        Assert.Equal(1027.67547, Number(psu, "density_kg_m3"), 1e-5);
        // 35.16504 g/kg of reference-composition seawater is practical salinity 35 (TEOS-10 reference ratio).
        var gPerKg = await JsonAsync("seawater", "--salinity", "35.16504 g/kg", "--pressure", "0 Pa", "--temperature", t90, "--standard", "eos-80");
        AssertRelative(35.0, Number(gPerKg, "practical_salinity"), 1e-12);
        AssertRelative(Number(psu, "density_kg_m3"), Number(gPerKg, "density_kg_m3"), 1e-12);
    }

    [Fact]
    public async Task Seawater_sound_speed_matches_the_Mackenzie1981_check_value()
    {
        // Mackenzie (1981), J. Acoust. Soc. Am. 70(3), check value: T = 25 °C, S = 35, D = 1000 m → 1550.744 m/s.
        var w = await JsonAsync("seawater", "--salinity", "35", "--pressure", "0 Pa", "--temperature", "25 °C", "--terrestrial-depth", "1000 m", "--standard", "eos-80");
        Assert.Equal(1550.744, Number(w, "sound_speed_mackenzie_m_s"), 1e-3);
        // Chen-Millero at the surface, same water: the two formulas agree within Mackenzie's own depth term, 16.3 m/s per km.
        Assert.Equal(1550.744 - 16.3, Number(w, "sound_speed_m_s"), 1.0);
    }

    [Fact]
    public async Task Seawater_by_TEOS10_answers_at_the_freezing_point_under_one_hundred_megapascals()
    {
        // GSW 3.6.16 (Debian python3-gsw), gsw.t_freezing(35.16504, 2420, 0) = −3.8226 °C (project note links-power-ocean SW-7)
        // and gsw.t_freezing(0, 10000, 0) = −8.951978831 °C; gsw.rho_t_exact and gsw.sound_speed_t_exact at that point.
        var w = await JsonAsync("seawater", "--salinity", "35.16504 g/kg", "--pressure", "2420 dbar");
        AssertFields(w, "freezing_temperature_k", "sound_speed_m_s", "density_kg_m3", "conservative_temperature_k");
        Assert.Equal(273.15 - 3.8226, Number(w, "freezing_temperature_k"), 1e-4);
        Assert.Equal(Number(w, "freezing_temperature_k"), Number(w, "temperature_k"), 12);
        var fresh = await JsonAsync("seawater", "--salinity", "0", "--pressure", "100 MPa");
        Assert.Equal(273.15 - 8.951978831383515, Number(fresh, "freezing_temperature_k"), 1e-8);
        var (exit, _, stderr) = await RunAsync("seawater", "--salinity", "35", "--pressure", "100 MPa", "--temperature", "-11 °C", "--json");
        Assert.Equal(3, exit); // ExitCode.InvalidInput: colder than its freezing point
        Assert.Contains("--temperature: temperature = 262.15 K is outside the valid range [", stderr, StringComparison.Ordinal);
        Assert.Contains("TEOS-10", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Jets_answer_hole_radius_speed_and_freeze_back()
    {
        // Reference note §4.6, PRB-10: 5 kW of jet heat, η 0.8, 1 m/h, 250 K ice (melting at 273.15 K) → R_h = 0.11450 m.
        var j = await JsonAsync("jets", "--power", "5 kW", "--speed", "1 m/h", "--temperature", "250 K", "--melting-temperature", "273.15 K",
            "--probe-radius", "10 cm", "--probe-length", "2 m", "--efficiency", "0.8", "--pump-power", "300 W");
        AssertFields(j, "hole_radius_m", "speed_m_s", "clearance_m", "freeze_back_time_s");
        Assert.Equal(0.11450, Number(j, "hole_radius_m"), 2e-4);
        Assert.Equal(Number(j, "hole_radius_m") - 0.1, Number(j, "clearance_m"), 12);
        Assert.True(Number(j, "freeze_back_time_s") > 0);
    }

    // ---- acoustic ----

    [Fact]
    public async Task Acoustic_loss_and_margin_follow_the_sonar_equation()
    {
        var a = await JsonAsync("acoustic", "--frequency", "10 kHz", "--range", "2 km", "--temperature", "0 °C", "--salinity", "35", "--depth", "100 m",
            "--source-level", "180 dB", "--noise-level", "60", "--detection-threshold", "10");
        AssertFields(a, "absorption_db_per_km", "transmission_loss_db", "margin_db");
        // Ainslie and McColm (1998), J. Acoust. Soc. Am. 103(3), eq. 2, coded here independently (f in kHz, T in °C, z in km).
        double f = 10.0, t = 0.0, s = 35.0, z = 0.1, ph = 8.0;
        var f1 = 0.78 * Math.Sqrt(s / 35.0) * Math.Exp(t / 26.0);
        var f2 = 42.0 * Math.Exp(t / 17.0);
        var alpha = (0.106 * f1 * f * f / ((f1 * f1) + (f * f)) * Math.Exp((ph - 8.0) / 0.56))
            + (0.52 * (1.0 + (t / 43.0)) * (s / 35.0) * f2 * f * f / ((f2 * f2) + (f * f)) * Math.Exp(-z / 6.0))
            + (0.00049 * f * f * Math.Exp(-((t / 27.0) + (z / 17.0))));
        AssertRelative(alpha, Number(a, "absorption_db_per_km"), 1e-12);
        // Spherical spreading plus absorption: TL = 20·log10(2000) + 2α; margin = SL − TL − NL − DT.
        var tl = (20.0 * Math.Log10(2000.0)) + (2.0 * alpha);
        AssertRelative(tl, Number(a, "transmission_loss_db"), 1e-12);
        AssertRelative(180.0 - tl - 60.0 - 10.0, Number(a, "margin_db"), 1e-12);
    }

    [Fact]
    public async Task Acoustic_Thorp_absorption_matches_a_hand_computation()
    {
        // Thorp (1967) at 10 kHz: 0.1·100/101 + 40·100/4200 + 2.75e-4·100 + 0.003 = 1.081891 dB/kyd = 1.183170 dB/km.
        var a = await JsonAsync("acoustic", "--frequency", "10 kHz", "--range", "1 km", "--temperature", "4 °C", "--salinity", "35", "--depth", "1 km", "--absorption-formula", "Thorp");
        Assert.Equal(1.183170, Number(a, "absorption_db_per_km"), 1e-6);
        Assert.False(a.TryGetProperty("margin_db", out _)); // no levels given, no margin
    }

    // ---- fibre ----

    [Fact]
    public async Task Fibre_budget_adds_up_the_losses()
    {
        // 3.2 km at 0.35 dB/km (typical 1310 nm) + 2 connector pairs at 0.3 dB = 1.72 dB; the default optics are the
        // 1000BASE-LX class (IEEE 802.3 clause 38): −11 dBm minimum launch, −19 dBm sensitivity → margin 6.28 dB.
        var f = await JsonAsync("fibre", "--length", "3.2 km");
        AssertFields(f, "loss_db", "margin_db");
        Assert.Equal(1.72, Number(f, "loss_db"), 1e-12);
        Assert.Equal(6.28, Number(f, "margin_db"), 1e-12);
        // At 1550 nm the typical attenuation is 0.20 dB/km; 4 splices at 0.05 dB add 0.2 dB.
        var g = await JsonAsync("fibre", "--length", "10 km", "--wavelength", "1550 nm", "--splices", "4", "--transmitter-power", "0 dBm", "--receiver-sensitivity", "-24");
        Assert.Equal(2.0 + 0.2 + 0.6, Number(g, "loss_db"), 1e-12);
        Assert.Equal(24.0 - 2.8, Number(g, "margin_db"), 1e-12);
    }

    // ---- radio in ice ----

    [Fact]
    public async Task Radio_ice_attenuation_and_spreading_follow_their_formulas()
    {
        var r = await JsonAsync("radio-ice", "--temperature", "251 K", "--distance", "100 m", "--frequency", "100 MHz");
        AssertFields(r, "attenuation_db_per_km", "path_loss_db");
        // MacGregor et al. (2007) Table 1: pure ice conducts σ = 6.6 µS/m at its reference temperature 251 K, ε′ = 3.2.
        // N_a = 10·log10(e)·σ/(ε0·c·√ε′) (ε0 = 8.8541878128e-12 F/m, CODATA 2018).
        var perM = 10.0 * Math.Log10(Math.E) * 6.6e-6 / (8.8541878128e-12 * SpeedOfLightMPerS * Math.Sqrt(3.2));
        AssertRelative(perM * 1e3, Number(r, "attenuation_db_per_km"), 1e-12);
        // Free-space loss with the wavelength in ice, 20·log10(4π·d·√ε′·f/c), plus 100 m of absorption.
        var spreading = 20.0 * Math.Log10(4.0 * Math.PI * 100.0 * Math.Sqrt(3.2) * 100e6 / SpeedOfLightMPerS);
        AssertRelative(spreading + (perM * 100.0), Number(r, "path_loss_db"), 1e-12);
    }

    // ---- station and light time ----

    [Fact]
    public async Task Station_median_life_is_the_median_dose_over_the_rate()
    {
        var lognormal = await JsonAsync("station", "--dose-rate", "0.1 Gy/d", "--median-dose", "30 krad");
        AssertFields(lognormal, "median_life_s");
        // 30 krad = 300 Gy (1 rad = 0.01 Gy); 300 Gy / (0.1 Gy / 86400 s) = 2.592e8 s.
        AssertRelative(2.592e8, Number(lognormal, "median_life_s"), 1e-12);
        // Weibull median η·(ln 2)^(1/β).
        var weibull = await JsonAsync("station", "--dose-rate", "10 mGy/h", "--failure-model", "Weibull", "--characteristic-dose", "500 Gy", "--shape", "2");
        AssertRelative(500.0 * Math.Sqrt(Math.Log(2.0)) / (0.01 / 3600.0), Number(weibull, "median_life_s"), 1e-12);
    }

    [Fact]
    public async Task A_refused_value_of_a_plain_option_is_reported_under_that_options_name()
    {
        // pH and the spreading exponent come from plain (unitless) options; the models refuse pH outside 7.7 to 8.3
        // (the fit's range, Francois and Garrison 1982) and a spreading exponent outside 1 to 2.
        var (exit, _, stderr) = await RunAsync("acoustic", "--frequency", "10 kHz", "--range", "1 km", "--temperature", "275 K", "--salinity", "35", "--depth", "100 m", "--ph", "9");
        Assert.Equal(3, exit); // ExitCode.InvalidInput
        Assert.Contains("descentops physics acoustic: --ph: ", stderr, StringComparison.Ordinal);
        var (spreadExit, _, spreadError) = await RunAsync("acoustic", "--frequency", "10 kHz", "--range", "1 km", "--temperature", "275 K", "--salinity", "35", "--depth", "100 m", "--spreading", "3");
        Assert.Equal(3, spreadExit);
        Assert.Contains("descentops physics acoustic: --spreading: ", spreadError, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Light_time_is_distance_over_the_speed_of_light()
    {
        // 1 au = 149 597 870 700 m (IAU 2012, exact); over c = 299 792 458 m/s that is 499.004 783 836 s.
        var l = await JsonAsync("light-time", "--distance", "1 au");
        AssertFields(l, "one_way_s");
        Assert.Equal(499.004783836, Number(l, "one_way_s"), 1e-9);
        var km = await JsonAsync("light-time", "--distance", "1.08e9 km");
        AssertRelative(1.08e12 / SpeedOfLightMPerS, Number(km, "one_way_s"), 1e-15);
    }

    // ---- vehicle ----

    [Fact]
    public async Task Vehicle_speed_energy_and_endurance_follow_the_drag_law()
    {
        var v = await JsonAsync("vehicle", "--speed", "0.5 m/s", "--battery", "1 kWh", "--hotel-power", "8 W", "--diameter", "20 cm", "--water-density", "1030 kg/m³");
        AssertFields(v, "speed_m_s", "energy_per_km_j", "endurance_s");
        // By hand: D = ½ρC_D·A·V², P = hotel + D·V/η, with C_D 0.2 and η 0.5 (the defaults) and A = π·0.1².
        var area = Math.PI * 0.01;
        var drag = 0.5 * 1030.0 * 0.2 * area * 0.25;
        var power = 8.0 + (drag * 0.5 / 0.5);
        AssertRelative(0.5, Number(v, "speed_m_s"), 1e-15);
        AssertRelative(power / 0.5 * 1000.0, Number(v, "energy_per_km_j"), 1e-12);
        AssertRelative(3.6e6 / power, Number(v, "endurance_s"), 1e-12);
        // The speed of most range makes propulsion half the hotel load: V* = (P_hotel·η/(ρC_D·A))^(1/3).
        AssertRelative(Math.Cbrt(8.0 * 0.5 / (1030.0 * 0.2 * area)), Number(v, "max_range_speed_m_s"), 1e-12);
    }

    // ---- refusals ----

    [Fact]
    public async Task A_temperature_below_absolute_zero_is_a_usage_error_naming_the_option()
    {
        var (exit, stdout, stderr) = await RunAsync("ice", "--temperature", "-5 K", "--pressure", "1 MPa", "--json");
        Assert.Equal(2, exit); // ExitCode.UsageError
        Assert.Contains("--temperature", stderr);
        Assert.Contains("absolute zero", stderr);
        Assert.Empty(stdout);
    }

    [Fact]
    public async Task A_zero_radius_is_refused_with_the_range()
    {
        var (exit, stdout, stderr) = await RunAsync("descent", "--radius", "0 m", "--length", "2 m", "--head-power", "5 kW", "--temperature", "250 K", "--json");
        Assert.Equal(3, exit); // ExitCode.InvalidInput
        Assert.Contains("--radius", stderr);
        Assert.Contains("(0, +inf) m", stderr);
        Assert.DoesNotContain("   at ", stderr); // no stack trace
        Assert.Empty(stdout);
    }

    [Fact]
    public async Task A_pressure_beyond_the_models_range_is_refused_with_the_range()
    {
        var (exit, _, stderr) = await RunAsync("descent", "--radius", "10 cm", "--length", "2 m", "--head-power", "5 kW", "--temperature", "250 K", "--pressure", "80 MPa", "--json");
        Assert.Equal(3, exit);
        Assert.Contains("--pressure", stderr);
        Assert.Contains("[611.657, 50000000] Pa", stderr); // liquid needs p ≥ p_t; the latent heat is trusted to 50 MPa
        Assert.DoesNotContain("Parameter '", stderr);

        var (iceExit, _, iceError) = await RunAsync("ice", "--temperature", "250 K", "--pressure", "300 MPa");
        Assert.Equal(3, iceExit);
        Assert.Contains("IAPWS R10-06", iceError);
    }

    [Fact]
    public async Task A_length_given_for_a_power_is_a_usage_error()
    {
        var (exit, _, stderr) = await RunAsync("descent", "--radius", "10 cm", "--length", "2 m", "--head-power", "12 cm", "--temperature", "250 K");
        Assert.Equal(2, exit);
        Assert.Contains("--head-power: '12 cm' is not a power", stderr);
    }

    [Fact]
    public async Task A_missing_option_is_a_usage_error_naming_it()
    {
        var (exit, _, stderr) = await RunAsync("refreeze", "--gap", "1 mm");
        Assert.Equal(2, exit);
        Assert.Contains("--temperature", stderr);
    }

    [Fact]
    public async Task The_printed_table_carries_the_same_numbers_as_the_JSON()
    {
        var (exit, stdout, _) = await RunAsync("light-time", "--distance", "1 au");
        Assert.Equal(0, exit);
        Assert.Contains("499.005 s", stdout);
        Assert.Contains("998.01 s", stdout);
        Assert.Contains("certifies nothing", stdout); // the README's cautions travel with every printout
    }

    private static async Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(params string[] arguments) =>
        await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(), ["physics", .. arguments]);

    /// <summary>Runs a subcommand with --json and returns the single object it printed.</summary>
    private static async Task<JsonElement> JsonAsync(params string[] arguments)
    {
        var (exit, stdout, stderr) = await RunAsync([.. arguments, "--json"]);
        Assert.True(exit == 0, $"exit {exit}: {stderr}");
        using var document = JsonDocument.Parse(stdout);
        Assert.Equal(JsonValueKind.Object, document.RootElement.ValueKind);
        return document.RootElement.Clone();
    }

    private static void AssertFields(JsonElement json, params string[] names)
    {
        foreach (var name in names) Assert.True(json.TryGetProperty(name, out _), $"missing field '{name}' in {json}");
    }

    private static double Number(JsonElement json, string name) => json.GetProperty(name).GetDouble();

    private static void AssertRelative(double expected, double actual, double tolerance) =>
        Assert.True(Math.Abs(actual - expected) <= tolerance * Math.Abs(expected), $"expected {expected:R} within {tolerance:R} relative, got {actual:R}");
}
