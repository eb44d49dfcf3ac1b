using System.Text;
using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Model;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace DescentOps.Scenarios.Loading;

/// <summary>
/// Reads scenario files. Every problem is reported as a <see cref="ScenarioException"/> that lists each
/// error with its file, line, column and field path; nothing else escapes to the caller.
/// </summary>
public static class ScenarioLoader
{
    /// <summary>Water gap left around a stopped probe without side heaters: 0.5 mm (a modelling default, no published value).</summary>
    public const double DefaultFreezeGapM = 0.5e-3;

    /// <summary>Tilt at which a probe is taken as lost: 10 degrees (a modelling default of ours, no published value).</summary>
    public const double DefaultMaxTiltRad = 10 * Math.PI / 180;

    /// <summary>Battery cell temperature when a scenario gives none: 20 °C, a warm pack (a modelling default, no published value).</summary>
    public const double DefaultBatteryTemperatureK = 293.15;

    /// <summary>Ocean water density for the turbine when a scenario gives none: 1030 kg/m³ (common practice for seawater, no source).</summary>
    public const double DefaultWaterDensityKgPerM3 = 1030;

    /// <summary>Share of the surface dose carried by electrons when the scenario does not say: 0.9 (a modelling default of ours, no published value).</summary>
    public const double DefaultElectronShare = 0.9;

    /// <summary>Electron dose attenuation length in ice: 2 cm (RULE: within the 1–5 cm the electrons' CSDA ranges suggest, from memory).</summary>
    public const double DefaultElectronLengthM = 0.02;

    /// <summary>Photon dose attenuation length in ice: 15.37 cm, 1/(μ/ρ·ρ) with μ/ρ 0.0707 cm²/g at 1 MeV (from memory) and ρ 0.92 g/cm³.</summary>
    public const double DefaultPhotonLengthM = 0.1537;

    /// <summary>Aperture efficiency of the station's dish: 0.55 (RULE, common practice for a small dish).</summary>
    public const double DefaultDishEfficiency = 0.55;

    /// <summary>Aperture efficiency of the ground antenna: 0.6 (RULE, common practice for a large dish).</summary>
    public const double DefaultGroundDishEfficiency = 0.6;

    /// <summary>Buoyancy pump efficiency when none is given: 0.5 (a rule of thumb, no source).</summary>
    public const double DefaultPumpEfficiency = 0.5;

    /// <summary>Spreading exponent when none is given: 1.5, the usual compromise for a bounded channel (common practice, no source).</summary>
    public const double DefaultSpreadingExponent = 1.5;

    /// <summary>pH when none is given: 8, about that of terrestrial seawater (from memory; an alien ocean's pH is unknown).</summary>
    public const double DefaultPH = 8.0;

    /// <summary>Time between a vehicle's data messages when none is given: 10 min (a modelling default, no source).</summary>
    public const double DefaultMessageIntervalS = 600.0;

    public static Scenario LoadFile(string path)
    {
        string text;
        try
        {
            if (new FileInfo(path).Length > YamlBounds.MaxBytes)
            {
                throw new ScenarioException([new ScenarioError(new SourceLocation(path, 1, 1), "", $"the file is {new FileInfo(path).Length:N0} bytes; a scenario may hold at most {YamlBounds.MaxBytes:N0}")]);
            }

            text = File.ReadAllText(path, Encoding.UTF8);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            throw new ScenarioException([new ScenarioError(new SourceLocation(path, 1, 1), "", $"cannot read the file: {exception.Message}")]);
        }

        return LoadText(text, path);
    }

    /// <summary>Parses <paramref name="text"/>; <paramref name="sourceName"/> is the file name errors carry.</summary>
    public static Scenario LoadText(string text, string sourceName, ISet<string>? readPaths = null)
    {
        var errors = new List<ScenarioError>();
        var root = Bind(text, sourceName, ScenarioFormat.Root, errors, readPaths, out var locations, out var rootNode);
        if (root.List("landers").Count > 0) return LanderLoader.Load(rootNode, root, locations, text, sourceName, errors, readPaths);
        LanderLoader.CheckSingle(root, sourceName, errors);
        var scenario = DescentOps.Scenarios.Campaign.CampaignSections.Read(WithTimedParts(Build(root, sourceName, text, errors), root) with { FieldLocations = locations, OnboardSampling = OnboardSamplingReader.Read(root.OptionalSection("onboard_sampling"), errors) }, root, text, errors);
        ScenarioConsistency.Check(scenario, root, errors);
        return errors.Count > 0 ? throw new ScenarioException(errors) : scenario;
    }

