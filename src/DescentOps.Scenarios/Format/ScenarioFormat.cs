using static DescentOps.Scenarios.Format.QuantityKind;

namespace DescentOps.Scenarios.Format;

/// <summary>
/// The scenario format, version 1: every section and field a scenario file may hold, with its unit
/// dimension, bounds and meaning. Bounds are wide physical plausibility limits, not design limits: they
/// catch a typed "12 m" radius, not a bold design.
/// </summary>
public static class ScenarioFormat
{
    public const string Version = "descentops-scenario/1";

    private const double Day = 86_400;
    private const double Year = 365.25 * Day;

    public static SectionField Root { get; } = new(
        "",
        "A DescentOps scenario: the icy body, its ice shell, the probe, tether, station and vehicles, the faults to inject and the run settings.",
        [
            new TextField("scenario", "Scenario identifier, written into every log (lowercase letters, digits, '-').", IsIdentifier: true),
            new TextField("description", "What this scenario rehearses, in a sentence or two.", Required: false),
            new SectionField("body", "The icy body and the site.",
            [
                new TextField("name", "Name of the body."),
                new TextField("site", "Name of the landing site."),
                new QuantityField("gravity", "Surface gravity.", Acceleration, 0, 30, MinExclusive: true),
                new QuantityField("distance_to_ground", "Distance from the surface station to the ground team, for the one-way light time.", Length, 0, 1e14),
                new QuantityField("surface_pressure", "Atmospheric pressure at the surface; omit (0 Pa) for an airless body, where the probe starts by sublimating.", Pressure, 0, 2e5, Required: false),
            ]),
            new SectionField("shell", "The ice shell above the ocean.",
            [
                new QuantityField("thickness", "Ice thickness from the surface to the ocean.", Length, 0, 200_000, MinExclusive: true),
                new QuantityField("surface_temperature", "Ice temperature at the surface.", Temperature, 20, 273.15),
                new QuantityField("ocean_salinity", "Salinity of the ocean under the ice (mass of salt per mass of seawater); it sets the freezing point at the base.", MassFraction, 0, 0.04),
            ]),
            new SectionField("probe", "The melt probe.",
            [
                new TextField("name", "Name of the probe."),
                new QuantityField("radius", "Outer radius of the probe and its melting head.", Length, 0, 2, MinExclusive: true),
                new QuantityField("length", "Length of the probe body.", Length, 0, 30, MinExclusive: true),
                new QuantityField("mass", "Mass of the probe.", Mass, 0, 20_000, MinExclusive: true),
                new QuantityField("head_power", "Heater power delivered to the melting head.", Power, 0, 1e6),
                new QuantityField("wall_power", "Heater power delivered to the side walls.", Power, 0, 1e6),
                new QuantityField("electronics_power", "Power drawn by on-board electronics.", Power, 0, 1e5),
                new QuantityField("max_head_power", "Most head power a telecommand may set (default: head_power).", Power, 0, 1e6, Required: false),
                new QuantityField("max_wall_power", "Most wall power a telecommand may set (default: wall_power).", Power, 0, 1e6, Required: false),
                new QuantityField("max_tilt", "Tilt from the vertical beyond which the probe is lost (default 10 deg).", Angle, 0, Math.PI / 2, Required: false, MinExclusive: true),
                new QuantityField("freeze_gap", "Water gap around the body that refreezes when the probe stops (default 0.5 mm).", Length, 0, 0.05, Required: false, MinExclusive: true),
                new QuantityField("telemetry_interval", "Time between telemetry frames.", Duration, 1, Day),
            ]),
            new SectionField("tether", "The fibre-optic tether paid out by the probe.",
            [
                new QuantityField("length", "Fibre length on the spool.", Length, 0, 300_000, MinExclusive: true),
                new QuantityField("signal_speed", "Speed of light in the fibre (about c/1.468 in silica fibre).", Speed, 1e7, 299_792_458),
            ]),
            new SectionField("station", "The surface station.",
            [
                new TextField("name", "Name of the station."),
                new QuantityField("forwarding_delay", "Time the station takes to pass a frame on.", Duration, 0, 3600),
            ]),
            new ListField("vehicles", "Vehicles released into the ocean at breakthrough.", new SectionField("vehicle", "One vehicle.",
            [
                new TextField("name", "Vehicle identifier (lowercase letters, digits, '-').", IsIdentifier: true),
                new QuantityField("battery", "Usable battery energy at release.", Energy, 0, 1e10, MinExclusive: true),
                new NumberField("reserve", "Battery share kept for the return and docking; the task stops when only this is left.", 0, 0.9),
                new QuantityField("hotel_power", "Power drawn by sensors and electronics.", Power, 0, 1e4),
                new QuantityField("propulsion_power", "Power drawn by propulsion while moving (a propeller vehicle without a hull section).", Power, 0, 1e5, Required: false),
                new QuantityField("speed", "Speed through the water (a propeller vehicle).", Speed, 0, 10, Required: false, MinExclusive: true),
                new QuantityField("profile_depth", "Depth below the ice of each water-column profile, of the sea floor for a survey, of the station for sampling.", Length, 0, 100_000, MinExclusive: true),
                new NumberField("speed_variation", "Standard deviation of the speed made good over one leg, as a share of the speed (currents); 0 for none.", 0, 0.5, Required: false),
                new ChoiceField("kind", "propeller (default) or glider.", ["propeller", "glider"], Required: false),
                new ChoiceField("task", "water_column (default), ice_mapping, seafloor_survey or sampling.", ["water_column", "ice_mapping", "seafloor_survey", "sampling"], Required: false),
                new QuantityField("heading", "Direction of the task's horizontal legs, clockwise from north (default 0 deg).", Angle, 0, 2 * Math.PI, Required: false),
                new QuantityField("track_length", "Length of one transect of ice_mapping or seafloor_survey (default 500 m).", Length, 0, 100_000, Required: false, MinExclusive: true),
                new QuantityField("sample_time", "Time on station of a sampling task (default 30 min).", Duration, 0, 30 * Day, Required: false, MinExclusive: true),
                new QuantityField("max_out_of_range", "Longest time out of acoustic contact before the vehicle is given up as lost (default 1 d).", Duration, 0, 1000 * Year, Required: false, MinExclusive: true),
                new SectionField("glider", "A buoyancy glider's trim and coefficients (Leonard and Graver 2001 form); for kind glider.",
                [
                    new QuantityField("net_buoyancy", "Net heaviness when diving (and buoyancy when climbing), as a mass.", Mass, 0, 100, MinExclusive: true),
                    new QuantityField("glide_angle", "Glide path angle below or above the horizontal.", Angle, 0, Math.PI / 4, MinExclusive: true),
                    new NumberField("lift_slope", "K_L, kg/m per rad (default 132.5).", 0.1, 10_000, Required: false),
                    new NumberField("drag_offset", "K_D0, kg/m (default 2.15).", 0.01, 1_000, Required: false),
                    new NumberField("drag_quadratic", "K_D, kg/m per rad² (default 25).", 0.01, 10_000, Required: false),
                    new NumberField("pump_efficiency", "Buoyancy pump efficiency (default 0.5).", 0.01, 1, Required: false),
                ], Required: false),
                new SectionField("hull", "A propeller vehicle's hull: its propulsion power follows from drag at its speed (instead of propulsion_power).",
                [
                    new QuantityField("diameter", "Hull diameter.", Length, 0, 5, MinExclusive: true),
                    new NumberField("drag_coefficient", "Drag coefficient on frontal area (default 0.2).", 0.01, 5, Required: false),
                    new NumberField("propulsive_efficiency", "Propeller and motor efficiency together (default 0.5).", 0.01, 1, Required: false),
                ], Required: false),
                new SectionField("current", "A steady current the vehicle drifts in.",
                [
                    new QuantityField("speed", "Current speed.", Speed, 0, 5),
                    new QuantityField("direction", "Direction the current flows towards, clockwise from north.", Angle, 0, 2 * Math.PI),
                ], Required: false),
                new SectionField("navigation", "Dead-reckoning error growth between acoustic fixes.",
                [
                    new NumberField("error_per_distance", "Position error as a share of the distance run (e.g. 0.01).", 0, 1),
                    new NumberField("random_walk", "Random-walk growth of the error variance, m²/s (default 0).", 0, 1e4, Required: false),
                ], Required: false),
                new SectionField("dock", "Return to the dock at the probe by a battery rule, recharge, and go out again.",
                [
                    new NumberField("return_at", "Battery share at which the vehicle turns home.", 0, 1),
                    new QuantityField("charging_power", "Power into the battery at the dock (0 W: no recharging).", Power, 0, 1e6),
                    new IntegerField("sorties", "Sorties in all before the task is done (default 1).", 1, 10_000, Required: false),
                ], Required: false),
            ]), MinItems: 0, MaxItems: 16, Required: false),
            new SectionField("acoustics", "The acoustic link between the probe and its vehicles; omit for a link that never fails.",
            [
                new QuantityField("frequency", "Carrier frequency.", Frequency, 100, 1e6),
                new NumberField("source_level", "Source level, dB re 1 µPa at 1 m.", 100, 250),
                new NumberField("noise_level", "Noise spectral level at the receiver, dB re 1 µPa²/Hz (the receiver's own noise under quiet ice).", -50, 150),
                new QuantityField("bandwidth", "Receiver bandwidth.", Frequency, 0, 1e6, MinExclusive: true),
                new NumberField("detection_threshold", "Signal-to-noise ratio in the band the modem needs, dB.", -30, 60),
                new NumberField("spreading", "Spreading exponent k of k·10·log10(r): 2 spherical, 1 cylindrical (default 1.5).", 1, 2, Required: false),
                new QuantityField("ocean_temperature", "Temperature of the water under the ice.", Temperature, 260, 310),
                new NumberField("ph", "pH of the water (default 8).", 7.7, 8.3, Required: false),
                new ChoiceField("absorption", "francois_garrison (default) or ainslie_mccolm.", ["francois_garrison", "ainslie_mccolm"], Required: false),
                new QuantityField("message_interval", "Time between a vehicle's data messages (default 10 min).", Duration, 1, Day, Required: false),
            ], Required: false),
            new ListField("faults", "Faults injected during the run.", new SectionField("fault", "One fault.",
            [
                new TextField("name", "Fault identifier (lowercase letters, digits, '-').", IsIdentifier: true),
                new ChoiceField("kind", "What fails.", ["power_dip", "tether_break", "station_failure", "sensor_stuck", "sensor_bias", "sensor_dropout", "heater_segment_failure", "tilt_kick", "vehicle_loss"]),
                new QuantityField("at", "Simulated time after the start of the run when the fault begins (give this or at_depth).", Duration, 0, 1000 * Year, Required: false),
                new QuantityField("at_depth", "Head depth at which the fault begins (give this or at).", Length, 0, 200_000, Required: false),
                new QuantityField("duration", "How long the fault lasts; omit for a fault that stays.", Duration, 0, 1000 * Year, Required: false, MinExclusive: true),
                new NumberField("remaining_fraction", "For power_dip: the share of heater power left during the dip; for heater_segment_failure: the share one head half keeps; for a vehicle_loss by battery: the share of the charge left (0 to 1).", 0, 1, Required: false),
                new QuantityField("angle", "For tilt_kick: the sudden change of tilt (a debris band or an inclined layer under the head).", Angle, -Math.PI / 4, Math.PI / 4, Required: false),
                new ChoiceField("point", "For sensor faults: the telemetry point that lies.", [.. Model.ProbeTelemetryPoints.Numeric.Select(p => p.Name)], Required: false),
                new TextField("vehicle", "For vehicle_loss: the vehicle it strikes.", Required: false),
                new ChoiceField("cause", "For vehicle_loss: battery (the charge falls to remaining_fraction), entrapment (held until the fault clears) or out_of_range (the acoustic link is dead until it clears).", ["battery", "entrapment", "out_of_range"], Required: false),
                new TextField("value", "For sensor_stuck (optional: the reading at the fault's start otherwise) and sensor_bias: a quantity in the point's unit, e.g. '0.5 m/h'.", Required: false),
            ]), MinItems: 0, MaxItems: 1000, Required: false),
            new TextField("rules", "Recovery rules in the DescentOps rule language (a YAML block: 'rules: |' then indented lines).", Required: false),
            new SectionField("run", "Run settings; the command line may override them.",
            [
                new IntegerField("seed", "Seed of the run's random streams.", long.MinValue, long.MaxValue),
                new QuantityField("until", "Simulated time limit of the run.", Duration, 0, 1000 * Year, MinExclusive: true),
            ]),
        ]);
}
