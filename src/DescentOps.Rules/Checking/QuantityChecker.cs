using System.Globalization;
using DescentOps.Primitives.Time;
using DescentOps.Primitives.Units;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;
using DescentOps.Rules.Units;

namespace DescentOps.Rules.Checking;

/// <summary>Quantities and durations as a rule writes them: unit known, of the expected dimension, finite, in SI.</summary>
internal sealed class QuantityChecker
{
    private readonly DiagnosticList _diagnostics;

    public QuantityChecker(DiagnosticList diagnostics) => _diagnostics = diagnostics;

    internal double? TryQuantity(QuantitySyntax quantity, QuantityDimension expected, bool isDifference, string what)
    {
        var dimensionless = expected.Normalized == QuantityDimension.Of(PhysicalDimension.Dimensionless);
        if (!quantity.HasUnit)
        {
            if (dimensionless)
            {
                return quantity.Number;
            }

            _diagnostics.Error(DiagnosticCode.MissingUnit, quantity.Location, $"{what} is a {expected}: give a unit, e.g. '{quantity} {UnitTable.Example(expected)}'");
            return null;
        }

        if (!UnitTable.TryResolve(quantity.Unit, out var unit))
        {
            _diagnostics.Error(DiagnosticCode.UnknownUnit, quantity.UnitLocation, $"unknown unit '{quantity.Unit}'");
            return null;
        }

        if (!unit.Dimension.SameAs(expected))
        {
            _diagnostics.Error(DiagnosticCode.UnitMismatch, quantity.Location, $"{what} is a {expected.Normalized}, but {quantity} is a {unit.Dimension.Normalized}");
            return null;
        }

        var si = unit.ToSi(quantity.Number, isDifference);
        if (!double.IsFinite(si))
        {
            _diagnostics.Error(DiagnosticCode.InvalidNumber, quantity.Location, $"{quantity} is too large");
            return null;
        }

        return si;
    }

    internal SimDuration? TryDuration(QuantitySyntax quantity, string what, bool allowZero)
    {
        if (TryQuantity(quantity, QuantityDimension.Of(PhysicalDimension.Duration), isDifference: true, what) is not { } seconds)
        {
            return null;
        }

        if (Math.Abs(seconds) > RuleChecker.MaxDurationS)
        {
            _diagnostics.Error(DiagnosticCode.InvalidNumber, quantity.Location, $"{what} of {quantity} is longer than the {Si(RuleChecker.MaxDurationS)} s a rule may name");
            return null;
        }

        var duration = SimDuration.FromSeconds(seconds);
        if (duration < SimDuration.Zero || (!allowZero && duration == SimDuration.Zero))
        {
            _diagnostics.Error(DiagnosticCode.NonPositiveDuration, quantity.Location, $"{what} must be {(allowZero ? "zero or more" : "longer than zero")} (at least 1 µs), found {quantity}");
            return null;
        }

        return duration;
    }

    internal static string Si(double value) => value.ToString("G6", CultureInfo.InvariantCulture);

    /// <summary>A value in SI with its SI unit, as a person reads it in a message: "3000 W", "0.000833 m/s".</summary>
    internal static string Si(double value, PhysicalDimension dimension) =>
        UnitTable.SiSymbol(dimension) is { Length: > 0 } symbol ? Si(value) + " " + symbol : Si(value);
}
