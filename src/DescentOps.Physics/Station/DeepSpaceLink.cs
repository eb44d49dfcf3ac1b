namespace DescentOps.Physics.Station;

/// <summary>
/// The station-to-Earth radio link: R [dB-Hz] = EIRP − L_fs + G/T + 228.6 − (E_b/N0)_req − M, the last constant being
/// −10·log10 of Boltzmann's constant in dBW/(Hz·K).
/// </summary>
public static class DeepSpaceLink
{
    private const double MinusBoltzmannDbw = 228.6;
    private const string Model = "the deep-space link equation";

    /// <summary>Free-space loss 20·log10(4πd/λ).</summary>
    public static double FreeSpaceLossDb(double distanceM, double frequencyHz)
    {
        ValidRange.RequirePositive(distanceM, nameof(distanceM), "m", Model);
        ValidRange.Require(frequencyHz, 1e8, 1e12, nameof(frequencyHz), "Hz", Model);
        return 20.0 * Math.Log10(4.0 * Math.PI * distanceM * frequencyHz / LightTime.SpeedOfLightMPerS);
    }

    /// <summary>Parabolic dish gain η(πD/λ)², dBi.</summary>
    public static double DishGainDbi(double diameterM, double frequencyHz, double apertureEfficiency)
    {
        ValidRange.RequirePositive(diameterM, nameof(diameterM), "m", Model);
        ValidRange.Require(frequencyHz, 1e8, 1e12, nameof(frequencyHz), "Hz", Model);
        ValidRange.Require(apertureEfficiency, 0.01, 1.0, nameof(apertureEfficiency), "(fraction)", Model);
        var x = Math.PI * diameterM * frequencyHz / LightTime.SpeedOfLightMPerS;
        return 10.0 * Math.Log10(apertureEfficiency * x * x);
    }

    /// <summary>Supportable data rate, dB-Hz (10·log10 of bit/s).</summary>
    public static double DataRateDbHz(double transmitPowerW, double transmitGainDbi, double lineLossDb, double distanceM, double frequencyHz, double receiveGainDbi, double systemNoiseTemperatureK, double requiredEbN0Db, double marginDb)
    {
        ValidRange.RequirePositive(transmitPowerW, nameof(transmitPowerW), "W", Model);
        ValidRange.RequireNonNegative(lineLossDb, nameof(lineLossDb), "dB", Model);
        ValidRange.RequirePositive(systemNoiseTemperatureK, nameof(systemNoiseTemperatureK), "K", Model);
        var eirp = (10.0 * Math.Log10(transmitPowerW)) + transmitGainDbi - lineLossDb;
        var gOverT = receiveGainDbi - (10.0 * Math.Log10(systemNoiseTemperatureK));
        return eirp - FreeSpaceLossDb(distanceM, frequencyHz) + gOverT + MinusBoltzmannDbw - requiredEbN0Db - marginDb;
    }
}
