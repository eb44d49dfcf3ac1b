namespace DescentOps.Physics.Power;

/// <summary>
/// Where a heat source's waste heat goes (MODEL): of the heat the converter does not turn into electricity,
/// P_waste = P_thermal − P_electric, a share reaches the melting head and a share the side wall through the probe's
/// heat path (heat pipes, fluid loops, conduction); the rest is rejected elsewhere (into the water column behind the
/// probe). The electric output is taken before any dip: a converter or bus fault that lowers the electricity the bus
/// receives does not stop the heat flowing, so the waste heat keeps its share of P_thermal − P_electric,nominal
/// (conservative: the unconverted heat of a faulty converter is not counted as extra heat).
/// </summary>
public static class WasteHeatPath
{
    private const string Model = "the waste heat path";

    /// <summary>Waste heat to head and wall, and the heat rejected elsewhere.</summary>
    public static WasteHeatSplit Split(double thermalPowerW, double electricPowerW, double headShare, double wallShare)
    {
        ValidRange.RequireNonNegative(thermalPowerW, nameof(thermalPowerW), "W", Model);
        ValidRange.Require(electricPowerW, 0.0, thermalPowerW, nameof(electricPowerW), "W", Model + " (electricity cannot exceed the heat it is made from)");
        ValidRange.Require(headShare, 0.0, 1.0, nameof(headShare), "(share)", Model);
        ValidRange.Require(wallShare, 0.0, 1.0 - headShare, nameof(wallShare), "(share)", Model + " (head and wall shares add up to at most 1)");
        var waste = thermalPowerW - electricPowerW;
        return new WasteHeatSplit(waste * headShare, waste * wallShare, waste * (1.0 - headShare - wallShare));
    }
}
