using DescentOps.Engine.Components;
using DescentOps.Physics.Descent;
using DescentOps.Physics.Ice;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The probe's hot-water jets as the run uses them: when they run, what they ask of the bus, the heat that reaches the
/// hole's bottom, and the operating point <see cref="HotWaterJet"/> gives for it. Pure arithmetic over the probe's state.
/// </summary>
/// <remarks>
/// MODEL: while the jets run the head sits in the water of a hole wider than the probe, out of contact with the ice, so
/// its heater idles (asks for nothing) and the jets alone set the speed; the wall heaters keep running. The jets need
/// liquid water: above the depth where melting can start (an airless body's sublimation zone) they do not run. Waste
/// heat the heat path brings to the head still reaches it and counts where the head's heat counts (holding a stopped
/// probe's gap open, melting free), not in the jets' balance: in the hole's water it is not aimed at the ice.
/// </remarks>
public static class ProbeJets
{
    /// <summary>True when the probe has jets, they are set above 0 W, and nothing holds the probe (pause, surface dwell, ocean, sublimation zone).</summary>
    public static bool Engaged(ProbeDesign design, ProbeState state) =>
        design.Probe.Jets is not null
        && state.JetSetpointW > 0
        && !state.Paused
        && !state.HeldAtSurface
        && state.Regime != ProbeRegime.AtOcean
        && state.DepthM >= design.Descent.LiquidOnsetDepthM;

    /// <summary>Heat the jets ask of the bus while engaged: their set point.</summary>
    public static double HeatDemandW(ProbeDesign design, ProbeState state) => Engaged(design, state) ? state.JetSetpointW : 0.0;

    /// <summary>What the jets' load asks of the bus: heat and pump while engaged.</summary>
    public static double LoadDemandW(ProbeDesign design, ProbeState state) =>
        Engaged(design, state) ? state.JetSetpointW + design.Probe.Jets!.PumpPowerW : 0.0;

    /// <summary>Heat the jets put into the water: the set point scaled by a dip without a bus, all or nothing with one.</summary>
    public static double HeatW(ProbeDesign design, ProbeState state)
    {
        var demand = HeatDemandW(design, state);
        if (demand <= 0) return 0.0;
        return state.Bus is null ? demand * state.PowerFraction : ProbeHeaters.IsRunning(state.Bus, design.Power!.JetsLoad!) ? demand : 0.0;
    }

    /// <summary>Pump power drawn now (0 unless the jets run).</summary>
    public static double PumpPowerW(ProbeDesign design, ProbeState state)
    {
        if (!Engaged(design, state)) return 0.0;
        var pump = design.Probe.Jets!.PumpPowerW;
        return state.Bus is null ? pump * state.PowerFraction : ProbeHeaters.IsRunning(state.Bus, design.Power!.JetsLoad!) ? pump : 0.0;
    }

    /// <summary>Heat reaching the hole's bottom: what a clogged nozzle leaves of the jets' heat (the rest is lost up the hole).</summary>
    public static double HeatAtBottomW(ProbeDesign design, ProbeState state) => HeatW(design, state) * state.NozzleShare;

    /// <summary>
    /// The operating point at the probe's depth: the jets' heat at the hole's bottom cutting the commanded hole
    /// (<see cref="HotWaterJet.At"/>, with the scenario's efficiency), in the ice and at the melting point the head model
    /// uses there. Null when no heat reaches the bottom.
    /// </summary>
    public static JetOperatingPoint? Operating(ProbeDesign design, ProbeState state)
    {
        var heatW = HeatAtBottomW(design, state);
        if (heatW <= 0) return null;
        var jets = design.Probe.Jets!;
        // A head with no power gives the local far-field and melting temperatures without solving the head (cached by node).
        var ice = design.Descent.Rate(state.DepthM, 0.0, 0.0);
        return HotWaterJet.At(heatW, state.JetHoleRadiusM, jets.MinimumHoleRadiusM, design.Probe.RadiusM, design.Probe.LengthM,
            ice.IceTemperatureK, ice.MeltingTemperatureK, jets.Efficiency);
    }

