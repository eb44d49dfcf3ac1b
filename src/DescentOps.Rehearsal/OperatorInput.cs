namespace DescentOps.Rehearsal;

/// <summary>
/// One input from the console as the simulation receives it: numbered from 1 in the order given, with its body as
/// compact JSON. The body is what the log keeps, so a replay hands the same input to the same handler.
/// </summary>
public sealed record OperatorInput(long Number, OperatorInputKind Kind, string Body)
{
    public string KindWord => Kind.ToString().ToLowerInvariant();

    public static bool TryParseKind(string word, out OperatorInputKind kind)
    {
        foreach (var candidate in Enum.GetValues<OperatorInputKind>())
        {
            if (candidate.ToString().ToLowerInvariant() != word) continue;
            kind = candidate;
            return true;
        }

        kind = default;
        return false;
    }
}
