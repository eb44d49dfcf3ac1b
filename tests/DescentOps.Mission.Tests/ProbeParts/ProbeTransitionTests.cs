using DescentOps.Engine.Components;
using DescentOps.Engine.Randomness;
using DescentOps.Engine.Running;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Probe;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests.ProbeParts;

/// <summary>
/// The probe's parts, one transition at a time, on a detached context: the expected values are computed in each test
/// from the scenario's own figures (constant-velocity kinematics, tick rounding), not taken from a run.
/// </summary>
public sealed class ProbeTransitionTests
{
    private static readonly Scenario DefaultScenario = BuiltInScenarios.Default();
    private static readonly ProbeDesign Design = new(DefaultScenario);
    private static readonly ProbeComponent Component = new(DefaultScenario);

    private static ComponentContext At(double seconds) =>
        ComponentContext.Detached(MissionIds.Probe, new RandomStream(1, MissionIds.Probe), SimTime.FromSecondsSinceEpoch(seconds));

    [Fact]
    public void Run_started_logs_the_shell_and_plans_the_first_step_at_the_first_frame()
    {
        var context = At(0);
        var state = Component.Handle(Component.InitialState, RunStarted.Instance, context);

        Assert.Equal("probe.started", context.Records[0].Kind);
        Assert.True(Design.Descent.LiquidOnsetDepthM > 0, "the default shell's top sublimates");
        Assert.Equal(ProbeRegime.Sublimating, state.Regime);
        var step = Assert.Single(context.Scheduled, e => e.Payload is ProbeStepDue);
        Assert.Equal(SimTime.Epoch, step.Key.Time);
        Assert.Equal(step.Key.Handle, state.PendingStep);
    }

    [Fact]
    public void Advance_moves_along_the_axis_at_the_held_velocity_and_books_the_bus_energy()
    {
        // A stopped probe has no tilt rate, so the tilt stays put and the kinematics are exact.
        var state = Component.InitialState with { Regime = ProbeRegime.Stopped, VelocityMPerS = 1e-4, TiltRad = 0.1 };
        var moved = ProbeMotion.Advance(Design, state, SimTime.FromSecondsSinceEpoch(1000));

        Assert.Equal(1e-4 * Math.Cos(0.1) * 1000, moved.DepthM, 12);
        Assert.Equal(1e-4 * Math.Sin(0.1) * 1000, moved.LateralDriftM, 12);
        Assert.Equal(0.1, moved.TiltRad);
        var p = DefaultScenario.Probe;
        Assert.Equal((p.HeadPowerW + p.WallPowerW + p.ElectronicsPowerW) * 1000, moved.EnergyUsedJ, 6);
    }

    [Fact]
    public void The_step_planner_stops_at_the_end_of_the_sublimation_zone_when_that_comes_before_the_frame()
    {
        var onset = Design.Descent.LiquidOnsetDepthM;
        var state = Component.InitialState with
        {
            Regime = ProbeRegime.Sublimating, DepthM = onset - 1.0, VelocityMPerS = 1e-3, NextFrameAt = SimTime.FromSecondsSinceEpoch(1e6),
        };
        var next = ProbeStepPlanner.NextStepAt(Design, state, SimTime.Epoch);

        // 1 m at 1 mm/s, rounded up to a whole tick.
        var expectedTicks = (long)Math.Ceiling((onset - (onset - 1.0)) / 1e-3 * SimDuration.TicksPerSecond);
        Assert.Equal(expectedTicks, next.Ticks);
        // A frame due in 10 s comes first.
        Assert.Equal(SimTime.FromSecondsSinceEpoch(10), ProbeStepPlanner.NextStepAt(Design, state with { NextFrameAt = SimTime.FromSecondsSinceEpoch(10) }, SimTime.Epoch));
    }

