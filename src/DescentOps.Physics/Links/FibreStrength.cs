namespace DescentOps.Physics.Links;

/// <summary>
/// Mechanical limits of the silica fibre: proof load, bending stress and static fatigue. Fatigue parameters scatter
/// widely, so the fatigue life is for ranking scenarios, not for predicting a date.
/// </summary>
public static class FibreStrength
{
    /// <summary>G.652/G.657 proof-test stress, 0.69 GPa (100 kpsi, about 1 % strain).</summary>
    public const double StandardProofStressPa = 0.69e9;

    /// <summary>Young's modulus of silica, about 72 GPa (from memory).</summary>
    public const double SilicaYoungsModulusPa = 72e9;

    /// <summary>Glass diameter of standard fibre.</summary>
    public const double StandardGlassDiameterM = 125e-6;

    private const string Model = "the fibre strength model";

    /// <summary>Tensile load on the glass at the proof stress, σ_p·π·d²/4.</summary>
    public static double ProofLoadN(double proofStressPa, double glassDiameterM)
    {
        ValidRange.RequirePositive(proofStressPa, nameof(proofStressPa), "Pa", Model);
        ValidRange.RequirePositive(glassDiameterM, nameof(glassDiameterM), "m", Model);
        return proofStressPa * Math.PI * glassDiameterM * glassDiameterM / 4.0;
    }

    /// <summary>Peak tensile stress at the glass surface of a bent fibre, E·r_f/R.</summary>
    public static double BendingStressPa(double youngsModulusPa, double glassRadiusM, double bendRadiusM)
    {
        ValidRange.RequirePositive(youngsModulusPa, nameof(youngsModulusPa), "Pa", Model);
        ValidRange.RequirePositive(glassRadiusM, nameof(glassRadiusM), "m", Model);
        ValidRange.Require(bendRadiusM, glassRadiusM, double.MaxValue, nameof(bendRadiusM), "m", Model);
        return youngsModulusPa * glassRadiusM / bendRadiusM;
    }

    /// <summary>
    /// Power-law static fatigue, t_f = t_p·(σ_p/σ)^n. Typical n ≈ 20 and t_p ≈ 1 s for standard fibre (from memory);
    /// stresses at or above proof are refused because the proof test itself says nothing about them.
    /// </summary>
    public static double StaticFatigueLifeS(double appliedStressPa, double proofStressPa, double fatigueExponent, double proofDurationS)
    {
        ValidRange.RequirePositive(proofStressPa, nameof(proofStressPa), "Pa", Model);
        ValidRange.Require(appliedStressPa, double.Epsilon, proofStressPa, nameof(appliedStressPa), "Pa", Model);
        ValidRange.Require(fatigueExponent, 1.0, 200.0, nameof(fatigueExponent), "(stress-corrosion exponent)", Model);
        ValidRange.RequirePositive(proofDurationS, nameof(proofDurationS), "s", Model);
        return proofDurationS * Math.Pow(proofStressPa / appliedStressPa, fatigueExponent);
    }
}
