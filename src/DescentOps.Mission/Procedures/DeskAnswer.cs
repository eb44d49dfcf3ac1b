namespace DescentOps.Mission.Procedures;

/// <summary>
/// The extra of a desk input: a person's answer to a step (procedure and step named, confirmed or skipped, the console
/// input's number), or, on a start, the mark that people at a console answer its steps (<see cref="PeopleAnswer"/>).
/// </summary>
public sealed record DeskAnswer(string? Procedure, string Step, bool Confirmed, long Number)
{
    public static DeskAnswer PeopleAnswer { get; } = new(null, "", false, 0);
}
