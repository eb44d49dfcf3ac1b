namespace DescentOps.Cli.Commands.Physics;

/// <summary>The distribution of the dose at which a part fails, for <c>physics station</c>.</summary>
internal enum FailureModel
{
    /// <summary>F(D) = Φ(ln(D/D50)/σ).</summary>
    Lognormal,

    /// <summary>F(D) = 1 − exp[−(D/η)^β].</summary>
    Weibull,
}
