using DescentOps.Engine.Components;
using DescentOps.Engine.Randomness;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Vehicles;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests.VehicleParts;

/// <summary>
/// The vehicle's parts, one transition at a time, on a detached context. The vehicle is the propeller vehicle of the
/// built-in flat-battery scenario (wisp-2: 0.5 kWh, 8 W hotel load, docked, charging at 100 W, no power system, so the
/// dock has its own charger); expected values are computed in each test from its figures.
/// </summary>
public sealed class VehicleTransitionTests
{
    private static readonly Scenario FlatBattery = Load("vehicle-flat-battery.yaml");
    private static readonly VehicleComponent Component = new(FlatBattery.Vehicles.Single(v => v.Name == "wisp-2"), FlatBattery);
    private static readonly VehicleDesign Design = Component.Design;

    private static Scenario Load(string name) => DescentOps.Scenarios.Loading.ScenarioLoader.LoadText(BuiltInScenarios.Text(name), name);

    private static ComponentContext At(double seconds) =>
        ComponentContext.Detached(MissionIds.Vehicle("wisp-2"), new RandomStream(1, MissionIds.Vehicle("wisp-2")), SimTime.FromSecondsSinceEpoch(seconds));

    private static VehicleState Working => Component.InitialState with { Phase = VehiclePhase.Working };

    private static VehicleLeg Leg(double powerW, double seconds, double batteryJ, OceanVector ground, SimTime? start = null) =>
        new(new PlannedLeg("test", ground, 0, 0, seconds, powerW, 0, null, false), start ?? SimTime.Epoch, OceanVector.Zero, batteryJ, ground, ground, powerW, seconds, 0, false, false);

    [Fact]
    public void Release_logs_the_release_and_starts_the_first_leg_with_its_timer()
    {
        var context = At(100);
        var state = Component.Handle(Component.InitialState, new ReleaseVehicle(2500), context);

        Assert.Equal(VehiclePhase.Working, state.Phase);
        Assert.Equal(2500, state.InterfaceDepthM);
        Assert.Equal("vehicle.released", context.Records[0].Kind);
        var timer = Assert.Single(context.Scheduled);
        Assert.IsType<VehicleLegDone>(timer.Payload);
        Assert.Equal(timer.Key.Handle, state.PendingTimer);
        Assert.Equal(SimTime.FromSecondsSinceEpoch(100), state.Leg!.StartAt);
    }

    [Fact]
    public void A_leg_that_would_empty_the_battery_ends_when_it_runs_flat()
    {
        var context = At(0);
        // 10 W for 1000 s needs 10 kJ; 5 kJ last 500 s.
        var state = VehicleLegs.Schedule(Working with { Leg = Leg(10, 1000, 5000, OceanVector.Zero) }, context);
        var timer = Assert.Single(context.Scheduled);
        Assert.Equal(new VehicleLegDone(true), timer.Payload);
        Assert.Equal(SimTime.FromSecondsSinceEpoch(500), timer.Key.Time);
        Assert.Equal(timer.Key.Handle, state.PendingTimer);
    }

    [Fact]
    public void An_interruption_commits_the_leg_up_to_now_and_keeps_the_rest_for_later()
    {
        var velocity = new OceanVector(0.5, 0, 0);
        var scheduled = VehicleLegs.Schedule(Working with { Leg = Leg(10, 1000, 50_000, velocity) }, At(0));
        var context = At(400);
        var state = VehicleLegs.Interrupt(scheduled, context);

        // 400 s at 10 W and 0.5 m/s: 4 kJ and 200 m.
        Assert.Equal(46_000, state.BatteryJ, 9);
        Assert.Equal(200, state.Position.East, 9);
        Assert.Equal(200, state.WaterDistanceM, 9);
        Assert.Equal(4000, state.EnergyUsedJ, 9);
        Assert.Null(state.Leg);
        Assert.Equal(600, state.Suspended!.Seconds, 9);
        Assert.Equal([scheduled.PendingTimer!.Value], context.Cancelled);

        var resumed = VehicleLegs.Resume(state, At(500));
        Assert.Equal((SimTime.FromSecondsSinceEpoch(500), 46_000.0, 600.0), (resumed.Leg!.StartAt, resumed.Leg.StartBatteryJ, resumed.Leg.Seconds));
        Assert.Null(resumed.Suspended);
    }

    [Fact]
    public void Docked_with_its_own_charger_delivers_the_held_data_and_charges_for_the_missing_energy()
    {
        var context = At(0);
        var state = Working with { BatteryJ = 1.0e6, Link = VehicleLinkState.Initial with { Held = 3 } };
        var docked = VehicleDock.Docked(Design, state, context);

        Assert.Equal(VehiclePhase.Charging, docked.Phase);
        Assert.Equal((0L, 3L), (docked.Link.Held, docked.Link.Delivered));
        Assert.Equal(["vehicle.docked", "vehicle.charging"], context.Records.Select(r => r.Kind));
        // 0.5 kWh = 1.8 MJ; 0.8 MJ missing at 100 W take 8000 s.
        var timer = Assert.Single(context.Scheduled);
        Assert.IsType<VehicleCharged>(timer.Payload);
        Assert.Equal(SimTime.FromSecondsSinceEpoch(8000), timer.Key.Time);
    }

