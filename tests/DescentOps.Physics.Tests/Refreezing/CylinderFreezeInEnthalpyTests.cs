using DescentOps.Physics.Refreezing;
using Xunit;
using Xunit.Abstractions;

namespace DescentOps.Physics.Tests.Refreezing;

/// <summary>
/// The cylindrical freeze-in model (<see cref="Refreeze.FreezeInAroundProbe"/>, what <c>physics refreeze --geometry
/// cylinder</c> and the runs use) against the independent radial enthalpy solver with temperature-dependent
/// properties. A 1 mm gap around a 5 cm probe, within 10 % from 100 K to 270 K. Before the model took its planar limit
/// from the variable-property front (<see cref="VariablePropertyFreezing"/>) it used the constant-property Neumann
/// front with one effective diffusivity Φ/(ρΔh_s), and froze 15 % too fast at 150 K and 27 % at 100 K: the freshly
/// frozen layer near T_m conducts and stores heat like warm ice, whose diffusivity is about a sixth of that at 100 K.
/// </summary>
public class CylinderFreezeInEnthalpyTests(ITestOutputHelper output)
{
    [Theory]
    [InlineData(100.0)]
    [InlineData(125.0)]
    [InlineData(150.0)]
    [InlineData(200.0)]
    [InlineData(250.0)]
    [InlineData(270.0)]
    public void Model_agrees_with_the_enthalpy_solver(double iceK)
    {
        const double gap = 1e-3, radius = 0.05, meltingK = 273.15;
        var model = Refreeze.FreezeInAroundProbe(gap, radius, 0.0, iceK, meltingK).FreezeTimeS;
        var reference = RadialEnthalpySolver.FreezeTimeS(gap, radius, iceK, meltingK, 20.0 * model);
        output.WriteLine(FormattableString.Invariant($"{iceK} K: model {model:G5} s, enthalpy solver {reference:G5} s, ratio {model / reference:F3}"));
        Approx.Rel(reference, model, 0.10, $"freeze time at {iceK} K");
    }

    [Theory]
    [InlineData(100.0)]
    [InlineData(250.0)]
    public void A_wider_gap_around_a_larger_probe_also_agrees(double iceK)
    {
        // 5 mm around 12 cm: the freeze lasts long enough for the wall's curvature to matter.
        const double gap = 5e-3, radius = 0.12, meltingK = 273.15;
        var model = Refreeze.FreezeInAroundProbe(gap, radius, 0.0, iceK, meltingK).FreezeTimeS;
        var reference = RadialEnthalpySolver.FreezeTimeS(gap, radius, iceK, meltingK, 20.0 * model);
        output.WriteLine(FormattableString.Invariant($"{iceK} K, 5 mm at 12 cm: model {model:G5} s, enthalpy solver {reference:G5} s, ratio {model / reference:F3}"));
        Approx.Rel(reference, model, 0.10, $"freeze time at {iceK} K");
    }

    [Fact]
    public void The_cylinder_freezes_faster_than_the_plane()
    {
        // A curved wall draws more heat than a flat one at the same temperature (G(τ) > 1/√(πτ)), so the cylinder's
        // freeze time is the shorter, and the more so the smaller the radius.
        var planar = Refreeze.FreezeIn(0.01, 250.0, 273.15).FreezeTimeS;
        var large = Refreeze.FreezeInAroundProbe(0.01, 0.2, 0.0, 250.0, 273.15).FreezeTimeS;
        var small = Refreeze.FreezeInAroundProbe(0.01, 0.025, 0.0, 250.0, 273.15).FreezeTimeS;
        Assert.True(small < large && large < planar, $"{small} < {large} < {planar}");
    }
}
