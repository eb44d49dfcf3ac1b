using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Station;

/// <summary>
/// What the station sets going when the run starts. The draws come in a fixed order (failure dose, then the first
/// upset) from the station's own stream, so a seed fixes both and nothing else shifts them.
/// </summary>
public static class StationStart
{
    public static void Start(StationDesign design, ComponentContext context)
    {
        context.Record(StationRecords.Started, Severity.Info, RecordField.Of("one_way_light_time_s", design.OneWayLightTimeS));
        if (design.Dose is { } dose)
        {
            var failureDoseGy = dose.DrawFailureDoseGy(context.Random);
            var lifeS = dose.TimeToSiliconDoseS(failureDoseGy);
            context.Record(StationRecords.Radiation, Severity.Info,
                RecordField.Of("surface_dose_rate_gy_s", dose.SurfaceDoseRateGyPerS),
                RecordField.Of("electronics_dose_rate_gy_si_s", dose.SiliconDoseRateGyPerS),
                RecordField.Of("median_failure_dose_gy_si", dose.MedianFailureDoseGy),
                RecordField.Of("median_life_s", dose.TimeToSiliconDoseS(dose.MedianFailureDoseGy)),
                RecordField.Of("failure_dose_gy_si", failureDoseGy),
                RecordField.Of("life_s", lifeS));
            if (lifeS < StationDesign.MaxTimerS)
            {
                context.ScheduleSelf(SimDuration.FromSeconds(lifeS), new StationDoseLimit(failureDoseGy), MissionPriority.Fault);
            }
        }

        if (design.Station.Link is not null)
        {
            var link = design.SiteLink;
            context.Record(StationRecords.Link, Severity.Info,
                RecordField.Of("in_view_fraction", link.InViewFraction),
                RecordField.Of("occultation_per_turn_s", link.OccultationPerTurnS),
                RecordField.Of("open_fraction", link.Windows!.OpenFraction),
                RecordField.Of("data_rate_bit_s", link.DataRateBitPerS),
                RecordField.Of("frame_time_s", link.FrameTimeS),
                RecordField.Of("open_now", link.IsOpen(0.0)));
        }

        if (design.Station.Dwell is { } dwell)
        {
            context.Record(StationRecords.DwellStarted, Severity.Notice, RecordField.Of("dwell_s", dwell.DurationS), RecordField.Of("d_value_gy", dwell.DValueGy));
            context.ScheduleSelf(SimDuration.FromSeconds(dwell.DurationS), DwellOver.Instance, MissionPriority.Command);
        }

        if (design.Station.Charging is not null)
        {
            StationLife.ScheduleNextUpset(design, context);
        }
    }
}
