using System.Globalization;
using System.Text.Json.Nodes;
using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Loading;
using Json.Schema;
using YamlDotNet.RepresentationModel;

namespace DescentOps.Scenarios.Tests;

/// <summary>The committed JSON Schema, the format tree and the loader must describe the same files.</summary>
public sealed class SchemaAgreementTests
{
    private static string CommittedSchema => File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "shared", "scenario.schema.json"));

    [Fact]
    public void The_committed_schema_is_the_generated_one()
    {
        // If this fails, regenerate: dotnet run --project src/DescentOps.Cli -- schema > shared/scenario.schema.json
        Assert.Equal(ScenarioJsonSchema.Generate(), CommittedSchema);
    }

    [Fact]
    public void The_loader_reads_every_field_the_format_defines()
    {
        var read = new HashSet<string>(StringComparer.Ordinal);
        ScenarioLoader.LoadText(ScenarioText.Default, "default.yaml", read);
        ScenarioLoader.LoadText(EveryFieldInALander(), "every-field-lander.yaml", read);

        var defined = Paths(ScenarioFormat.Root, "").ToHashSet(StringComparer.Ordinal);
        Assert.Empty(defined.Except(read));
        Assert.Empty(read.Except(defined));
    }

    [Fact]
    public void The_fixture_and_the_default_scenario_are_valid_against_the_schema()
    {
        var schema = JsonSchema.FromText(CommittedSchema);
        Assert.True(schema.Evaluate(ToJson(ScenarioText.RepositoryDefault)).IsValid);
        var result = schema.Evaluate(ToJson(ScenarioText.Default), new EvaluationOptions { OutputFormat = OutputFormat.List });
        Assert.True(result.IsValid, string.Join("; ", result.Details.Where(d => d.HasErrors).SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Value}"))));
    }

    [Fact]
    public void The_schema_rejects_what_the_loader_rejects()
    {
        var schema = JsonSchema.FromText(CommittedSchema);
        var unknownField = ScenarioText.DefaultWith("  mass: 210 kg", "  mass: 210 kg\n  colour: orange");
        var noUnit = ScenarioText.DefaultWith("  radius: 12 cm", "  radius: 12");
        Assert.False(schema.Evaluate(ToJson(unknownField)).IsValid);
        Assert.False(schema.Evaluate(ToJson(noUnit)).IsValid);
        Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(unknownField, "x.yaml"));
        Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(noUnit, "x.yaml"));
    }

    /// <summary>The every-field fixture with its lander's own sections moved into a one-lander landers list.</summary>
    private static string EveryFieldInALander()
    {
        var stream = new YamlStream();
        stream.Load(new StringReader(ScenarioText.Default));
        var root = (YamlMappingNode)stream.Documents[0].RootNode;
        var lander = new YamlMappingNode { { "name", "tarn" }, { "site", "Tarn Flats" }, { "latitude", "12 deg" }, { "longitude", "20 deg" } };
        foreach (var name in LanderFormat.OwnSections.Concat(LanderFormat.DefaultableSections))
        {
            // The fixture has no rules block; the loader reads a lander's as text, so any text is read.
            var (key, value) = root.Children.SingleOrDefault(kv => ((YamlScalarNode)kv.Key).Value == name);
            lander.Add(key ?? new YamlScalarNode(name), value ?? new YamlScalarNode("rule placeholder {}"));
            if (key is not null) root.Children.Remove(key);
        }

        var station = (YamlMappingNode)lander.Children.Single(kv => ((YamlScalarNode)kv.Key).Value == "station").Value;
        var link = (YamlMappingNode)station.Children.Single(kv => ((YamlScalarNode)kv.Key).Value == "link").Value;
        link.Children.Remove(link.Children.Single(kv => ((YamlScalarNode)kv.Key).Value == "latitude").Key);
        root.Add("landers", new YamlSequenceNode(lander));
        root.Add("link_home", new YamlMappingNode
        {
            { "channels", "1" }, { "policy", "contact_plan" }, { "priority", "tarn" }, { "repeat", "1 d" },
            { "contact_plan", new YamlSequenceNode(new YamlMappingNode { { "lander", "tarn" }, { "from", "0 h" }, { "to", "12 h" } }) },
        });
        // The loader reads the mission's rules as text, as a lander's, so any text is read.
        root.Add("mission_rules", "rule placeholder {}");
        var writer = new StringWriter();
        stream.Save(writer, assignAnchors: false);
        return writer.ToString();
    }

    private static IEnumerable<string> Paths(SectionField section, string prefix)
    {
        foreach (var field in section.Fields)
        {
            var path = prefix.Length == 0 ? field.Name : prefix + "." + field.Name;
            yield return path;
            var children = field switch
            {
                SectionField child => Paths(child, path),
                ListField list => Paths(list.Item, path + "[]"),
                _ => [],
            };
            foreach (var child in children) yield return child;
        }
    }

    /// <summary>YAML to JSON as an editor's YAML plugin sees it: plain scalars that read as numbers are numbers.</summary>
    private static JsonNode? ToJson(string yaml)
    {
        var stream = new YamlStream();
        stream.Load(new StringReader(yaml));
        return Convert(stream.Documents[0].RootNode);
    }

    private static JsonNode? Convert(YamlNode node) => node switch
    {
        YamlMappingNode map => new JsonObject(map.Children.Select(kv => KeyValuePair.Create(((YamlScalarNode)kv.Key).Value!, Convert(kv.Value)))),
        YamlSequenceNode seq => new JsonArray([.. seq.Children.Select(Convert)]),
        YamlScalarNode { Style: YamlDotNet.Core.ScalarStyle.Plain } s when long.TryParse(s.Value, NumberStyles.Integer, CultureInfo.InvariantCulture, out var l) => JsonValue.Create(l),
        YamlScalarNode { Style: YamlDotNet.Core.ScalarStyle.Plain } s when double.TryParse(s.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out var d) => JsonValue.Create(d),
        YamlScalarNode s => JsonValue.Create(s.Value),
        _ => throw new InvalidOperationException(node.NodeType.ToString()),
    };
}
