using System.Collections.Immutable;
using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Probe;
using DescentOps.Mission.Running;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Tether;

/// <summary>
/// The link from the probe to the surface. The fibre pays out as the probe descends (it freezes into the borehole
/// behind it, so paid-out length equals depth), carries each frame up after the light's travel time while its optical
/// budget closes, and parts when the spool runs out, jams, or a fault breaks it. Radio relays dropped into the melt
/// channel form a backup chain to a receiver at the surface; while the fibre is down, frames cross every hop that
/// closes and wait in the probe's or a relay's buffer below one that does not. Every frame that cannot be kept is
/// logged as <c>data.lost</c>.
/// </summary>
public sealed class TetherComponent : SimComponent<TetherState>
{
    private const int MilestonesPerSpool = 10;
    private readonly TetherModel _tether;
    private readonly LanderIds _ids;
    private readonly TetherOptics _optics;
    private readonly RelayPlanModel? _plan;
    private readonly RelayRadio? _radio;
    private readonly IReadOnlyList<double> _plannedDropsM;

    public TetherComponent(Scenario scenario, LanderIds? ids = null)
        : base((ids ?? LanderIds.Single).Tether, FailurePolicy.RestartFromLastState)
    {
        _ids = ids ?? LanderIds.Single;
        ArgumentNullException.ThrowIfNull(scenario);
        _tether = scenario.Tether;
        _optics = new TetherOptics(scenario.Tether);
        _plan = scenario.Relays;
        if (_plan is not null)
        {
            _radio = new RelayRadio(_plan, ProbeDescentFactory.Shell(scenario).TemperatureK);
            _plannedDropsM = _plan.IntervalM is { } interval
                ? [.. Enumerable.Range(1, _plan.Carried).Select(k => k * interval).TakeWhile(d => d < scenario.Shell.ThicknessM)]
                : _plan.DropDepthsM;
        }
        else
        {
            _plannedDropsM = [];
        }
    }

    public override TetherState InitialState => new(
        0.0, false, null, 0, 0, 0, true,
        FrameHold<TelemetryFrame>.Empty(_tether.BufferFrames), FrameHold<Telecommand>.Empty(_tether.BufferFrames),
        [], 0, [], null, 0, 0, 0.0, 0.0);

    public override TetherState Handle(TetherState state, object message, ComponentContext context) => message switch
    {
        RunStarted => Start(state, context),
        TelemetryFrame frame => Report(OnFrame(state, frame, context), context),
        Telecommand command => Report(CarryDown(state, command, context), context),
        DropRelay drop => Report(Route(Drop(state, drop.DepthM, drop.Origin, context), null, context), context),
        RelayBatteryDue due => Report(Route(BatteryFlat(state, due.Number, context), null, context), context),
        FaultStarted { Fault.Effect: FaultEffect.TetherBreak } fault => Report(Route(Break(state, $"fault '{fault.Fault.Name}'", context), null, context), context),
        FaultStarted { Fault.Effect: FaultEffect.SpoolJam } fault => Report(Route(Break(state, $"spool jam (fault '{fault.Fault.Name}')", context), null, context), context),
        FaultStarted { Fault.Effect: FaultEffect.RelayFailure relay } fault => Report(Route(RelayFault(state, fault.Fault.Name, relay.RelayNumber, true, context), null, context), context),
        FaultCleared { Fault.Effect: FaultEffect.RelayFailure relay } fault => Report(Route(RelayFault(state, fault.Fault.Name, relay.RelayNumber, false, context), null, context), context),
        _ => throw new InvalidOperationException($"The tether cannot handle {message.GetType().Name}."),
    };

