using DescentOps.Primitives.Identity;

namespace DescentOps.Mission;

/// <summary>
/// The component ids of one lander. A single-lander scenario keeps the fixed ids of <see cref="MissionIds"/> (so its
/// logs do not change); a lander of a scenario with landers prefixes them with its name and a slash ("north/probe").
/// A prefix keeps the ordinal order of a lander's own components what it is alone, so ties between them break the same.
/// Commands and the rule catalogue keep naming the unprefixed ids; <see cref="Of"/> routes such a name to this lander.
/// </summary>
public sealed class LanderIds
{
    public const char Separator = '/';

    private LanderIds(string? lander)
    {
        Lander = lander;
        Probe = Of(MissionIds.Probe);
        Tether = Of(MissionIds.Tether);
        Station = Of(MissionIds.Station);
        Ground = Of(MissionIds.Ground);
        FaultInjector = Of(MissionIds.FaultInjector);
        Autonomy = Of(MissionIds.Autonomy);
    }

    /// <summary>The ids of a single-lander scenario.</summary>
    public static LanderIds Single { get; } = new(null);

    /// <summary>Null for the single lander of a scenario without landers.</summary>
    public string? Lander { get; }

    public ComponentId Probe { get; }
    public ComponentId Tether { get; }
    public ComponentId Station { get; }
    public ComponentId Ground { get; }
    public ComponentId FaultInjector { get; }
    public ComponentId Autonomy { get; }

    public static LanderIds For(string lander) =>
        lander.Length == 0 || lander.Contains(Separator, StringComparison.Ordinal) ? throw new ArgumentException($"'{lander}' is not a lander name.", nameof(lander)) : new(lander);

    public ComponentId Vehicle(string name) => Of(MissionIds.Vehicle(name));

    /// <summary>This lander's component of the given single-lander id.</summary>
    public ComponentId Of(ComponentId single) => Lander is null ? single : new ComponentId(Lander + Separator + single.Name);

    /// <summary>The lander a component belongs to (null: a single lander's component, or a shared one).</summary>
    public static string? LanderOf(ComponentId id)
    {
        var at = id.Name.IndexOf(Separator, StringComparison.Ordinal);
        return at > 0 ? id.Name[..at] : null;
    }
}
