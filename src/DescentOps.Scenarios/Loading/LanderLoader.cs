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

        if (root.OptionalSection("link_home") is { } shared)
        {
            errors.Add(new ScenarioError(shared.Location, "link_home", "the link home is shared among landers: this scenario has no 'landers' list"));
        }

        if (root.OptionalText("mission_rules") is not null)
        {
            errors.Add(new ScenarioError(root.LocationOf("mission_rules"), "mission_rules", "mission rules watch and compare landers: this scenario has no 'landers' list (its own rules go in 'rules')"));
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
                if (name is "landers" or "faults" or "uncertain" or "criteria" or "mission_rules" || own.Contains(name)) continue;
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
            if (own.Contains("procedures")) scenario = OwnProcedures(scenario, i);
            models.Add(new LanderModel(names[i], lander.Text("site"), latitude, longitude, scenario));
            faults.AddRange(faultIndices.Select((k, n) => (k, scenario.Faults[n])));
        }

        var linkHome = LinkHome(root.OptionalSection("link_home"), names, errors);
        ThrowIfAny(errors);
        var first = models[0].View;
        var whole = first with
        {
            Faults = [.. faults.OrderBy(x => x.Index).Select(x => x.Fault)],
            Landers = models,
            LinkHome = linkHome,
            MissionRules = ScenarioLoader.Rules(root, text, "mission_rules"),
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

    /// <summary>The link_home section: names that are landers, a policy with what it needs, and a plan that fits the channels.</summary>
    private static LinkHomeModel LinkHome(BoundSection? section, IReadOnlyList<string> names, List<ScenarioError> errors)
    {
        if (section is null) return LinkHomeModel.Default(names);
        var channels = (int)(section.OptionalInteger("channels") ?? 1);
        var policy = section.OptionalText("policy") == "contact_plan" ? LinkPolicy.ContactPlan : LinkPolicy.Priority;
        var named = section.OptionalText("priority") is { } text ? text.Split(',', StringSplitOptions.TrimEntries) : [];
        foreach (var name in named.Where(n => !names.Contains(n)).Distinct())
        {
            errors.Add(new ScenarioError(section.LocationOf("priority"), "link_home.priority", $"'{name}' is not a lander (landers: {string.Join(", ", names)})"));
        }

        foreach (var name in named.GroupBy(n => n).Where(g => g.Count() > 1).Select(g => g.Key))
        {
            errors.Add(new ScenarioError(section.LocationOf("priority"), "link_home.priority", $"'{name}' is named twice"));
        }

        var priority = named.Where(names.Contains).Distinct().Concat(names.Where(n => !named.Contains(n))).ToList();
        var repeat = section.OptionalQuantity("repeat");
        var items = section.List("contact_plan");
        var windows = items.Select(w => new ContactWindowModel(w.Text("lander"), w.Quantity("from"), w.Quantity("to"))).ToList();
        if (policy == LinkPolicy.ContactPlan && items.Count == 0)
        {
            errors.Add(new ScenarioError(section.LocationOf("policy"), "link_home.contact_plan", "policy contact_plan needs its contact_plan windows"));
        }

        if (policy == LinkPolicy.Priority && (items.Count > 0 || repeat is not null))
        {
            errors.Add(new ScenarioError(section.LocationOf(items.Count > 0 ? "contact_plan" : "repeat"), "link_home.policy", "a contact plan (and its repeat) belongs to policy contact_plan"));
        }

        for (var i = 0; i < windows.Count; i++)
        {
            var w = windows[i];
            var path = $"link_home.contact_plan[{i}]";
            if (!names.Contains(w.Lander)) errors.Add(new ScenarioError(items[i].LocationOf("lander"), $"{path}.lander", $"there is no lander named '{w.Lander}'"));
            if (w.ToS <= w.FromS) errors.Add(new ScenarioError(items[i].LocationOf("to"), $"{path}.to", "a window ends after it starts"));
            if (repeat is { } period && w.ToS > period) errors.Add(new ScenarioError(items[i].LocationOf("to"), $"{path}.to", "a window of a repeating plan ends within its period"));
            for (var j = 0; j < i; j++)
            {
                if (windows[j].Lander == w.Lander && w.FromS < windows[j].ToS && windows[j].FromS < w.ToS)
                {
                    errors.Add(new ScenarioError(items[i].Location, path, $"overlaps window {j} of the same lander"));
                }
            }
        }

        // More windows open at once than there are channels: found by a sweep over the window edges, ends before starts.
        var edges = windows.Select((w, i) => (At: w.FromS, Step: 1, Index: i)).Concat(windows.Select((w, i) => (At: w.ToS, Step: -1, Index: i))).OrderBy(e => e.At).ThenBy(e => e.Step);
        var open = 0;
        foreach (var edge in edges)
        {
            open += edge.Step;
            if (open > channels)
            {
                errors.Add(new ScenarioError(items[edge.Index].Location, $"link_home.contact_plan[{edge.Index}]", $"{open} windows are open at once from {edge.At.ToString("G6", CultureInfo.InvariantCulture)} s, more than the {channels} channel(s)"));
                break;
            }
        }

        return new LinkHomeModel(channels, policy, priority, windows, repeat);
    }

    /// <summary>A view's field path as the file's: a lander's own section under the lander, a fault at its place in the whole list.</summary>
    private static string Translate(string path, int lander, HashSet<string> own, List<int> faultIndices)
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

    /// <summary>
    /// A lander's own procedures named by their place in the file (landers[k].procedures[i]): the checks of the
    /// mission run on the lander's view and locate their errors, and the ground logs a timed start, by these paths.
    /// </summary>
    private static Scenario OwnProcedures(Scenario view, int lander)
    {
        var prefix = $"landers[{lander}].";
        var locations = new Dictionary<string, SourceLocation>(view.FieldLocations, StringComparer.Ordinal);
        foreach (var (path, at) in view.FieldLocations)
        {
            if (path.StartsWith("procedures", StringComparison.Ordinal)) locations[prefix + path] = at;
        }

        return view with
        {
            FieldLocations = locations,
            Procedures = [.. view.Procedures.Select(p => p with { FieldPath = prefix + p.FieldPath, Steps = [.. p.Steps.Select(s => s with { FieldPath = prefix + s.FieldPath })] })],
        };
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
