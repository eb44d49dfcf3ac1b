using DescentOps.Primitives.Units;

namespace DescentOps.Rules.Catalogue;

/// <summary>A measured point: its dimension and the physical range its sensor can report, in SI.</summary>
public sealed record NumericPointSpec(string Name, PhysicalDimension Dimension, double MinimumSi, double MaximumSi) : TelemetryPointSpec(Name);
