namespace DescentOps.Scenarios.Model;

/// <summary>
/// The ice shell between the surface and the ocean. The temperature profile is conductive for a
/// conductivity that goes as 1/T, which gives T(z) = Ts (Tb/Ts)^(z/H) with Tb the melting point at the base.
/// Salty layers, debris bands and an open-fractured zone at the top are optional.
/// </summary>
public sealed record ShellModel(double ThicknessM, double SurfaceTemperatureK, double OceanSalinityKgPerKg)
{
    public double FracturedToM { get; init; }

    /// <summary>In-situ temperature of the ocean under the shell; null: the local freezing point (TEOS-10).</summary>
    public double? OceanTemperatureK { get; init; }

    public ConvectionModel? Convection { get; init; }

    public IReadOnlyList<ShellLayerModel> Layers { get; init; } = [];

    public IReadOnlyList<DebrisBandModel> DebrisBands { get; init; } = [];
}
