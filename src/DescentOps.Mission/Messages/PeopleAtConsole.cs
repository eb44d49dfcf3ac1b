namespace DescentOps.Mission.Messages;

/// <summary>A rehearsal console is attached: people answer the procedure steps that ask for confirmation.</summary>
public sealed record PeopleAtConsole
{
    public static PeopleAtConsole Instance { get; } = new();
}
