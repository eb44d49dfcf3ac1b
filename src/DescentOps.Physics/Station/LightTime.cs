namespace DescentOps.Physics.Station;

/// <summary>One-way light time between the station and Earth: the floor under every command round trip.</summary>
public static class LightTime
{
    /// <summary>Astronomical unit, m (IAU 2012, exact).</summary>
    public const double AstronomicalUnitM = 149_597_870_700.0;

    /// <summary>Speed of light, m/s (exact).</summary>
    public const double SpeedOfLightMPerS = PhysicalConstants.SpeedOfLightMPerS;

    private const string Model = "the light time";

    /// <summary>d/c.</summary>
    public static double OneWayS(double distanceM)
    {
        ValidRange.RequireNonNegative(distanceM, nameof(distanceM), "m", Model);
        return distanceM / SpeedOfLightMPerS;
    }
}
