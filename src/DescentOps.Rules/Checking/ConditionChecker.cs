using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;
using DescentOps.Rules.Units;

namespace DescentOps.Rules.Checking;

/// <summary>A rule's condition against the catalogue: points that exist and can be read, thresholds in their units and ranges.</summary>
internal sealed class ConditionChecker
{
    private readonly TelemetryCatalogue _catalogue;
    private readonly DiagnosticList _diagnostics;
    private readonly QuantityChecker _quantities;

    /// <summary>Where the rule whose condition is being checked runs (null outside a rule).</summary>
    private Placement? _placement;

    public ConditionChecker(TelemetryCatalogue catalogue, DiagnosticList diagnostics, QuantityChecker quantities)
    {
        _catalogue = catalogue;
        _diagnostics = diagnostics;
        _quantities = quantities;
    }

    /// <summary>The condition of a rule that runs at <paramref name="placement"/> (null: not a rule's, e.g. a fault's 'when').</summary>
    internal CompiledCondition? Check(ConditionSyntax condition, Placement? placement)
    {
        _placement = placement;
        try
        {
            return Check(condition);
        }
        finally
        {
            _placement = null;
        }
    }

    private CompiledCondition? Check(ConditionSyntax condition)
    {
        switch (condition)
        {
            case LimitCheckSyntax limit:
            {
                var spec = NumericPoint(limit.Point);
                if (spec is null)
                {
                    return null;
                }

                var threshold = CheckThreshold(limit.Threshold, QuantityDimension.Of(spec.Dimension), isDifference: false, $"point '{spec.Name}'");
                if (threshold is null)
                {
                    return null;
                }

                CheckPhysicalRange(spec, limit.Threshold.Lower, threshold.Kind == Comparison.Below ? threshold.UpperSi : threshold.LowerSi);
                if (limit.Threshold.Upper is { } upper)
                {
                    CheckPhysicalRange(spec, upper, threshold.UpperSi);
                }

                return new LimitCondition(spec.Name, threshold);
            }

            case StateCheckSyntax state:
            {
                var spec = _catalogue.FindPoint(state.Point.Text);
                if (spec is null)
                {
                    UnknownPoint(state.Point);
                    return null;
                }

                if (!Readable(spec, state.Point))
                {
                    return null;
                }

                if (spec is not DiscretePointSpec discrete)
                {
                    _diagnostics.Error(DiagnosticCode.WrongPointKind, state.Point.Location, $"point '{spec.Name}' is numeric; compare it with above, below, inside or outside, not 'is'");
                    return null;
                }

                if (!discrete.Values.Contains(state.Value.Text, StringComparer.Ordinal))
                {
                    _diagnostics.Error(DiagnosticCode.ImpossibleDiscreteValue, state.Value.Location,
                        $"point '{spec.Name}' is never '{state.Value.Text}': its states are {string.Join(", ", discrete.Values)}");
                    return null;
                }

                return new StateCondition(spec.Name, state.Value.Text, state.Negated);
            }

            case RateCheckSyntax rate:
            {
                var spec = NumericPoint(rate.Point);
                var window = _quantities.TryDuration(rate.Window, "a rate window", allowZero: false);
                if (spec is null)
                {
                    return null;
                }

                var threshold = CheckThreshold(rate.Threshold, QuantityDimension.Of(spec.Dimension).Rate, isDifference: true, $"the rate of point '{spec.Name}'");
                return threshold is null || window is null ? null : new RateCondition(spec.Name, window.Value, threshold);
            }

            case StepCheckSyntax step:
            {
                var spec = NumericPoint(step.Point);
                if (spec is null)
                {
                    return null;
                }

                var threshold = CheckThreshold(step.Threshold, QuantityDimension.Of(spec.Dimension), isDifference: true, $"a step of point '{spec.Name}'");
                return threshold is null ? null : new StepCondition(spec.Name, threshold);
            }

            case DifferenceCheckSyntax difference:
            {
                var left = NumericPoint(difference.Left);
                var right = NumericPoint(difference.Right);
                if (left is null || right is null)
                {
                    return null;
                }

                if (left.Dimension != right.Dimension)
                {
                    _diagnostics.Error(DiagnosticCode.UnitMismatch, difference.Right.Location,
                        $"'{left.Name}' is a {QuantityDimension.Of(left.Dimension)}, but '{right.Name}' is a {QuantityDimension.Of(right.Dimension)}: only points of one dimension can be taken from each other");
                    return null;
                }

                // A difference of two temperatures is a difference (5 °C is 5 K), as a step's is.
                var threshold = CheckThreshold(difference.Threshold, QuantityDimension.Of(left.Dimension), isDifference: true, $"'{left.Name}' minus '{right.Name}'");
                return threshold is null ? null : new DifferenceCondition(left.Name, right.Name, threshold);
            }

            case AllOfSyntax all:
            {
                var operands = all.Operands.Select(Check).ToArray();
                return operands.Any(o => o is null) ? null : new AllOfCondition(operands!);
            }

            case AnyOfSyntax any:
            {
                var operands = any.Operands.Select(Check).ToArray();
                return operands.Any(o => o is null) ? null : new AnyOfCondition(operands!);
            }

            case NotSyntax not:
                return Check(not.Operand) is { } negated ? new NotCondition(negated) : null;

            case HoldsForDurationSyntax forDuration:
            {
                var operand = Check(forDuration.Operand);
                var duration = _quantities.TryDuration(forDuration.Duration, "a persistence duration", allowZero: false);
                return operand is null || duration is null ? null : new HoldsForDurationCondition(operand, duration.Value);
            }

            case HoldsForSamplesSyntax forSamples:
                return Check(forSamples.Operand) is { } counted ? new HoldsForSamplesCondition(counted, forSamples.Count) : null;

            case TimeSinceSyntax since:
            {
                var happened = Check(since.Event);
                var duration = _quantities.TryDuration(since.Duration, "a time since an event", allowZero: true);
                return happened is null || duration is null ? null : new TimeSinceCondition(happened, since.Comparison, duration.Value);
            }

            case LatchedSyntax latched:
                return Check(latched.Operand) is { } latch ? new LatchedCondition(latch) : null;

            default:
                return null;
        }
    }

