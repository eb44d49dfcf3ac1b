using System.Globalization;

namespace DescentOps.Physics;

/// <summary>
/// The validity range of one input of one model, as data: which model, which quantity, in which unit, between which
/// bounds (inclusive; an infinite bound is open). The loader and the command line format refusals from it.
/// </summary>
public sealed record ModelRange(string Model, string Quantity, string Unit, double Minimum, double Maximum, bool MinimumExcluded = false)
{
    /// <summary>A range (0, +inf): any positive finite value.</summary>
    public static ModelRange Positive(string model, string quantity, string unit) => new(model, quantity, unit, 0.0, double.MaxValue, MinimumExcluded: true);

    /// <summary>A range [0, +inf): any non-negative finite value.</summary>
    public static ModelRange NonNegative(string model, string quantity, string unit) => new(model, quantity, unit, 0.0, double.MaxValue);

    /// <summary>Whether a value lies inside the range (NaN never does; an infinity only under an infinite bound).</summary>
    public bool Contains(double value) =>
        !double.IsNaN(value) && (MinimumExcluded ? value > Minimum : value >= Minimum) && value <= Maximum;

    /// <summary>The value if it lies inside the range; otherwise a <see cref="ModelRangeException"/> carrying this range.</summary>
    public double Require(double value) => Contains(value) ? value : throw new ModelRangeException(this, value);

    /// <summary>The bounds as text, e.g. "[0, 100000000] Pa".</summary>
    public string Bounds =>
        $"{(MinimumExcluded || double.IsInfinity(Minimum) ? '(' : '[')}{Number(Minimum)}, {Number(Maximum)}{(Maximum >= double.MaxValue ? ')' : ']')}{(Unit.Length == 0 ? "" : " " + Unit)}";

    /// <summary>One sentence naming the value, the quantity, the range and the model.</summary>
    public string Describe(double value) =>
        string.Create(CultureInfo.InvariantCulture, $"{Quantity} = {value:R}{(Unit.Length == 0 ? "" : " " + Unit)} is outside the valid range {Bounds} of {Model}");

    /// <summary>The same range with other bounds (a range that depends on the state, such as a freezing point).</summary>
    public ModelRange Between(double minimum, double maximum) => this with { Minimum = minimum, Maximum = maximum };

    private static string Number(double value) => value switch
    {
        double.PositiveInfinity or double.MaxValue => "+inf",
        double.NegativeInfinity => "-inf",
        _ => value.ToString("R", CultureInfo.InvariantCulture),
    };
}
