using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Tether;

/// <summary>
/// The fibre: it pays out to the probe's depth (it freezes into the borehole behind it), its optical budget at that
/// length decides whether it carries light, and it parts when the spool runs out, jams or a fault breaks it.
/// </summary>
public static class TetherFibre
{
    private const int MilestonesPerSpool = 10;

    /// <summary>The budget at both ends of the spool, logged once at the start.</summary>
    public static TetherState Start(TetherDesign design, TetherState state, ComponentContext context)
    {
        var full = design.Optics.Budget(design.Tether.LengthM);
        var empty = design.Optics.Budget(0.0);
        context.Record(TetherRecords.LinkBudget, Severity.Info,
            RecordField.Of("transceiver", design.Optics.Transceiver.Name),
            RecordField.Of("wavelength_m", design.Optics.Transceiver.WavelengthM),
            RecordField.Of("line_rate_bit_s", design.Optics.Transceiver.LineRateBitPerS),
            RecordField.Of("attenuation_db_per_km", design.Optics.AttenuationDbPerKm),
            RecordField.Of("g652d_maximum_db_per_km", design.Optics.G652DMaximumDbPerKm),
            RecordField.Of("margin_at_start_db", empty.MarginDb),
            RecordField.Of("margin_at_full_payout_db", full.MarginDb),
            RecordField.Of("relays_carried", design.Plan?.Carried ?? 0),
            RecordField.Of("relay_drops_planned", design.PlannedDropsM.Count));
        return state;
    }

    /// <summary>Out to the probe's depth, with a record every tenth of the spool; past the spool's end the fibre parts.</summary>
    public static TetherState PayOut(TetherDesign design, TetherState state, double depthM, ComponentContext context)
    {
        var lengthM = design.Tether.LengthM;
        if (state.Broken || depthM <= state.PaidOutM) return state;
        if (depthM > lengthM)
        {
            return Break(state with { PaidOutM = lengthM }, "the spool ran out of fibre", context);
        }

        var milestone = (int)(depthM / lengthM * MilestonesPerSpool);
        if (milestone > state.PayoutMilestone)
        {
            context.Record(TetherRecords.Payout, Severity.Info,
                RecordField.Of("paid_out_m", depthM),
                RecordField.Of("spool_left_m", lengthM - depthM));
        }

        return state with { PaidOutM = depthM, PayoutMilestone = Math.Max(milestone, state.PayoutMilestone) };
    }

    /// <summary>The fibre's budget at the current payout; a change of verdict is logged, and commands held wait no longer.</summary>
    public static TetherState Budget(TetherDesign design, TetherState state, ComponentContext context)
    {
        if (state.Broken) return state;
        var budget = design.Optics.Budget(state.PaidOutM);
        if (budget.LinkUp == state.FibreUp) return state;
        context.Record(budget.LinkUp ? TetherRecords.LinkUp : TetherRecords.LinkDown, budget.LinkUp ? Severity.Notice : Severity.Alarm,
            RecordField.Of("paid_out_m", state.PaidOutM),
            RecordField.Of("margin_db", budget.MarginDb),
            RecordField.Of("received_power_dbm", budget.ReceivedPowerDbm));
        var next = state with { FibreUp = budget.LinkUp };
        return budget.LinkUp ? TetherRouting.FlushCommands(design, next, design.FibreDelay(next), context) : next;
    }

    public static TetherState Break(TetherState state, string cause, ComponentContext context)
    {
        if (state.Broken) return state;
        context.Record(TetherRecords.Broken, Severity.Alarm, TetherReports.WithLedger(state,
            RecordField.Of("cause", cause),
            RecordField.Of("paid_out_m", state.PaidOutM),
            RecordField.Of("frames_carried", state.FramesCarried)));
        return state with { Broken = true, BrokenAtDepthM = state.PaidOutM, FibreUp = false };
    }
}
