namespace DescentOps.Scenarios.Model;

/// <summary>The icy body and where the team sits: gravity sets hydrostatic pressure, distance sets the light time home.</summary>
public sealed record BodyModel(string Name, string Site, double GravityMPerS2, double DistanceToGroundM, double SurfacePressurePa);