    [Fact]
    public void A_change_of_dock_power_books_the_energy_at_the_old_power_and_expects_a_full_battery_at_the_new_one()
    {
        var state = Working with { Phase = VehiclePhase.Charging, BatteryJ = 1.0e6, DockChargeW = 50, DockChargeSince = SimTime.Epoch };
        var context = At(100);
        var next = VehicleDock.OnDockPower(Design, state, new DockPower(200), context);

        // 100 s at 50 W = 5 kJ; then (1.8 MJ − 1.005 MJ) / 200 W = 3975 s.
        Assert.Equal(1.005e6, next.BatteryJ, 6);
        Assert.Equal(5000, next.EnergyChargedJ, 9);
        Assert.Equal(SimTime.FromSecondsSinceEpoch(100 + 3975), Assert.Single(context.Scheduled).Key.Time);
    }

    [Fact]
    public void A_full_battery_starts_the_next_sortie_from_the_dock()
    {
        var context = At(0);
        var next = VehicleDock.Charged(Design, Working with { Phase = VehiclePhase.Charging, BatteryJ = 1.0e6, Sortie = 1, LegIndex = 2 }, context);

        Assert.Equal((VehiclePhase.Working, 2, 0.8e6), (next.Phase, next.Sortie, next.EnergyChargedJ));
        Assert.Equal(Design.Vehicle.BatteryEnergyJ, next.BatteryJ);
        Assert.Equal("vehicle.sortie", context.Records[0].Kind);
        Assert.NotNull(next.Leg);
    }

    [Fact]
    public void A_message_that_does_not_get_through_is_held_and_too_long_out_of_contact_loses_the_vehicle()
    {
        var faulted = Working with { Link = VehicleLinkState.Initial with { Faulted = true } };
        var context = At(600);
        var held = VehicleModem.MessageDue(Design, faulted, context);
        Assert.Equal((1L, 1L, false), (held.Link.Produced, held.Link.Held, held.Link.Up));
        Assert.Equal("vehicle.out_of_range", Assert.Single(context.Records).Kind);
        Assert.Equal("link fault", context.Records[0].Fields.Single(f => f.Name == "cause").Text);

        var late = At(600 + Design.Vehicle.MaxOutOfRangeS);
        var lost = VehicleModem.MessageDue(Design, held, late);
        Assert.Equal(VehiclePhase.Done, lost.Phase);
        Assert.Contains(late.Records, r => r.Kind == "vehicle.lost");
        Assert.Contains(late.Records, r => r.Kind == "vehicle.data_lost");
        Assert.Equal(new VehicleFinished("wisp-2", "out of acoustic range too long", 0, Working.BatteryJ, Lost: true), late.Scheduled.Single(e => e.Target == MissionIds.Probe).Payload);
    }

    [Fact]
    public void A_failing_battery_keeps_its_share_and_an_empty_one_loses_the_vehicle()
    {
        var state = Working with { BatteryJ = 1.0e6 };
        var context = At(0);
        var weak = VehicleFaults.Begins(Design, state, "weak", new FaultEffect.VehicleLoss("wisp-2", VehicleLossCause.Battery, 0.25), null, context);
        Assert.Equal((250_000.0, 750_000.0), (weak.BatteryJ, weak.EnergyUsedJ));
        Assert.Equal("vehicle.battery_failed", context.Records[0].Kind);

        var flat = VehicleFaults.Begins(Design, state, "flat", new FaultEffect.VehicleLoss("wisp-2", VehicleLossCause.Battery, 0), null, At(0));
        Assert.Equal(VehiclePhase.Done, flat.Phase);
    }

    [Fact]
    public void A_fault_before_release_is_ignored_and_an_entrapment_for_good_loses_the_vehicle()
    {
        var context = At(0);
        var stowed = VehicleFaults.Begins(Design, Component.InitialState, "early", new FaultEffect.VehicleLoss("wisp-2", VehicleLossCause.Entrapment, 0), null, context);
        Assert.Equal(Component.InitialState, stowed);
        Assert.Equal("vehicle.fault_ignored", Assert.Single(context.Records).Kind);

        var caught = At(0);
        var trapped = VehicleFaults.Begins(Design, Working, "caught", new FaultEffect.VehicleLoss("wisp-2", VehicleLossCause.Entrapment, 0), null, caught);
        Assert.Equal(VehiclePhase.Done, trapped.Phase);
        Assert.Equal(["vehicle.entrapped", "vehicle.lost"], caught.Records.Select(r => r.Kind).Take(2));

        var held = VehicleFaults.Begins(Design, Working, "caught", new FaultEffect.VehicleLoss("wisp-2", VehicleLossCause.Entrapment, 0), 3600, At(0));
        Assert.True(held.Leg is { Held: true, PowerW: 8 }, "held on the hotel load of 8 W");
    }

    [Fact]
    public void A_recall_out_of_contact_waits_and_one_in_contact_turns_the_vehicle_home()
    {
        var recall = new Telecommand(new CommandAction(MissionIds.Vehicle("wisp-2"), VehicleRecall.Command, []), "test", "ground", SimTime.Epoch);
        var away = At(10);
        var waiting = VehicleRecall.Recall(Design, Working with { Link = VehicleLinkState.Initial with { Up = false } }, recall, away);
        Assert.True(waiting.RecallHeld);
        Assert.Equal(["command.executed", "vehicle.command_held"], away.Records.Select(r => r.Kind));

        var near = At(10);
        var out200 = Working with { Position = new OceanVector(200, 0, 0) };
        var homeward = VehicleRecall.Recall(Design, out200, recall, near);
        Assert.True(homeward.Recalled);
        Assert.Equal(VehiclePhase.Returning, homeward.Phase);
        Assert.Equal(["command.executed", "vehicle.recalled", "vehicle.returning"], near.Records.Select(r => r.Kind));
        Assert.True(homeward.Leg!.Home);
    }
}
