using DescentOps.Physics.Acoustics;
using DescentOps.Physics.Ocean;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// The probe-to-vehicle modem link under the shell: absorption at the carrier (Francois-Garrison or Ainslie-McColm)
/// at the Earth depth whose pressure equals the ice overburden, spreading, the scenario's noise and threshold, and the
/// range where the margin reaches zero. The pressure terms of the absorption formulas were fitted to Earth depth, so
/// the overburden is expressed as that depth (UNESCO standard ocean at 9.80665 m/s²).
/// </summary>
public sealed record VehicleAcousticLink(AcousticLink Link, double PracticalSalinity, double EarthEquivalentDepthM, double SoundSpeedMPerS, double MaximumRangeM)
{
    /// <summary>Standard gravity, m/s², to express a sea pressure as the Earth depth the absorption fits were made for.</summary>
    public const double StandardGravityMPerS2 = 9.80665;

    /// <summary>Farthest range searched for the link's limit: 200 km, beyond any modem's reach under ice.</summary>
    public const double SearchLimitM = 200_000.0;

    public static VehicleAcousticLink For(AcousticsModel acoustics, double oceanSalinityKgPerKg, double basePressurePa)
    {
        var salinity = Physics.Ocean.PracticalSalinity.FromAbsoluteKgPerKg(oceanSalinityKgPerKg);
        var depth = SeawaterPressureDepth.StandardOceanDepthM(basePressurePa, StandardGravityMPerS2);
        var absorption = acoustics.Formula == AbsorptionFormula.AinslieMcColm
            ? SeawaterAbsorption.AinslieMcColmDbPerKm(acoustics.FrequencyHz, acoustics.OceanTemperatureK, salinity, depth, acoustics.PH)
            : SeawaterAbsorption.FrancoisGarrisonDbPerKm(acoustics.FrequencyHz, acoustics.OceanTemperatureK, salinity, depth, acoustics.PH);
        // The noise level is taken as the floor (self-noise) with no ambient term above it: under a still shell there is
        // no wind, rain or shipping, which is what the ambient fits describe.
        var link = new AcousticLink(acoustics.SourceLevelDb, absorption, acoustics.SpreadingExponent, 0.0, acoustics.BandwidthHz,
            double.NegativeInfinity, acoustics.NoiseSpectralLevelDb, 0.0, acoustics.DetectionThresholdDb);
        var range = SonarEquation.MaximumRange(link, SearchLimitM);
        return new VehicleAcousticLink(link, salinity, depth, SoundSpeed.UnescoMPerS(salinity, acoustics.OceanTemperatureK, basePressurePa), range.RangeM);
    }

    /// <summary>The sonar equation at a range; closer than 1 m counts as 1 m, where the spreading law starts.</summary>
    public AcousticLinkBudget At(double rangeM) => SonarEquation.Evaluate(Link, Math.Max(rangeM, 1.0));
}
