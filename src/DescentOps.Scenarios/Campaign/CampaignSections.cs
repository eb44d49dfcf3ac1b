using System.Globalization;
using DescentOps.Primitives.Units;
using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Campaign;

/// <summary>
/// Reads a scenario's <c>uncertain</c> and <c>criteria</c> sections into the model, with every problem reported at its
/// place in the file: a path the format or the scenario does not have, a value without the field's unit, a negative
/// spread, a low end above the high end, a range outside the field's valid range, a measure criteria do not know.
/// </summary>
public static class CampaignSections
{
    public static Scenario Read(Scenario scenario, BoundSection root, string text, List<ScenarioError> errors)
    {
        var inputs = new List<UncertainInput>();
        var items = root.List("uncertain");
        for (var i = 0; i < items.Count; i++)
        {
            if (ReadInput(items[i], $"uncertain[{i}]", text, errors) is { } input)
            {
                if (inputs.Any(x => x.Path == input.Path))
                {
                    errors.Add(new ScenarioError(items[i].LocationOf("path"), $"uncertain[{i}].path", $"'{input.Path}' is uncertain twice"));
                }

                inputs.Add(input);
            }
        }

        var criteria = new List<MissionCriterion>();
        var list = root.List("criteria");
        for (var i = 0; i < list.Count; i++)
        {
            var name = list[i].Text("name");
            var requirement = list[i].Text("require");
            if (criteria.Any(c => c.Name == name))
            {
                errors.Add(new ScenarioError(list[i].LocationOf("name"), $"criteria[{i}].name", $"criterion '{name}' is given twice"));
            }

            var scope = Scope(scenario, list[i], $"criteria[{i}]", errors);
            if (ParseCriterion(name, requirement, out var error) is { } criterion) criteria.Add(criterion with { Scope = scope.Scope, Lander = scope.Lander });
            else errors.Add(new ScenarioError(list[i].LocationOf("require"), $"criteria[{i}].require", error));
        }

        return scenario with { Uncertain = inputs, Criteria = criteria };
    }

    /// <summary>A criterion's <c>lander</c> or <c>landers</c>: allowed only with landers, one of the two, a lander the scenario has.</summary>
    private static (CriterionScope Scope, string? Lander) Scope(Scenario scenario, BoundSection item, string at, List<ScenarioError> errors)
    {
        var lander = item.OptionalText("lander");
        var landers = item.OptionalText("landers");
        if (scenario.Landers.Count == 0)
        {
            if (lander is not null) errors.Add(new ScenarioError(item.LocationOf("lander"), at + ".lander", "this scenario has no landers list: its criteria judge the whole run"));
            if (landers is not null) errors.Add(new ScenarioError(item.LocationOf("landers"), at + ".landers", "this scenario has no landers list: its criteria judge the whole run"));
            return (CriterionScope.Run, null);
        }

        if (lander is not null && landers is not null)
        {
            errors.Add(new ScenarioError(item.LocationOf("landers"), at + ".landers", "give 'lander' (one lander) or 'landers' (every or any), not both"));
            return (CriterionScope.EveryLander, null);
        }

        if (lander is not null)
        {
            if (scenario.Landers.All(l => l.Name != lander))
            {
                errors.Add(new ScenarioError(item.LocationOf("lander"), at + ".lander", $"no lander is named '{lander}' (the landers: {string.Join(", ", scenario.Landers.Select(l => l.Name))})"));
            }

            return (CriterionScope.Lander, lander);
        }

        return (landers == "any" ? CriterionScope.AnyLander : CriterionScope.EveryLander, null);
    }

