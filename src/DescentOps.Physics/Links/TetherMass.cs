namespace DescentOps.Physics.Links;

/// <summary>Linear mass of a layered tether, Σ ρ_i·A_i: what the spool carries and what hangs in a water-filled bore.</summary>
public static class TetherMass
{
    private const string Model = "the layered tether mass";

    /// <summary>Mass per metre of concentric layers listed from the core outward.</summary>
    public static double PerMetreKgPerM(IReadOnlyList<TetherLayer> layersFromCore)
    {
        ArgumentNullException.ThrowIfNull(layersFromCore);
        var inner = 0.0;
        var mass = 0.0;
        foreach (var layer in layersFromCore)
        {
            ValidRange.Require(layer.OuterDiameterM, inner, double.MaxValue, nameof(layer.OuterDiameterM), "m", Model);
            ValidRange.RequirePositive(layer.DensityKgPerM3, nameof(layer.DensityKgPerM3), "kg/m³", Model);
            mass += layer.DensityKgPerM3 * Math.PI / 4.0 * ((layer.OuterDiameterM * layer.OuterDiameterM) - (inner * inner));
            inner = layer.OuterDiameterM;
        }

        return mass;
    }
}
