namespace DescentOps.Physics.Acoustics;

/// <summary>Noise spectral levels, dB re 1 µPa²/Hz, of turbulence, shipping, wind and thermal noise, and their power sum.</summary>
public sealed record AmbientNoiseSpectrum(double TurbulenceDb, double ShippingDb, double WindDb, double ThermalDb, double TotalDb);
