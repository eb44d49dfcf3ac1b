using System.Globalization;
using System.Text.RegularExpressions;
using DescentOps.Primitives.Units;
using DescentOps.Scenarios.Format;
using YamlDotNet.RepresentationModel;

namespace DescentOps.Scenarios.Loading;

/// <summary>
/// Checks a YAML tree against the scenario format and converts every value to SI, collecting all problems
/// with their locations instead of stopping at the first.
/// </summary>
internal sealed partial class YamlBinder
{
    private readonly string _file;
    private readonly List<ScenarioError> _errors;
    private readonly ISet<string>? _readPaths;

    /// <summary>Where every bound field's value stands, by field path.</summary>
    public Dictionary<string, SourceLocation> Locations { get; } = new(StringComparer.Ordinal);

    public YamlBinder(string file, List<ScenarioError> errors, ISet<string>? readPaths)
    {
        _file = file;
        _errors = errors;
        _readPaths = readPaths;
    }

    public BoundSection? BindSection(YamlNode node, SectionField spec, string path)
    {
        if (node is not YamlMappingNode mapping)
        {
            Error(node, path, $"expected a section of fields ({string.Join(", ", spec.Fields.Select(f => f.Name))}), found {Describe(node)}");
            return null;
        }

        var values = new Dictionary<string, object>(StringComparer.Ordinal);
        var locations = new Dictionary<string, SourceLocation>(StringComparer.Ordinal);
        foreach (var (keyNode, valueNode) in mapping.Children)
        {
            var key = (keyNode as YamlScalarNode)?.Value ?? "";
            var fieldPath = Join(path, key);
            var field = spec.Find(key);
            if (field is null)
            {
                Error(keyNode, fieldPath, $"unknown field; {(path.Length == 0 ? "the top level" : $"'{path}'")} takes {string.Join(", ", spec.Fields.Select(f => f.Name))}");
                continue;
            }

            if (IsNull(valueNode))
            {
                if (field.Required) Error(valueNode, fieldPath, "a value is required here");
                continue;
            }

            locations[key] = Locate(valueNode);
            Locations[fieldPath] = locations[key];
            if (BindValue(valueNode, field, fieldPath) is { } value) values[key] = value;
        }

        foreach (var field in spec.Fields.Where(f => f.Required && !mapping.Children.Keys.OfType<YamlScalarNode>().Any(k => k.Value == f.Name)))
        {
            Error(mapping, Join(path, field.Name), $"missing required field ({field.Description})");
        }

        return new BoundSection(path, Locate(mapping), values, locations, _readPaths);
    }

    private object? BindValue(YamlNode node, FieldSpec field, string path) => field switch
    {
        SectionField section => BindSection(node, section, path),
        ListField list => BindList(node, list, path),
        QuantityField quantity => BindQuantity(node, quantity, path),
        NumberField number => BindNumber(node, number, path),
        IntegerField integer => BindInteger(node, integer, path),
        ChoiceField choice => BindChoice(node, choice, path),
        TextField text => BindText(node, text, path),
        _ => throw new InvalidOperationException($"No binding for {field.GetType().Name}."),
    };

    private List<BoundSection>? BindList(YamlNode node, ListField spec, string path)
    {
        if (node is not YamlSequenceNode sequence)
        {
            Error(node, path, $"expected a list of {spec.Item.Name} entries (lines starting with '- '), found {Describe(node)}");
            return null;
        }

        if (sequence.Children.Count < spec.MinItems || sequence.Children.Count > spec.MaxItems)
        {
            Error(node, path, $"expected {spec.MinItems} to {spec.MaxItems} entries, found {sequence.Children.Count}");
        }

        var items = new List<BoundSection>();
        for (var i = 0; i < sequence.Children.Count; i++)
        {
            if (BindSection(sequence.Children[i], spec.Item, $"{path}[{i}]") is { } item) items.Add(item);
        }

        // Named entries (vehicles, faults) must be told apart; unnamed ones (depth intervals) need not be.
        if (!spec.Item.Fields.Any(f => f.Name == "name")) return items;
        // An entry whose name was refused has none here; it is reported already.
        var duplicate = items.Where(i => i.OptionalText("name") is not null).GroupBy(i => i.Text("name")).FirstOrDefault(g => g.Count() > 1);
        if (duplicate is not null)
        {
            var second = duplicate.Skip(1).First();
            _errors.Add(new ScenarioError(second.Location, second.Path + ".name", $"'{duplicate.Key}' is used by two entries; names must be unique"));
        }

        return items;
    }

