namespace DescentOps.Physics.Vehicles;

/// <summary>
/// How position error grows without a fix under the ice: heading error, accelerometer bias, an unmodelled current,
/// and a random-walk form σ(t) = √(σ0² + (k_d·d)² + q·t) with parameters per navigation mode (RULE).
/// </summary>
public static class DeadReckoning
{
    private const string Model = "the dead-reckoning error model";

    /// <summary>Cross-track error of a straight leg flown with a constant heading error, d·sin δψ.</summary>
    public static double HeadingCrossTrackErrorM(double distanceM, double headingErrorRad)
    {
        ValidRange.RequireNonNegative(distanceM, nameof(distanceM), "m", Model);
        ValidRange.Require(headingErrorRad, -Math.PI / 2, Math.PI / 2, nameof(headingErrorRad), "rad", Model);
        return distanceM * Math.Sin(headingErrorRad);
    }

    /// <summary>Position error of an unaided inertial solution from a constant accelerometer bias, ½·b·t².</summary>
    public static double AccelerometerBiasErrorM(double biasMPerS2, double elapsedS)
    {
        ValidRange.RequireNonNegative(elapsedS, nameof(elapsedS), "s", Model);
        return 0.5 * biasMPerS2 * elapsedS * elapsedS;
    }

    /// <summary>Drift from a current the navigator does not know about, δu·t.</summary>
    public static double UnmodelledCurrentErrorM(double currentErrorMPerS, double elapsedS)
    {
        ValidRange.RequireNonNegative(elapsedS, nameof(elapsedS), "s", Model);
        return currentErrorMPerS * elapsedS;
    }

    /// <summary>One-sigma horizontal error of the random-walk form.</summary>
    public static double PositionSigmaM(double initialSigmaM, double errorPerDistance, double distanceM, double randomWalkM2PerS, double elapsedS)
    {
        ValidRange.RequireNonNegative(initialSigmaM, nameof(initialSigmaM), "m", Model);
        ValidRange.Require(errorPerDistance, 0.0, 1.0, nameof(errorPerDistance), "(fraction of distance)", Model);
        ValidRange.RequireNonNegative(distanceM, nameof(distanceM), "m", Model);
        ValidRange.RequireNonNegative(randomWalkM2PerS, nameof(randomWalkM2PerS), "m²/s", Model);
        ValidRange.RequireNonNegative(elapsedS, nameof(elapsedS), "s", Model);
        var along = errorPerDistance * distanceM;
        return Math.Sqrt((initialSigmaM * initialSigmaM) + (along * along) + (randomWalkM2PerS * elapsedS));
    }
}
