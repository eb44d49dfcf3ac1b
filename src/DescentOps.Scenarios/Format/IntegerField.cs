namespace DescentOps.Scenarios.Format;

/// <summary>A whole number (a seed, a count).</summary>
public sealed record IntegerField(string Name, string Description, long Min, long Max, bool Required = true)
    : FieldSpec(Name, Description, Required);
