using DescentOps.Primitives.Units;

namespace DescentOps.Rules.Catalogue;

/// <summary>An argument that is a physical quantity within a range, in SI.</summary>
public sealed record QuantityArgumentSpec(string Name, PhysicalDimension Dimension, double MinimumSi, double MaximumSi) : ArgumentSpec(Name);
