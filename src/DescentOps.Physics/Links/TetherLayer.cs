namespace DescentOps.Physics.Links;

/// <summary>One concentric layer of the tether, from the previous layer's outer diameter to this one.</summary>
public sealed record TetherLayer(string Name, double OuterDiameterM, double DensityKgPerM3)
{
    /// <summary>Silica glass, 125 µm, 2200 kg/m³ (RULE).</summary>
    public static TetherLayer Glass { get; } = new("glass", 125e-6, 2200.0);

    /// <summary>Dual acrylate coating to 250 µm, 1100 kg/m³ (RULE).</summary>
    public static TetherLayer Acrylate { get; } = new("acrylate", 250e-6, 1100.0);

    /// <summary>Tight buffer to 900 µm, 1300 kg/m³ (RULE).</summary>
    public static TetherLayer TightBuffer { get; } = new("tight buffer", 900e-6, 1300.0);
}
