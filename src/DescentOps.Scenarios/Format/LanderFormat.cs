using static DescentOps.Scenarios.Format.QuantityKind;

namespace DescentOps.Scenarios.Format;

/// <summary>
/// The <c>landers</c> list: one to <see cref="MaxLanders"/> stacks at their own sites, each with the same probe, tether
/// and station sections a single-lander scenario has at its top level. It is built from the top-level sections, so a
/// field added there is at once a lander's field too.
/// </summary>
public static class LanderFormat
{
    public const int MaxLanders = 4;

    /// <summary>Sections a lander holds for itself; with landers, the top level may not hold them.</summary>
    public static IReadOnlyList<string> OwnSections { get; } = ["probe", "power", "tether", "relays", "station", "vehicles", "telecommands"];

    /// <summary>Sections a lander may hold for itself; the top level's, when given, stand for every lander without its own.</summary>
    public static IReadOnlyList<string> DefaultableSections { get; } = ["acoustics", "onboard_sampling", "rules", "procedures"];

    /// <summary>Sections every lander must hold (they are required at the top level of a single-lander scenario).</summary>
    public static IReadOnlyList<string> RequiredSections { get; } = ["probe", "tether", "station"];

    /// <summary>On a fault: the lander it strikes.</summary>
    public static TextField FaultLander { get; } = new("lander", "With landers: the lander whose components the fault strikes (may be omitted when there is one lander).", Required: false, IsIdentifier: true);

    /// <summary>The link home the landers share (with landers only).</summary>
    public static SectionField LinkHome { get; } = new("link_home", "With landers: how the ground's antenna time is shared. Frames wait at each station for its turn; what a station's store cannot hold is lost and logged. Default: one channel, by priority in the landers' order.",
    [
        new IntegerField("channels", "Stations the ground hears at once (default 1).", 1, MaxLanders, Required: false),
        new ChoiceField("policy", "priority (default): a free channel goes to the first lander in 'priority' with frames waiting; contact_plan: each lander sends in its windows, and a dead station's windows go to the others by priority.", ["priority", "contact_plan"], Required: false),
        new TextField("priority", "Landers in order of precedence, comma-separated (default: the landers' order); landers not named come after, in their order.", Required: false),
        new QuantityField("repeat", "For contact_plan: the plan repeats with this period (default: it does not; outside its windows nobody sends).", Duration, 60, 1000 * Day, Required: false),
        new ListField("contact_plan", "For contact_plan: the windows, each a lander and a span of run time (of each period when the plan repeats).", new SectionField("window", "One window of the contact plan.",
        [
            new TextField("lander", "The lander that sends in this window.", IsIdentifier: true),
            new QuantityField("from", "Start of the window.", Duration, 0, 1000 * Year),
            new QuantityField("to", "End of the window.", Duration, 0, 1000 * Year, MinExclusive: true),
        ]), MinItems: 1, MaxItems: 10_000, Required: false),
    ], Required: false);

    private const double Day = 86_400;
    private const double Year = 365.25 * Day;

    /// <summary>The mission's own rules, across its landers (with landers only; they run on the ground).</summary>
    public static TextField MissionRules { get; } = new("mission_rules", "With landers: ground rules of the mission as a whole, in the rule language ('mission_rules: |' then indented lines); they name a lander's points and targets as LANDER/point, may take one point from another ('fell/probe.depth minus tarn/probe.depth above 20 m'), and run at the ground on every lander's frames as they arrive.", Required: false);

    /// <summary><paramref name="root"/> with the landers list inserted before the faults, and the lander's own sections optional at the top.</summary>
    public static SectionField Attach(SectionField root)
    {
        var own = OwnSections.Concat(DefaultableSections).Select(name => root.Find(name) ?? throw new InvalidOperationException($"The format has no '{name}' section for landers to hold."));
        var lander = new SectionField("lander", "One lander: its site, and its own probe, power, tether, relays, station and vehicles (and, when they differ from the top level's, acoustics, on-board sampling, rules and procedures).",
        [
            new TextField("name", "Lander identifier (lowercase letters, digits, '-'); records, faults, criteria and the contact plan name it.", IsIdentifier: true),
            new TextField("site", "Name of the landing site."),
            new QuantityField("latitude", "Latitude of the site; it is the station's latitude for the visibility of home.", Angle, -Math.PI / 2, Math.PI / 2),
            new QuantityField("longitude", "East longitude of the site; the station's hour angles of home and of the parent planet are those at longitude 0 (station.link.start_hour_angle, planet_hour_angle) plus this.", Angle, -2 * Math.PI, 2 * Math.PI),
            .. own.Select(f => RequiredSections.Contains(f.Name) ? f with { Required = true } : f),
        ]);
        var landers = new ListField("landers", $"Several landers at different sites sharing the link home and the team (1 to {MaxLanders}); omit for one lander described by the top-level probe, tether and station.", lander, 1, MaxLanders, Required: false);
        var fields = new List<FieldSpec>();
        foreach (var field in root.Fields)
        {
            if (field.Name == "faults") fields.AddRange([landers, LinkHome, MissionRules]);
            fields.Add(RequiredSections.Contains(field.Name) ? field with { Required = false } : field);
        }

        return root with { Fields = fields };
    }
}
