namespace DescentOps.Physics.Refreezing;

/// <summary>
/// Behind a moving probe without wall heating: where the meltwater has given up its superheat and starts to refreeze
/// (onset), and where it has all refrozen so that the water column ends (closure). Infinite when the ice is at its
/// melting point.
/// </summary>
public sealed record CriticalRefreezeLengths(double OnsetLengthM, double ClosureLengthM);
