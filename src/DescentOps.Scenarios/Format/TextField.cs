namespace DescentOps.Scenarios.Format;

/// <summary>Free text, or an identifier when <see cref="IsIdentifier"/> (lowercase letters, digits, '-').</summary>
public sealed record TextField(string Name, string Description, bool Required = true, bool IsIdentifier = false)
    : FieldSpec(Name, Description, Required)
{
    public const string IdentifierPattern = "^[a-z][a-z0-9-]*$";
}
