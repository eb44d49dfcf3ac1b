using DescentOps.Physics.Attitude;
using DescentOps.Physics.Power;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The probe's motion between events: velocity, tilt rate and bus flows are held constant over a step, so the state
/// at any instant follows exactly from the last update. Pure: no context, no draws.
/// </summary>
public static class ProbeMotion
{
    /// <summary>Moves the state to <paramref name="now"/> under the velocity and power that held since the last update.</summary>
    public static ProbeState Advance(ProbeDesign design, ProbeState state, SimTime now)
    {
        var seconds = (now - state.LastUpdate).TotalSeconds;
        var bus = state.Bus;
        var busEnergyJ = 0.0;
        if (bus is not null)
        {
            var step = PowerBus.Advance(bus.Allocation, bus.StateOfCharge, design.Power!.Battery, seconds);
            busEnergyJ = step.Energy.LoadsJ;
            bus = bus with
            {
                StateOfCharge = step.StateOfCharge,
                Energy = bus.Energy.Plus(step.Energy),
                BatteryLockedOut = step.StateOfCharge <= 0 || (bus.BatteryLockedOut && step.StateOfCharge < ProbePowerSystem.ReconnectStateOfCharge),
            };
        }

        var depth = Math.Min(state.DepthM + (state.VelocityMPerS * Math.Cos(state.TiltRad) * seconds), design.ShellThicknessM);
        return state with
        {
            LastUpdate = now,
            DepthM = depth,
            LateralDriftM = state.LateralDriftM + (state.VelocityMPerS * Math.Sin(state.TiltRad) * seconds),
            TiltRad = state.TiltRad + (TiltRateRadPerS(design, state) * seconds),
            EnergyUsedJ = state.EnergyUsedJ + (bus is null ? ProbeHeaters.BusPowerW(design, state) * seconds : busEnergyJ),
            Bus = bus,
        };
    }

    /// <summary>
    /// dθ/dt from <see cref="TiltDynamics"/> (MODEL): the head's power difference turns it, a pendulum-stabilised body
    /// relaxes towards the vertical with τ = ℓ/v, and the body cannot turn faster than its clearance allows. Held over
    /// one step (explicit Euler): over a 10-minute step the tilt changes by thousandths of a degree. A failed
    /// segment turns the probe towards positive tilt; steering power on the other half turns it back.
    /// </summary>
    public static double TiltRateRadPerS(ProbeDesign design, ProbeState state)
    {
        var v = state.VelocityMPerS;
        if (v <= 0 || !ProbeHeaters.IsMoving(state.Regime)) return 0.0;
        var probe = design.Probe;
        if (ProbeJets.Engaged(design, state) && state.JetHoleAroundBodyM > probe.RadiusM)
        {
            // MODEL: the jets cut the hole, the head is out of contact and melts nothing unevenly, so a failed segment or
            // a steering difference does not turn it; the pendulum still relaxes it, within the jets' wider clearance.
            var jetLimit = TiltDynamics.KinematicTurnRateLimitRadPerS(v, state.JetHoleAroundBodyM - probe.RadiusM, probe.LengthM);
            return TiltDynamics.TiltRateRadPerS(state.TiltRad, 0.0, 0.0, 0.0, probe.LengthM / v, jetLimit);
        }

        var rate = design.Descent.Rate(state.DepthM, ProbeHeaters.HeadHeatW(design, state), ProbeHeaters.WallHeatW(design, state));
        var area = Math.PI * probe.RadiusM * probe.RadiusM;
        var density = Physics.Ice.IceIh.DensityKgPerM3(rate.IceTemperatureK, Math.Max(rate.PressurePa, 0));
        var meltEnthalpy = (rate.SensibleW + rate.LatentW) / (density * area * v);
        var scale = ProbeHeaters.HeadScale(design, state);
        var differenceW = (state.SegmentLossFraction * state.HeadSetpointW * scale / 2) - (state.SteeringW * scale);
        var turn = TiltDynamics.HeadTurnRateRadPerS(differenceW, probe.RadiusM, density, meltEnthalpy);
        // The clearance is the water gap the side balance leaves along the body: wall heat widens it.
        var clearanceM = rate.ClearanceM > 0 ? rate.ClearanceM : probe.FreezeGapM;
        var limit = TiltDynamics.KinematicTurnRateLimitRadPerS(v, clearanceM, probe.LengthM);
        return TiltDynamics.TiltRateRadPerS(state.TiltRad, 0.0, turn, 0.0, probe.LengthM / v, limit);
    }
}
