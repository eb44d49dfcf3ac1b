namespace DescentOps.Scenarios.Model;

/// <summary>
/// A band of debris in the shell between two depths, with the debris volume per volume of ice, and the random tilt it
/// gives a head melting through it: standard deviation <see cref="TiltScatterRad"/> per square root of a metre.
/// </summary>
public sealed record DebrisBandModel(double TopM, double BottomM, double VolumeFraction, double TiltScatterRad = 0.0);
