using MathNet.Numerics.RootFinding;

namespace DescentOps.Physics.Links;

/// <summary>
/// Link budget of a relay hop: P_r = P_t + G_t + G_r − FSPL_ice − A − L_misc against a 290 K thermal floor. An antenna
/// in cold ice sees less than 290 K, so the floor is conservative.
/// </summary>
public static class IceRadioLinkBudget
{
    private const double SpeedOfLightMPerS = PhysicalConstants.SpeedOfLightMPerS;
    private const string Model = "the relay radio link budget";

    /// <summary>Free-space spreading loss with the wavelength shortened by √ε′ in ice.</summary>
    public static double FreeSpaceLossDb(double distanceM, double frequencyHz, double relativePermittivity)
    {
        ValidRange.RequirePositive(distanceM, nameof(distanceM), "m", Model);
        ValidRange.Require(frequencyHz, 1e6, 1e9, nameof(frequencyHz), "Hz", Model);
        ValidRange.Require(relativePermittivity, 1.0, 100.0, nameof(relativePermittivity), "(relative permittivity)", Model);
        return 20.0 * Math.Log10(4.0 * Math.PI * distanceM * Math.Sqrt(relativePermittivity) * frequencyHz / SpeedOfLightMPerS);
    }

    /// <summary>kTB at 290 K (−174 dBm/Hz) plus the receiver noise figure.</summary>
    public static double NoiseFloorDbm(double bandwidthHz, double noiseFigureDb)
    {
        ValidRange.RequirePositive(bandwidthHz, nameof(bandwidthHz), "Hz", Model);
        ValidRange.RequireNonNegative(noiseFigureDb, nameof(noiseFigureDb), "dB", Model);
        return -174.0 + (10.0 * Math.Log10(bandwidthHz)) + noiseFigureDb;
    }

    /// <summary>Spreading plus absorption the hop may lose and still meet SNR and margin.</summary>
    public static double AllowedPathLossDb(IceRadioLink link)
    {
        ArgumentNullException.ThrowIfNull(link);
        return link.TransmitPowerDbm + link.TransmitGainDbi + link.ReceiveGainDbi - link.MiscLossDb
            - (NoiseFloorDbm(link.BandwidthHz, link.NoiseFigureDb) + link.RequiredSnrDb + link.RequiredMarginDb);
    }

    /// <summary>Excess of allowed over actual loss at a spacing in ice of uniform attenuation; non-negative means up.</summary>
    public static double MarginDb(IceRadioLink link, double spacingM, double attenuationDbPerM)
    {
        ValidRange.RequireNonNegative(attenuationDbPerM, nameof(attenuationDbPerM), "dB/m", Model);
        return AllowedPathLossDb(link) - FreeSpaceLossDb(spacingM, link.FrequencyHz, link.RelativePermittivity) - (attenuationDbPerM * spacingM);
    }

    /// <summary>
    /// Spacing where the margin reaches zero in ice of uniform attenuation, by Brent's method; loss grows strictly
    /// with distance, so the root is unique. Ice warms with depth, so callers take N_a of the warmest ice in the hop.
    /// </summary>
    public static IceRadioRange MaximumSpacing(IceRadioLink link, double attenuationDbPerM, double searchLimitM)
    {
        ValidRange.Require(searchLimitM, 1.0, 1e7, nameof(searchLimitM), "m", Model);
        var allowed = AllowedPathLossDb(link);
        const double shortest = 0.01;
        if (MarginDb(link, shortest, attenuationDbPerM) < 0.0) return new IceRadioRange(0.0, allowed, false);
        if (MarginDb(link, searchLimitM, attenuationDbPerM) >= 0.0) return new IceRadioRange(searchLimitM, allowed, true);
        var spacing = Brent.FindRoot(d => MarginDb(link, d, attenuationDbPerM), shortest, searchLimitM, 1e-9, 200);
        return new IceRadioRange(spacing, allowed, false);
    }
}
