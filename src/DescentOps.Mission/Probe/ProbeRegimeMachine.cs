using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Physics.Descent;
using DescentOps.Physics.Ice;
using DescentOps.Physics.Refreezing;
using DescentOps.Primitives.Time;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The probe's regime machine: moving (sublimating, melting), stopped, frozen in, melting free, at the ocean. Each
/// transition is logged with its cause; the thermal timers (gap frozen, gap melted open) are the context's events.
/// </summary>
public static class ProbeRegimeMachine
{
    /// <summary>Sets regime and velocity for the depth and power now in force, logging every change of regime.</summary>
    public static ProbeState Retune(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        state = ProbeBusControl.Rebus(design, state, context);
        if (state.HeldAtSurface) return state with { VelocityMPerS = 0.0 };
        switch (state.Regime)
        {
            case ProbeRegime.AtOcean:
                return state with { VelocityMPerS = 0.0 };
            case ProbeRegime.FrozenIn:
                return StartMeltingFree(design, state, context);
            case ProbeRegime.MeltingFree when ProbeHeaters.HeadHeatW(design, state) + ProbeHeaters.WallHeatW(design, state) + ProbeJets.HeatAtBottomW(design, state) <= 0:
                context.Cancel(state.PendingThermal!.Value);
                return ChangeRegime(state with { PendingThermal = null }, ProbeRegime.FrozenIn, context, "heaters lost while melting free");
            case ProbeRegime.MeltingFree:
                return state with { VelocityMPerS = 0.0 };
        }

        if (ProbeJets.Engaged(design, state)) return JetRetune(design, state, context);
        if (design.Probe.Jets is not null) state = ProbeJets.RecordChange(design, state, null, context);
        var rate = design.Descent.Rate(state.DepthM, ProbeHeaters.HeadHeatW(design, state), ProbeHeaters.WallHeatW(design, state));
        if (rate.Regime == DescentRegimeKind.Stalled)
        {
            return state.Regime == ProbeRegime.Stopped ? state with { VelocityMPerS = 0.0 } : Stop(design, state, rate, context);
        }

        if (rate.Regime == DescentRegimeKind.Melting && rate.Held)
        {
            return RefreezeStall(design, state, rate, context);
        }

        if (state.PendingThermal is { } freezing)
        {
            context.Cancel(freezing);
            state = state with { PendingThermal = null };
        }

        var regime = rate.Regime == DescentRegimeKind.Sublimating ? ProbeRegime.Sublimating : ProbeRegime.Melting;
        state = ChangeRegime(state, regime, context, "heater power and ice allow descent");
        var deficit = rate.Regime == DescentRegimeKind.Melting && !rate.WallPowerSufficient;
        if (deficit != state.WallDeficit)
        {
            context.Record(deficit ? ProbeRecords.WallDeficit : ProbeRecords.WallSufficient, deficit ? Severity.Warning : Severity.Notice,
                RecordField.Of("depth_m", state.DepthM),
                RecordField.Of("wall_power_w", ProbeHeaters.WallPowerW(design, state)),
                RecordField.Of("lateral_loss_w", rate.LateralLossW),
                RecordField.Of("ice_temperature_k", rate.IceTemperatureK));
        }

        return state with { VelocityMPerS = rate.VelocityMPerS, LastMovingVelocityMPerS = rate.VelocityMPerS, WallDeficit = deficit, JetHoleAroundBodyM = 0.0 };
    }

