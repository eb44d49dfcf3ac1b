namespace DescentOps.Scenarios.Model;

/// <summary>A salty layer of the shell between two depths, with the salt's mass per mass of ice.</summary>
public sealed record ShellLayerModel(double TopM, double BottomM, double SalinityKgPerKg);
