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
            if (field.Name == "faults") fields.Add(landers);
            fields.Add(RequiredSections.Contains(field.Name) ? field with { Required = false } : field);
        }

        return root with { Fields = fields };
    }
}