    private double? BindQuantity(YamlNode node, QuantityField spec, string path)
    {
        if (Scalar(node, path, $"a quantity with a unit ({spec.Kind.ExampleUnits()})") is not { } text) return null;
        if (!QuantityParser.TryParseSi(spec.Kind, text, out var si, out var error))
        {
            Error(node, path, error);
            return null;
        }

        return CheckRange(node, path, si, spec.MinSi, spec.MaxSi, spec.MinExclusive, spec.Kind.SiSymbol()) ? si : null;
    }

    private double? BindNumber(YamlNode node, NumberField spec, string path)
    {
        if (Scalar(node, path, "a number") is not { } text) return null;
        if (!StrictNumber.TryParse(text, out var value, out var error))
        {
            Error(node, path, error);
            return null;
        }

        return CheckRange(node, path, value, spec.Min, spec.Max, false, "") ? value : null;
    }

    private long? BindInteger(YamlNode node, IntegerField spec, string path)
    {
        if (Scalar(node, path, "a whole number") is not { } text) return null;
        if (!long.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var value))
        {
            Error(node, path, StrictNumber.WhyNot(text.Trim(), StrictNumber.Length(text.Trim())) ?? $"'{text}' is not a whole number");
            return null;
        }

        if (value < spec.Min || value > spec.Max)
        {
            Error(node, path, $"{value} is outside {spec.Min} to {spec.Max}");
            return null;
        }

        return value;
    }

    private string? BindChoice(YamlNode node, ChoiceField spec, string path)
    {
        if (Scalar(node, path, "one of " + string.Join(", ", spec.Options)) is not { } text) return null;
        if (spec.Options.Contains(text)) return text;
        Error(node, path, $"'{text}' is not one of {string.Join(", ", spec.Options)}");
        return null;
    }

    private string? BindText(YamlNode node, TextField spec, string path)
    {
        if (Scalar(node, path, "text") is not { } text) return null;
        // A name, identifier or word is one line: "Wendlow\n" from a block scalar would name a different probe in every log.
        if (spec.Name is not ("description" or "rules" or "mission_rules" or "when") && text.AsSpan().IndexOfAny('\n', '\r') >= 0)
        {
            Error(node, path, $"'{text.ReplaceLineEndings("\\n")}' holds a line break; this field is one line of text");
            return null;
        }

        if (spec.IsIdentifier && !Identifier().IsMatch(text))
        {
            Error(node, path, $"'{text}' is not an identifier (lowercase letters, digits and '-', starting with a letter)");
            return null;
        }

        return text;
    }

    private string? Scalar(YamlNode node, string path, string expected)
    {
        if (node is YamlScalarNode { Value: { } value }) return value;
        Error(node, path, $"expected {expected}, found {Describe(node)}");
        return null;
    }

    private bool CheckRange(YamlNode node, string path, double value, double min, double max, bool minExclusive, string unit)
    {
        var suffix = unit.Length == 0 ? "" : " " + unit;
        var tooLow = minExclusive ? value <= min : value < min;
        if (!tooLow && value <= max) return true;
        var lower = minExclusive ? $"above {Format(min)}{suffix}" : $"at least {Format(min)}{suffix}";
        Error(node, path, $"{Format(value)}{suffix} is out of range: must be {lower} and at most {Format(max)}{suffix}");
        return false;
    }

    private static bool IsNull(YamlNode node) =>
        node is YamlScalarNode { Style: YamlDotNet.Core.ScalarStyle.Plain, Value: null or "" or "~" or "null" };

    private static string Describe(YamlNode node) => node switch
    {
        YamlMappingNode => "a section",
        YamlSequenceNode => "a list",
        YamlScalarNode scalar => $"'{scalar.Value}'",
        _ => node.NodeType.ToString(),
    };

    private void Error(YamlNode node, string path, string message) => _errors.Add(new ScenarioError(Locate(node), path, message));

    private SourceLocation Locate(YamlNode node) => new(_file, (int)node.Start.Line, (int)node.Start.Column);

    private static string Join(string path, string name) => path.Length == 0 ? name : path + "." + name;

    private static string Format(double value) => value.ToString("G6", CultureInfo.InvariantCulture);

    [GeneratedRegex(TextField.IdentifierPattern)]
    private static partial Regex Identifier();
}
