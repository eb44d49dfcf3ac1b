namespace DescentOps.Physics.Refreezing;

/// <summary>Energy and time a frozen-in probe's heaters need to re-melt the refrozen gap (+∞ when they never can).</summary>
public sealed record MeltFreeSolution(double EnergyJ, double TimeS)
{
    /// <summary>Steady loss C·Φ of the stopped body held at T_m: heaters must deliver more than this to melt free.</summary>
    public double HoldOpenPowerW { get; init; }

    /// <summary>Heat the ice near the wall lost while the probe was held, which the heaters must put back.</summary>
    public double CoolingJ { get; init; }
}
