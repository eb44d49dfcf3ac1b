namespace DescentOps.Scenarios.Format;

/// <summary>A mapping of named fields; any other key is an error.</summary>
public sealed record SectionField(string Name, string Description, IReadOnlyList<FieldSpec> Fields, bool Required = true)
    : FieldSpec(Name, Description, Required)
{
    public FieldSpec? Find(string name) => Fields.FirstOrDefault(f => f.Name == name);
}
