namespace DescentOps.Rehearsal;

/// <summary>
/// What became of an input offered at the console: accepted under its number, refused as malformed with the field
/// named (400), refused by the rule checker with its located message (422), or too late for an ended session (409).
/// </summary>
public sealed record InputResult(int Status, string? Error, long? Number)
{
    public static InputResult Accepted(long number) => new(202, null, number);

    public static InputResult Bad(string error) => new(400, error, null);

    public static InputResult Refused(string error) => new(422, error, null);

    public static InputResult Ended() => new(409, "session: the session has ended", null);
}