    /// <summary>
    /// One lander's view: <paramref name="node"/> is a top level made of the file's own nodes (so every location is the
    /// file's), bound and checked as a single-lander scenario; null when it has errors.
    /// </summary>
    internal static Scenario? LoadView(YamlNode node, string text, string sourceName, List<ScenarioError> errors, ISet<string> readPaths)
    {
        var binder = new YamlBinder(sourceName, errors, readPaths);
        if (binder.BindSection(node, ScenarioFormat.Root, "") is not { } root || errors.Count > 0) return null;
        var scenario = WithTimedParts(Build(root, sourceName, text, errors), root) with { FieldLocations = binder.Locations, OnboardSampling = OnboardSamplingReader.Read(root.OptionalSection("onboard_sampling"), errors) };
        ScenarioConsistency.Check(scenario, root, errors);
        return scenario;
    }

    private static Scenario Build(BoundSection root, string sourceName, string text, List<ScenarioError> errors)
    {
        var body = root.Section("body");
        var shell = root.Section("shell");
        var probe = root.Section("probe");
        var tether = root.Section("tether");
        var station = root.Section("station");
        var run = root.Section("run");
        return new Scenario(
            root.Text("scenario"),
            root.OptionalText("description") ?? "",
            new BodyModel(body.Text("name"), body.Text("site"), body.Quantity("gravity"), body.Quantity("distance_to_ground"), body.OptionalQuantity("surface_pressure") ?? 0.0),
            new ShellModel(shell.Quantity("thickness"), shell.Quantity("surface_temperature"), shell.Quantity("ocean_salinity"))
            {
                FracturedToM = shell.OptionalQuantity("fractured_to") ?? 0.0,
                OceanTemperatureK = shell.OptionalQuantity("ocean_temperature"),
                Convection = shell.OptionalSection("convection") is { } c
                    ? new ConvectionModel(c.Quantity("top"), c.Quantity("temperature"), c.OptionalQuantity("basal_boundary") ?? ((shell.Quantity("thickness") - c.Quantity("top")) / 10))
                    : null,
                Layers = [.. shell.List("layers").Select(l => new ShellLayerModel(l.Quantity("top"), l.Quantity("bottom"), l.Quantity("salinity")))],
                DebrisBands = [.. shell.List("debris_bands").Select(b => new DebrisBandModel(b.Quantity("top"), b.Quantity("bottom"), b.Number("volume_fraction"), b.OptionalQuantity("tilt_scatter") ?? 0.0))],
            },
            new ProbeModel(
                probe.Text("name"),
                probe.Quantity("radius"),
                probe.Quantity("length"),
                probe.Quantity("mass"),
                probe.Quantity("head_power"),
                probe.Quantity("wall_power"),
                probe.Quantity("electronics_power"),
                probe.Quantity("telemetry_interval"),
                probe.OptionalQuantity("freeze_gap") ?? DefaultFreezeGapM,
                probe.OptionalQuantity("max_head_power") ?? probe.Quantity("head_power"),
                probe.OptionalQuantity("max_wall_power") ?? probe.Quantity("wall_power"),
                probe.OptionalQuantity("max_tilt") ?? DefaultMaxTiltRad)
            {
                Jets = probe.OptionalSection("jets") is { } jets ? JetsReader.Read(jets) : null,
            },
            new TetherModel(tether.Quantity("length"), tether.Quantity("signal_speed"), TetherReader.Optics(tether), (int)(tether.OptionalInteger("buffer_frames") ?? 0)),
            StationReader.Read(station),
            [.. root.List("vehicles").Select(VehicleReader.Read)],
            [.. root.List("faults").Select((f, i) => FaultReader.Read(f, $"faults[{i}]", errors)).OfType<FaultModel>()],
            Rules(root, text),
            new RunModel(run.Integer("seed"), run.Quantity("until")),
            sourceName,
            text,
            root.OptionalSection("power") is { } power ? PowerReader.Read(power, probe.OptionalSection("jets") is not null) : null,
            AcousticsReader.Read(root.OptionalSection("acoustics")),
            RelayReader.Read(root.OptionalSection("relays"), shell.Quantity("thickness")));
    }

