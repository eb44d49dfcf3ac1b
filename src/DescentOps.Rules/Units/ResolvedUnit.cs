namespace DescentOps.Rules.Units;

/// <summary>A unit text resolved to its dimension and its conversion to SI.</summary>
public readonly record struct ResolvedUnit(QuantityDimension Dimension, double ScaleToSi, double OffsetToSi)
{
    /// <summary>
    /// Converts a number to SI. A difference (a step, a rate's numerator) drops the offset: a rise of 5 °C is a
    /// rise of 5 K, while a reading of 5 °C is 278.15 K.
    /// </summary>
    public double ToSi(double value, bool isDifference) => value * ScaleToSi + (isDifference ? 0.0 : OffsetToSi);
}
