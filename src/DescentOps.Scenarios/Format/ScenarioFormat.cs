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

    /// <summary>
    /// The tether's optical budget and the probe-end buffer. Every field is optional; the defaults (1000BASE-LX optics at
    /// 1310 nm, typical fibre, two connectors, no buffer) give a link that closes over any spool of the demo scenarios.
    /// </summary>
    private static IReadOnlyList<FieldSpec> TetherLinkFields { get; } =
    [
        new ChoiceField("transceiver", "Optical transceiver class at both ends (default 1000base-lx): its wavelength, line rate, minimum launch power and receiver sensitivity.", ["100base-lx10", "1000base-lx", "10gbase-lr", "gbe-long-reach"], Required: false),
        new NumberField("attenuation", "Cabled fibre attenuation in dB/km (default: typical fibre at the transceiver's wavelength, 0.35 dB/km at 1310 nm, 0.20 dB/km at 1550 nm).", 0, 10, Required: false),
        new NumberField("transmit_power", "Launch power in dBm (default: the transceiver class minimum).", -40, 20, Required: false),
        new NumberField("receiver_sensitivity", "Receiver sensitivity in dBm (default: the transceiver class value).", -60, 0, Required: false),
        new IntegerField("splices", "Fusion splices along the fibre (default 0).", 0, 10_000, Required: false),
        new NumberField("splice_loss", "Loss per splice in dB (default 0.05).", 0, 3, Required: false),
        new IntegerField("connectors", "Mated connector pairs (default 2).", 0, 100, Required: false),
        new NumberField("connector_loss", "Loss per connector pair in dB (default 0.3).", 0, 3, Required: false),
        new NumberField("bend_loss", "Macro-bend loss at the spool and in the borehole, in dB (default 0).", 0, 30, Required: false),
        new NumberField("pack_loss", "Extra loss in dB while fibre is still wound on the spool (default 0).", 0, 30, Required: false),
        new NumberField("required_margin", "Margin in dB a frame needs to get through (default 0: margin >= 0).", 0, 30, Required: false),
        new IntegerField("buffer_frames", "Frames the probe holds while no path home is up; also the frames the surface end holds for commands going down (default 0: nothing is held).", 0, 10_000_000, Required: false),
    ];

    /// <summary>The radio relay transceivers the probe drops into its melt channel, a backup path when the fibre fails.</summary>
    private static SectionField Relays { get; } = new("relays", "Radio relay transceivers the probe carries and drops into the melt channel; when the fibre is down, frames go home relay by relay if every hop closes.",
    [
        new IntegerField("carried", "Relays on board (default: as many as the drops planned).", 0, 1000, Required: false),
        new QuantityField("interval", "Drop a relay every time the head has gone this much deeper (give this or drops, or neither to drop only by telecommand).", Length, 0, 200_000, Required: false, MinExclusive: true),
        new ListField("drops", "Depths at which relays are dropped.", new SectionField("drop", "One planned drop.",
        [
            new QuantityField("depth", "Head depth of the drop.", Length, 0, 200_000, MinExclusive: true),
        ]), MinItems: 1, MaxItems: 1000, Required: false),
        new NumberField("transmit_power", "Radio transmit power in dBm (default 30).", -30, 60, Required: false),
        new NumberField("antenna_gain", "Gain of each antenna embedded in ice, in dBi (default 0).", -20, 20, Required: false),
        new QuantityField("frequency", "Carrier frequency (default 100 MHz).", Frequency, 1e6, 1e9, Required: false),
        new QuantityField("bandwidth", "Receiver bandwidth (default 10 kHz).", Frequency, 1, 1e8, Required: false),
        new NumberField("noise_figure", "Receiver noise figure in dB (default 5).", 0, 30, Required: false),
        new NumberField("required_snr", "Signal-to-noise ratio in dB the modem needs (default 10).", -10, 40, Required: false),
        new NumberField("required_margin", "Margin in dB a hop needs on top of the SNR (default 6).", 0, 40, Required: false),
        new NumberField("misc_loss", "Borehole geometry, refrozen interfaces and detuning, in dB (default 3).", 0, 60, Required: false),
        new ChoiceField("conductivity", "Parameter set of the ice conductivity (default m07-std, MacGregor et al. 2007).", ["m07-std", "m07-adj", "w97"], Required: false),
        new QuantityField("battery", "Usable battery energy of each relay at the drop.", Energy, 0, 1e10, MinExclusive: true),
        new QuantityField("power_draw", "Power each relay draws from the drop until its battery is empty.", Power, 0, 1e4, MinExclusive: true),
        new IntegerField("buffer_frames", "Frames each relay holds while the path above it is down (default 0).", 0, 10_000_000, Required: false),
        new QuantityField("forwarding_delay", "Time each relay takes to pass a frame on (default 0 s).", Duration, 0, 3600, Required: false),
    ], Required: false);

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
                .. TetherLinkFields,
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
                new QuantityField("propulsion_power", "Power drawn by propulsion while moving.", Power, 0, 1e5),
                new QuantityField("speed", "Speed through the water while profiling.", Speed, 0, 10, MinExclusive: true),
                new QuantityField("profile_depth", "Depth below the ice of each water-column profile.", Length, 0, 100_000, MinExclusive: true),
                new NumberField("speed_variation", "Standard deviation of the speed made good over one leg, as a share of the speed (currents); 0 for none.", 0, 0.5, Required: false),
            ]), MinItems: 0, MaxItems: 16, Required: false),
            Relays,
            new ListField("faults", "Faults injected during the run.", new SectionField("fault", "One fault.",
            [
                new TextField("name", "Fault identifier (lowercase letters, digits, '-').", IsIdentifier: true),
                new ChoiceField("kind", "What fails.", ["power_dip", "tether_break", "station_failure", "sensor_stuck", "sensor_bias", "sensor_dropout", "heater_segment_failure", "tilt_kick", "relay_failure", "spool_jam"]),
                new QuantityField("at", "Simulated time after the start of the run when the fault begins (give this or at_depth).", Duration, 0, 1000 * Year, Required: false),
                new QuantityField("at_depth", "Head depth at which the fault begins (give this or at).", Length, 0, 200_000, Required: false),
                new QuantityField("duration", "How long the fault lasts; omit for a fault that stays.", Duration, 0, 1000 * Year, Required: false, MinExclusive: true),
                new NumberField("remaining_fraction", "For power_dip: the share of heater power left during the dip; for heater_segment_failure: the share one head half keeps (0 to 1).", 0, 1, Required: false),
                new QuantityField("angle", "For tilt_kick: the sudden change of tilt (a debris band or an inclined layer under the head).", Angle, -Math.PI / 4, Math.PI / 4, Required: false),
                new ChoiceField("point", "For sensor faults: the telemetry point that lies.", [.. Model.ProbeTelemetryPoints.Numeric.Select(p => p.Name)], Required: false),
                new TextField("value", "For sensor_stuck (optional: the reading at the fault's start otherwise) and sensor_bias: a quantity in the point's unit, e.g. '0.5 m/h'.", Required: false),
                new TextField("relay", "For relay_failure: the relay that fails, by name ('relay-2') or number ('2'); relays are numbered from the surface in the order they are dropped.", Required: false),
            ]), MinItems: 0, MaxItems: 1000, Required: false),
            new TextField("rules", "Recovery rules in the DescentOps rule language (a YAML block: 'rules: |' then indented lines).", Required: false),
            new SectionField("run", "Run settings; the command line may override them.",
            [
                new IntegerField("seed", "Seed of the run's random streams.", long.MinValue, long.MaxValue),
                new QuantityField("until", "Simulated time limit of the run.", Duration, 0, 1000 * Year, MinExclusive: true),
            ]),
        ]);
}
