namespace DescentOps.Physics.Seawater;

/// <summary>
/// One state of seawater by TEOS-10: Absolute Salinity, sea pressure, in-situ, potential and Conservative Temperature,
/// the freezing temperature at that salinity and pressure, density and sound speed from the full Gibbs function and,
/// beside them, the same from the 75-term polynomial (Roquet et al. 2015). The simulator uses the Gibbs-function values:
/// outside the oceanographic range the polynomial was fitted in, it departs from them (at 100 MPa by up to 0.1 kg/m³
/// and 3.5 m/s for fresh water at its freezing point, 0.24 kg/m³ and 22 m/s at 40 °C; GSW 3.6.16).
/// </summary>
public sealed record SeawaterState(
    double AbsoluteSalinityGPerKg,
    double SeaPressurePa,
    double TemperatureK,
    double PotentialTemperatureK,
    double ConservativeTemperatureK,
    double FreezingTemperatureK,
    double DensityKgPerM3,
    double SoundSpeedMPerS,
    double PolynomialDensityKgPerM3,
    double PolynomialSoundSpeedMPerS,
    double SpecificHeatJPerKgK);
