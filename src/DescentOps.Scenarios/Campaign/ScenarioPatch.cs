using System.Globalization;
using DescentOps.Scenarios.Format;
using YamlDotNet.RepresentationModel;

namespace DescentOps.Scenarios.Campaign;

/// <summary>
/// Field paths into a scenario ("shell.thickness", "faults[bus-trip].at", "relays.drops[2].depth") and the rewriting of
/// a scenario's text with drawn values: the patched text is loaded like any scenario, so a drawn value meets the same
/// checks as a typed one.
/// </summary>
public static class ScenarioPatch
{
    /// <summary>The format field a path names, or an error saying why there is none.</summary>
    public static FieldSpec? FindField(string path, out string error)
    {
        error = "";
        FieldSpec current = ScenarioFormat.Root;
        foreach (var (name, selector) in Segments(path))
        {
            if (current is not SectionField section || section.Find(name) is not { } next)
            {
                error = $"the scenario format has no field '{name}' there";
                return null;
            }

            if (next is ListField list)
            {
                if (selector is null)
                {
                    error = $"'{name}' is a list: pick an item by name or position, e.g. '{name}[1]'";
                    return null;
                }

                current = list.Item;
            }
            else
            {
                if (selector is not null)
                {
                    error = $"'{name}' is not a list";
                    return null;
                }

                current = next;
            }
        }

        return current;
    }

    /// <summary>Whether the path's list items exist in the scenario text (every segment but the last must exist).</summary>
    public static bool Exists(string text, string path, out string error)
    {
        var root = Load(text);
        return Locate(root, path, out error) is not null;
    }

    /// <summary>The text with each path's value replaced (or added), and the <c>uncertain</c> section removed.</summary>
    public static string Apply(string text, IReadOnlyList<(string Path, string Value)> values)
    {
        var root = Load(text);
        foreach (var (path, value) in values)
        {
            var (mapping, key) = Locate(root, path, out var error) ?? throw new InvalidOperationException($"{path}: {error}");
            mapping.Children[new YamlScalarNode(key)] = new YamlScalarNode(value);
        }

        root.Children.Remove(new YamlScalarNode(CampaignFields.Uncertain.Name));
        var document = new YamlStream(new YamlDocument(root));
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        document.Save(writer, assignAnchors: false);
        return writer.ToString();
    }

    private static YamlMappingNode Load(string text)
    {
        var stream = new YamlStream();
        stream.Load(new StringReader(text));
        return (YamlMappingNode)stream.Documents[0].RootNode;
    }

    private static (YamlMappingNode Mapping, string Key)? Locate(YamlMappingNode root, string path, out string error)
    {
        error = "";
        var segments = Segments(path);
        var mapping = root;
        for (var i = 0; i < segments.Count; i++)
        {
            var (name, selector) = segments[i];
            if (i == segments.Count - 1 && selector is null) return (mapping, name);
            if (!mapping.Children.TryGetValue(new YamlScalarNode(name), out var child))
            {
                error = $"the scenario has no '{name}' section";
                return null;
            }

            if (selector is null)
            {
                if (child is not YamlMappingNode section)
                {
                    error = $"'{name}' is not a section";
                    return null;
                }

                mapping = section;
                continue;
            }

            if (child is not YamlSequenceNode items)
            {
                error = $"'{name}' is not a list";
                return null;
            }

            var item = items.Children.OfType<YamlMappingNode>().FirstOrDefault(m =>
                m.Children.TryGetValue(new YamlScalarNode("name"), out var n) && n is YamlScalarNode s && s.Value == selector);
            if (item is null && int.TryParse(selector, NumberStyles.None, CultureInfo.InvariantCulture, out var position)
                && position >= 1 && position <= items.Children.Count)
            {
                item = items.Children[position - 1] as YamlMappingNode;
            }

            if (item is null)
            {
                error = $"'{name}' has no item named or numbered '{selector}'";
                return null;
            }

            if (i == segments.Count - 1)
            {
                error = "a path must end at a field, not a list item";
                return null;
            }

            mapping = item;
        }

        error = "empty path";
        return null;
    }

    private static List<(string Name, string? Selector)> Segments(string path)
    {
        var result = new List<(string, string?)>();
        foreach (var part in path.Split('.'))
        {
            var open = part.IndexOf('[', StringComparison.Ordinal);
            if (open < 0)
            {
                result.Add((part, null));
            }
            else
            {
                var close = part.IndexOf(']', open);
                result.Add((part[..open], close > open ? part[(open + 1)..close] : part[(open + 1)..]));
            }
        }

        return result;
    }
}