    [Fact]
    public void A_probe_without_heat_stops_and_its_gap_starts_to_freeze()
    {
        var context = At(0);
        var state = Component.InitialState with
        {
            Regime = ProbeRegime.Melting, DepthM = 1000, LastMovingVelocityMPerS = 1e-4, HeadSetpointW = 0, WallSetpointW = 0, HeldAtSurface = false,
        };
        var stopped = ProbeRegimeMachine.Retune(Design, state, context);

        Assert.Equal(ProbeRegime.Stopped, stopped.Regime);
        Assert.Equal(0.0, stopped.VelocityMPerS);
        Assert.Equal(["probe.regime", "probe.refreezing"], context.Records.Select(r => r.Kind));
        var timer = Assert.Single(context.Scheduled);
        Assert.Equal(new ProbeThermalDue(ProbeRegime.FrozenIn), timer.Payload);
        Assert.Equal(timer.Key.Handle, stopped.PendingThermal);
    }

    [Fact]
    public void The_freeze_timer_holds_a_stopped_probe_and_is_refused_in_any_other_regime()
    {
        var context = At(0);
        var frozen = ProbeRegimeMachine.Thermal(Component.InitialState with { Regime = ProbeRegime.Stopped }, new ProbeThermalDue(ProbeRegime.FrozenIn), context);
        Assert.Equal(ProbeRegime.FrozenIn, frozen.Regime);
        Assert.Equal("critical", context.Records.Single().Severity.ToString().ToLowerInvariant());

        Assert.Throws<InvalidOperationException>(() =>
            ProbeRegimeMachine.Thermal(Component.InitialState with { Regime = ProbeRegime.Melting }, new ProbeThermalDue(ProbeRegime.FrozenIn), At(0)));
    }

    [Fact]
    public void A_stuck_sensor_repeats_its_value_a_bias_adds_and_a_dropout_is_missing()
    {
        IReadOnlyList<(string Point, double Value)> truth = [("probe.depth", 100.0), ("probe.velocity", 2e-4), ("probe.tilt", 0.01)];
        ActiveSensorFault[] faults =
        [
            new("stuck", new FaultEffect.SensorStuck("probe.depth", null), 42.0),
            new("bias", new FaultEffect.SensorBias("probe.velocity", 1e-4), null),
            new("gone", new FaultEffect.SensorDropout("probe.tilt"), null),
        ];
        var reported = ProbeSensors.Reported(truth, faults, new RandomStream(1, MissionIds.Probe));

        Assert.Equal([("probe.depth", 42.0), ("probe.velocity", 2e-4 + 1e-4)], reported);
    }

    [Fact]
    public void Beyond_the_tilt_limit_the_run_ends_as_mission_lost()
    {
        var context = At(0);
        var limit = DefaultScenario.Probe.MaxTiltRad;
        var state = Component.InitialState with { Regime = ProbeRegime.Melting, VelocityMPerS = 1e-4, TiltRad = limit * 1.01 };

        var lost = ProbeAttitude.CheckTilt(Design, state, context);
        Assert.Equal(RunOutcomeKind.MissionLost, context.StopRequest?.Kind);
        Assert.Equal(0.0, lost.VelocityMPerS);

        var inside = At(0);
        ProbeAttitude.CheckTilt(Design, state with { TiltRad = limit * 0.99 }, inside);
        Assert.Null(inside.StopRequest);
        Assert.Empty(inside.Records);
    }

    [Fact]
    public void A_link_buffer_fill_only_changes_the_fill_the_next_frame_reports()
    {
        var context = At(5);
        var initial = Component.InitialState;
        var state = Component.Handle(initial, new LinkBufferFill(0.25), context);

        Assert.Equal(initial with { BufferFill = 0.25 }, state);
        Assert.Empty(context.Records);
        Assert.Empty(context.Scheduled);
    }

    [Fact]
    public void A_failed_head_segment_halves_its_share_of_the_head_demand()
    {
        var state = Component.InitialState with { Regime = ProbeRegime.Melting, HeldAtSurface = false, SegmentLossFraction = 1.0 };
        Assert.Equal(DefaultScenario.Probe.HeadPowerW / 2, ProbeHeaters.HeadDemandW(Design, state));
        Assert.Equal(0.0, ProbeHeaters.HeadDemandW(Design, state with { Paused = true }));
        Assert.Equal(0.0, ProbeHeaters.WallDemandW(state with { Regime = ProbeRegime.AtOcean }));
    }
}
