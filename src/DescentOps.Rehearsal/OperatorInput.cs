namespace DescentOps.Rehearsal;

/// <summary>
/// One input from the console as the simulation receives it: numbered from 1 in the order given, with its body as
/// compact JSON. The body is what the log keeps, so a replay hands the same input to the same handler.
/// </summary>
public sealed record OperatorInput(long Number, OperatorInputKind Kind, string Body)
{
    public string KindWord => Kind.ToString().ToLowerInvariant();

    /// <summary>The kinds by their word (the lower-case name, matched exactly).</summary>
    private static readonly Dictionary<string, OperatorInputKind> KindsByWord =
        Enum.GetValues<OperatorInputKind>().ToDictionary(k => k.ToString().ToLowerInvariant(), StringComparer.Ordinal);

    public static bool TryParseKind(string word, out OperatorInputKind kind) => KindsByWord.TryGetValue(word, out kind);
}
