namespace DescentOps.Mission.Tether;

/// <summary>The states of the <c>probe.link_path</c> point: what carries the probe's frames towards the surface now.</summary>
public static class LinkPaths
{
    public const string Fibre = "fibre";
    public const string Relays = "relays";
    public const string None = "none";

    public static IReadOnlyList<string> All { get; } = [Fibre, Relays, None];

    public static string Of(TetherState state) => state.FibreUp ? Fibre : state.RelayPathUp == true ? Relays : None;
}
