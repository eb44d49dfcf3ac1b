namespace DescentOps.Physics.Station;

/// <summary>
/// When a surface station on a tidally locked moon of an outer planet can see Earth: the moon turns once per orbit
/// relative to Earth; a station on the planet-facing side also loses Earth behind the planet once per orbit.
/// Refraction and terrain are ignored; Earth is taken as a point.
/// </summary>
public static class EarthVisibility
{
    private const string Model = "the Earth visibility geometry";

    /// <summary>
    /// Fraction of each rotation with Earth above the elevation mask: H0/π with cos H0 = (sin e − sin φ sin δ)/(cos φ cos δ),
    /// δ the declination of Earth in the moon's equatorial frame. Always or never visible give 1 or 0.
    /// </summary>
    public static double InViewFraction(double latitudeRad, double earthDeclinationRad, double elevationMaskRad)
    {
        ValidRange.Require(latitudeRad, -Math.PI / 2, Math.PI / 2, nameof(latitudeRad), "rad", Model);
        ValidRange.Require(earthDeclinationRad, -Math.PI / 2, Math.PI / 2, nameof(earthDeclinationRad), "rad", Model);
        ValidRange.Require(elevationMaskRad, 0.0, Math.PI / 2, nameof(elevationMaskRad), "rad", Model);
        var denominator = Math.Cos(latitudeRad) * Math.Cos(earthDeclinationRad);
        var numerator = Math.Sin(elevationMaskRad) - (Math.Sin(latitudeRad) * Math.Sin(earthDeclinationRad));
        if (denominator <= 0.0) return numerator <= 0.0 ? 1.0 : 0.0;
        var cosH0 = numerator / denominator;
        if (cosH0 >= 1.0) return 0.0;
        if (cosH0 <= -1.0) return 1.0;
        return Math.Acos(cosH0) / Math.PI;
    }

    /// <summary>
    /// Time per orbit that the planet hides Earth from a station near the sub-planet point, P·asin(R_p/a)/π (geometric,
    /// no atmosphere, Earth near the orbit plane).
    /// </summary>
    public static double OccultationPerOrbitS(double orbitalPeriodS, double planetRadiusM, double orbitSemiMajorAxisM)
    {
        ValidRange.RequirePositive(orbitalPeriodS, nameof(orbitalPeriodS), "s", Model);
        ValidRange.RequirePositive(planetRadiusM, nameof(planetRadiusM), "m", Model);
        ValidRange.Require(orbitSemiMajorAxisM, planetRadiusM, double.MaxValue, nameof(orbitSemiMajorAxisM), "m", Model);
        return orbitalPeriodS * Math.Asin(planetRadiusM / orbitSemiMajorAxisM) / Math.PI;
    }

    /// <summary>Largest angle between Earth and the Sun seen from a planet at a heliocentric distance, asin(1 AU/d).</summary>
    public static double MaximumEarthElongationRad(double planetSunDistanceM)
    {
        ValidRange.Require(planetSunDistanceM, LightTime.AstronomicalUnitM * 1.0001, double.MaxValue, nameof(planetSunDistanceM), "m", Model);
        return Math.Asin(LightTime.AstronomicalUnitM / planetSunDistanceM);
    }
}