    /// <summary>Reads a branch change file (see <see cref="ChangeFormat"/>), with the same located errors as a scenario.</summary>
    public static ScenarioChange LoadChange(string text, string sourceName)
    {
        var errors = new List<ScenarioError>();
        var root = Bind(text, sourceName, ChangeFormat.Root, errors, null, out var locations, out _);
        var added = root.List("add_faults");
        var faults = added.Select((f, i) => FaultReader.Read(f, $"add_faults[{i}]", errors)).OfType<FaultModel>().ToList();
        if (errors.Count > 0) throw new ScenarioException(errors);
        var rules = root.OptionalText("rules") is null ? null : Rules(root, text);
        var telecommands = root.List("add_telecommands");
        var uplinks = root.List("uplink_rules");
        return new ScenarioChange(sourceName, text, faults, [.. root.List("remove_faults").Select(f => f.Text("name"))], rules)
        {
            FieldLocations = locations,
            AddTelecommands = Telecommands(telecommands, "add_telecommands"),
            AddFaultLanders = [.. added.Select(f => f.OptionalText("lander"))],
            RuleUplinks = [.. uplinks.Select((u, i) => new RuleUplinkModel(u.Quantity("at"), Rules(u, text), $"uplink_rules[{i}]")).OrderBy(u => u.AtS)],
            TimedLanders = telecommands.Select((t, i) => ($"add_telecommands[{i}]", t.OptionalText("lander")))
                .Concat(uplinks.Select((u, i) => ($"uplink_rules[{i}]", u.OptionalText("lander"))))
                .Where(x => x.Item2 is not null).ToDictionary(x => x.Item1, x => x.Item2!, StringComparer.Ordinal),
        };
    }

    private static TimedTelecommandModel[] Telecommands(IReadOnlyList<BoundSection> list, string path) =>
    [
        .. list.Select((t, i) => new TimedTelecommandModel(
            t.Quantity("at"),
            t.Text("from") == "board" ? TelecommandSender.Board : TelecommandSender.Ground,
            t.Text("send"),
            t.LocationOf("send"),
            $"{path}[{i}]")).OrderBy(t => t.AtS),
    ];

    private static Scenario WithTimedParts(Scenario scenario, BoundSection root) => scenario with
    {
        Telecommands = Telecommands(root.List("telecommands"), "telecommands"),
        Procedures = ProceduresReader.Read(root),
    };

    /// <summary>Parses YAML and validates it against a format tree; syntax and field errors are thrown, located.</summary>
    private static BoundSection Bind(string text, string sourceName, SectionField spec, List<ScenarioError> errors, ISet<string>? readPaths, out IReadOnlyDictionary<string, SourceLocation> locations, out YamlNode rootNode)
    {
        var stream = new YamlStream();
        var parser = new Parser(new StringReader(text));
        try
        {
            YamlBounds.Check(text, sourceName);
            stream.Load(parser);
        }
        catch (YamlException exception)
        {
            var message = exception.InnerException?.Message ?? exception.Message;
            throw new ScenarioException([new ScenarioError(new SourceLocation(sourceName, (int)exception.Start.Line, (int)exception.Start.Column), "", $"YAML syntax: {Trim(message)}")]);
        }
        catch (InvalidOperationException)
        {
            // The YAML scanner throws this bare exception for some malformed flow collections; the parser's
            // last good token is then the best location there is.
            var mark = parser.Current?.End ?? Mark.Empty;
            throw new ScenarioException([new ScenarioError(new SourceLocation(sourceName, (int)Math.Max(1, mark.Line), (int)Math.Max(1, mark.Column)), "", "YAML syntax: a flow collection ('[...]' or '{...}') is not closed or is malformed near here")]);
        }

        if (stream.Documents.Count != 1)
        {
            throw new ScenarioException([new ScenarioError(new SourceLocation(sourceName, 1, 1), "", $"expected one YAML document, found {stream.Documents.Count}")]);
        }

        var binder = new YamlBinder(sourceName, errors, readPaths);
        rootNode = stream.Documents[0].RootNode;
        var root = binder.BindSection(rootNode, spec, "");
        locations = binder.Locations;
        if (errors.Count > 0 || root is null)
        {
            throw new ScenarioException([.. errors.OrderBy(e => e.Location.Line).ThenBy(e => e.Location.Column)]);
        }

        return root;
    }

    /// <summary>A rules block (<paramref name="key"/>) with its place in the file: a block scalar's text starts on the line after 'rules: |'.</summary>
    internal static RulesSource Rules(BoundSection root, string text, string key = "rules")
    {
        if (root.OptionalText(key) is not { } rules) return RulesSource.None;
        var at = root.LocationOf(key);
        var lines = text.Split('\n');
        var valueLine = at.Line - 1 < lines.Length ? lines[at.Line - 1] : "";
        var startsBlock = at.Column - 1 < valueLine.Length && valueLine[at.Column - 1] is '|' or '>';
        var positions = ScalarPositionMap.Build(text, at, rules);
        if (!startsBlock) return new RulesSource(rules, at, at.Column - 1) { Positions = positions };
        var first = Array.FindIndex(lines, at.Line, l => l.Trim().Length > 0);
        var indent = first < 0 ? 0 : lines[first].Length - lines[first].TrimStart(' ').Length;
        return new RulesSource(rules, new SourceLocation(at.File, at.Line + 1, 1), indent) { Positions = positions };
    }

    private static string Trim(string message)
    {
        var index = message.IndexOf(" (Line:", StringComparison.Ordinal);
        return index > 0 ? message[..index] : message;
    }
}