    private TetherState Start(TetherState state, ComponentContext context)
    {
        var full = _optics.Budget(_tether.LengthM);
        var empty = _optics.Budget(0.0);
        context.Record(TetherRecords.LinkBudget, Severity.Info,
            RecordField.Of("transceiver", _optics.Transceiver.Name),
            RecordField.Of("wavelength_m", _optics.Transceiver.WavelengthM),
            RecordField.Of("line_rate_bit_s", _optics.Transceiver.LineRateBitPerS),
            RecordField.Of("attenuation_db_per_km", _optics.AttenuationDbPerKm),
            RecordField.Of("g652d_maximum_db_per_km", _optics.G652DMaximumDbPerKm),
            RecordField.Of("margin_at_start_db", empty.MarginDb),
            RecordField.Of("margin_at_full_payout_db", full.MarginDb),
            RecordField.Of("relays_carried", _plan?.Carried ?? 0),
            RecordField.Of("relay_drops_planned", _plannedDropsM.Count));
        return state;
    }

    /// <summary>A frame from the probe: the fibre pays out to its depth, relays due there go, then the frame is routed.</summary>
    private TetherState OnFrame(TetherState state, TelemetryFrame frame, ComponentContext context)
    {
        var paidOut = PayOut(state, frame.PaidOutM, context) with { ProbeDepthM = frame.PaidOutM, FramesProduced = state.FramesProduced + 1 };
        return Route(Fibre(DropPlanned(paidOut, context), context), frame, context);
    }

    private TetherState PayOut(TetherState state, double depthM, ComponentContext context)
    {
        if (state.Broken || depthM <= state.PaidOutM) return state;
        if (depthM > _tether.LengthM)
        {
            return Break(state with { PaidOutM = _tether.LengthM }, "the spool ran out of fibre", context);
        }

        var milestone = (int)(depthM / _tether.LengthM * MilestonesPerSpool);
        if (milestone > state.PayoutMilestone)
        {
            context.Record(TetherRecords.Payout, Severity.Info,
                RecordField.Of("paid_out_m", depthM),
                RecordField.Of("spool_left_m", _tether.LengthM - depthM));
        }

        return state with { PaidOutM = depthM, PayoutMilestone = Math.Max(milestone, state.PayoutMilestone) };
    }

    /// <summary>The fibre's budget at the current payout; a change of verdict is logged, and commands held wait no longer.</summary>
    private TetherState Fibre(TetherState state, ComponentContext context)
    {
        if (state.Broken) return state;
        var budget = _optics.Budget(state.PaidOutM);
        if (budget.LinkUp == state.FibreUp) return state;
        context.Record(budget.LinkUp ? TetherRecords.LinkUp : TetherRecords.LinkDown, budget.LinkUp ? Severity.Notice : Severity.Alarm,
            RecordField.Of("paid_out_m", state.PaidOutM),
            RecordField.Of("margin_db", budget.MarginDb),
            RecordField.Of("received_power_dbm", budget.ReceivedPowerDbm));
        var next = state with { FibreUp = budget.LinkUp };
        return budget.LinkUp ? FlushCommands(next, FibreDelay(next), context) : next;
    }

    /// <summary>The relays whose drop depth the head has passed go into the channel.</summary>
    private TetherState DropPlanned(TetherState state, ComponentContext context)
    {
        while (state.NextPlannedDrop < _plannedDropsM.Count && _plannedDropsM[state.NextPlannedDrop] <= state.ProbeDepthM)
        {
            state = Drop(state with { NextPlannedDrop = state.NextPlannedDrop + 1 }, _plannedDropsM[state.NextPlannedDrop], "plan", context);
        }

        return state;
    }

