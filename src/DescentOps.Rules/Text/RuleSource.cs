namespace DescentOps.Rules.Text;

/// <summary>
/// Rule text and the name it is reported under (a file path, or a scenario path such as "mission.yaml#rules").
/// A null text is read as empty so that no caller can make the parser throw.
/// </summary>
public sealed record RuleSource(string Name, string Text)
{
    /// <summary>The conventional extension of a stand-alone rule-set file.</summary>
    public const string FileExtension = ".dorules";
}
