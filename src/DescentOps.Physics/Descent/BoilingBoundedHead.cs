using DescentOps.Physics.Water;

namespace DescentOps.Physics.Descent;

/// <summary>
/// Close-contact melting at the head with the melt film bounded by boiling: the film cannot be hotter than the boiling
/// point of water at the local pressure (IAPWS-IF97, <see cref="BoilingCurve"/>). Where the free solution at constant
/// power (<see cref="CloseContactMelting.AtConstantPower"/>, after Shreve 1962 and Moallemi et al. 1986) would exceed
/// it, the head runs at the boiling point: the film melts at the speed the constant-temperature solution gives for that
/// superheat, and the rest of the head's power boils film water. The vapour rises past the body and condenses on the
/// cold wall above the head (MODEL: a heat pipe), so the boiled-off power joins the heat the side receives.
/// </summary>
public static class BoilingBoundedHead
{
    /// <param name="headPowerW">Head power (positive).</param>
    /// <param name="radiusM">Head radius.</param>
    /// <param name="loadN">Net load on the film.</param>
    /// <param name="iceDensityKgPerM3">Density of the ice melted.</param>
    /// <param name="meltEnthalpyJPerKg">L + Δh_s.</param>
    /// <param name="maximumSuperheatK">Boiling point at the local pressure less the melting point (≥ 0).</param>
    public static BoundedHeadSolution Solve(double headPowerW, double radiusM, double loadN, double iceDensityKgPerM3, double meltEnthalpyJPerKg, double maximumSuperheatK)
    {
        const double f = CloseContactMelting.DefaultSuperheatFraction;
        ValidRange.RequirePositive(headPowerW, nameof(headPowerW), "W", "the boiling-bounded head");
        ValidRange.RequireNonNegative(maximumSuperheatK, nameof(maximumSuperheatK), "K", "the boiling-bounded head");
        var area = Math.PI * radiusM * radiusM;
        var free = CloseContactMelting.AtConstantPower(headPowerW / area, radiusM, loadN, iceDensityKgPerM3, meltEnthalpyJPerKg, f);
        if (free.FilmSuperheatK <= maximumSuperheatK) return new BoundedHeadSolution(free, 0.0);
        if (maximumSuperheatK <= 0) return new BoundedHeadSolution(new CloseContactSolution(0.0, 0.0, 0.0), headPowerW);

        // At a fixed film temperature the heat conducted across the film melts ice and leaves f·c_w·ΔT with the water,
        // so the constant-temperature solution holds with the enthalpy H + f c_w ΔT.
        var bounded = CloseContactMelting.AtConstantSuperheat(maximumSuperheatK, radiusM, loadN, iceDensityKgPerM3, meltEnthalpyJPerKg + (f * LiquidWater.SpecificHeatJPerKgK * maximumSuperheatK));
        var meltingW = iceDensityKgPerM3 * area * bounded.VelocityMPerS * (meltEnthalpyJPerKg + (f * LiquidWater.SpecificHeatJPerKgK * maximumSuperheatK));
        if (meltingW >= headPowerW) return new BoundedHeadSolution(free, 0.0);
        return new BoundedHeadSolution(bounded, headPowerW - meltingW);
    }
}
