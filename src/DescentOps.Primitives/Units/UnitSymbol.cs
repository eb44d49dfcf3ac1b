namespace DescentOps.Primitives.Units;

/// <summary>
/// A unit as written (case matters: "mW" is a milliwatt, "MW" a megawatt), what it measures and how it converts to SI.
/// <see cref="ScaleToSi"/> and <see cref="OffsetToSi"/> define the unit; <see cref="ToSi"/> is the same conversion
/// written as the steps scenario files were always read with (1.3 d is 1.3 × 24 × 3600 = 112320.00000000001 s, where
/// 1.3 × 86400 gives 112320), so that a value reads to the same double it always did and logs stay byte-identical.
/// </summary>
public sealed record UnitSymbol(string Symbol, PhysicalDimension Dimension, double ScaleToSi, double OffsetToSi, Func<double, double> ToSi)
{
    public static UnitSymbol Scaled(string symbol, PhysicalDimension dimension, double scaleToSi) =>
        new(symbol, dimension, scaleToSi, 0.0, v => v * scaleToSi);
}
