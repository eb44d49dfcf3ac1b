using DescentOps.Engine.Randomness;
using DescentOps.Physics.Radiation;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Station;

/// <summary>
/// The dose the station's electronics take and the dose they die at. The surface dose (water) is carried through
/// the shielding by the two-exponential ice rule and converted to silicon, the unit parts are rated in.
/// </summary>
public sealed class StationDose
{
    private readonly StationRadiationModel _model;

    public StationDose(StationRadiationModel model)
    {
        _model = model;
        var behindShieldGyPerS = IceShielding.DoseRateGyPerS(
            model.ShieldingM,
            model.SurfaceDoseRateGyPerS * model.ElectronShare,
            model.ElectronLengthM,
            model.SurfaceDoseRateGyPerS * (1 - model.ElectronShare),
            model.PhotonLengthM);
        SiliconDoseRateGyPerS = behindShieldGyPerS * DoseAccumulation.SiliconPerWaterDoseRatio;
        MedianFailureDoseGy = model.FailureModel == DoseFailureModel.Weibull
            ? DoseToFailure.WeibullMedianDoseGy(model.FailureDoseGy, model.FailureSpread)
            : model.FailureDoseGy;
    }

    /// <summary>Dose rate in the electronics, Gy(Si)/s.</summary>
    public double SiliconDoseRateGyPerS { get; }

    /// <summary>Unshielded dose rate at the surface in water, which exposed hardware takes.</summary>
    public double SurfaceDoseRateGyPerS => _model.SurfaceDoseRateGyPerS;

    public double MedianFailureDoseGy { get; }

    /// <summary>
    /// This station's failure dose, drawn once from its own stream: one uniform draw for a Weibull (1 − u keeps it
    /// off zero), one standard normal draw for a lognormal.
    /// </summary>
    public double DrawFailureDoseGy(RandomStream random) => _model.FailureModel == DoseFailureModel.Weibull
        ? DoseToFailure.WeibullFailureDoseGy(1.0 - random.NextUniform(), _model.FailureDoseGy, _model.FailureSpread)
        : DoseToFailure.LognormalFailureDoseGy(random.NextNormal(0.0, 1.0), _model.FailureDoseGy, _model.FailureSpread);

    /// <summary>Electronics dose after a time at the steady rate.</summary>
    public double SiliconDoseAfterGy(double elapsedS) => DoseAccumulation.AccumulatedDoseGy(0.0, SiliconDoseRateGyPerS, elapsedS);

    /// <summary>Time until the electronics reach a dose; +∞ when nothing reaches them.</summary>
    public double TimeToSiliconDoseS(double doseGy) => SiliconDoseRateGyPerS > 0 ? doseGy / SiliconDoseRateGyPerS : double.PositiveInfinity;
}
