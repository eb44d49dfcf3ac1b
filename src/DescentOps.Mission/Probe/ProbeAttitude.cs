using System.Globalization;
using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Running;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Probe;

/// <summary>The probe's tilt outside its own dynamics: the random kicks of debris bands, and the limit beyond which it is lost.</summary>
public static class ProbeAttitude
{
    /// <summary>Beyond the scenario's tilt limit the probe is lost: the run ends as MissionLost.</summary>
    public static ProbeState CheckTilt(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        var limitRad = design.Probe.MaxTiltRad;
        if (Math.Abs(state.TiltRad) <= limitRad || state.Regime == ProbeRegime.AtOcean) return state;
        context.Record(ProbeRecords.TiltLimit, Severity.Critical,
            RecordField.Of("tilt_rad", state.TiltRad),
            RecordField.Of("limit_rad", limitRad),
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("lateral_drift_m", state.LateralDriftM));
        context.StopRun(RunOutcomeKind.MissionLost, string.Create(CultureInfo.InvariantCulture, $"tilt {state.TiltRad * 180 / Math.PI:F1} deg beyond the {limitRad * 180 / Math.PI:F1} deg limit"));
        return state with { VelocityMPerS = 0.0 };
    }

    /// <summary>
    /// Accounts for the debris bands melted through since the last step: the deposit on the head grows, and the tilt takes
    /// one normal draw with the variance the bands give over that depth (a random walk in depth, so the step length does
    /// not matter). The probe draws only when a band scatters, so shells without such bands keep their random streams.
    /// </summary>
    public static ProbeState CrossDebris(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        if (state.DepthM <= state.DebrisAccountedToM) return state;
        var crossing = DebrisCrossing.Between(design.Scenario.Shell.DebrisBands, state.DebrisAccountedToM, state.DepthM);
        state = state with { DebrisAccountedToM = state.DepthM, DebrisOnHeadM = state.DebrisOnHeadM + crossing.DebrisM };
        if (crossing.TiltVarianceRad2 > 0)
        {
            state = state with { TiltRad = state.TiltRad + context.Random.NextNormal(0.0, Math.Sqrt(crossing.TiltVarianceRad2)) };
        }

        foreach (var band in crossing.BandsLeft)
        {
            context.Record(ProbeRecords.DebrisBandCrossed, Severity.Notice,
                RecordField.Of("top_m", band.TopM),
                RecordField.Of("bottom_m", band.BottomM),
                RecordField.Of("debris_on_head_m", state.DebrisOnHeadM),
                RecordField.Of("tilt_rad", state.TiltRad));
        }

        return state;
    }
}
