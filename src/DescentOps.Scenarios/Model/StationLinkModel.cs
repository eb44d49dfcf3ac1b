namespace DescentOps.Scenarios.Model;

/// <summary>
/// The geometry of the link home: the home direction comes round once per <see cref="RotationPeriodS"/>; the station's
/// latitude, home's declination and the elevation mask set how much of each turn it is up; a parent planet of
/// <see cref="PlanetRadiusM"/> at <see cref="OrbitRadiusM"/> (both null: none) hides it about
/// <see cref="PlanetHourAngleRad"/>. <see cref="Radio"/> null means the data rate does not limit the link.
/// </summary>
public sealed record StationLinkModel(
    double RotationPeriodS,
    double LatitudeRad,
    double HomeDeclinationRad,
    double ElevationMaskRad,
    double StartHourAngleRad,
    double? PlanetRadiusM,
    double? OrbitRadiusM,
    double PlanetHourAngleRad,
    StationRadioModel? Radio);
