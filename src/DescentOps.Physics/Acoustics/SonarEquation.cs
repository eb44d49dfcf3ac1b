using MathNet.Numerics.RootFinding;

namespace DescentOps.Physics.Acoustics;

/// <summary>
/// Passive sonar equation for a one-way modem link: SNR = SL − TL − (NL − DI), NL = N + 10·log10 B, margin = SNR − DT.
/// </summary>
public static class SonarEquation
{
    private const string Model = "the acoustic link sonar equation";

    /// <summary>Transmission loss, noise, SNR and margin at one range.</summary>
    public static AcousticLinkBudget Evaluate(AcousticLink link, double rangeM)
    {
        ArgumentNullException.ThrowIfNull(link);
        ValidRange.RequirePositive(link.BandwidthHz, nameof(link.BandwidthHz), "Hz", Model);
        var tl = link.TransitionRangeM > 0.0
            ? TransmissionLoss.SphericalThenCylindricalDb(rangeM, link.TransitionRangeM, link.AbsorptionDbPerKm)
            : TransmissionLoss.PowerLawDb(rangeM, link.SpreadingExponent, link.AbsorptionDbPerKm);
        var spectral = Math.Max(link.AmbientNoiseSpectralLevelDb, link.SelfNoiseSpectralLevelDb);
        var noise = spectral + (10.0 * Math.Log10(link.BandwidthHz));
        var snr = link.SourceLevelDb - tl - (noise - link.ReceiverDirectivityIndexDb);
        return new AcousticLinkBudget(rangeM, tl, noise, snr, snr - link.DetectionThresholdDb);
    }

    /// <summary>
    /// Range where the margin reaches zero, by Brent's method between 1 m and the search limit. Transmission loss grows
    /// strictly with range, so the root is unique; zero is returned if even 1 m fails.
    /// </summary>
    public static AcousticRange MaximumRange(AcousticLink link, double searchLimitM)
    {
        ValidRange.Require(searchLimitM, 1.0, 1e8, nameof(searchLimitM), "m", Model);
        if (Evaluate(link, 1.0).MarginDb < 0.0) return new AcousticRange(0.0, false);
        if (Evaluate(link, searchLimitM).MarginDb >= 0.0) return new AcousticRange(searchLimitM, true);
        var range = Brent.FindRoot(r => Evaluate(link, r).MarginDb, 1.0, searchLimitM, 1e-9, 200);
        return new AcousticRange(range, false);
    }
}
