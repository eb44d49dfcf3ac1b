namespace DescentOps.Rules.Units;

/// <summary>A unit symbol and how it converts to SI: si = value × ScaleToSi + OffsetToSi (the offset is for °C only).</summary>
public sealed record UnitDefinition(string Symbol, Dimension Dimension, double ScaleToSi, double OffsetToSi = 0.0);
