namespace DescentOps.Scenarios.Model;

/// <summary>The distribution of the dose at which the station's electronics fail.</summary>
public enum DoseFailureModel
{
    /// <summary>F(D) = 1 − exp[−(D/η)^β]; scale η, spread β.</summary>
    Weibull,

    /// <summary>F(D) = Φ(ln(D/D50)/σ); scale D50, spread σ.</summary>
    Lognormal,
}
