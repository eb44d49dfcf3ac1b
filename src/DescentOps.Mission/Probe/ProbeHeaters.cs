namespace DescentOps.Mission.Probe;

/// <summary>
/// What the heaters ask of the bus and what they get: pure arithmetic over the probe's state. Without a power system
/// a dip scales the heaters' set points; with one each heater is a whole load that runs or does not.
/// </summary>
public static class ProbeHeaters
{
    public static bool IsMoving(ProbeRegime regime) => regime is ProbeRegime.Sublimating or ProbeRegime.Melting;

    /// <summary>
    /// What the head heater asks of the bus: its set point less a failed segment's share; nothing at rest, while held at
    /// the surface, or while the hot-water jets cut the hole (the head is then out of contact, <see cref="ProbeJets"/>).
    /// </summary>
    public static double HeadDemandW(ProbeDesign design, ProbeState state) =>
        state.Regime == ProbeRegime.AtOcean || state.Paused || state.HeldAtSurface || ProbeJets.Engaged(design, state) ? 0.0 : state.HeadSetpointW * (1 - (state.SegmentLossFraction / 2));

    public static double WallDemandW(ProbeState state) =>
        state.Regime == ProbeRegime.AtOcean || state.HeldAtSurface ? 0.0 : state.WallSetpointW;

    /// <summary>Share of the head's set point its segments get: the dip's share without a bus, all or nothing with one.</summary>
    public static double HeadScale(ProbeDesign design, ProbeState state) =>
        state.Bus is null ? state.PowerFraction : IsRunning(state.Bus, design.Power!.HeadLoad) ? 1.0 : 0.0;

    public static double HeadPowerW(ProbeDesign design, ProbeState state) => HeadDemandW(design, state) * HeadScale(design, state);

    public static double WallPowerW(ProbeDesign design, ProbeState state) =>
        state.Bus is null ? WallDemandW(state) * state.PowerFraction : IsRunning(state.Bus, design.Power!.WallLoad) ? WallDemandW(state) : 0.0;

    /// <summary>What the bus delivers: heaters, jets and electronics without a power system, the allocation's supplied power with one.</summary>
    public static double BusPowerW(ProbeDesign design, ProbeState state) =>
        state.Bus is null
            ? HeadPowerW(design, state) + WallPowerW(design, state) + ProbeJets.HeatW(design, state) + ProbeJets.PumpPowerW(design, state) + design.Probe.ElectronicsPowerW
            : state.Bus.Allocation.Loads.SuppliedPowerW;

    /// <summary>
    /// Heat reaching the head: its heater's electric power and the source's waste heat along the heat path, which flows
    /// whatever the bus does (<see cref="ProbePowerSystem.WasteHeat"/>). Rounded to 10 W so that the slow decay of the
    /// source does not defeat the descent model's cache (MODEL: 10 W is well below the model's own uncertainty).
    /// </summary>
    public static double HeadHeatW(ProbeDesign design, ProbeState state) => HeadPowerW(design, state) + Waste(design, state).HeadW;

    /// <summary>Heat reaching the side wall: its heaters' electric power and the waste heat's share.</summary>
    public static double WallHeatW(ProbeDesign design, ProbeState state) => WallPowerW(design, state) + Waste(design, state).WallW;

    private static DescentOps.Physics.Power.WasteHeatSplit Waste(ProbeDesign design, ProbeState state)
    {
        if (design.Power is not { HeatsProbe: true } power || state.Regime == ProbeRegime.AtOcean || state.HeldAtSurface) return default;
        var split = power.WasteHeat(state.LastUpdate.SecondsSinceEpoch);
        return new DescentOps.Physics.Power.WasteHeatSplit(Math.Round(split.HeadW / 10.0) * 10.0, Math.Round(split.WallW / 10.0) * 10.0, split.RejectedW);
    }

    public static bool IsRunning(ProbeBusState bus, string load) => bus.Allocation.Loads.Running.Any(l => l.Name == load);
}
