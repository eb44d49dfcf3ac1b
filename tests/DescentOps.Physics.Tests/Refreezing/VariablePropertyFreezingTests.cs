using DescentOps.Physics.Ice;
using DescentOps.Physics.Refreezing;
using DescentOps.Physics.Water;
using Xunit;

namespace DescentOps.Physics.Tests.Refreezing;

/// <summary>
/// The variable-property freezing front against the classical constant-property solution (Carslaw and Jaeger 1959,
/// §11.2, case (b)) where the properties barely change, and against the direction the property change must move it.
/// </summary>
public class VariablePropertyFreezingTests
{
    private const double MeltingK = 273.15;
    private static readonly double LatentPerVolume = LiquidWater.DensityKgPerM3 * FusionLatentHeat.AtMeltingTemperatureJPerKg(MeltingK);

    [Fact]
    public void Two_Kelvin_below_the_melting_point_it_is_the_Neumann_front()
    {
        // Over 2 K, k and ρc of ice change by under 1 %: the front must be case (b)'s λ√κ with the properties at the
        // middle of the range, Ste = ρ_i c ΔT/(ρ_w L) (the latent heat is that of the water consumed).
        const double iceK = MeltingK - 2.0, midK = MeltingK - 1.0, p = TriplePoint.PressurePa;
        var rho = IceIh.DensityKgPerM3(midK, p);
        var c = IceIh.SpecificHeatJPerKgK(midK, p);
        var k = IceConductivity.ReciprocalCoefficientWPerM / midK;
        var kappa = k / (rho * c);
        var stefan = rho * c * 2.0 / LatentPerVolume;
        var neumann = StefanProblem.ColdWallFrontConstant(stefan) * Math.Sqrt(kappa);
        Approx.Rel(neumann, VariablePropertyFreezing.FrontConstantMPerRootS(iceK, MeltingK, LatentPerVolume), 0.005, "front constant 2 K below T_m");
    }

    [Fact]
    public void Cold_ice_freezes_slower_than_one_effective_diffusivity_says()
    {
        // At 100 K one effective diffusivity Φ/(ρΔh_s) over the range overstates how fast the warm new ice passes heat on
        // (its diffusivity is about a sixth of the cold ice's): the exact front is slower than that estimate.
        const double iceK = 100.0, p = TriplePoint.PressurePa;
        var phi = IceConductivity.KirchhoffPotentialWPerM(iceK, MeltingK, IceConductivityFit.PetrenkoWhitworth1999);
        var sensible = IceIh.SensibleHeatJPerKg(iceK, MeltingK, p);
        var rho = IceIh.DensityKgPerM3(iceK, p);
        var kappaEff = phi / (rho * sensible);
        var estimate = StefanProblem.ColdWallFrontConstant(rho * sensible / LatentPerVolume) * Math.Sqrt(kappaEff);
        var exact = VariablePropertyFreezing.FrontConstantMPerRootS(iceK, MeltingK, LatentPerVolume);
        Assert.True(exact < 0.95 * estimate, $"{exact} < 0.95 · {estimate}");
    }
}
