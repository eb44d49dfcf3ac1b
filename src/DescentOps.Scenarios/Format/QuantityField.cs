namespace DescentOps.Scenarios.Format;

/// <summary>A number with a unit of the given kind; bounds are in SI units.</summary>
public sealed record QuantityField(
    string Name,
    string Description,
    QuantityKind Kind,
    double MinSi,
    double MaxSi,
    bool Required = true,
    bool MinExclusive = false) : FieldSpec(Name, Description, Required);
