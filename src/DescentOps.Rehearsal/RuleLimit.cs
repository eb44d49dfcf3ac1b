using System.Globalization;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Units;

namespace DescentOps.Rehearsal;

/// <summary>
/// One limit check of the team's rules (a point against a threshold, inside any rule's condition), which the team's
/// view marks as within or beyond on every frame that reaches the ground.
/// </summary>
public sealed record RuleLimit(string Rule, string Placement, string Point, Threshold Threshold, string SiUnit = "")
{
    /// <summary>True when the check's comparison holds (the rule's limit is crossed); null when the frame lacks the point.</summary>
    public bool? Crossed(IReadOnlyDictionary<string, double> readings) =>
        readings.TryGetValue(Point, out var value) ? Threshold.Holds(value) : null;

    public string Describe() => Threshold.Kind switch
    {
        Comparison.Above => $"{Point} above {Number(Threshold.LowerSi)}",
        Comparison.Below => $"{Point} below {Number(Threshold.UpperSi)}",
        Comparison.Inside => $"{Point} inside {Number(Threshold.LowerSi)} to {Number(Threshold.UpperSi)}",
        _ => $"{Point} outside {Number(Threshold.LowerSi)} to {Number(Threshold.UpperSi)}",
    };

    /// <summary>Every limit check in a rule set, rule by rule, in the order written, each with its point's SI unit from the catalogue.</summary>
    public static IReadOnlyList<RuleLimit> Of(CompiledRuleSet rules, TelemetryCatalogue catalogue)
    {
        return [.. rules.Rules.SelectMany(rule => ConditionLeaf.Of(rule.Condition)
            .Where(leaf => !leaf.UnderTimeSinceOrLatch)
            .Select(leaf => leaf.Check)
            .OfType<LimitCondition>()
            .Select(limit => new RuleLimit(rule.Name, rule.Placement.ToString().ToLowerInvariant(), limit.Point, limit.Threshold, SiUnitOf(limit.Point, catalogue))))];
    }

    private static string SiUnitOf(string point, TelemetryCatalogue catalogue) =>
        catalogue.FindPoint(point) is NumericPointSpec spec ? UnitTable.SiSymbol(spec.Dimension) : "";

    private string Number(double si) => si.ToString("G6", CultureInfo.InvariantCulture) + (SiUnit.Length > 0 ? " " + SiUnit : "");
}
