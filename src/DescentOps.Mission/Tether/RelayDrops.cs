using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Tether;

/// <summary>
/// The relays' lives: dropped at the plan's depths as the head passes them (or by telecommand) while any are left,
/// silent while a fault holds them, and dead with whatever they held when their battery goes flat.
/// </summary>
public static class RelayDrops
{
    /// <summary>The relays whose drop depth the head has passed go into the channel.</summary>
    public static TetherState DropPlanned(TetherDesign design, TetherState state, ComponentContext context)
    {
        while (state.NextPlannedDrop < design.PlannedDropsM.Count && design.PlannedDropsM[state.NextPlannedDrop] <= state.ProbeDepthM)
        {
            state = Drop(design, state with { NextPlannedDrop = state.NextPlannedDrop + 1 }, design.PlannedDropsM[state.NextPlannedDrop], "plan", context);
        }

        return state;
    }

    public static TetherState Drop(TetherDesign design, TetherState state, double depthM, string origin, ComponentContext context)
    {
        if (design.Plan is not { } plan || design.Radio is not { } radio || state.Relays.Count >= plan.Carried)
        {
            context.Record(RelayRecords.NoneLeft, Severity.Warning,
                RecordField.Of("carried", design.Plan?.Carried ?? 0),
                RecordField.Of("origin", origin));
            return state;
        }

        var relay = new RelayState(state.Relays.Count + 1, depthM, context.Now, false, new FrameHold<TelemetryFrame>(plan.BufferFrames));
        var lifeS = plan.BatteryEnergyJ / plan.PowerDrawW;
        context.Record(RelayRecords.Dropped, Severity.Notice,
            RecordField.Of("relay", relay.Name),
            RecordField.Of("depth_m", depthM),
            RecordField.Of("ice_temperature_k", radio.IceTemperatureK(depthM)),
            RecordField.Of("attenuation_db_per_km", radio.AttenuationDbPerM(depthM) * 1e3),
            RecordField.Of("range_m", radio.RangeM(depthM)),
            RecordField.Of("battery_life_s", lifeS),
            RecordField.Of("origin", origin),
            RecordField.Of("relays_left", plan.Carried - relay.Number));
        context.ScheduleSelf(SimDuration.FromSeconds(lifeS), new RelayBatteryDue(relay.Number), MissionPriority.Physics);
        return state with { Relays = state.Relays.Add(relay) };
    }

    /// <summary>A relay whose battery is flat stops; whatever it held is gone.</summary>
    public static TetherState BatteryFlat(TetherState state, int number, ComponentContext context)
    {
        var relay = state.Relays.Single(r => r.Number == number);
        foreach (var frame in relay.Hold.Items)
        {
            state = TetherRouting.LostFrame(state, frame, relay.Name, "the relay's battery went flat", context);
        }

        var dead = relay with { Dead = true, Hold = relay.Hold.Cleared() };
        var next = state with { Relays = state.Relays.Replace(relay, dead), FramesLost = state.FramesLost + relay.Hold.Count };
        context.Record(RelayRecords.BatteryFlat, Severity.Alarm, TetherReports.WithLedger(next,
            RecordField.Of("relay", relay.Name),
            RecordField.Of("depth_m", relay.DepthM),
            RecordField.Of("frames_lost_with_it", relay.Hold.Count)));
        return next;
    }

    /// <summary>A fault silences relay <paramref name="number"/> (dropped or not yet), or lets it work again.</summary>
    public static TetherState Fault(TetherState state, string fault, int number, bool starts, ComponentContext context)
    {
        context.Record(starts ? RelayRecords.Failed : RelayRecords.Recovered, starts ? Severity.Alarm : Severity.Notice, TetherReports.WithLedger(state,
            RecordField.Of("relay", $"relay-{number}"),
            RecordField.Of("fault", fault),
            RecordField.Of("dropped", state.Relays.Any(r => r.Number == number))));
        return state with { FailedRelays = starts ? state.FailedRelays.Add(number) : state.FailedRelays.Remove(number) };
    }
}
