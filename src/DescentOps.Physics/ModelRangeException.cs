using DescentOps.Primitives.Failures;

namespace DescentOps.Physics;

/// <summary>
/// A model was asked outside its validity range. Carries the range and the value as data, so callers name the
/// field and format the refusal without reading the message; a run that meets one is aborted, not restarted.
/// </summary>
public sealed class ModelRangeException : ArgumentOutOfRangeException, IAbortsRun
{
    public ModelRangeException(ModelRange range, double value)
        : base(range?.Quantity, value, range?.Describe(value) + ".")
    {
        Range = range!;
        Value = value;
    }

    public ModelRange Range { get; }

    public double Value { get; }

    /// <summary>The model's sentence alone, without the runtime's parameter suffix.</summary>
    public string Sentence => Range.Describe(Value);
}
