namespace DescentOps.Scenarios.Format;

/// <summary>
/// One field of the scenario format. The same tree drives the loader's validation and the JSON Schema, so
/// the two cannot drift apart.
/// </summary>
public abstract record FieldSpec(string Name, string Description, bool Required);