    private TetherState Drop(TetherState state, double depthM, string origin, ComponentContext context)
    {
        if (_plan is null || _radio is null || state.Relays.Count >= _plan.Carried)
        {
            context.Record(RelayRecords.NoneLeft, Severity.Warning,
                RecordField.Of("carried", _plan?.Carried ?? 0),
                RecordField.Of("origin", origin));
            return state;
        }

        var relay = new RelayState(state.Relays.Count + 1, depthM, context.Now, false, FrameHold<TelemetryFrame>.Empty(_plan.BufferFrames));
        var lifeS = _plan.BatteryEnergyJ / _plan.PowerDrawW;
        context.Record(RelayRecords.Dropped, Severity.Notice,
            RecordField.Of("relay", relay.Name),
            RecordField.Of("depth_m", depthM),
            RecordField.Of("ice_temperature_k", _radio.IceTemperatureK(depthM)),
            RecordField.Of("attenuation_db_per_km", _radio.AttenuationDbPerM(depthM) * 1e3),
            RecordField.Of("range_m", _radio.RangeM(depthM)),
            RecordField.Of("battery_life_s", lifeS),
            RecordField.Of("origin", origin),
            RecordField.Of("relays_left", _plan.Carried - relay.Number));
        context.ScheduleSelf(SimDuration.FromSeconds(lifeS), new RelayBatteryDue(relay.Number), MissionPriority.Physics);
        return state with { Relays = state.Relays.Add(relay) };
    }

    /// <summary>A relay whose battery is flat stops; whatever it held is gone.</summary>
    private TetherState BatteryFlat(TetherState state, int number, ComponentContext context)
    {
        var relay = state.Relays.Single(r => r.Number == number);
        foreach (var frame in relay.Hold.Items)
        {
            state = LostFrame(state, frame, relay.Name, "the relay's battery went flat", context);
        }

        var dead = relay with { Dead = true, Hold = relay.Hold.Cleared() };
        var next = state with { Relays = state.Relays.Replace(relay, dead), FramesLost = state.FramesLost + relay.Hold.Count };
        context.Record(RelayRecords.BatteryFlat, Severity.Alarm, WithLedger(next,
            RecordField.Of("relay", relay.Name),
            RecordField.Of("depth_m", relay.DepthM),
            RecordField.Of("frames_lost_with_it", relay.Hold.Count)));
        return next;
    }

    private static TetherState RelayFault(TetherState state, string fault, int number, bool starts, ComponentContext context)
    {
        context.Record(starts ? RelayRecords.Failed : RelayRecords.Recovered, starts ? Severity.Alarm : Severity.Notice, WithLedger(state,
            RecordField.Of("relay", $"relay-{number}"),
            RecordField.Of("fault", fault),
            RecordField.Of("dropped", state.Relays.Any(r => r.Number == number))));
        return state with { FailedRelays = starts ? state.FailedRelays.Add(number) : state.FailedRelays.Remove(number) };
    }

    /// <summary>
    /// Sends what can go: by fibre while it is up, else up the relay chain as far as the hops close; then offers the new
    /// frame, if any, to the probe end. A frame that finds the probe's buffer full (or no buffer and no path) is lost.
    /// </summary>
    private TetherState Route(TetherState state, TelemetryFrame? incoming, ComponentContext context)
    {
        if (state.FibreUp)
        {
            var fibreDelay = FibreDelay(state);
            foreach (var held in state.ProbeHold.Items) context.Schedule(_ids.Station, fibreDelay, held, MissionPriority.Telemetry);
            var carried = state.FramesCarried + state.ProbeHold.Count + (incoming is null ? 0 : 1);
            if (incoming is not null) context.Schedule(_ids.Station, fibreDelay, incoming, MissionPriority.Telemetry);
            state = state with { ProbeHold = state.ProbeHold.Cleared(), FramesCarried = carried };
            return state.Relays.Any(r => r.Hold.Count > 0) ? SettleRelays(state, context) : state;
        }

        state = SettleRelays(state, context);
        if (incoming is null) return state;

        var chain = Chain(state);
        // The frame being sent needs no buffer of its own when it can leave the probe at once.
        if (state.ProbeHold.Room > 0 || StoreAndForward.CanLeave(chain.Holds, chain.HopCloses, 0))
        {
            var hold = state.ProbeHold with { Capacity = state.ProbeHold.Capacity + 1 };
            state = SettleRelays(state with { ProbeHold = hold.Offer(incoming)! }, context);
            return state with { ProbeHold = state.ProbeHold with { Capacity = hold.Capacity - 1 } };
        }

        state = LostFrame(state, incoming, "probe", state.ProbeHold.Capacity == 0 ? "no path home and no buffer" : "the probe's buffer is full", context);
        return state with { FramesLost = state.FramesLost + 1 };
    }