    /// <summary>
    /// The jets cut the hole (<see cref="ProbeJets"/>): the speed is the jets' for their hole radius. A hole that would
    /// freeze back on the body before it passed holds the probe (a refreeze stall); jets that deliver no heat at the
    /// bottom (shed by the bus, a nozzle fully clogged) leave it stopped in their hole.
    /// </summary>
    private static ProbeState JetRetune(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        var point = ProbeJets.Operating(design, state);
        state = ProbeJets.RecordChange(design, state, point, context);
        if (point is null)
        {
            var idle = design.Descent.Rate(state.DepthM, 0.0, ProbeHeaters.WallHeatW(design, state));
            return state.Regime == ProbeRegime.Stopped ? state with { VelocityMPerS = 0.0 } : Stop(design, state, idle, context);
        }

        if (ProbeJets.ClosesOnBody(design, state, point))
        {
            if (state.PendingThermal is { } pending) context.Cancel(pending);
            context.Record(ProbeRecords.RefreezeStall, Severity.Critical,
                RecordField.Of("depth_m", state.DepthM),
                RecordField.Of("hole_radius_m", point.HoleRadiusM),
                RecordField.Of("clearance_m", point.ClearanceM),
                RecordField.Of("freeze_back_s", point.FreezeBackTimeS),
                RecordField.Of("body_passage_s", design.Probe.LengthM / point.SpeedMPerS),
                RecordField.Of("body_length_m", design.Probe.LengthM));
            var held = state with { VelocityMPerS = 0.0, PendingThermal = null, StoppedAt = context.Now, JetHoleAroundBodyM = point.HoleRadiusM };
            return ChangeRegime(held, ProbeRegime.FrozenIn, context, "the jets' hole froze back before the body passed");
        }

        if (state.PendingThermal is { } freezing)
        {
            context.Cancel(freezing);
            state = state with { PendingThermal = null };
        }

        state = ChangeRegime(state, ProbeRegime.Melting, context, "hot-water jets cut the hole");
        return state with { VelocityMPerS = point.SpeedMPerS, LastMovingVelocityMPerS = point.SpeedMPerS, JetHoleAroundBodyM = point.HoleRadiusM };
    }

    /// <summary>
    /// The probe stops. Unless its wall heaters can hold the water gap open against the conduction loss of the
    /// stopped body (<see cref="StallLimit"/>), the gap freezes after the time the Stefan problem gives
    /// (<see cref="Refreeze.FreezeInAroundProbe"/>), with the ice behind the wall warmed for half the time the
    /// body took to pass (MODEL: the exposure of the body's middle, ℓ/(2v)).
    /// </summary>
    private static ProbeState Stop(ProbeDesign design, ProbeState state, DescentRate rate, ComponentContext context)
    {
        var probe = design.Probe;
        state = ChangeRegime(state with { VelocityMPerS = 0.0, StoppedAt = context.Now }, ProbeRegime.Stopped, context, "heater power below what descent needs");
        if (state.Regime == ProbeRegime.Stopped && state.LastMovingVelocityMPerS > 0 && state.DepthM >= design.Descent.LiquidOnsetDepthM)
        {
            var phi = IceConductivity.KirchhoffPotentialWPerM(rate.IceTemperatureK, rate.MeltingTemperatureK, IceConductivityFit.PetrenkoWhitworth1999);
            var holdOpenW = StallLimit.StallPowerW(StallLimit.ProbeCapacitanceM(probe.RadiusM, probe.LengthM), phi);
            if (ProbeHeaters.HeadHeatW(design, state) + ProbeHeaters.WallHeatW(design, state) < holdOpenW)
            {
                var exposureS = probe.LengthM / (2 * state.LastMovingVelocityMPerS);
                // In a hole the jets cut, the water to freeze is their whole clearance: a wider hole freezes in later.
                var (gapM, wallRadiusM) = state.JetHoleAroundBodyM > 0 ? (state.JetHoleAroundBodyM - probe.RadiusM, state.JetHoleAroundBodyM) : (probe.FreezeGapM, probe.RadiusM);
                var freeze = Refreeze.FreezeInAroundProbe(gapM, wallRadiusM, exposureS, rate.IceTemperatureK, rate.MeltingTemperatureK);
                context.Record(ProbeRecords.Refreezing, Severity.Alarm,
                    RecordField.Of("depth_m", state.DepthM),
                    RecordField.Of("gap_m", gapM),
                    RecordField.Of("freeze_time_s", freeze.FreezeTimeS),
                    RecordField.Of("stefan_number", freeze.StefanNumber),
                    RecordField.Of("hold_open_power_w", holdOpenW));
                if (freeze.FreezeTimeS < ProbeStepPlanner.MaxTimerS)
                {
                    var handle = context.ScheduleSelf(SimDuration.FromSeconds(freeze.FreezeTimeS), new ProbeThermalDue(ProbeRegime.FrozenIn), MissionPriority.Physics);
                    state = state with { PendingThermal = handle };
                }
            }
        }

        return state;
    }

