using System.Globalization;
using System.Text.RegularExpressions;
using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Model;
using YamlDotNet.RepresentationModel;

namespace DescentOps.Scenarios.Loading;

/// <summary>
/// Reads the <c>landers</c> list. Each lander is loaded as a single-lander scenario of its own (its view): a top level
/// assembled from the file's own YAML nodes (the shared body, shell and run, the lander's sections, the faults that
/// name it), so every check of the single-lander format applies to it unchanged and every error keeps its line in the
/// file; only the field path is rewritten to the lander's place ("landers[1].probe.radius").
/// </summary>
internal static partial class LanderLoader
{
    private static readonly string[] SiteFields = ["name", "site", "latitude", "longitude"];

    /// <summary>Checks of the single-lander format that the optional top-level sections leave to the loader.</summary>
    public static void CheckSingle(BoundSection root, string sourceName, List<ScenarioError> errors)
    {
        foreach (var name in LanderFormat.RequiredSections)
        {
            if (root.OptionalSection(name) is null)
            {
                errors.Add(new ScenarioError(new SourceLocation(sourceName, root.Location.Line, root.Location.Column), name, $"missing required field ({ScenarioFormat.Root.Find(name)!.Description}); or describe each lander in a 'landers' list"));
            }
        }

        var faults = root.List("faults");
        for (var i = 0; i < faults.Count; i++)
        {
            if (faults[i].OptionalText("lander") is { } lander)
            {
                errors.Add(new ScenarioError(faults[i].LocationOf("lander"), $"faults[{i}].lander", $"this scenario has no 'landers' list, so there is no lander '{lander}' to name"));
            }
        }

        if (root.OptionalSection("station")?.OptionalSection("link") is { } link && link.OptionalQuantity("latitude") is null)
        {
            errors.Add(new ScenarioError(link.Location, "station.link.latitude", "missing required field (the station's latitude)"));
        }

        if (errors.Count > 0) throw new ScenarioException([.. errors.OrderBy(e => e.Location.Line).ThenBy(e => e.Location.Column)]);
    }

    public static Scenario Load(YamlNode rootNode, BoundSection root, IReadOnlyDictionary<string, SourceLocation> locations, string text, string sourceName, List<ScenarioError> errors, ISet<string>? readPaths)
    {
        var landers = root.List("landers");
        var names = landers.Select(l => l.Text("name")).ToList();
        CheckTopLevel(root, landers, names, errors);
        ThrowIfAny(errors);

        var rootMap = (YamlMappingNode)rootNode;
        var landerNodes = ((YamlSequenceNode)Child(rootMap, "landers")!).Children;
        var faultNodes = Child(rootMap, "faults") is YamlSequenceNode list ? list.Children : [];
        var faultLanders = root.List("faults").Select(x => x.OptionalText("lander") ?? names[0]).ToList();
        var models = new List<LanderModel>();
        var faults = new List<(int Index, FaultModel Fault)>();
        for (var i = 0; i < landers.Count; i++)
        {
            var landerMap = (YamlMappingNode)landerNodes[i];
            var own = landerMap.Children.Keys.OfType<YamlScalarNode>().Select(k => k.Value ?? "").Where(k => !SiteFields.Contains(k)).ToHashSet(StringComparer.Ordinal);
            var faultIndices = Enumerable.Range(0, faultLanders.Count).Where(k => faultLanders[k] == names[i]).ToList();
            var view = new YamlMappingNode();
            foreach (var (key, value) in rootMap.Children)
            {
                var name = (key as YamlScalarNode)?.Value ?? "";
                if (name is "landers" or "faults" or "uncertain" or "criteria" || own.Contains(name)) continue;
                view.Add(key, value);
            }

            foreach (var (key, value) in landerMap.Children)
            {
                if (!SiteFields.Contains((key as YamlScalarNode)?.Value ?? "")) view.Add(key, value);
            }

            if (faultIndices.Count > 0) view.Add("faults", new YamlSequenceNode(faultIndices.Select(k => faultNodes[k])));
            var viewErrors = new List<ScenarioError>();
            var viewRead = new HashSet<string>(StringComparer.Ordinal);
            var scenario = ScenarioLoader.LoadView(view, text, sourceName, viewErrors, viewRead);
            errors.AddRange(viewErrors.Select(e => e with { FieldPath = Translate(e.FieldPath, i, own, faultIndices) }));
            foreach (var path in viewRead) readPaths?.Add(Translate(path, -1, own, []));
            // A view with errors fails the whole load below; a fault it refused was not built, so its faults are not counted.
            if (scenario is null || viewErrors.Count > 0) continue;
            var lander = landers[i];
            var (latitude, longitude) = (lander.Quantity("latitude"), lander.Quantity("longitude"));
            var station = scenario.Station.Link is { } link
                ? scenario.Station with { Link = link with { LatitudeRad = latitude, StartHourAngleRad = link.StartHourAngleRad + longitude, PlanetHourAngleRad = link.PlanetHourAngleRad + longitude } }
                : scenario.Station;
            scenario = scenario with { Body = scenario.Body with { Site = lander.Text("site") }, Station = station };
            models.Add(new LanderModel(names[i], lander.Text("site"), latitude, longitude, scenario));
            faults.AddRange(faultIndices.Select((k, n) => (k, scenario.Faults[n])));
        }

        ThrowIfAny(errors);
        var first = models[0].View;
        var whole = first with
        {
            Faults = [.. faults.OrderBy(x => x.Index).Select(x => x.Fault)],
            Landers = models,
            FieldLocations = locations,
        };
        whole = Campaign.CampaignSections.Read(whole, root, text, errors);
        ThrowIfAny(errors);
        return whole;
    }

