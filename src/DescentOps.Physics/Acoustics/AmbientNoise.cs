namespace DescentOps.Physics.Acoustics;

/// <summary>
/// Ambient noise spectral level, dB re 1 µPa²/Hz, from the empirical fits of Coates (1989) as used by Stojanovic
/// (2007), "On the relationship between capacity and distance in an underwater acoustic communication channel".
/// Under a still ice shell with no ships and no wind these levels fall far below any hydrophone's own noise, which is
/// why the sonar equation floors them at a receiver self-noise.
/// </summary>
public static class AmbientNoise
{
    private const string Model = "the Coates (1989) ambient noise fits";

    /// <summary>Each source term and their power sum, at a frequency, shipping activity s in [0, 1] and wind speed.</summary>
    public static AmbientNoiseSpectrum SpectralLevel(double frequencyHz, double shippingActivity, double windSpeedMPerS)
    {
        ValidRange.Require(frequencyHz, 1.0, 1e6, nameof(frequencyHz), "Hz", Model);
        ValidRange.Require(shippingActivity, 0.0, 1.0, nameof(shippingActivity), "(fraction)", Model);
        ValidRange.Require(windSpeedMPerS, 0.0, 40.0, nameof(windSpeedMPerS), "m/s", Model);
        var f = frequencyHz / 1e3;
        var lf = Math.Log10(f);
        var turbulence = 17.0 - (30.0 * lf);
        var shipping = 40.0 + (20.0 * (shippingActivity - 0.5)) + (26.0 * lf) - (60.0 * Math.Log10(f + 0.03));
        var wind = 50.0 + (7.5 * Math.Sqrt(windSpeedMPerS)) + (20.0 * lf) - (40.0 * Math.Log10(f + 0.4));
        var thermal = -15.0 + (20.0 * lf);
        var total = 10.0 * Math.Log10(Math.Pow(10.0, turbulence / 10.0) + Math.Pow(10.0, shipping / 10.0) + Math.Pow(10.0, wind / 10.0) + Math.Pow(10.0, thermal / 10.0));
        return new AmbientNoiseSpectrum(turbulence, shipping, wind, thermal, total);
    }
}
