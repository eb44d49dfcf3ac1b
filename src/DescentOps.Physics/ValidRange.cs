using System.Globalization;

namespace DescentOps.Physics;

/// <summary>
/// Every model here has a published (or stated) validity range; outside it the caller gets an exception that
/// names the quantity and the range, never a silently extrapolated number.
/// </summary>
internal static class ValidRange
{
    public static double Require(double value, double minimum, double maximum, string quantity, string unit, string model)
    {
        if (double.IsNaN(value) || value < minimum || value > maximum)
        {
            throw new ArgumentOutOfRangeException(
                quantity,
                value,
                string.Create(CultureInfo.InvariantCulture, $"{quantity} = {value:R} {unit} is outside the valid range [{minimum:R}, {maximum:R}] {unit} of {model}."));
        }

        return value;
    }

    public static double RequirePositive(double value, string quantity, string unit, string model)
    {
        if (double.IsNaN(value) || value <= 0 || double.IsInfinity(value))
        {
            throw new ArgumentOutOfRangeException(
                quantity,
                value,
                string.Create(CultureInfo.InvariantCulture, $"{quantity} = {value:R} {unit} is outside the valid range (0, +inf) {unit} of {model}."));
        }

        return value;
    }

    public static double RequireNonNegative(double value, string quantity, string unit, string model)
    {
        if (double.IsNaN(value) || value < 0 || double.IsInfinity(value))
        {
            throw new ArgumentOutOfRangeException(
                quantity,
                value,
                string.Create(CultureInfo.InvariantCulture, $"{quantity} = {value:R} {unit} is outside the valid range [0, +inf) {unit} of {model}."));
        }

        return value;
    }
}
