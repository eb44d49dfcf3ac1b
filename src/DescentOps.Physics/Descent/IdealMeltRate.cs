using DescentOps.Physics.Ice;

namespace DescentOps.Physics.Descent;

/// <summary>
/// The first energy balance of a melting head: all head power, times an efficiency, warms the ice ahead
/// from its far-field temperature to the melting point and melts it, v = η P / (π R² ρ (L + Δh_s)).
/// This is the common starting point of published melt-probe models (Aamot 1967, CRREL Research Report 194;
/// Ulamec et al. 2007, Rev. Environ. Sci. Biotechnol. 6, 71). <see cref="SteadyDescent"/> is the full model.
/// </summary>
public static class IdealMeltRate
{
    /// <summary>Nominal density of ice Ih near 250 K, kg/m³ (IAPWS R10-06 gives 919.9 at 250 K, 916.7 at 273.15 K).</summary>
    public const double IceDensityKgPerM3 = 917.0;

    /// <summary>Nominal latent heat of fusion at 0.1 MPa, J/kg (from IAPWS R10-06: 333.43 kJ/kg).</summary>
    public const double LatentHeatJPerKg = 333_430.0;

    /// <summary>
    /// Closed-form sensible heat from the linear fit c = 185 + 7.037 T J/(kg K) (widely used in icy-satellite work; its
    /// original source not confirmed), integrated from T∞ to Tm. Kept for callers that need a closed form;
    /// <see cref="VelocityMPerS"/> now uses the exact R10-06 enthalpy difference.
    /// </summary>
    public static double SensibleHeatJPerKg(double farFieldTemperatureK, double meltingTemperatureK)
    {
        if (farFieldTemperatureK > meltingTemperatureK) return 0.0;
        return 185.0 * (meltingTemperatureK - farFieldTemperatureK)
               + 0.5 * 7.037 * ((meltingTemperatureK * meltingTemperatureK) - (farFieldTemperatureK * farFieldTemperatureK));
    }

    /// <summary>
    /// Axial melt velocity, m/s, for head power in watts and radius in metres. Ice density at T∞, sensible heat
    /// h(Tm) − h(T∞) from IAPWS R10-06 and latent heat at Tm from <see cref="FusionLatentHeat"/>, all evaluated at the
    /// triple-point pressure, where every Tm up to 273.16 K is a valid ice state (the pressure effect on these
    /// differences is below 1e-4 relative up to 1 MPa). Ice warmer than Tm needs no sensible heat. Tm must lie in
    /// [269, 273.16] K, the range of the latent-heat model; the efficiency in [0, 1].
    /// </summary>
    public static double VelocityMPerS(double headPowerW, double radiusM, double farFieldTemperatureK, double meltingTemperatureK, double efficiency)
    {
        if (radiusM <= 0) throw new ArgumentOutOfRangeException(nameof(radiusM), radiusM, "The probe radius must be positive.");
        ValidRange.Require(efficiency, 0.0, 1.0, nameof(efficiency), "", "the ideal melt rate");
        if (headPowerW <= 0) return 0.0;
        const double p = TriplePoint.PressurePa;
        var iceK = Math.Min(farFieldTemperatureK, meltingTemperatureK);
        var density = IceIh.DensityKgPerM3(iceK, p);
        var sensible = IceIh.SensibleHeatJPerKg(iceK, meltingTemperatureK, p);
        var latent = FusionLatentHeat.AtMeltingTemperatureJPerKg(meltingTemperatureK);
        var area = Math.PI * radiusM * radiusM;
        return efficiency * headPowerW / (area * density * (latent + sensible));
    }
}
