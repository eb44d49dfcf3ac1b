using DescentOps.Physics.Ice;
using Xunit;

namespace DescentOps.Physics.Tests.Ice;

public class IceGibbsFunctionTests
{
    // IAPWS (2009), "Revised Release on the Equation of State 2006 for H2O Ice Ih" (R10-06), Table 6, the release's
    // own check values. The release quotes 12 significant digits; 1e-8 rel leaves room only for rounding of the
    // coefficients' last digit. Columns: (273.16 K, 611.657 Pa), (273.152519 K, 101325 Pa), (100 K, 100 MPa).
    public static TheoryData<string, double, double, double> Table6 => new()
    {
        { "g", 0.611784135, 0.101342740690e3, -0.222296513088e6 },
        { "g_p", 0.109085812737e-2, 0.109084388214e-2, 0.106193389260e-2 },
        { "g_T", 0.122069433940e4, 0.122076932550e4, 0.261195122589e4 },
        { "g_pp", -0.128495941571e-12, -0.128485364928e-12, -0.941807981761e-13 },
        { "g_Tp", 0.174387964700e-6, 0.174362219972e-6, 0.274505162488e-7 },
        { "g_TT", -0.767602985875e1, -0.767598233365e1, -0.866333195517e1 },
        { "h", -0.333444253966e6, -0.333354873637e6, -0.483491635676e6 },
        { "f", -0.554468750000e-1, -0.918701567000e1, -0.328489902347e6 },
        { "u", -0.333444921197e6, -0.333465403393e6, -0.589685024936e6 },
        { "s", -0.122069433940e4, -0.122076932550e4, -0.261195122589e4 },
        { "c_p", 0.209678431622e4, 0.209671391024e4, 0.866333195517e3 },
        { "rho", 0.916709492200e3, 0.916721463419e3, 0.941678203297e3 },
        { "alpha", 0.159863102566e-3, 0.159841589458e-3, 0.258495528207e-4 },
        { "beta", 0.135714764659e7, 0.135705899321e7, 0.291466166994e6 },
        { "kappa_T", 0.117793449348e-9, 0.117785291765e-9, 0.886880048115e-10 },
        { "kappa_s", 0.114161597779e-9, 0.114154442556e-9, 0.886060982687e-10 },
    };

    [Theory]
    [MemberData(nameof(Table6))]
    public void Reproduces_the_release_check_table(string quantity, double atTriplePoint, double atNormalMelting, double at100K100MPa)
    {
        (double T, double p, double expected)[] states =
        [
            (273.16, 611.657, atTriplePoint),
            (273.152519, 101325.0, atNormalMelting),
            (100.0, 100e6, at100K100MPa),
        ];
        foreach (var (t, p, expected) in states)
        {
            var s = IceGibbsFunction.Evaluate(t, p);
            var actual = quantity switch
            {
                "g" => s.GJPerKg,
                "g_p" => s.GpM3PerKg,
                "g_T" => s.GtJPerKgK,
                "g_pp" => s.GppM3PerKgPa,
                "g_Tp" => s.GtpM3PerKgK,
                "g_TT" => s.GttJPerKgK2,
                "h" => s.EnthalpyJPerKg,
                "f" => s.HelmholtzEnergyJPerKg,
                "u" => s.InternalEnergyJPerKg,
                "s" => s.EntropyJPerKgK,
                "c_p" => s.SpecificHeatJPerKgK,
                "rho" => s.DensityKgPerM3,
                "alpha" => s.ExpansionPerK,
                "beta" => s.PressureCoefficientPaPerK,
                "kappa_T" => s.IsothermalCompressibilityPerPa,
                "kappa_s" => s.IsentropicCompressibilityPerPa,
                _ => throw new ArgumentException(quantity),
            };
            Approx.Rel(expected, actual, 1e-8, $"{quantity} at {t} K, {p} Pa");
        }
    }

