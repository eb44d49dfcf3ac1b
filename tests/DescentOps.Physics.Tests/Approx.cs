using Xunit;

namespace DescentOps.Physics.Tests;

internal static class Approx
{
    public static void Rel(double expected, double actual, double relativeTolerance, string what = "")
    {
        var error = Math.Abs(actual - expected) / Math.Abs(expected);
        Assert.True(error <= relativeTolerance, FormattableString.Invariant($"{what}: expected {expected:R}, got {actual:R}, relative error {error:E3} > {relativeTolerance:E1}"));
    }

    public static void Abs(double expected, double actual, double tolerance, string what = "")
    {
        var error = Math.Abs(actual - expected);
        Assert.True(error <= tolerance, FormattableString.Invariant($"{what}: expected {expected:R}, got {actual:R}, error {error:E3} > {tolerance:E1}"));
    }
}
