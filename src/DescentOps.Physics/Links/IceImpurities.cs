namespace DescentOps.Physics.Links;

/// <summary>Soluble impurity concentrations of the ice, mol/m³ (1 µM = 1e-3 mol/m³).</summary>
public sealed record IceImpurities(double HydrogenIonMolPerM3, double ChlorideMolPerM3, double AmmoniumMolPerM3)
{
    /// <summary>Pure ice.</summary>
    public static IceImpurities None { get; } = new(0.0, 0.0, 0.0);
}
