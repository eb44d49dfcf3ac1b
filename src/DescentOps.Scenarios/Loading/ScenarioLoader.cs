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

    public static Scenario LoadFile(string path)
    {
        string text;
        try
        {
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
        var root = Bind(text, sourceName, ScenarioFormat.Root, errors, readPaths);
        var scenario = Build(root, sourceName, text);
        CheckConsistency(scenario, root, errors);
        return errors.Count > 0 ? throw new ScenarioException(errors) : scenario;
    }

    private static Scenario Build(BoundSection root, string sourceName, string text)
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
            new ShellModel(shell.Quantity("thickness"), shell.Quantity("surface_temperature"), shell.Quantity("ocean_salinity")),
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
                probe.OptionalQuantity("max_tilt") ?? DefaultMaxTiltRad),
            new TetherModel(tether.Quantity("length"), tether.Quantity("signal_speed"), Optics(tether), (int)(tether.OptionalInteger("buffer_frames") ?? 0)),
            new StationModel(station.Text("name"), station.Quantity("forwarding_delay")),
            [.. root.List("vehicles").Select(v => new VehicleModel(
                v.Text("name"),
                v.Quantity("battery"),
                v.Number("reserve"),
                v.Quantity("hotel_power"),
                v.Quantity("propulsion_power"),
                v.Quantity("speed"),
                v.Quantity("profile_depth"),
                v.OptionalNumber("speed_variation") ?? 0.0))],
            [.. root.List("faults").Select(BuildFault)],
            Rules(root, text),
            new RunModel(run.Integer("seed"), run.Quantity("until")),
            sourceName,
            text,
            RelayPlan(root.OptionalSection("relays"), shell.Quantity("thickness")));
    }

    private static FibreOpticsModel Optics(BoundSection tether)
    {
        var d = FibreOpticsModel.Default;
        return new FibreOpticsModel(
            tether.OptionalText("transceiver") ?? d.Transceiver,
            tether.OptionalNumber("attenuation"),
            tether.OptionalNumber("transmit_power"),
            tether.OptionalNumber("receiver_sensitivity"),
            (int)(tether.OptionalInteger("splices") ?? d.SpliceCount),
            tether.OptionalNumber("splice_loss") ?? d.SpliceLossDb,
            (int)(tether.OptionalInteger("connectors") ?? d.ConnectorCount),
            tether.OptionalNumber("connector_loss") ?? d.ConnectorLossDb,
            tether.OptionalNumber("bend_loss") ?? d.BendLossDb,
            tether.OptionalNumber("pack_loss") ?? d.PackLossDb,
            tether.OptionalNumber("required_margin") ?? d.RequiredMarginDb);
    }

    /// <summary>
    /// The relays, with the defaults of the physics reference's relay example (30 dBm, 0 dBi, 100 MHz, 10 kHz, NF 5 dB,
    /// SNR 10 dB, margin 6 dB) and its 3 dB rule for borehole losses.
    /// </summary>
    private static RelayPlanModel? RelayPlan(BoundSection? relays, double shellThicknessM)
    {
        if (relays is null) return null;
        var drops = relays.List("drops").Select(d => d.Quantity("depth")).Order().ToList();
        var interval = relays.OptionalQuantity("interval");
        // Without a count, the probe carries one relay for each planned drop: each listed depth, or each whole interval
        // above the ocean.
        var planned = interval is { } every ? (int)Math.Min(1000, Math.Ceiling(shellThicknessM / every) - 1) : drops.Count;
        var carried = relays.OptionalInteger("carried");
        return new RelayPlanModel(
            (int)(carried ?? Math.Max(planned, 0)),
            interval,
            drops,
            relays.OptionalNumber("transmit_power") ?? 30.0,
            relays.OptionalNumber("antenna_gain") ?? 0.0,
            relays.OptionalQuantity("frequency") ?? 100e6,
            relays.OptionalQuantity("bandwidth") ?? 10e3,
            relays.OptionalNumber("noise_figure") ?? 5.0,
            relays.OptionalNumber("required_snr") ?? 10.0,
            relays.OptionalNumber("required_margin") ?? 6.0,
            relays.OptionalNumber("misc_loss") ?? 3.0,
            relays.OptionalText("conductivity") ?? "m07-std",
            relays.Quantity("battery"),
            relays.Quantity("power_draw"),
            (int)(relays.OptionalInteger("buffer_frames") ?? 0),
            relays.OptionalQuantity("forwarding_delay") ?? 0.0);
    }

    /// <summary>Reads a branch change file (see <see cref="ChangeFormat"/>), with the same located errors as a scenario.</summary>
    public static ScenarioChange LoadChange(string text, string sourceName)
    {
        var errors = new List<ScenarioError>();
        var root = Bind(text, sourceName, ChangeFormat.Root, errors, null);
        var added = root.List("add_faults");
        var faults = added.Select(BuildFault).ToList();
        for (var i = 0; i < faults.Count; i++) CheckFault(faults[i], added[i], $"add_faults[{i}]", errors);
        if (errors.Count > 0) throw new ScenarioException(errors);
        var rules = root.OptionalText("rules") is null ? null : Rules(root, text);
        return new ScenarioChange(sourceName, text, faults, [.. root.List("remove_faults").Select(f => f.Text("name"))], rules);
    }

    /// <summary>Parses YAML and validates it against a format tree; syntax and field errors are thrown, located.</summary>
    private static BoundSection Bind(string text, string sourceName, SectionField spec, List<ScenarioError> errors, ISet<string>? readPaths)
    {
        var stream = new YamlStream();
        var parser = new Parser(new StringReader(text));
        try
        {
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
        var root = binder.BindSection(stream.Documents[0].RootNode, spec, "");
        if (errors.Count > 0 || root is null)
        {
            throw new ScenarioException([.. errors.OrderBy(e => e.Location.Line).ThenBy(e => e.Location.Column)]);
        }

        return root;
    }

    internal static FaultModel BuildFault(BoundSection f) => new(
        f.Text("name"),
        ParseFaultKind(f.Text("kind")),
        f.OptionalQuantity("at"),
        f.OptionalQuantity("at_depth"),
        f.OptionalQuantity("duration"),
        f.OptionalNumber("remaining_fraction") ?? 0.0,
        f.OptionalText("point"),
        SensorValue(f),
        f.OptionalQuantity("angle"),
        RelayNumber(f));

    /// <summary>"relay-2" or "2" is relay number 2; 0 marks a name that does not parse (reported by <see cref="CheckFault"/>).</summary>
    private static int? RelayNumber(BoundSection fault)
    {
        if (fault.OptionalText("relay") is not { } text) return null;
        var digits = text.StartsWith("relay-", StringComparison.Ordinal) ? text["relay-".Length..] : text;
        return int.TryParse(digits, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var n) && n >= 1 ? n : 0;
    }

    /// <summary>A sensor fault's value in SI, in the unit dimension of its point; NaN marks a value that does not parse.</summary>
    private static double? SensorValue(BoundSection fault)
    {
        if (fault.OptionalText("value") is not { } text) return null;
        var kind = fault.OptionalText("point") is { } point ? ProbeTelemetryPoints.KindOf(point) : null;
        if (kind is null) return double.NaN;
        return QuantityParser.TryParseSi(kind.Value, text, out var si, out _) ? si : double.NaN;
    }

    /// <summary>The rules block with its place in the file: a block scalar's text starts on the line after 'rules: |'.</summary>
    private static RulesSource Rules(BoundSection root, string text)
    {
        if (root.OptionalText("rules") is not { } rules) return RulesSource.None;
        var at = root.LocationOf("rules");
        var lines = text.Split('\n');
        var valueLine = at.Line - 1 < lines.Length ? lines[at.Line - 1] : "";
        var startsBlock = at.Column - 1 < valueLine.Length && valueLine[at.Column - 1] is '|' or '>';
        if (!startsBlock) return new RulesSource(rules, at, at.Column - 1);
        var first = Array.FindIndex(lines, at.Line, l => l.Trim().Length > 0);
        var indent = first < 0 ? 0 : lines[first].Length - lines[first].TrimStart(' ').Length;
        return new RulesSource(rules, new SourceLocation(at.File, at.Line + 1, 1), indent);
    }

    /// <summary>Rules that tie fields together, which the per-field bounds cannot express.</summary>
    private static void CheckConsistency(Scenario scenario, BoundSection root, List<ScenarioError> errors)
    {
        var faults = root.List("faults");
        for (var i = 0; i < scenario.Faults.Count; i++)
        {
            CheckFault(scenario.Faults[i], faults[i], $"faults[{i}]", errors);
            if (scenario.Faults[i].RelayNumber is > 0 and var n && n > (scenario.Relays?.Carried ?? 0))
            {
                errors.Add(new ScenarioError(faults[i].LocationOf("relay"), $"faults[{i}].relay", $"the probe carries {scenario.Relays?.Carried ?? 0} relays, so there is no relay {n}"));
            }
        }

        if (scenario.Relays is { } plan && root.OptionalSection("relays") is { } relays)
        {
            if (plan.IntervalM is not null && plan.DropDepthsM.Count > 0)
            {
                errors.Add(new ScenarioError(relays.LocationOf("interval"), "relays.interval", "give 'interval' or 'drops', not both"));
            }

            if (plan.DropDepthsM.Count > plan.Carried)
            {
                errors.Add(new ScenarioError(relays.LocationOf("carried"), "relays.carried", $"{plan.DropDepthsM.Count} drops are planned but only {plan.Carried} relays are carried"));
            }
        }
    }

    /// <summary>The cross-field rules of one fault, shared by scenarios and branch change files.</summary>
    internal static void CheckFault(FaultModel fault, BoundSection section, string path, List<ScenarioError> errors)
    {
        if (fault.Kind == FaultKind.PowerDip && fault.DurationS is null)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.duration", "a power_dip needs a duration"));
        }

        if (fault.Kind is FaultKind.TetherBreak or FaultKind.SpoolJam && fault.DurationS is not null)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.duration", $"a broken fibre does not heal: a {KindWord(fault.Kind)} takes no duration"));
        }

        if ((fault.Kind == FaultKind.RelayFailure) != (fault.RelayNumber is not null))
        {
            errors.Add(new ScenarioError(section.LocationOf("relay"), $"{path}.relay", fault.Kind == FaultKind.RelayFailure ? "a relay_failure names its relay" : $"'relay' belongs to a relay_failure, not to a {KindWord(fault.Kind)}"));
        }
        else if (fault.RelayNumber == 0)
        {
            errors.Add(new ScenarioError(section.LocationOf("relay"), $"{path}.relay", $"'{section.OptionalText("relay")}' is not a relay: write its name ('relay-2') or its number ('2')"));
        }

        if ((fault.AtS is null) == (fault.AtDepthM is null))
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.at", "give exactly one trigger: 'at' (a time) or 'at_depth' (a depth)"));
        }

        var isSensor = fault.Kind is FaultKind.SensorStuck or FaultKind.SensorBias or FaultKind.SensorDropout;
        if (isSensor && fault.Point is null)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.point", $"a {KindWord(fault.Kind)} fault names the telemetry point that lies"));
        }

        if (!isSensor && (fault.Point is not null || section.OptionalText("value") is not null))
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.point", $"'point' and 'value' belong to sensor faults, not to a {KindWord(fault.Kind)}"));
        }

        if ((fault.Kind == FaultKind.TiltKick) != (fault.AngleRad is not null))
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.angle", fault.Kind == FaultKind.TiltKick ? "a tilt_kick needs its angle" : "'angle' belongs to a tilt_kick"));
        }

        if (fault.Kind == FaultKind.SensorBias && fault.ValueSi is null)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.value", "a sensor_bias needs the offset as a value"));
        }

        if (fault.ValueSi is { } v && double.IsNaN(v) && fault.Point is { } point)
        {
            var kind = ProbeTelemetryPoints.KindOf(point)!.Value;
            errors.Add(new ScenarioError(section.LocationOf("value"), $"{path}.value", $"'{section.OptionalText("value")}' is not a {kind.ToString().ToLowerInvariant()} (units: {kind.ExampleUnits()}), as point {point} needs"));
        }
    }

    private static FaultKind ParseFaultKind(string word) => word switch
    {
        "power_dip" => FaultKind.PowerDip,
        "tether_break" => FaultKind.TetherBreak,
        "station_failure" => FaultKind.StationFailure,
        "sensor_stuck" => FaultKind.SensorStuck,
        "sensor_bias" => FaultKind.SensorBias,
        "sensor_dropout" => FaultKind.SensorDropout,
        "heater_segment_failure" => FaultKind.HeaterSegmentFailure,
        "tilt_kick" => FaultKind.TiltKick,
        "relay_failure" => FaultKind.RelayFailure,
        "spool_jam" => FaultKind.SpoolJam,
        _ => throw new InvalidOperationException($"Fault kind '{word}' passed validation but has no model."),
    };

    private static string KindWord(FaultKind kind) => kind switch
    {
        FaultKind.PowerDip => "power_dip",
        FaultKind.TetherBreak => "tether_break",
        FaultKind.StationFailure => "station_failure",
        FaultKind.SensorStuck => "sensor_stuck",
        FaultKind.SensorBias => "sensor_bias",
        FaultKind.SensorDropout => "sensor_dropout",
        FaultKind.HeaterSegmentFailure => "heater_segment_failure",
        FaultKind.RelayFailure => "relay_failure",
        FaultKind.SpoolJam => "spool_jam",
        _ => "tilt_kick",
    };

    private static string Trim(string message)
    {
        var index = message.IndexOf(" (Line:", StringComparison.Ordinal);
        return index > 0 ? message[..index] : message;
    }
}
