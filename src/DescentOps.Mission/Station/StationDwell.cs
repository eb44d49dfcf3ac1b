using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Physics.Radiation;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Station;

/// <summary>
/// The end of the sterilising surface dwell, whatever became of the station: the exposed hardware took the unshielded
/// surface dose for the whole dwell, which sets the log reduction; the station's own dose shows what the wait cost it.
/// The probe is then cleared to descend.
/// </summary>
public static class StationDwell
{
    public static void End(StationDesign design, ComponentContext context)
    {
        var dwell = design.Station.Dwell!;
        var dose = design.Dose!;
        var exposedDoseGy = DoseAccumulation.AccumulatedDoseGy(0.0, dose.SurfaceDoseRateGyPerS, dwell.DurationS);
        var logReduction = BioburdenReduction.LogReductionFromDose(exposedDoseGy, dwell.DValueGy);
        var stationDoseGy = dose.SiliconDoseAfterGy(context.Now.SecondsSinceEpoch);
        context.Record(StationRecords.DwellEnded, Severity.Notice,
            RecordField.Of("dwell_s", dwell.DurationS),
            RecordField.Of("exposed_dose_gy", exposedDoseGy),
            RecordField.Of("log_reduction", logReduction),
            RecordField.Of("station_dose_gy_si", stationDoseGy),
            RecordField.Of("station_dose_share_of_median", stationDoseGy / dose.MedianFailureDoseGy));
        context.Schedule(design.Ids.Probe, SimDuration.Zero, new DescentCleared(dwell.DurationS, logReduction), MissionPriority.Command);
    }
}
