namespace DescentOps.Mission.LinkHome;

/// <summary>The shared link's timer: a channel frees, a station comes into view or a window opens.</summary>
public sealed record LinkHomeDue
{
    public static LinkHomeDue Instance { get; } = new();
}