    /// <summary>A thermal timer completes: the gap has frozen, or it has been melted open.</summary>
    public static ProbeState Thermal(ProbeState state, ProbeThermalDue due, ComponentContext context) => due.Completes switch
    {
        ProbeRegime.FrozenIn when state.Regime == ProbeRegime.Stopped =>
            ChangeRegime(state, ProbeRegime.FrozenIn, context, "the water gap around the body has frozen"),
        ProbeRegime.Melting when state.Regime == ProbeRegime.MeltingFree =>
            ChangeRegime(state, ProbeRegime.Stopped, context, "the frozen gap is melted open") with { LastMovingVelocityMPerS = 0.0 },
        _ => throw new InvalidOperationException($"A thermal timer for {due.Completes} fired in regime {state.Regime}; its cancellation was missed."),
    };

    /// <summary>
    /// A refreeze stall: the side balance of the moving probe (<see cref="SideBalance"/>) closes its water gap within the
    /// body's length, so the ice holds it where it is. Logged with the balance's numbers.
    /// </summary>
    private static ProbeState RefreezeStall(ProbeDesign design, ProbeState state, DescentRate rate, ComponentContext context)
    {
        if (state.PendingThermal is { } pending) context.Cancel(pending);
        context.Record(ProbeRecords.RefreezeStall, Severity.Critical,
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("required_side_heat_w", rate.RequiredSideHeatW),
            RecordField.Of("side_heat_supplied_w", rate.SideHeatSuppliedW),
            RecordField.Of("refreeze_closure_m", rate.RefreezeClosureM),
            RecordField.Of("body_length_m", design.Probe.LengthM),
            RecordField.Of("ice_temperature_k", rate.IceTemperatureK));
        var stopped = state with { VelocityMPerS = 0.0, PendingThermal = null, StoppedAt = context.Now, WallDeficit = false };
        return ChangeRegime(stopped, ProbeRegime.FrozenIn, context, string.Create(System.Globalization.CultureInfo.InvariantCulture, $"refrozen water closed the gap {rate.RefreezeClosureM:F2} m behind the head"));
    }

