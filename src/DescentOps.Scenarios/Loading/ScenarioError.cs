namespace DescentOps.Scenarios.Loading;

/// <summary>One problem in a scenario file, located to the line, column and field path.</summary>
public sealed record ScenarioError(SourceLocation Location, string FieldPath, string Message)
{
    public override string ToString() =>
        FieldPath.Length == 0 ? $"{Location}: {Message}" : $"{Location}: field '{FieldPath}': {Message}";
}
