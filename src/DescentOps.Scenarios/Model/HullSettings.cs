namespace DescentOps.Scenarios.Model;

/// <summary>A propeller vehicle's hull: diameter, drag coefficient on frontal area, and propeller-and-motor efficiency.</summary>
public sealed record HullSettings(double DiameterM, double DragCoefficient, double PropulsiveEfficiency);