    /// <summary>The chain as it stands: the probe end, then every working relay from the deepest up, and each hop's verdict.</summary>
    private ChainNow Chain(TetherState state)
    {
        var working = state.Relays.Where(r => !r.Dead && !state.FailedRelays.Contains(r.Number)).Reverse().ToList();
        var depths = new List<double>(working.Count + 1) { state.ProbeDepthM };
        depths.AddRange(working.Select(r => r.DepthM));
        var closes = new bool[depths.Count];
        var margins = new double[depths.Count];
        for (var i = 0; i < depths.Count; i++)
        {
            margins[i] = _radio is null ? double.NegativeInfinity : _radio.HopMarginDb(i + 1 < depths.Count ? depths[i + 1] : 0.0, depths[i]);
            closes[i] = margins[i] >= 0.0;
        }

        List<FrameHold<TelemetryFrame>> holds = [state.ProbeHold, .. working.Select(r => r.Hold)];
        return new ChainNow(working, depths, closes, margins, holds);
    }

    private TetherState SettleRelays(TetherState state, ComponentContext context)
    {
        var chain = Chain(state);
        var settled = StoreAndForward.Settle(chain.Holds, chain.HopCloses);
        foreach (var (frame, from) in settled.Delivered)
        {
            context.Schedule(_ids.Station, RelayDelay(chain, from), frame, MissionPriority.Telemetry);
        }

        var relays = state.Relays;
        for (var i = 0; i < chain.Working.Count; i++)
        {
            relays = relays.Replace(chain.Working[i], chain.Working[i] with { Hold = settled.Holds[i + 1] });
        }

        state = state with { ProbeHold = settled.Holds[0], Relays = relays, FramesByRelays = state.FramesByRelays + settled.Delivered.Count };
        // The probe's own radio is the chain's bottom end: in cold ice it may reach the surface before any relay is down.
        var pathUp = _radio is not null && chain.HopCloses.All(c => c);
        if (state.FibreUp) return state with { RelayPathUp = null };
        if (_radio is not null && pathUp != state.RelayPathUp)
        {
            var open = Array.IndexOf(chain.HopCloses, false);
            context.Record(pathUp ? RelayRecords.PathUp : RelayRecords.PathDown, pathUp ? Severity.Notice : Severity.Alarm, WithLedger(state,
                RecordField.Of("relays_working", chain.Working.Count),
                RecordField.Of("open_hop_from", open < 0 ? "" : open == 0 ? "probe" : chain.Working[open - 1].Name),
                RecordField.Of("open_hop_margin_db", open < 0 ? 0.0 : chain.Margins[open]),
                RecordField.Of("frames_released", settled.Delivered.Count)));
        }

        state = state with { RelayPathUp = pathUp };
        return pathUp ? FlushCommands(state, RelayDelay(chain, 0), context) : state;
    }

