namespace DescentOps.Scenarios.Format;

/// <summary>A sequence of sections of one shape.</summary>
public sealed record ListField(string Name, string Description, SectionField Item, int MinItems, int MaxItems, bool Required = true)
    : FieldSpec(Name, Description, Required);
