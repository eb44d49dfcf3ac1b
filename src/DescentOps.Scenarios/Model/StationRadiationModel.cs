namespace DescentOps.Scenarios.Model;

/// <summary>
/// The radiation at the site and what it does to the station's electronics. <see cref="SurfaceDoseRateGyPerS"/> is the
/// unshielded dose rate in water (ice); the electronics sit behind <see cref="ShieldingM"/> of ice-equivalent shielding,
/// through which the electron share falls off over <see cref="ElectronLengthM"/> and the rest (bremsstrahlung photons)
/// over <see cref="PhotonLengthM"/>. The failure dose, in silicon, follows <see cref="FailureModel"/> with a scale
/// (Weibull η or lognormal D50) and a spread (Weibull β or lognormal σ).
/// </summary>
public sealed record StationRadiationModel(
    double SurfaceDoseRateGyPerS,
    double ShieldingM,
    double ElectronShare,
    double ElectronLengthM,
    double PhotonLengthM,
    DoseFailureModel FailureModel,
    double FailureDoseGy,
    double FailureSpread);