    [Theory]
    // Feistel and Wagner (2006), J. Phys. Chem. Ref. Data 35, 1021, zero-pressure density table (seen through a
    // secondary data file, per the reference note ICE-2); the table gives 2 decimals, hence 0.01 kg/m³.
    [InlineData(0.0, 933.79)]
    [InlineData(70.0, 933.60)]
    [InlineData(80.0, 933.47)]
    [InlineData(90.0, 933.29)]
    public void Zero_pressure_density_matches_Feistel_Wagner_table(double temperatureK, double expectedKgPerM3)
    {
        Approx.Abs(expectedKgPerM3, IceIh.DensityKgPerM3(temperatureK, 0.0), 0.01, "rho(p=0)");
    }

    [Theory]
    // Computed (CALC) in the reference note §1.2 (ICE-3) from R10-06 at 0.101325 MPa, values rounded as printed;
    // tolerances are half a unit in the last printed digit. Δh_s = h(273.15 K) − h(T).
    [InlineData(50.0, 933.747, 437.49, 4.185e-6, 289.605)]
    [InlineData(70.0, 933.609, 623.92, 1.129e-5, 278.966)]
    [InlineData(100.0, 933.049, 874.14, 3.036e-5, 256.401)]
    [InlineData(150.0, 930.614, 1226.18, 7.514e-5, 203.688)]
    [InlineData(200.0, 926.132, 1568.35, 1.164e-4, 133.890)]
    [InlineData(250.0, 919.996, 1926.83, 1.480e-4, 46.569)]
    [InlineData(260.0, 918.612, 1999.98, 1.533e-4, 26.935)]
    public void Matches_the_computed_table_at_normal_pressure(double t, double rho, double cp, double alpha, double sensibleKJPerKg)
    {
        const double p = 101325.0;
        Approx.Abs(rho, IceIh.DensityKgPerM3(t, p), 0.0005, "rho");
        Approx.Abs(cp, IceIh.SpecificHeatJPerKgK(t, p), 0.005, "cp");
        Approx.Rel(alpha, IceIh.ExpansionPerK(t, p), 0.0005 / 1.0, "alpha");
        Approx.Abs(sensibleKJPerKg * 1e3, IceIh.SensibleHeatJPerKg(t, 273.15, p), 0.5, "sensible heat");
    }

    [Fact]
    public void Agrees_with_the_IAPWS_Python_library_over_the_whole_table()
    {
        // Golden table from python3-iapws (see shared/reference/README.md): an independent implementation of the
        // same release, so agreement is expected to round-off; 1e-9 rel covers its kJ-based arithmetic.
        var rows = GoldenTable.Read("ice-ih-properties.csv");
        Assert.True(rows.Count > 300);
        foreach (var r in rows)
        {
            var s = IceGibbsFunction.Evaluate(r[0], r[1]);
            var at = $"{r[0]} K {r[1]} Pa";
            Approx.Rel(r[2], s.DensityKgPerM3, 1e-9, "rho " + at);
            Approx.Rel(r[3], s.SpecificHeatJPerKgK, 1e-9, "cp " + at);
            Approx.Rel(r[4], s.EnthalpyJPerKg, 1e-9, "h " + at);
            Approx.Rel(r[5], s.EntropyJPerKgK, 1e-9, "s " + at);
            Approx.Rel(r[6], s.ExpansionPerK, 1e-8, "alpha " + at);
        }
    }

    [Theory]
    [InlineData(-1.0, 1e5, "temperatureK")]
    [InlineData(273.2, 1e5, "temperatureK")]
    [InlineData(200.0, 211e6, "pressurePa")]
    [InlineData(200.0, -1.0, "pressurePa")]
    [InlineData(270.0, 50e6, "pressurePa")] // above the melting curve (p_m(270 K) ≈ 37.6 MPa): liquid, not ice
    public void Refuses_states_outside_the_release(double t, double p, string quantity)
    {
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceGibbsFunction.Evaluate(t, p));
        Assert.Equal(quantity, e.ParamName);
        Assert.Contains("valid range", e.Message);
        Assert.Contains(quantity, e.Message);
    }
}
