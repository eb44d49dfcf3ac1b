namespace DescentOps.Physics;

/// <summary>
/// Every model here has a published (or stated) validity range; outside it the caller gets a
/// <see cref="ModelRangeException"/> that carries the quantity and the range as data, never a silently
/// extrapolated number.
/// </summary>
internal static class ValidRange
{
    public static double Require(double value, double minimum, double maximum, string quantity, string unit, string model) =>
        new ModelRange(model, quantity, unit, minimum, maximum).Require(value);

    public static double RequirePositive(double value, string quantity, string unit, string model)
    {
        return ModelRange.Positive(model, quantity, unit).Require(value);
    }

    public static double RequireNonNegative(double value, string quantity, string unit, string model)
    {
        return ModelRange.NonNegative(model, quantity, unit).Require(value);
    }
}
