namespace DescentOps.Physics.Radiation;

/// <summary>
/// Total ionising dose on a part, accumulated step by step from a dose rate behind a shield. Dose-rate effects
/// (ELDRS) and single-event effects are outside this model.
/// </summary>
public static class DoseAccumulation
{
    /// <summary>
    /// Silicon-to-water dose ratio in the Compton regime from electrons per unit mass, (14/28.0855)/(10/18.0153): what
    /// converts a water or ice dose into the krad(Si) that parts are rated in.
    /// </summary>
    public static readonly double SiliconPerWaterDoseRatio = 14.0 / 28.0855 / (10.0 / 18.0153);

    private const string Model = "the dose accumulation";

    /// <summary>Dose after a further step at a constant rate.</summary>
    public static double AccumulatedDoseGy(double previousDoseGy, double doseRateGyPerS, double durationS)
    {
        ValidRange.RequireNonNegative(previousDoseGy, nameof(previousDoseGy), "Gy", Model);
        ValidRange.RequireNonNegative(doseRateGyPerS, nameof(doseRateGyPerS), "Gy/s", Model);
        ValidRange.RequireNonNegative(durationS, nameof(durationS), "s", Model);
        return previousDoseGy + (doseRateGyPerS * durationS);
    }
}