    private static void CheckTopLevel(BoundSection root, IReadOnlyList<BoundSection> landers, IReadOnlyList<string> names, List<ScenarioError> errors)
    {
        foreach (var name in LanderFormat.OwnSections)
        {
            if (root.LocationOf(name) != root.Location)
            {
                errors.Add(new ScenarioError(root.LocationOf(name), name, $"with landers, '{name}' belongs inside each lander, not at the top level"));
            }
        }

        for (var i = 0; i < landers.Count; i++)
        {
            // Two landers of one name are refused by the binder, as two entries of any named list are.
            if (landers[i].Section("station").OptionalSection("link") is { } link && link.OptionalQuantity("latitude") is not null)
            {
                errors.Add(new ScenarioError(link.LocationOf("latitude"), $"landers[{i}].station.link.latitude", "a lander's station stands at its site: the lander's latitude is the station's, so the link takes none"));
            }
        }

        var faults = root.List("faults");
        for (var i = 0; i < faults.Count; i++)
        {
            var lander = faults[i].OptionalText("lander");
            if (lander is null && landers.Count > 1)
            {
                errors.Add(new ScenarioError(faults[i].Location, $"faults[{i}].lander", $"with several landers a fault names the lander it strikes ({string.Join(", ", names)})"));
            }
            else if (lander is not null && !names.Contains(lander))
            {
                errors.Add(new ScenarioError(faults[i].LocationOf("lander"), $"faults[{i}].lander", $"there is no lander named '{lander}' (landers: {string.Join(", ", names)})"));
            }
        }
    }

    /// <summary>A view's field path as the file's: a lander's own section under the lander, a fault at its place in the whole list.</summary>
    private static string Translate(string path, int lander, IReadOnlySet<string> own, IReadOnlyList<int> faultIndices)
    {
        var fault = FaultIndex().Match(path);
        if (fault.Success)
        {
            var k = int.Parse(fault.Groups[1].Value, CultureInfo.InvariantCulture);
            return k < faultIndices.Count ? $"faults[{faultIndices[k]}]" + path[fault.Length..] : path;
        }

        var head = path.Split('.', '[')[0];
        return own.Contains(head) ? (lander < 0 ? "landers[]." : $"landers[{lander}].") + path : path;
    }

    private static YamlNode? Child(YamlMappingNode map, string key) =>
        map.Children.FirstOrDefault(kv => (kv.Key as YamlScalarNode)?.Value == key).Value;

    private static void ThrowIfAny(List<ScenarioError> errors)
    {
        if (errors.Count > 0) throw new ScenarioException([.. errors.OrderBy(e => e.Location.Line).ThenBy(e => e.Location.Column)]);
    }

    [GeneratedRegex(@"^faults\[(\d+)\]")]
    private static partial Regex FaultIndex();
}