    /// <summary>
    /// A frozen-in probe melts its gap open with its head and wall heat (<see cref="Refreeze.MeltFree"/>, the longer it
    /// was held the more the ice has cooled), or stays held. Freeing is pointless while the side balance at the present
    /// power would close the gap again as soon as the probe moved: that, and power too small ever to melt free, are
    /// logged once per power setting with the numbers.
    /// </summary>
    private static ProbeState StartMeltingFree(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        var probe = design.Probe;
        var headW = ProbeHeaters.HeadHeatW(design, state);
        var wallW = ProbeHeaters.WallHeatW(design, state);
        // Hot water from the jets reaches the frozen gap too (MODEL: as the heaters' heat does, through the water).
        var jetW = ProbeJets.HeatAtBottomW(design, state);
        var powerW = headW + wallW + jetW;
        if (powerW <= 0 || state.MeltFreeRefusedAtWallW == powerW) return state with { VelocityMPerS = 0.0 };
        if (ProbeJets.Engaged(design, state))
        {
            if (ProbeJets.Operating(design, state) is { } jet && ProbeJets.ClosesOnBody(design, state, jet))
            {
                context.Record(ProbeRecords.CannotMeltFree, Severity.Critical,
                    RecordField.Of("depth_m", state.DepthM),
                    RecordField.Of("head_power_w", headW),
                    RecordField.Of("wall_power_w", wallW),
                    RecordField.Of("cause", "the jets' hole would freeze back on the body"),
                    RecordField.Of("jet_heat_at_bottom_w", jetW),
                    RecordField.Of("freeze_back_s", jet.FreezeBackTimeS),
                    RecordField.Of("body_passage_s", probe.LengthM / jet.SpeedMPerS));
                return state with { VelocityMPerS = 0.0, MeltFreeRefusedAtWallW = powerW };
            }
        }
        else if (design.Descent.Rate(state.DepthM, headW, wallW) is { Regime: DescentRegimeKind.Melting, Held: true } moving)
        {
            context.Record(ProbeRecords.CannotMeltFree, Severity.Critical,
                RecordField.Of("depth_m", state.DepthM),
                RecordField.Of("head_power_w", headW),
                RecordField.Of("wall_power_w", wallW),
                RecordField.Of("cause", "side balance short: the gap would close again"),
                RecordField.Of("required_side_heat_w", moving.RequiredSideHeatW),
                RecordField.Of("side_heat_supplied_w", moving.SideHeatSuppliedW),
                RecordField.Of("refreeze_closure_m", moving.RefreezeClosureM));
            return state with { VelocityMPerS = 0.0, MeltFreeRefusedAtWallW = powerW };
        }

        var iceK = design.Descent.Shell.TemperatureK(state.DepthM);
        var meltingK = MeltingCurve.TemperatureK(Math.Max(design.Descent.Shell.PressurePa(state.DepthM), TriplePoint.PressurePa));
        var exposureS = Math.Max(1.0, state.LastMovingVelocityMPerS > 0 ? probe.LengthM / (2 * state.LastMovingVelocityMPerS) : 1.0);
        var heldS = state.StoppedAt is { } stoppedAt ? (context.Now - stoppedAt).TotalSeconds : 0.0;
        var free = Refreeze.MeltFree(probe.FreezeGapM, probe.RadiusM, probe.LengthM, powerW, exposureS, Math.Min(iceK, meltingK - 1e-3), meltingK, heldS);
        if (!double.IsFinite(free.TimeS))
        {
            context.Record(ProbeRecords.CannotMeltFree, Severity.Critical,
                RecordField.Of("depth_m", state.DepthM),
                RecordField.Of("head_power_w", headW),
                RecordField.Of("wall_power_w", wallW),
                RecordField.Of("cause", "heat below the steady loss of the held body"),
                RecordField.Of("hold_open_power_w", free.HoldOpenPowerW));
            return state with { VelocityMPerS = 0.0, MeltFreeRefusedAtWallW = powerW };
        }

        context.Record(ProbeRecords.MeltingFree, Severity.Notice,
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("wall_power_w", wallW),
            RecordField.Of("head_power_w", headW),
            RecordField.Of("held_s", heldS),
            RecordField.Of("cooling_j", free.CoolingJ),
            RecordField.Of("time_s", free.TimeS),
            RecordField.Of("energy_j", free.EnergyJ));
        var handle = context.ScheduleSelf(SimDuration.FromSeconds(free.TimeS), new ProbeThermalDue(ProbeRegime.Melting), MissionPriority.Physics);
        return ChangeRegime(state with { VelocityMPerS = 0.0, PendingThermal = handle, MeltFreeRefusedAtWallW = null }, ProbeRegime.MeltingFree, context, "heaters powered");
    }

    public static ProbeState ChangeRegime(ProbeState state, ProbeRegime regime, ComponentContext context, string cause)
    {
        if (regime == state.Regime) return state;
        var severity = regime switch
        {
            ProbeRegime.Stopped => Severity.Warning,
            ProbeRegime.FrozenIn => Severity.Critical,
            _ => Severity.Notice,
        };
        context.Record(ProbeRecords.Regime, severity,
            RecordField.Of("from", state.Regime.ToString()),
            RecordField.Of("to", regime.ToString()),
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("cause", cause));
        return state with { Regime = regime };
    }
}