    /// <summary>A telecommand from the station goes down the fibre, or down the relay chain, or waits at the surface end.</summary>
    private TetherState CarryDown(TetherState state, Telecommand command, ComponentContext context)
    {
        if (state.FibreUp)
        {
            context.Schedule(_ids.Probe, FibreDelay(state), command, MissionPriority.Command);
            return state;
        }

        if (state.RelayPathUp == true && state.CommandHold.Count == 0)
        {
            var chain = Chain(state);
            if (chain.HopCloses.All(c => c))
            {
                context.Schedule(_ids.Probe, RelayDelay(chain, 0), command, MissionPriority.Command);
                return state;
            }
        }

        if (state.CommandHold.Offer(command) is { } held) return state with { CommandHold = held };
        context.Record(DataRecords.Lost, Severity.Alarm,
            RecordField.Of("kind", "telecommand"),
            RecordField.Of("command", command.Command.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("where", "surface"),
            RecordField.Of("cause", state.CommandHold.Capacity == 0 ? (state.Broken ? "tether broken" : "fibre link down") + ", no relay path and no buffer" : "the surface end's command buffer is full"));
        return state;
    }

    private TetherState FlushCommands(TetherState state, SimDuration delay, ComponentContext context)
    {
        foreach (var command in state.CommandHold.Items) context.Schedule(_ids.Probe, delay, command, MissionPriority.Command);
        return state with { CommandHold = state.CommandHold.Cleared() };
    }

    /// <summary>The probe reports its buffer's fill in its next frame; it is told only when the fill changes.</summary>
    private TetherState Report(TetherState state, ComponentContext context)
    {
        var path = LinkPaths.Of(state);
        if (path != state.ReportedPath)
        {
            context.Schedule(_ids.Probe, SimDuration.Zero, new LinkPathChanged(path), MissionPriority.Telemetry);
            state = state with { ReportedPath = path };
        }

        var fill = state.ProbeHold.Fill;
        if (fill == state.ReportedFill) return state;
        context.Schedule(_ids.Probe, SimDuration.Zero, new LinkBufferFill(fill), MissionPriority.Telemetry);
        return state with { ReportedFill = fill };
    }

    /// <summary>
    /// The frame ledger carried by every record of a change in the link, so a post-mortem can see what the link held at
    /// that moment: produced = by fibre + by relays + held + lost.
    /// </summary>
    private static RecordField[] WithLedger(TetherState state, params RecordField[] fields) =>
    [
        .. fields,
        RecordField.Of("frames_produced", state.FramesProduced),
        RecordField.Of("frames_by_fibre", state.FramesCarried),
        RecordField.Of("frames_by_relays", state.FramesByRelays),
        RecordField.Of("frames_held", state.FramesHeld),
        RecordField.Of("frames_lost", state.FramesLost),
    ];

    private SimDuration FibreDelay(TetherState state) => SimDuration.FromSeconds(state.PaidOutM / _tether.SignalSpeedMPerS);

    /// <summary>
    /// From node <paramref name="from"/> to the surface: the depths fall monotonically up the chain, so the hops add up to
    /// the node's depth; each relay passed adds its forwarding delay.
    /// </summary>
    private SimDuration RelayDelay(ChainNow chain, int from) =>
        SimDuration.FromSeconds(_radio!.PropagationS(chain.Depths[from]) + ((chain.Depths.Count - Math.Max(from, 1)) * _plan!.ForwardingDelayS));

    private TetherState LostFrame(TetherState state, TelemetryFrame frame, string where, string cause, ComponentContext context)
    {
        var episode = state.LossEpisode.After(frame.Sequence);
        context.Record(DataRecords.Lost, episode.Severity,
        [
            RecordField.Of("kind", "telemetry"),
            RecordField.Of("frame", frame.Sequence),
            RecordField.Of("where", where),
            RecordField.Of("cause", cause),
            .. episode.Fields(),
        ]);
        return state with { LossEpisode = episode };
    }

    private TetherState Break(TetherState state, string cause, ComponentContext context)
    {
        if (state.Broken) return state;
        context.Record(TetherRecords.Broken, Severity.Alarm, WithLedger(state,
            RecordField.Of("cause", cause),
            RecordField.Of("paid_out_m", state.PaidOutM),
            RecordField.Of("frames_carried", state.FramesCarried)));
        return state with { Broken = true, BrokenAtDepthM = state.PaidOutM, FibreUp = false };
    }

    /// <summary>The relay chain at one instant, bottom up.</summary>
    private sealed record ChainNow(IReadOnlyList<RelayState> Working, IReadOnlyList<double> Depths, bool[] HopCloses, double[] Margins, IReadOnlyList<FrameHold<TelemetryFrame>> Holds);
}
