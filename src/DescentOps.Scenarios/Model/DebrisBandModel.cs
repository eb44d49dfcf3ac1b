namespace DescentOps.Scenarios.Model;

/// <summary>A band of debris in the shell between two depths, with the debris volume per volume of ice.</summary>
public sealed record DebrisBandModel(double TopM, double BottomM, double VolumeFraction);
