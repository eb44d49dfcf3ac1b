namespace DescentOps.Scenarios.Model;

/// <summary>A convecting layer under the lid: where it begins, its core temperature, and its basal boundary layer's thickness.</summary>
public sealed record ConvectionModel(double TopM, double TemperatureK, double BasalBoundaryM);