    /// <summary>
    /// True when the hole closes on the body, a refreeze stall: the clearance would freeze back before the body has
    /// passed (freeze-back time under ℓ/v) and the probe's own heat (head and wall) is below what holds a body of the
    /// hole's size open against the cold ice (<see cref="StallLimit"/>, the criterion a stopped probe uses).
    /// </summary>
    public static bool ClosesOnBody(ProbeDesign design, ProbeState state, JetOperatingPoint point)
    {
        if (point.FreezeBackTimeS >= design.Probe.LengthM / point.SpeedMPerS) return false;
        var ice = design.Descent.Rate(state.DepthM, 0.0, 0.0);
        var phi = IceConductivity.KirchhoffPotentialWPerM(ice.IceTemperatureK, ice.MeltingTemperatureK, IceConductivityFit.PetrenkoWhitworth1999);
        var holdOpenW = StallLimit.StallPowerW(StallLimit.ProbeCapacitanceM(point.HoleRadiusM, design.Probe.LengthM), phi);
        return ProbeHeaters.HeadHeatW(design, state) + ProbeHeaters.WallHeatW(design, state) < holdOpenW;
    }

    /// <summary>Hole radius now: the jets' hole around the body, else the probe's own radius (the head cuts its own diameter).</summary>
    public static double HoleRadiusM(ProbeDesign design, ProbeState state) =>
        state.JetHoleAroundBodyM > 0 ? state.JetHoleAroundBodyM : design.Probe.RadiusM;

    /// <summary>
    /// A nozzle clogs (or clears, share 1): the share of the jets' heat that reaches the hole's bottom. Logged with the
    /// heat at the bottom and the speed the jets give before and after, at the commanded hole radius.
    /// </summary>
    public static ProbeState Clog(ProbeDesign design, ProbeState state, double share, string fault, ComponentContext context)
    {
        var before = Operating(design, state);
        var next = state with { NozzleShare = share };
        var after = Operating(design, next);
        context.Record(share < 1.0 ? ProbeRecords.NozzleClogged : ProbeRecords.NozzleCleared, share < 1.0 ? Severity.Warning : Severity.Notice,
            RecordField.Of("fault", fault),
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("nozzle_share", share),
            RecordField.Of("jet_heat_w", HeatW(design, state)),
            RecordField.Of("heat_at_bottom_before_w", HeatAtBottomW(design, state)),
            RecordField.Of("heat_at_bottom_after_w", HeatAtBottomW(design, next)),
            RecordField.Of("speed_before_m_s", before?.SpeedMPerS ?? 0.0),
            RecordField.Of("speed_after_m_s", after?.SpeedMPerS ?? 0.0));
        return next;
    }

    /// <summary>Logs the operating point when the heat at the bottom or the hole radius changes.</summary>
    public static ProbeState RecordChange(ProbeDesign design, ProbeState state, JetOperatingPoint? point, ComponentContext context)
    {
        var heatW = HeatAtBottomW(design, state);
        var key = (heatW, point?.HoleRadiusM ?? 0.0);
        if (state.JetLogged == key) return state;
        context.Record(ProbeRecords.Jets, Severity.Notice,
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("jet_heat_w", HeatW(design, state)),
            RecordField.Of("heat_at_bottom_w", heatW),
            RecordField.Of("pump_power_w", PumpPowerW(design, state)),
            RecordField.Of("nozzle_share", state.NozzleShare),
            RecordField.Of("hole_radius_m", point?.HoleRadiusM ?? 0.0),
            RecordField.Of("speed_m_s", point?.SpeedMPerS ?? 0.0),
            RecordField.Of("clearance_m", point?.ClearanceM ?? 0.0),
            RecordField.Of("freeze_back_s", point?.FreezeBackTimeS ?? 0.0));
        return state with { JetLogged = key };
    }
}
