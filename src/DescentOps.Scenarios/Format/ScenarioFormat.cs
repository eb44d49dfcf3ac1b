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

    /// <summary>
    /// The probe's hot-water jets (omit for a probe that melts by its head alone). While they run the head is out of
    /// contact and idle: the jets cut the hole by the energy balance of hot-water drilling.
    /// </summary>
    private static SectionField Jets { get; } = new("jets", "Hot-water jets that cut the hole ahead of the probe; 'send probe.jets set_power(power = ...)' switches them (0 W: off). While they run the head heater idles and the jets' heat sets the speed for the hole radius.",
    [
        new QuantityField("heat", "Most heat the jets put into the water (the ceiling of set_power).", Power, 0, 1e7, MinExclusive: true),
        new QuantityField("pump_power", "Electric power the pump draws while the jets run.", Power, 0, 1e6),
        new QuantityField("minimum_hole_radius", "Smallest hole radius the jets may cut; wider than the probe.", Length, 0, 2, MinExclusive: true),
        new QuantityField("hole_radius", "Hole radius the jets cut at the start (default: minimum_hole_radius); set_hole_radius changes it.", Length, 0, 2, Required: false, MinExclusive: true),
        new NumberField("efficiency", "Share of the jets' heat that melts ice, the rest carried up the hole (default 0.8, a rule of thumb of hot-water drilling, 0.6-0.9).", 0.01, 1, Required: false),
        new QuantityField("initial_power", "Jet heat at the start of the run (default 0 W: off).", Power, 0, 1e7, Required: false),
    ], Required: false);

    /// <summary>One time-tagged telecommand; shared with branch change files.</summary>
    public static SectionField Telecommand { get; } = new("telecommand", "One telecommand at a time.",
    [
        new QuantityField("at", "Simulated time after the start of the run: when the ground sends it, or when the probe's store releases it.", Duration, 0, 1000 * Year),
        new ChoiceField("from", "ground (sent at its time, executed one uplink later: light time, the station, the fibre or relays) or board (stored on board, executed at its time).", ["ground", "board"]),
        new TextField("send", "The command as a rule's send writes it, without 'send': 'probe.wall set_power(power = 3 kW)'."),
    ]);

    /// <summary>The whole format; <see cref="LanderFormat.Attach"/> adds the landers list, built from the same probe, tether and station sections.</summary>
    public static SectionField Root { get; } = LanderFormat.Attach(new(
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
                new QuantityField("ocean_temperature", "In-situ temperature of the ocean under the shell (default: its freezing point at the ocean's salinity and the pressure under the shell, by TEOS-10); colder than that point is refused.", Temperature, 200, 313.15, Required: false),
                new QuantityField("fractured_to", "Bottom of an open-fractured zone below the surface of an airless body: vapour and melt escape through it, so melting (rather than sublimating) cannot start above it (default: no such zone).", Length, 0, 200_000, Required: false),
                new SectionField("convection", "A warm convecting layer under the conductive lid (default: none, the whole shell conducts).",
                [
                    new QuantityField("top", "Depth of the lid's base, where the convecting layer begins.", Length, 0, 200_000, MinExclusive: true),
                    new QuantityField("temperature", "Temperature of the convecting layer's well-mixed core (published interiors: about 250-265 K).", Temperature, 20, 273.15),
                    new QuantityField("basal_boundary", "Thickness of the bottom boundary layer across which the ice warms linearly to the melting point (default: a tenth of the convecting layer).", Length, 0, 200_000, Required: false),
                ], Required: false),
                new ListField("layers", "Salty layers of the shell; ice outside them is fresh. Salt lowers the melting point the head must reach.", new SectionField("layer", "One salty layer.",
                [
                    new QuantityField("top", "Depth of the layer's top.", Length, 0, 200_000),
                    new QuantityField("bottom", "Depth of the layer's bottom.", Length, 0, 200_000),
                    new QuantityField("salinity", "Bulk salinity of the ice (mass of salt per mass of ice).", MassFraction, 0, 0.04),
                ]), MinItems: 0, MaxItems: 100, Required: false),
                new ListField("debris_bands", "Bands of dust, tephra or sediment in the ice; the probe collects their debris on its head.", new SectionField("band", "One debris band.",
                [
                    new QuantityField("top", "Depth of the band's top.", Length, 0, 200_000),
                    new QuantityField("bottom", "Depth of the band's bottom.", Length, 0, 200_000),
                    new NumberField("volume_fraction", "Debris volume per volume of ice (0 to 0.99).", 0, 0.99),
                    new QuantityField("tilt_scatter", "Random tilt the band gives the head: the tilt change over a depth dz in the band is normal with standard deviation tilt_scatter * sqrt(dz / 1 m) (a random walk in depth; default 0).", Angle, 0, Math.PI / 18, Required: false),
                ]), MinItems: 0, MaxItems: 100, Required: false),
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
                Jets,
            ]),
            new SectionField("power", "The probe's electrical power system: heat source, bus loads by priority, battery and current turbine. Omit it for the simple model, in which a power dip scales the heater power directly.",
            [
                new ChoiceField("source", "Heat source: 'radioisotope' (Pu-238 decay heat through a converter) or 'fission' (a reactor at a set electric output).", ["radioisotope", "fission"]),
                new QuantityField("thermal_power", "For radioisotope: heat output of the fresh fuel.", Power, 0, 1e7, Required: false, MinExclusive: true),
                new NumberField("conversion_efficiency", "Share of the heat turned into electricity (radioisotope: at the start of the converter's life; fission: sets the core heat behind the output).", 0.001, 0.5),
                new NumberField("degradation_per_year", "For radioisotope: yearly fractional loss of converter efficiency on top of fuel decay (default 0).", 0, 0.5, Required: false),
                new QuantityField("fuel_age", "For radioisotope: time since the fuel was fresh, at the start of the run (default 0).", Duration, 0, 200 * Year, Required: false),
                new QuantityField("electric_power", "For fission: the reactor's electric output.", Power, 0, 1e7, Required: false, MinExclusive: true),
                new SectionField("battery", "The battery that covers what the source cannot; omit for none.",
                [
                    new QuantityField("capacity", "Energy the pack holds when full at 25 °C.", Energy, 0, 1e10, MinExclusive: true),
                    new QuantityField("max_discharge_power", "Most power the pack gives the bus.", Power, 0, 1e6),
                    new QuantityField("max_charge_power", "Most power the pack takes from the bus (default: max_discharge_power).", Power, 0, 1e6, Required: false),
                    new NumberField("charge_efficiency", "Share of the charging energy that is stored.", 0.5, 1),
                    new NumberField("discharge_efficiency", "Share of the stored energy that reaches the bus.", 0.5, 1),
                    new NumberField("initial_charge", "State of charge at the start of the run, 0 to 1 (default 1).", 0, 1, Required: false),
                    new QuantityField("temperature", "Cell temperature, held constant; cold cells hold less and refuse charge below 0 °C (default 20 °C).", Temperature, 213.15, 333.15, Required: false),
                ], Required: false),
                new ListField("loads", "Consumers on the bus with their priorities (0 = kept longest); when they ask for more than source and battery give, the least important are shed. Default: electronics and head heater at 0, wall heater at 1 (and the jets at 1 for a probe with jets). Must name one head_heater, one wall_heater and one electronics load, and one jets load for a probe with jets.", new SectionField("load", "One consumer.",
                [
                    new TextField("name", "Load identifier (lowercase letters, digits, '-'); rules shed and restore loads by it.", IsIdentifier: true),
                    new ChoiceField("role", "head_heater and wall_heater draw their set points, electronics the probe's electronics_power, jets the jets' heat and pump while they run, fixed its own power.", ["head_heater", "wall_heater", "electronics", "jets", "fixed"]),
                    new IntegerField("priority", "Shedding priority: lower numbers are kept longer.", 0, 1000),
                    new QuantityField("power", "For a fixed load: the power it draws.", Power, 0, 1e6, Required: false),
                ]), MinItems: 3, MaxItems: 64, Required: false),
                new SectionField("heat_path", "Where the source's waste heat (thermal less electric output) goes: shares reaching the head and the side wall, the rest rejected. It flows whatever the bus does; omit for none.",
                [
                    new NumberField("head", "Share of the waste heat that reaches the melting head.", 0, 1),
                    new NumberField("wall", "Share of the waste heat that reaches the side wall.", 0, 1),
                ], Required: false),
                new SectionField("turbine", "A current turbine that recharges the battery once the probe hangs in the ocean; omit for none.",
                [
                    new QuantityField("rotor_diameter", "Diameter of the rotor.", Length, 0, 10, MinExclusive: true),
                    new NumberField("power_coefficient", "Share of the current's power the rotor captures (at most the Betz limit, 16/27).", 0, 16.0 / 27.0),
                    new NumberField("drivetrain_efficiency", "Share of the rotor's power that reaches the bus.", 0, 1),
                    new QuantityField("cut_in_speed", "Current speed below which the rotor does not turn (default 0).", Speed, 0, 10, Required: false),
                    new QuantityField("rated_speed", "Current speed above which the output stays at its rated value.", Speed, 0, 10, MinExclusive: true),
                    new QuantityField("current_speed", "Speed of the current past the probe under the ice.", Speed, 0, 10),
                    new QuantityField("water_density", "Density of the ocean water (default 1030 kg/m³).", Density, 900, 1300, Required: false),
                ], Required: false),
            ], Required: false),
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
                new IntegerField("frame_queue_capacity", "Most frames the station holds while it cannot send home; more are lost, counted and logged (default: no limit).", 1, 100_000_000, Required: false),
                new IntegerField("command_queue_capacity", "Most commands held for the next window; more are lost, counted and logged (default: no limit).", 1, 1_000_000, Required: false),
                new QuantityField("silence_timeout", "How long the ground hears nothing from the station, with home in view, before it takes the station for dead (station.alive; default 10 min).", Duration, 0, 30 * 86_400, Required: false, MinExclusive: true),
                new SectionField("radiation", "The radiation at the site and the dose at which the station's electronics fail (omit: the station fails only by a station_failure fault).",
                [
                    new QuantityField("dose_rate", "Unshielded dose rate at the surface, in water or ice.", AbsorbedDoseRate, 0, 1, MinExclusive: true),
                    new QuantityField("shielding", "Ice-equivalent shielding in front of the electronics (default 0).", Length, 0, 10, Required: false),
                    new NumberField("electron_share", "Share of the surface dose carried by electrons; the rest is bremsstrahlung photons (default 0.9).", 0, 1, Required: false),
                    new QuantityField("electron_length", "Attenuation length of the electron dose in ice (default 2 cm).", Length, 0, 1, Required: false, MinExclusive: true),
                    new QuantityField("photon_length", "Attenuation length of the photon dose in ice (default 15.37 cm).", Length, 0, 10, Required: false, MinExclusive: true),
                    new ChoiceField("failure_model", "Distribution of the electronics' failure dose.", ["weibull", "lognormal"]),
                    new QuantityField("failure_dose", "Scale of the failure dose in silicon: the characteristic dose η (Weibull) or the median D50 (lognormal).", AbsorbedDose, 0, 1e8, MinExclusive: true),
                    new NumberField("failure_spread", "Spread of the failure dose: the shape β (Weibull, 0.1 to 50) or the log standard deviation σ (lognormal, 0.001 to 5).", 0.001, 50),
                ], Required: false),
                new SectionField("link", "When the station sees home (omit: always) and how fast it can send.",
                [
                    new QuantityField("rotation_period", "Time for home to come round the station's sky once (the body's rotation relative to the home direction).", Duration, 60, 1000 * Day),
                    new QuantityField("latitude", "The station's latitude (required without landers; a lander's station takes its site's).", Angle, -Math.PI / 2, Math.PI / 2, Required: false),
                    new QuantityField("home_declination", "Declination of home in the body's equatorial frame (default 0).", Angle, -Math.PI / 2, Math.PI / 2, Required: false),
                    new QuantityField("elevation_mask", "Lowest elevation at which the link closes (default 0).", Angle, 0, Math.PI / 2, Required: false),
                    new QuantityField("start_hour_angle", "Home's hour angle at the start of the run: 0 on the meridian, negative still rising (default 0).", Angle, -2 * Math.PI, 2 * Math.PI, Required: false),
                    new QuantityField("planet_radius", "Radius of the parent planet that hides home once per turn (give with orbit_radius; omit both for no occultation).", Length, 0, 1e9, Required: false, MinExclusive: true),
                    new QuantityField("orbit_radius", "Radius of the body's orbit about the parent planet.", Length, 0, 1e11, Required: false, MinExclusive: true),
                    new QuantityField("planet_hour_angle", "Hour angle of home when it is behind the planet's centre (default 0: the planet on the station's meridian).", Angle, -2 * Math.PI, 2 * Math.PI, Required: false),
                    new SectionField("radio", "The station's transmitter and the ground antenna; the link equation gives the data rate (omit: the rate does not limit the link).",
                    [
                        new QuantityField("transmit_power", "Transmitter output power.", Power, 0, 1e4, MinExclusive: true),
                        new QuantityField("dish_diameter", "Diameter of the station's dish.", Length, 0, 20, MinExclusive: true),
                        new NumberField("dish_efficiency", "Aperture efficiency of the station's dish (default 0.55).", 0.01, 1, Required: false),
                        new QuantityField("ground_dish_diameter", "Diameter of the ground antenna.", Length, 0, 200, MinExclusive: true),
                        new NumberField("ground_dish_efficiency", "Aperture efficiency of the ground antenna (default 0.6).", 0.01, 1, Required: false),
                        new QuantityField("frequency", "Carrier frequency.", Frequency, 1e8, 1e12),
                        new QuantityField("system_noise_temperature", "System noise temperature of the ground receiver.", Temperature, 1, 5000),
                        new NumberField("line_loss", "Losses between transmitter and dish, dB.", 0, 30),
                        new NumberField("required_eb_n0", "Energy per bit over noise density the decoder needs, dB.", -5, 30),
                        new NumberField("margin", "Link margin held back, dB.", 0, 30),
                        new IntegerField("frame_bits", "Size of one telemetry frame on the link, bits.", 1, 100_000_000),
                    ], Required: false),
                ], Required: false),
                new SectionField("dwell", "A wait on the surface before melting starts, during which the radiation sterilises the probe's exposed hardware (needs radiation).",
                [
                    new QuantityField("duration", "How long the probe waits on the surface.", Duration, 0, 10 * Year, MinExclusive: true),
                    new QuantityField("d_value", "Dose that kills nine spores in ten on the exposed hardware (D10), in water.", AbsorbedDose, 0, 1e6, MinExclusive: true),
                ], Required: false),
                new SectionField("charging", "Discharges of the charged environment that reset the station.",
                [
                    new QuantityField("upset_interval", "Mean time between upsets (they come as a Poisson process).", Duration, 60, 1000 * Year),
                    new QuantityField("recovery_time", "Time the station needs after an upset before it relays again.", Duration, 0, 30 * Day),
                    new ChoiceField("during_recovery", "What becomes of frames and commands that reach the station while it recovers (default queue).", ["queue", "lose"], Required: false),
                ], Required: false),
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
                new QuantityField("ocean_temperature", "Temperature of the water under the ice for absorption (default: the ocean's, shell.ocean_temperature).", Temperature, 260, 310, Required: false),
                new NumberField("ph", "pH of the water (default 8).", 7.7, 8.3, Required: false),
                new ChoiceField("absorption", "francois_garrison (default) or ainslie_mccolm.", ["francois_garrison", "ainslie_mccolm"], Required: false),
                new QuantityField("message_interval", "Time between a vehicle's data messages (default 10 min).", Duration, 1, Day, Required: false),
            ], Required: false),
            Relays,
            OnboardSamplingFormat.Section,
            new ListField("faults", "Faults injected during the run.", new SectionField("fault", "One fault.",
            [
                new TextField("name", "Fault identifier (lowercase letters, digits, '-').", IsIdentifier: true),
                new ChoiceField("kind", "What fails.", ["power_dip", "tether_break", "station_failure", "sensor_stuck", "sensor_bias", "sensor_dropout", "sensor_noise", "heater_segment_failure", "tilt_kick", "station_upset", "vehicle_loss", "relay_failure", "spool_jam", "clogged_nozzle"]),
                new QuantityField("at", "Trigger: simulated time after the start of the run when the fault begins (give exactly one of at, at_depth, when, mean_interval).", Duration, 0, 1000 * Year, Required: false),
                new QuantityField("at_depth", "Trigger: head depth at which the fault begins.", Length, 0, 200_000, Required: false),
                new TextField("when", "Trigger: a condition in the rule language on the probe's true state (not its sensors), e.g. 'probe.ice_temperature above 250 K for 2 samples'; checked on every frame, the fault begins the first time it holds.", Required: false),
                new QuantityField("mean_interval", "Trigger: the fault begins at random, at exponentially distributed intervals with this mean (a Poisson process drawn from the run's seeded stream).", Duration, 0, 1000 * Year, Required: false, MinExclusive: true),
                new QuantityField("not_before", "For a random trigger: simulated time before which the fault cannot begin (default 0).", Duration, 0, 1000 * Year, Required: false),
                new IntegerField("occurrences", "For a random trigger: how many times the fault happens at most (default 1); each begins a random interval after the previous one ended.", 1, 1000, Required: false),
                new QuantityField("duration", "How long the fault lasts; omit for a fault that stays.", Duration, 0, 1000 * Year, Required: false, MinExclusive: true),
                new NumberField("remaining_fraction", "For power_dip: the share of heater power left during the dip; for heater_segment_failure: the share one head half keeps; for clogged_nozzle: the share of the jets' heat that still reaches the hole's bottom; for a vehicle_loss by battery: the share of the charge left (0 to 1).", 0, 1, Required: false),
                new QuantityField("angle", "For tilt_kick: the sudden change of tilt (a debris band or an inclined layer under the head).", Angle, -Math.PI / 4, Math.PI / 4, Required: false),
                new ChoiceField("point", "For sensor faults: the telemetry point that lies.", [.. Model.ProbeTelemetryPoints.Numeric.Select(p => p.Name)], Required: false),
                new TextField("vehicle", "For vehicle_loss: the vehicle it strikes.", Required: false),
                new ChoiceField("cause", "For vehicle_loss: battery (the charge falls to remaining_fraction), entrapment (held until the fault clears) or out_of_range (the acoustic link is dead until it clears).", ["battery", "entrapment", "out_of_range"], Required: false),
                new TextField("value", "For sensor_stuck (optional: the reading at the fault's start otherwise), sensor_bias (the offset) and sensor_noise (the noise's standard deviation): a quantity in the point's unit, e.g. '0.5 m/h'.", Required: false),
                new TextField("relay", "For relay_failure: the relay that fails, by name ('relay-2') or number ('2'); relays are numbered from the surface in the order they are dropped.", Required: false),
                CampaignFields.DetectedBy,
                LanderFormat.FaultLander,
            ]), MinItems: 0, MaxItems: 1000, Required: false),
            new TextField("rules", "Recovery rules in the DescentOps rule language (a YAML block: 'rules: |' then indented lines).", Required: false),
            new ListField("telecommands", "Telecommands tagged with times: sent by the ground at its time (reaching the probe one uplink later) or stored on board and executed at its time.", Telecommand, 0, 1000, Required: false),
            ProceduresFormat.Section,
            CampaignFields.Uncertain,
            CampaignFields.Criteria,
            new SectionField("run", "Run settings; the command line may override them.",
            [
                new IntegerField("seed", "Seed of the run's random streams.", long.MinValue, long.MaxValue),
                new QuantityField("until", "Simulated time limit of the run.", Duration, 0, 1000 * Year, MinExclusive: true),
            ]),
        ]));
}
