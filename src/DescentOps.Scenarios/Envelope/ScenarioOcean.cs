using DescentOps.Physics.Ocean;
using DescentOps.Physics.Seawater;
using DescentOps.Physics.Shell;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Envelope;

/// <summary>
/// The ocean a scenario's vehicles work in: TEOS-10 water at the ocean's salinity under the shell's base pressure, at
/// the local freezing point unless <c>shell.ocean_temperature</c> (or, without it, <c>acoustics.ocean_temperature</c>)
/// says warmer; and the water temperature the absorption formula is given (<c>acoustics.ocean_temperature</c>, or the
/// ocean's own).
/// </summary>
public static class ScenarioOcean
{
    public static OceanUnderShell Build(Scenario scenario, IceShell shell)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(shell);
        return At(scenario, shell.BasePressurePa);
    }

    /// <summary>The ocean under a base pressure (absolute), as the vehicles learn it at release.</summary>
    public static OceanUnderShell At(Scenario scenario, double basePressurePa)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return OceanUnderShell.At(scenario.Shell.OceanSalinityKgPerKg * 1000.0, basePressurePa, scenario.Body.GravityMPerS2, GivenTemperatureK(scenario));
    }

    /// <summary>The ocean temperature a scenario gives, if any: <c>shell.ocean_temperature</c>, else <c>acoustics.ocean_temperature</c>.</summary>
    public static double? GivenTemperatureK(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return scenario.Shell.OceanTemperatureK ?? scenario.Acoustics?.OceanTemperatureK;
    }

    /// <summary>Temperature the acoustic absorption is evaluated at.</summary>
    public static double AcousticTemperatureK(AcousticsModel acoustics, OceanUnderShell ocean)
    {
        ArgumentNullException.ThrowIfNull(acoustics);
        ArgumentNullException.ThrowIfNull(ocean);
        return acoustics.OceanTemperatureK ?? ocean.TemperatureK;
    }

    /// <summary>Practical salinity of the ocean (reference composition), which the absorption fits take.</summary>
    public static double PracticalSalinity(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return Physics.Ocean.PracticalSalinity.FromAbsoluteKgPerKg(scenario.Shell.OceanSalinityKgPerKg);
    }

    /// <summary>
    /// The absorption fits' pressure terms were fitted to Earth depth: the shell's base pressure is expressed as the depth
    /// of the UNESCO standard ocean with that sea pressure at standard gravity.
    /// </summary>
    public static double EarthEquivalentDepthM(IceShell shell)
    {
        ArgumentNullException.ThrowIfNull(shell);
        return SeawaterPressureDepth.StandardOceanDepthM(OceanUnderShell.SeaPressurePa(shell.BasePressurePa), StandardGravityMPerS2);
    }

    /// <summary>Standard gravity, m/s².</summary>
    public const double StandardGravityMPerS2 = 9.80665;
}
