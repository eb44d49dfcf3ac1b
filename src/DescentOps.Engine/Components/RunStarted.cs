namespace DescentOps.Engine.Components;

/// <summary>Delivered to every component at the epoch, before any other event.</summary>
public sealed record RunStarted
{
    public static RunStarted Instance { get; } = new();

    private RunStarted()
    {
    }
}
