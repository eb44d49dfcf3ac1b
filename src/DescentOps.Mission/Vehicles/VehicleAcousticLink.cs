using DescentOps.Physics.Acoustics;
using DescentOps.Physics.Seawater;
using DescentOps.Scenarios.Envelope;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// The probe-to-vehicle modem link under the shell: absorption at the carrier (Francois-Garrison or Ainslie-McColm)
/// at the Earth depth whose pressure equals the ice overburden, spreading, the scenario's noise and threshold, and the
/// range where the margin reaches zero. The pressure terms of the absorption formulas were fitted to Earth depth, so
/// the sea pressure under the shell is expressed as that depth (UNESCO standard ocean at 9.80665 m/s²); the sound speed
/// is TEOS-10's.
/// </summary>
public sealed record VehicleAcousticLink(AcousticLink Link, double PracticalSalinity, double EarthEquivalentDepthM, double SoundSpeedMPerS, double MaximumRangeM)
{
    /// <summary>Farthest range searched for the link's limit: 200 km, beyond any modem's reach under ice.</summary>
    public const double SearchLimitM = 200_000.0;

    /// <param name="acoustics">The scenario's acoustics section.</param>
    /// <param name="scenario">The scenario (ocean salinity, temperatures).</param>
    /// <param name="ocean">The ocean under the shell (TEOS-10).</param>
    /// <param name="earthEquivalentDepthM">The Earth depth of the pressure under the shell, for the absorption fits.</param>
    public static VehicleAcousticLink For(AcousticsModel acoustics, Scenario scenario, OceanUnderShell ocean, double earthEquivalentDepthM)
    {
        ArgumentNullException.ThrowIfNull(acoustics);
        ArgumentNullException.ThrowIfNull(ocean);
        return Build(acoustics, ScenarioOcean.PracticalSalinity(scenario), ScenarioOcean.AcousticTemperatureK(acoustics, ocean), ocean, earthEquivalentDepthM);
    }

    private static VehicleAcousticLink Build(AcousticsModel acoustics, double salinity, double temperature, OceanUnderShell ocean, double earthEquivalentDepthM)
    {
        var absorption = acoustics.Formula == AbsorptionFormula.AinslieMcColm
            ? SeawaterAbsorption.AinslieMcColmDbPerKm(acoustics.FrequencyHz, temperature, salinity, earthEquivalentDepthM, acoustics.PH)
            : SeawaterAbsorption.FrancoisGarrisonDbPerKm(acoustics.FrequencyHz, temperature, salinity, earthEquivalentDepthM, acoustics.PH);
        // The noise level is taken as the floor (self-noise) with no ambient term above it: under a still shell there is
        // no wind, rain or shipping, which is what the ambient fits describe.
        var link = new AcousticLink(acoustics.SourceLevelDb, absorption, acoustics.SpreadingExponent, 0.0, acoustics.BandwidthHz,
            double.NegativeInfinity, acoustics.NoiseSpectralLevelDb, 0.0, acoustics.DetectionThresholdDb);
        var range = SonarEquation.MaximumRange(link, SearchLimitM);
        var soundSpeed = Teos10Seawater.At(ocean.Water.AbsoluteSalinityGPerKg, ocean.Water.SeaPressurePa, temperature).SoundSpeedMPerS;
        return new VehicleAcousticLink(link, salinity, earthEquivalentDepthM, soundSpeed, range.RangeM);
    }

    /// <summary>
    /// The link in water of the acoustics section's temperature (required here) at an ocean salinity and the absolute
    /// pressure under the shell, with no scenario at hand (tests and engineering answers).
    /// </summary>
    public static VehicleAcousticLink For(AcousticsModel acoustics, double oceanSalinityKgPerKg, double basePressurePa)
    {
        ArgumentNullException.ThrowIfNull(acoustics);
        var temperature = acoustics.OceanTemperatureK ?? throw new ArgumentException("the acoustics need a water temperature here", nameof(acoustics));
        var salinity = Physics.Ocean.PracticalSalinity.FromAbsoluteKgPerKg(oceanSalinityKgPerKg);
        var ocean = OceanUnderShell.At(oceanSalinityKgPerKg * 1000.0, basePressurePa, ScenarioOcean.StandardGravityMPerS2, temperature);
        var depth = Physics.Ocean.SeawaterPressureDepth.StandardOceanDepthM(ocean.Water.SeaPressurePa, ScenarioOcean.StandardGravityMPerS2);
        return Build(acoustics, salinity, temperature, ocean, depth);
    }

    /// <summary>The sonar equation at a range; closer than 1 m counts as 1 m, where the spreading law starts.</summary>
    public AcousticLinkBudget At(double rangeM) => SonarEquation.Evaluate(Link, Math.Max(rangeM, 1.0));
}
