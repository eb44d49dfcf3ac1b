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
        CheckConsistency(scenario, root, errors);
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
        CheckConsistency(scenario, root, errors);
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
                Jets = probe.OptionalSection("jets") is { } jets ? BuildJets(jets) : null,
            },
            new TetherModel(tether.Quantity("length"), tether.Quantity("signal_speed"), Optics(tether), (int)(tether.OptionalInteger("buffer_frames") ?? 0)),
            BuildStation(station),
            [.. root.List("vehicles").Select(BuildVehicle)],
            [.. root.List("faults").Select((f, i) => FaultReader.Read(f, $"faults[{i}]", errors)).OfType<FaultModel>()],
            Rules(root, text),
            new RunModel(run.Integer("seed"), run.Quantity("until")),
            sourceName,
            text,
            root.OptionalSection("power") is { } power ? BuildPower(power, probe.OptionalSection("jets") is not null) : null,
            BuildAcoustics(root.OptionalSection("acoustics")),
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

    private static PowerModel BuildPower(BoundSection power, bool hasJets)
    {
        var battery = power.OptionalSection("battery") is { } b
            ? new BatteryModel(
                b.Quantity("capacity"),
                b.Quantity("max_discharge_power"),
                b.OptionalQuantity("max_charge_power") ?? b.Quantity("max_discharge_power"),
                b.Number("charge_efficiency"),
                b.Number("discharge_efficiency"),
                b.OptionalNumber("initial_charge") ?? 1.0,
                b.OptionalQuantity("temperature") ?? DefaultBatteryTemperatureK)
            : null;
        var turbine = power.OptionalSection("turbine") is { } t
            ? new TurbineModel(
                t.Quantity("rotor_diameter"),
                t.Number("power_coefficient"),
                t.Number("drivetrain_efficiency"),
                t.OptionalQuantity("cut_in_speed") ?? 0.0,
                t.Quantity("rated_speed"),
                t.Quantity("current_speed"),
                t.OptionalQuantity("water_density") ?? DefaultWaterDensityKgPerM3)
            : null;
        var loads = power.List("loads");
        return new PowerModel(
            power.Text("source") == "fission" ? PowerSourceKind.Fission : PowerSourceKind.Radioisotope,
            power.OptionalQuantity("thermal_power") ?? 0.0,
            power.Number("conversion_efficiency"),
            power.OptionalNumber("degradation_per_year") ?? 0.0,
            power.OptionalQuantity("fuel_age") ?? 0.0,
            power.OptionalQuantity("electric_power") ?? 0.0,
            battery,
            loads.Count == 0 ? (hasJets ? [.. DefaultLoads, DefaultJetsLoad] : DefaultLoads) : [.. loads.Select(BuildLoad)],
            turbine)
        {
            WasteHeatToHead = power.OptionalSection("heat_path")?.Number("head") ?? 0.0,
            WasteHeatToWall = power.OptionalSection("heat_path")?.Number("wall") ?? 0.0,
        };
    }

    /// <summary>The bus a power section without loads gets: heat and electronics first, the wall heater shed first.</summary>
    private static readonly BusLoadModel[] DefaultLoads =
    [
        new("electronics", BusLoadRole.Electronics, 0, 0.0),
        new("head", BusLoadRole.HeadHeater, 0, 0.0),
        new("wall", BusLoadRole.WallHeater, 1, 0.0),
    ];

    /// <summary>The jets' load on a default bus: shed with the wall heater, before the head and the electronics.</summary>
    private static readonly BusLoadModel DefaultJetsLoad = new("jets", BusLoadRole.Jets, 1, 0.0);

    /// <summary>The jets section; the efficiency defaults to the rule of thumb the jet model carries (<see cref="Physics.Descent.HotWaterJet.DefaultEfficiency"/>).</summary>
    private static ProbeJetsModel BuildJets(BoundSection jets) => new(
        jets.Quantity("heat"),
        jets.Quantity("pump_power"),
        jets.Quantity("minimum_hole_radius"),
        jets.OptionalQuantity("hole_radius") ?? jets.Quantity("minimum_hole_radius"),
        jets.OptionalNumber("efficiency") ?? Physics.Descent.HotWaterJet.DefaultEfficiency,
        jets.OptionalQuantity("initial_power") ?? 0.0);

    private static BusLoadModel BuildLoad(BoundSection load) => new(
        load.Text("name"),
        load.Text("role") switch
        {
            "head_heater" => BusLoadRole.HeadHeater,
            "wall_heater" => BusLoadRole.WallHeater,
            "electronics" => BusLoadRole.Electronics,
            "jets" => BusLoadRole.Jets,
            _ => BusLoadRole.Fixed,
        },
        (int)load.Integer("priority"),
        load.OptionalQuantity("power") ?? 0.0);

    private static StationModel BuildStation(BoundSection station)
    {
        var radiation = station.OptionalSection("radiation");
        var link = station.OptionalSection("link");
        var radio = link?.OptionalSection("radio");
        var dwell = station.OptionalSection("dwell");
        var charging = station.OptionalSection("charging");
        return new StationModel(
            station.Text("name"),
            station.Quantity("forwarding_delay"),
            radiation is null ? null : new StationRadiationModel(
                radiation.Quantity("dose_rate"),
                radiation.OptionalQuantity("shielding") ?? 0.0,
                radiation.OptionalNumber("electron_share") ?? DefaultElectronShare,
                radiation.OptionalQuantity("electron_length") ?? DefaultElectronLengthM,
                radiation.OptionalQuantity("photon_length") ?? DefaultPhotonLengthM,
                radiation.Text("failure_model") == "weibull" ? DoseFailureModel.Weibull : DoseFailureModel.Lognormal,
                radiation.Quantity("failure_dose"),
                radiation.Number("failure_spread")),
            link is null ? null : new StationLinkModel(
                link.Quantity("rotation_period"),
                link.OptionalQuantity("latitude") ?? 0.0,
                link.OptionalQuantity("home_declination") ?? 0.0,
                link.OptionalQuantity("elevation_mask") ?? 0.0,
                link.OptionalQuantity("start_hour_angle") ?? 0.0,
                link.OptionalQuantity("planet_radius"),
                link.OptionalQuantity("orbit_radius"),
                link.OptionalQuantity("planet_hour_angle") ?? 0.0,
                radio is null ? null : new StationRadioModel(
                    radio.Quantity("transmit_power"),
                    radio.Quantity("dish_diameter"),
                    radio.OptionalNumber("dish_efficiency") ?? DefaultDishEfficiency,
                    radio.Quantity("ground_dish_diameter"),
                    radio.OptionalNumber("ground_dish_efficiency") ?? DefaultGroundDishEfficiency,
                    radio.Quantity("frequency"),
                    radio.Quantity("system_noise_temperature"),
                    radio.Number("line_loss"),
                    radio.Number("required_eb_n0"),
                    radio.Number("margin"),
                    radio.Integer("frame_bits"))),
            dwell is null ? null : new SurfaceDwellModel(dwell.Quantity("duration"), dwell.Quantity("d_value")),
            charging is null ? null : new StationChargingModel(
                charging.Quantity("upset_interval"),
                charging.Quantity("recovery_time"),
                (charging.OptionalText("during_recovery") ?? "queue") == "queue"),
            station.OptionalInteger("frame_queue_capacity"),
            station.OptionalInteger("command_queue_capacity"))
        {
            SilenceTimeoutS = station.OptionalQuantity("silence_timeout") ?? StationModel.DefaultSilenceTimeoutS,
        };
    }

    /// <summary>A vehicle; a missing speed or propulsion power reads as 0 here and is refused by the consistency check.</summary>
    private static VehicleModel BuildVehicle(BoundSection v)
    {
        var glider = v.OptionalSection("glider");
        var hull = v.OptionalSection("hull");
        var current = v.OptionalSection("current");
        var navigation = v.OptionalSection("navigation");
        var dock = v.OptionalSection("dock");
        var graver = Physics.Vehicles.GliderCoefficients.Graver2005;
        var propeller = Physics.Vehicles.PropelledVehicle.Default;
        return new VehicleModel(
            v.Text("name"),
            v.Quantity("battery"),
            v.Number("reserve"),
            v.Quantity("hotel_power"),
            v.OptionalQuantity("propulsion_power") ?? 0.0,
            v.OptionalQuantity("speed") ?? 0.0,
            v.Quantity("profile_depth"),
            v.OptionalNumber("speed_variation") ?? 0.0,
            v.OptionalText("kind") == "glider" ? VehicleKind.Glider : VehicleKind.Propeller,
            v.OptionalText("task") switch
            {
                "ice_mapping" => VehicleTask.IceMapping,
                "seafloor_survey" => VehicleTask.SeafloorSurvey,
                "sampling" => VehicleTask.Sampling,
                _ => VehicleTask.WaterColumn,
            },
            v.OptionalQuantity("heading") ?? 0.0,
            v.OptionalQuantity("track_length") ?? VehicleModel.DefaultTrackLengthM,
            v.OptionalQuantity("sample_time") ?? VehicleModel.DefaultSampleTimeS,
            glider is null ? null : new GliderSettings(
                glider.Quantity("net_buoyancy"),
                glider.Quantity("glide_angle"),
                glider.OptionalNumber("lift_slope") ?? graver.LiftSlopeKgPerMRad,
                glider.OptionalNumber("drag_offset") ?? graver.DragOffsetKgPerM,
                glider.OptionalNumber("drag_quadratic") ?? graver.DragQuadraticKgPerMRad2,
                glider.OptionalNumber("pump_efficiency") ?? DefaultPumpEfficiency),
            hull is null ? null : new HullSettings(
                hull.Quantity("diameter"),
                hull.OptionalNumber("drag_coefficient") ?? propeller.DragCoefficient,
                hull.OptionalNumber("propulsive_efficiency") ?? propeller.PropulsiveEfficiency),
            current is null ? null : new OceanCurrent(current.Quantity("speed"), current.Quantity("direction")),
            navigation is null ? null : new NavigationSettings(navigation.Number("error_per_distance"), navigation.OptionalNumber("random_walk") ?? 0.0),
            dock is null ? null : new DockSettings(dock.Number("return_at"), dock.Quantity("charging_power"), (int)(dock.OptionalInteger("sorties") ?? 1)),
            v.OptionalQuantity("max_out_of_range") ?? VehicleModel.DefaultMaxOutOfRangeS);
    }

    private static AcousticsModel? BuildAcoustics(BoundSection? a) => a is null ? null : new AcousticsModel(
        a.Quantity("frequency"),
        a.Number("source_level"),
        a.Number("noise_level"),
        a.Quantity("bandwidth"),
        a.Number("detection_threshold"),
        a.OptionalNumber("spreading") ?? DefaultSpreadingExponent,
        a.OptionalQuantity("ocean_temperature"),
        a.OptionalNumber("ph") ?? DefaultPH,
        a.OptionalText("absorption") == "ainslie_mccolm" ? AbsorptionFormula.AinslieMcColm : AbsorptionFormula.FrancoisGarrison,
        a.OptionalQuantity("message_interval") ?? DefaultMessageIntervalS);

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

    /// <summary>The rules block with its place in the file: a block scalar's text starts on the line after 'rules: |'.</summary>
    private static RulesSource Rules(BoundSection root, string text)
    {
        if (root.OptionalText("rules") is not { } rules) return RulesSource.None;
        var at = root.LocationOf("rules");
        var lines = text.Split('\n');
        var valueLine = at.Line - 1 < lines.Length ? lines[at.Line - 1] : "";
        var startsBlock = at.Column - 1 < valueLine.Length && valueLine[at.Column - 1] is '|' or '>';
        var positions = ScalarPositionMap.Build(text, at, rules);
        if (!startsBlock) return new RulesSource(rules, at, at.Column - 1) { Positions = positions };
        var first = Array.FindIndex(lines, at.Line, l => l.Trim().Length > 0);
        var indent = first < 0 ? 0 : lines[first].Length - lines[first].TrimStart(' ').Length;
        return new RulesSource(rules, new SourceLocation(at.File, at.Line + 1, 1), indent) { Positions = positions };
    }

    /// <summary>Rules that tie fields together, which the per-field bounds cannot express.</summary>
    private static void CheckConsistency(Scenario scenario, BoundSection root, List<ScenarioError> errors)
    {
        var shell = root.Section("shell");
        CheckIntervals(shell.List("layers"), scenario.Shell.Layers.Select(l => (l.TopM, l.BottomM)).ToList(), "shell.layers", scenario.Shell.ThicknessM, errors);
        CheckIntervals(shell.List("debris_bands"), scenario.Shell.DebrisBands.Select(b => (b.TopM, b.BottomM)).ToList(), "shell.debris_bands", scenario.Shell.ThicknessM, errors);
        if (scenario.Shell.Convection is { } convection && shell.OptionalSection("convection") is { } convectionSection)
        {
            if (convection.TopM + convection.BasalBoundaryM >= scenario.Shell.ThicknessM)
            {
                errors.Add(new ScenarioError(convectionSection.LocationOf("top"), "shell.convection.top", "the lid and the basal boundary layer leave no room for the convecting layer within the shell"));
            }

            if (convection.TemperatureK <= scenario.Shell.SurfaceTemperatureK)
            {
                errors.Add(new ScenarioError(convectionSection.LocationOf("temperature"), "shell.convection.temperature", "a convecting layer is warmer than the surface"));
            }
        }

        if (scenario.Shell.FracturedToM > scenario.Shell.ThicknessM)
        {
            errors.Add(new ScenarioError(shell.LocationOf("fractured_to"), "shell.fractured_to", "the fractured zone cannot reach below the shell's thickness"));
        }

        var faults = root.List("faults");
        for (var i = 0; i < faults.Count; i++)
        {
            if (faults[i].OptionalText("vehicle") is { } name && scenario.Vehicles.All(v => v.Name != name))
            {
                errors.Add(new ScenarioError(faults[i].LocationOf("vehicle"), $"faults[{i}].vehicle", $"there is no vehicle named '{name}'"));
            }
            if (FaultReader.RelayNumber(faults[i]) is > 0 and var n && n > (scenario.Relays?.Carried ?? 0))
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

        var vehicles = root.List("vehicles");
        for (var i = 0; i < scenario.Vehicles.Count; i++)
        {
            CheckVehicle(scenario.Vehicles[i], vehicles[i], $"vehicles[{i}]", errors);
        }

        if (scenario.Power is { } power) CheckPower(power, root.Section("power"), scenario.Probe.Jets is not null, errors);
        CheckJets(scenario, root, errors);
        CheckStation(scenario.Station, root.Section("station"), errors);
    }

    /// <summary>The jets cut a hole wider than the probe, no narrower than their minimum, with no more heat than they have; a clogged nozzle needs jets.</summary>
    private static void CheckJets(Scenario scenario, BoundSection root, List<ScenarioError> errors)
    {
        var faults = root.List("faults");
        for (var i = 0; i < faults.Count; i++)
        {
            if (FaultReader.KindOf(faults[i]) == FaultKind.CloggedNozzle && scenario.Probe.Jets is null)
            {
                errors.Add(new ScenarioError(faults[i].LocationOf("kind"), $"faults[{i}].kind", "a clogged_nozzle needs a probe with jets (probe.jets)"));
            }
        }

        if (scenario.Probe.Jets is not { } jets || root.Section("probe").OptionalSection("jets") is not { } section) return;
        if (jets.MinimumHoleRadiusM <= scenario.Probe.RadiusM)
        {
            errors.Add(new ScenarioError(section.LocationOf("minimum_hole_radius"), "probe.jets.minimum_hole_radius", $"the jets' hole must be wider than the probe's radius of {scenario.Probe.RadiusM.ToString("G6", System.Globalization.CultureInfo.InvariantCulture)} m"));
        }

        if (jets.HoleRadiusM < jets.MinimumHoleRadiusM)
        {
            errors.Add(new ScenarioError(section.LocationOf("hole_radius"), "probe.jets.hole_radius", "the hole radius is below minimum_hole_radius"));
        }

        if (jets.InitialHeatW > jets.MaxHeatW)
        {
            errors.Add(new ScenarioError(section.LocationOf("initial_power"), "probe.jets.initial_power", "the initial jet power is above the jets' heat"));
        }
    }

    /// <summary>A propeller needs its speed and one source of power; a glider its trim, which must be one it can fly.</summary>
    private static void CheckVehicle(VehicleModel vehicle, BoundSection section, string path, List<ScenarioError> errors)
    {
        if (vehicle.Kind == VehicleKind.Propeller)
        {
            if (section.OptionalQuantity("speed") is null)
            {
                errors.Add(new ScenarioError(section.Location, $"{path}.speed", "a propeller vehicle needs its speed"));
            }

            if ((section.OptionalQuantity("propulsion_power") is null) == (vehicle.Hull is null))
            {
                errors.Add(new ScenarioError(section.Location, $"{path}.propulsion_power", "a propeller vehicle takes either propulsion_power or a hull section, exactly one"));
            }

            if (vehicle.Glider is not null)
            {
                errors.Add(new ScenarioError(section.LocationOf("glider"), $"{path}.glider", "a glider section needs kind: glider"));
            }
        }
        else
        {
            if (vehicle.Glider is not { } glider)
            {
                errors.Add(new ScenarioError(section.Location, $"{path}.glider", "a glider needs its glider section (net_buoyancy, glide_angle)"));
                return;
            }

            if (section.OptionalQuantity("speed") is not null || section.OptionalQuantity("propulsion_power") is not null || vehicle.Hull is not null)
            {
                errors.Add(new ScenarioError(section.Location, $"{path}.speed", "a glider's speed follows from its buoyancy and trim: it takes no speed, propulsion_power or hull"));
            }

            var coefficients = new Physics.Vehicles.GliderCoefficients(0.0, glider.LiftSlopeKgPerMRad, glider.DragOffsetKgPerM, glider.DragQuadraticKgPerMRad2);
            Refused(section.LocationOf("glider"), $"{path}.glider.glide_angle", errors, () => Physics.Vehicles.SteadyGlide.AngleOfAttackRad(coefficients, glider.GlideAngleRad));
        }

        if (vehicle.Dock is { } dock && dock.ReturnAtFraction < vehicle.ReserveFraction)
        {
            errors.Add(new ScenarioError(section.LocationOf("dock"), $"{path}.dock.return_at", "return_at must not be below the reserve: the reserve is what the way home is paid from"));
        }
    }

    /// <summary>Runs a physics model on the scenario's values and turns its range refusal into a located error.</summary>
    private static void Refused(SourceLocation at, string path, List<ScenarioError> errors, Action model)
    {
        try
        {
            model();
        }
        catch (ArgumentOutOfRangeException exception)
        {
            errors.Add(new ScenarioError(at, path, exception.Message.Split(" (Parameter", StringSplitOptions.None)[0]));
        }
    }

    /// <summary>The cross-field rules of the power section: the source's own fields, and a bus that has every heater.</summary>
    private static void CheckPower(PowerModel power, BoundSection section, bool hasJets, List<ScenarioError> errors)
    {
        var radioisotope = power.Source == PowerSourceKind.Radioisotope;
        if (radioisotope && section.OptionalQuantity("thermal_power") is null)
        {
            errors.Add(new ScenarioError(section.Location, "power.thermal_power", "a radioisotope source needs its thermal_power"));
        }

        if (!radioisotope && section.OptionalQuantity("electric_power") is null)
        {
            errors.Add(new ScenarioError(section.Location, "power.electric_power", "a fission source needs its electric_power"));
        }

        var foreign = radioisotope
            ? new[] { ("electric_power", section.OptionalQuantity("electric_power") is not null) }
            : [("thermal_power", section.OptionalQuantity("thermal_power") is not null), ("degradation_per_year", section.OptionalNumber("degradation_per_year") is not null), ("fuel_age", section.OptionalQuantity("fuel_age") is not null)];
        foreach (var (field, _) in foreign.Where(f => f.Item2))
        {
            errors.Add(new ScenarioError(section.LocationOf(field), $"power.{field}", $"'{field}' does not belong to a {(radioisotope ? "radioisotope" : "fission")} source"));
        }

        var loads = section.List("loads");
        for (var i = 0; i < loads.Count; i++)
        {
            var fixedLoad = power.Loads[i].Role == BusLoadRole.Fixed;
            if (fixedLoad != (loads[i].OptionalQuantity("power") is not null))
            {
                errors.Add(new ScenarioError(loads[i].Location, $"power.loads[{i}].power", fixedLoad
                    ? "a fixed load needs its power"
                    : "a heater or the electronics draws what the probe asks of it; 'power' belongs to fixed loads"));
            }
        }

        foreach (var role in new[] { BusLoadRole.HeadHeater, BusLoadRole.WallHeater, BusLoadRole.Electronics })
        {
            var count = power.Loads.Count(l => l.Role == role);
            if (count != 1)
            {
                var word = role switch { BusLoadRole.HeadHeater => "head_heater", BusLoadRole.WallHeater => "wall_heater", _ => "electronics" };
                errors.Add(new ScenarioError(section.LocationOf("loads"), "power.loads", $"the bus needs exactly one {word} load, found {count}"));
            }
        }

        var jetLoads = power.Loads.Count(l => l.Role == BusLoadRole.Jets);
        if (jetLoads != (hasJets ? 1 : 0))
        {
            errors.Add(new ScenarioError(section.LocationOf("loads"), "power.loads", hasJets
                ? $"a probe with jets needs exactly one jets load on its bus, found {jetLoads}"
                : "a jets load belongs to a probe with a probe.jets section"));
        }

        if (power.WasteHeatToHead + power.WasteHeatToWall > 1.0)
        {
            errors.Add(new ScenarioError(section.Section("heat_path").Location, "power.heat_path", "the head and wall shares of the waste heat add up to more than 1"));
        }

        if (power.Turbine is { } turbine && turbine.CutInSpeedMPerS > turbine.RatedSpeedMPerS)
        {
            errors.Add(new ScenarioError(section.Section("turbine").Location, "power.turbine.cut_in_speed", "the cut-in speed is above the rated speed"));
        }
    }

    /// <summary>Depth intervals of the shell: top above bottom, inside the shell, and none overlapping another.</summary>
    private static void CheckIntervals(IReadOnlyList<BoundSection> sections, List<(double Top, double Bottom)> intervals, string path, double thicknessM, List<ScenarioError> errors)
    {
        for (var i = 0; i < intervals.Count; i++)
        {
            var (top, bottom) = intervals[i];
            if (bottom <= top)
            {
                errors.Add(new ScenarioError(sections[i].LocationOf("bottom"), $"{path}[{i}].bottom", "the bottom must be deeper than the top"));
            }
            else if (bottom > thicknessM)
            {
                errors.Add(new ScenarioError(sections[i].LocationOf("bottom"), $"{path}[{i}].bottom", "the bottom lies below the shell's thickness"));
            }

            for (var j = 0; j < i; j++)
            {
                if (top < intervals[j].Bottom && intervals[j].Top < bottom)
                {
                    errors.Add(new ScenarioError(sections[i].Location, $"{path}[{i}]", $"overlaps {path}[{j}]"));
                }
            }
        }
    }

    /// <summary>The station's parts that depend on each other, or whose range depends on a choice.</summary>
    private static void CheckStation(StationModel station, BoundSection section, List<ScenarioError> errors)
    {
        if (station.Radiation is { } radiation)
        {
            var at = section.Section("radiation").LocationOf("failure_spread");
            if (radiation.FailureModel == DoseFailureModel.Weibull && radiation.FailureSpread < 0.1)
            {
                errors.Add(new ScenarioError(at, "station.radiation.failure_spread", $"a Weibull shape must be 0.1 to 50, not {radiation.FailureSpread.ToString(System.Globalization.CultureInfo.InvariantCulture)}"));
            }

            if (radiation.FailureModel == DoseFailureModel.Lognormal && radiation.FailureSpread > 5)
            {
                errors.Add(new ScenarioError(at, "station.radiation.failure_spread", $"a lognormal log standard deviation must be 0.001 to 5, not {radiation.FailureSpread.ToString(System.Globalization.CultureInfo.InvariantCulture)}"));
            }
        }

        if (station.Link is { } link)
        {
            var linkSection = section.Section("link");
            if ((link.PlanetRadiusM is null) != (link.OrbitRadiusM is null))
            {
                errors.Add(new ScenarioError(linkSection.Location, "station.link.orbit_radius", "give planet_radius and orbit_radius together, or neither"));
            }
            else if (link.PlanetRadiusM >= link.OrbitRadiusM)
            {
                errors.Add(new ScenarioError(linkSection.LocationOf("orbit_radius"), "station.link.orbit_radius", "the orbit must lie outside the planet (orbit_radius above planet_radius)"));
            }
        }

        if (station.Dwell is not null && station.Radiation is null)
        {
            errors.Add(new ScenarioError(section.Section("dwell").Location, "station.dwell", "a surface dwell sterilises by dose: give station.radiation with its dose_rate"));
        }
    }

    private static string Trim(string message)
    {
        var index = message.IndexOf(" (Line:", StringComparison.Ordinal);
        return index > 0 ? message[..index] : message;
    }
}
