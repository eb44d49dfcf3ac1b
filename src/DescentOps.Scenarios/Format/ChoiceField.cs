namespace DescentOps.Scenarios.Format;

/// <summary>One word out of a fixed set.</summary>
public sealed record ChoiceField(string Name, string Description, IReadOnlyList<string> Options, bool Required = true)
    : FieldSpec(Name, Description, Required);