    /// <summary>A comma-separated list of rule names (empty when absent).</summary>
    public static IReadOnlyList<string> RuleNames(string? text) =>
        text is null ? [] : [.. text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)];

    /// <summary>Parses "MEASURE above Q", "MEASURE below Q" or "MEASURE inside Q to Q" (the rule language's comparison words).</summary>
    public static MissionCriterion? ParseCriterion(string name, string requirement, out string error)
    {
        error = "";
        var words = requirement.Trim().Split(' ', 2, StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        if (words.Length < 2 || CriterionMeasure.Find(words[0]) is not { } measure)
        {
            error = $"a criterion starts with a run measure ({string.Join(", ", CriterionMeasure.All.Select(m => m.Name))})";
            return null;
        }

        var rest = words[1].Split(' ', 2, StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        var comparison = rest[0];
        if (comparison is not ("above" or "below" or "inside" or "outside") || rest.Length < 2)
        {
            error = $"after '{measure.Name}' comes 'above Q', 'below Q', 'inside Q to Q' or 'outside Q to Q'";
            return null;
        }

        if (comparison is "above" or "below")
        {
            return Value(measure, rest[1], out var v, out error) ? new MissionCriterion(name, requirement, measure.Name, comparison, v, v) : null;
        }

        var ends = rest[1].Split(" to ", 2, StringSplitOptions.TrimEntries);
        if (ends.Length < 2)
        {
            error = $"'{comparison}' needs two ends: '{comparison} LOW to HIGH'";
            return null;
        }

        if (!Value(measure, ends[0], out var low, out error) || !Value(measure, ends[1], out var high, out error)) return null;
        if (low > high)
        {
            error = "the lower end comes first";
            return null;
        }

        return new MissionCriterion(name, requirement, measure.Name, comparison, low, high);
    }

    private static bool Value(CriterionMeasure measure, string text, out double si, out string error)
    {
        error = "";
        if (measure.Kind is { } kind)
        {
            if (!QuantityParser.TryParseSi(kind, text, out si, out var parseError))
            {
                error = $"'{measure.Name}': {parseError}";
                return false;
            }
        }
        else if (!StrictNumber.TryParse(text, out si, out var why))
        {
            error = $"'{measure.Name}' is a count: give a plain number, not '{text}' ({why})";
            return false;
        }

        // Every measure is a time, a depth, an energy or a count: none is negative or infinite.
        if (si >= 0 && double.IsFinite(si)) return true;
        error = $"'{measure.Name}' is never negative or infinite: '{text}' cannot be a threshold";
        return false;
    }

    private static UncertainInput? ReadInput(BoundSection item, string at, string text, List<ScenarioError> errors)
    {
        var path = item.Text("path");
        var field = ScenarioPatch.FindField(path, out var error);
        if (field is null || !ScenarioPatch.Exists(text, path, out error))
        {
            errors.Add(new ScenarioError(item.LocationOf("path"), at + ".path", $"unknown parameter path '{path}': {error}"));
            return null;
        }

        (QuantityKind? kind, double min, double max, bool minExclusive) = field switch
        {
            QuantityField q => ((QuantityKind?)q.Kind, q.MinSi, q.MaxSi, q.MinExclusive),
            NumberField n => (null, n.Min, n.Max, false),
            _ => (null, 0, 0, false),
        };
        if (field is not (QuantityField or NumberField) || path.StartsWith("run.", StringComparison.Ordinal))
        {
            errors.Add(new ScenarioError(item.LocationOf("path"), at + ".path", $"'{path}' is not a number or a quantity a run can draw"));
            return null;
        }

        var before = errors.Count;
        double Get(string name)
        {
            if (item.OptionalText(name) is not { } value)
            {
                errors.Add(new ScenarioError(item.LocationOf("distribution"), $"{at}.{name}", $"this distribution needs '{name}'"));
                return double.NaN;
            }

            if (kind is { } k)
            {
                if (QuantityParser.TryParseSi(k, value, out var si, out var parseError)) return si;
                errors.Add(new ScenarioError(item.LocationOf(name), $"{at}.{name}", $"'{value}' for {path}: {parseError}"));
                return double.NaN;
            }

            if (StrictNumber.TryParse(value, out var number, out var why)) return number;
            errors.Add(new ScenarioError(item.LocationOf(name), $"{at}.{name}", $"'{value}' is not a plain number, as {path} is ({why})"));
            return double.NaN;
        }

        void Refuse(string name, string why) => errors.Add(new ScenarioError(item.LocationOf(name), $"{at}.{name}", why));
        var unit = kind is { } u && u != QuantityKind.Ratio ? u.SiSymbol() : "";
        string Show(double si) => kind is null ? si.ToString("R", CultureInfo.InvariantCulture) : string.Create(CultureInfo.InvariantCulture, $"{si:R} {unit}");
        bool Inside(double v) => (minExclusive ? v > min : v >= min) && v <= max;
        var range = $"{path} must lie in {(minExclusive ? "(" : "[")}{Show(min)}, {Show(max)}]";

        UncertainInput? result = null;
        switch (item.Text("distribution"))
        {
            case "normal":
                {
                    var mean = Get("mean");
                    var sd = Get("sd");
                    if (errors.Count > before) return null;
                    if (!(sd > 0)) Refuse("sd", "the standard deviation must be positive");
                    else if (sd > max - min) Refuse("sd", $"a standard deviation of {Show(sd)} is wider than the field's whole valid range ({range}): almost every draw would fall outside it");
                    else if (!Inside(mean)) Refuse("mean", $"the mean is outside the field's range: {range}");
                    else result = new UncertainInput(path, UncertainDistribution.Normal, mean, sd, 0, min, max, minExclusive, unit);
                    break;
                }

            case "lognormal":
                {
                    var median = Get("median");
                    var logSd = item.OptionalNumber("log_sd");
                    if (logSd is null) Refuse("distribution", "a lognormal needs 'log_sd'");
                    if (errors.Count > before) return null;
                    if (!(median > 0)) Refuse("median", "a lognormal's median must be positive");
                    else if (!(logSd > 0)) Refuse("log_sd", "the spread must be positive");
                    else if (!Inside(median)) Refuse("median", $"the median is outside the field's range: {range}");
                    else result = new UncertainInput(path, UncertainDistribution.LogNormal, Math.Log(median), logSd!.Value, 0, min, max, minExclusive, unit);
                    break;
                }

            case "uniform":
                {
                    var low = Get("low");
                    var high = Get("high");
                    if (errors.Count > before) return null;
                    if (!(low < high)) Refuse("low", "the low end must be below the high end");
                    else if (!Inside(low) || !Inside(high)) Refuse("low", $"the range reaches outside the field's: {range}");
                    else result = new UncertainInput(path, UncertainDistribution.Uniform, low, high, 0, min, max, minExclusive, unit);
                    break;
                }

            case "triangular":
                {
                    var low = Get("low");
                    var mode = Get("mode");
                    var high = Get("high");
                    if (errors.Count > before) return null;
                    if (!(low < high)) Refuse("low", "the low end must be below the high end");
                    else if (mode < low || mode > high) Refuse("mode", "the mode must lie between the low and the high end");
                    else if (!Inside(low) || !Inside(high)) Refuse("low", $"the range reaches outside the field's: {range}");
                    else result = new UncertainInput(path, UncertainDistribution.Triangular, low, mode, high, min, max, minExclusive, unit);
                    break;
                }

            default:
                // Not a distribution the format knows: the format's check has reported it at its line.
                break;
        }

        // Read every parameter field, so the format's fields are all used (the loader test proves it).
        _ = item.OptionalText("mean");
        _ = item.OptionalText("sd");
        _ = item.OptionalText("median");
        _ = item.OptionalNumber("log_sd");
        _ = item.OptionalText("low");
        _ = item.OptionalText("mode");
        _ = item.OptionalText("high");
        return result;
    }
}
