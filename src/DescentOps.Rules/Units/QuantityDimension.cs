using DescentOps.Primitives.Units;

namespace DescentOps.Rules.Units;

/// <summary>
/// A dimension, or a dimension per unit time (what a rate check compares). A length per time is a speed,
/// so "m/h" written as a rate of a depth and "m/h" written for a speed point mean the same thing.
/// </summary>
public readonly record struct QuantityDimension(PhysicalDimension Base, bool PerSecond)
{
    public static QuantityDimension Of(PhysicalDimension dimension) => new(dimension, false);

    public QuantityDimension Normalized => Base == PhysicalDimension.Length && PerSecond ? Of(PhysicalDimension.Speed) : this;

    /// <summary>The dimension of this quantity's rate of change.</summary>
    public QuantityDimension Rate => PerSecond ? this : new QuantityDimension(Base, true).Normalized;

    public bool SameAs(QuantityDimension other) => Normalized == other.Normalized;

    public override string ToString()
    {
        var name = Base.ToString().ToLowerInvariant();
        return PerSecond ? $"{name} per time" : name;
    }
}
