namespace DescentOps.Scenarios.Format;

/// <summary>A plain number without a unit (an efficiency, a fraction).</summary>
public sealed record NumberField(string Name, string Description, double Min, double Max, bool Required = true)
    : FieldSpec(Name, Description, Required);
