using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Tether;

/// <summary>
/// Moves what the chain's hops let through (<see cref="StoreAndForward"/>) and delivers what reaches the surface; a
/// change of whether the whole chain reaches the surface is logged, and commands held go down once it does.
/// </summary>
public static class RelaySettling
{
    public static TetherState Settle(TetherDesign design, TetherState state, ComponentContext context)
    {
        var chain = RelayChain.Of(design, state);
        var settled = StoreAndForward.Settle(chain.Holds, chain.HopCloses);
        foreach (var (frame, from) in settled.Delivered)
        {
            context.Schedule(design.Ids.Station, chain.DelayFrom(design, from), frame, MissionPriority.Telemetry);
        }

        var relays = state.Relays;
        for (var i = 0; i < chain.Working.Count; i++)
        {
            relays = relays.Replace(chain.Working[i], chain.Working[i] with { Hold = settled.Holds[i + 1] });
        }

        state = state with { ProbeHold = settled.Holds[0], Relays = relays, FramesByRelays = state.FramesByRelays + settled.Delivered.Count };
        // The probe's own radio is the chain's bottom end: in cold ice it may reach the surface before any relay is down.
        var pathUp = design.Radio is not null && chain.PathUp;
        if (state.FibreUp) return state with { RelayPathUp = null };
        if (design.Radio is not null && pathUp != state.RelayPathUp)
        {
            var open = Array.IndexOf(chain.HopCloses, false);
            context.Record(pathUp ? RelayRecords.PathUp : RelayRecords.PathDown, pathUp ? Severity.Notice : Severity.Alarm, TetherReports.WithLedger(state,
                RecordField.Of("relays_working", chain.Working.Count),
                RecordField.Of("open_hop_from", open < 0 ? "" : open == 0 ? "probe" : chain.Working[open - 1].Name),
                RecordField.Of("open_hop_margin_db", open < 0 ? 0.0 : chain.Margins[open]),
                RecordField.Of("frames_released", settled.Delivered.Count)));
        }

        state = state with { RelayPathUp = pathUp };
        return pathUp ? TetherRouting.FlushCommands(design, state, chain.DelayFrom(design, 0), context) : state;
    }
}
