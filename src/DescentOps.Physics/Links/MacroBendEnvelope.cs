namespace DescentOps.Physics.Links;

/// <summary>
/// Worst-case macro-bend loss per turn, L(R) = A·exp(−B·R), fitted through two specification points. Real fibre is
/// usually far better than the specification, so this is an envelope, valid only between the two fitted radii.
/// </summary>
public sealed record MacroBendEnvelope(double CoefficientDbPerTurn, double DecayPerM, double MinimumRadiusM, double MaximumRadiusM)
{
    private const string Model = "the macro-bend loss envelope";

    /// <summary>
    /// ITU-T G.657.A1 at 1550 nm: 0.25 dB for 10 turns at 15 mm and 0.75 dB for 1 turn at 10 mm (G.657 table as
    /// printed in a vendor copy).
    /// </summary>
    public static MacroBendEnvelope G657A1At1550Nm { get; } = FromSpecificationPoints(10e-3, 0.75, 15e-3, 0.025);

    /// <summary>Exponential through (R1, L1) and (R2, L2), per-turn losses, R1 &lt; R2.</summary>
    public static MacroBendEnvelope FromSpecificationPoints(double smallRadiusM, double smallRadiusLossDbPerTurn, double largeRadiusM, double largeRadiusLossDbPerTurn)
    {
        ValidRange.RequirePositive(smallRadiusM, nameof(smallRadiusM), "m", Model);
        ValidRange.Require(largeRadiusM, smallRadiusM * (1 + 1e-9), double.MaxValue, nameof(largeRadiusM), "m", Model);
        ValidRange.RequirePositive(largeRadiusLossDbPerTurn, nameof(largeRadiusLossDbPerTurn), "dB", Model);
        ValidRange.Require(smallRadiusLossDbPerTurn, largeRadiusLossDbPerTurn, double.MaxValue, nameof(smallRadiusLossDbPerTurn), "dB", Model);
        var decay = Math.Log(smallRadiusLossDbPerTurn / largeRadiusLossDbPerTurn) / (largeRadiusM - smallRadiusM);
        return new MacroBendEnvelope(smallRadiusLossDbPerTurn * Math.Exp(decay * smallRadiusM), decay, smallRadiusM, largeRadiusM);
    }

    /// <summary>Loss of one full turn at a radius inside the fitted range.</summary>
    public double LossPerTurnDb(double bendRadiusM)
    {
        ValidRange.Require(bendRadiusM, MinimumRadiusM, MaximumRadiusM, nameof(bendRadiusM), "m", Model);
        return CoefficientDbPerTurn * Math.Exp(-DecayPerM * bendRadiusM);
    }

    /// <summary>Loss of a bend through an angle (2π per turn): a borehole dog-leg or a sheave.</summary>
    public double ArcLossDb(double bendRadiusM, double bendAngleRad)
    {
        ValidRange.RequireNonNegative(bendAngleRad, nameof(bendAngleRad), "rad", Model);
        return LossPerTurnDb(bendRadiusM) * bendAngleRad / (2.0 * Math.PI);
    }

    /// <summary>
    /// Upper bound for radii at or above the fitted range, such as a spool hub: bend loss falls monotonically with
    /// radius, so the loss at the largest fitted radius bounds it. The name says bound because it is not an estimate.
    /// </summary>
    public double UpperBoundArcLossDb(double bendRadiusM, double bendAngleRad)
    {
        ValidRange.Require(bendRadiusM, MinimumRadiusM, double.MaxValue, nameof(bendRadiusM), "m", Model);
        return ArcLossDb(Math.Min(bendRadiusM, MaximumRadiusM), bendAngleRad);
    }
}