    private NumericPointSpec? NumericPoint(NameSyntax point)
    {
        var spec = _catalogue.FindPoint(point.Text);
        if (spec is null)
        {
            UnknownPoint(point);
            return null;
        }

        if (spec is not NumericPointSpec numeric)
        {
            _diagnostics.Error(DiagnosticCode.WrongPointKind, point.Location, $"point '{spec.Name}' is discrete; test it with 'is', not with a threshold");
            return null;
        }

        return Readable(spec, point) ? numeric : null;
    }

    private bool Readable(TelemetryPointSpec spec, NameSyntax point)
    {
        if (spec.GroundOnly && (_placement != Placement.Ground || _catalogue.ReadsTrueState))
        {
            _diagnostics.Error(DiagnosticCode.GroundOnly, point.Location, $"'{spec.Name}' is what the ground knows of the station: only ground rules and procedures may read it, not a rule on board or a fault's 'when'");
            return false;
        }

        if (!spec.TrueStateOnly || _catalogue.ReadsTrueState) return true;
        _diagnostics.Error(DiagnosticCode.TrueStateOnly, point.Location, $"'{spec.Name}' is true state that no sensor reports: only a fault's 'when' may read it, not a rule");
        return false;
    }

    private void UnknownPoint(NameSyntax point)
    {
        if (_catalogue.UnknownLanderOf(point.Text) is { } lander)
        {
            _diagnostics.Error(DiagnosticCode.UnknownLander, point.Location, $"unknown lander '{lander}' in '{point.Text}'; the landers are {string.Join(", ", _catalogue.Landers.Order(StringComparer.Ordinal))}");
            return;
        }

        _diagnostics.Error(DiagnosticCode.UnknownPoint, point.Location, $"unknown telemetry point '{point.Text}'");
    }

    private Threshold? CheckThreshold(ThresholdSyntax threshold, QuantityDimension dimension, bool isDifference, string what)
    {
        var lower = _quantities.TryQuantity(threshold.Lower, dimension, isDifference, what);
        if (threshold.Upper is null)
        {
            return lower is not { } value ? null
                : threshold.Kind == Comparison.Above ? Threshold.Above(value) : Threshold.Below(value);
        }

        var upper = _quantities.TryQuantity(threshold.Upper, dimension, isDifference, what);
        if (lower is not { } low || upper is not { } high)
        {
            return null;
        }

        if (low > high)
        {
            _diagnostics.Error(DiagnosticCode.InvalidBand, threshold.Lower.Location, $"the band {threshold.Lower} to {threshold.Upper} runs backwards: write the lower end first");
            return null;
        }

        return new Threshold(threshold.Kind, low, high);
    }

    private void CheckPhysicalRange(NumericPointSpec spec, QuantitySyntax written, double valueSi)
    {
        if (valueSi < spec.MinimumSi || valueSi > spec.MaximumSi)
        {
            _diagnostics.Error(DiagnosticCode.ThresholdOutsideRange, written.Location,
                $"{written} is outside the physical range of point '{spec.Name}' ({QuantityChecker.Si(spec.MinimumSi, spec.Dimension)} to {QuantityChecker.Si(spec.MaximumSi, spec.Dimension)})");
        }
    }
}
