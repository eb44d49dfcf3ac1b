using DescentOps.Records;
using DescentOps.Engine.Running;

namespace DescentOps.Mission.Running;

/// <summary>
/// Passes every record on to the journal and keeps the running figures the summary needs, so the summary
/// says nothing the log does not.
/// </summary>
public sealed class MissionSummarySink : IJournalSink
{
    private readonly IJournalSink _next;
    private readonly FaultMeasures _faultMeasures;
    private readonly SummaryTally _mission = new();
    private readonly CoverageTally _coverage = new();
    private readonly List<(string Lander, SummaryTally Tally)> _landers;

    public MissionSummarySink(IJournalSink next)
        : this(next, new FaultMeasures())
    {
    }

    /// <param name="next">Where every record goes on.</param>
    /// <param name="faultMeasures">The fault measures, which know what each rule reads.</param>
    /// <param name="landers">The scenario's landers in file order (none for a scenario without a landers list): each gets its own figures.</param>
    public MissionSummarySink(IJournalSink next, FaultMeasures faultMeasures, IReadOnlyList<string>? landers = null)
    {
        _next = next;
        _faultMeasures = faultMeasures;
        _landers = [.. (landers ?? []).Select(l => (l, new SummaryTally()))];
    }

    public void Write(JournalRecord record)
    {
        _next.Write(record);
        _faultMeasures.Observe(record);
        _mission.Observe(record);
        _coverage.Observe(record.Kind, record.Fields);
        if (_landers.Count > 0 && LanderOf(record) is { } lander)
        {
            foreach (var (name, tally) in _landers)
            {
                if (name == lander) tally.Observe(record);
            }
        }
    }

    /// <summary>The rules whose acting the summary reports (<see cref="MissionSummary.RulesActed"/>).</summary>
    public IReadOnlyList<string> CoveredRules { get; init; } = [];

    /// <summary>The procedures whose branches the summary reports (<see cref="MissionSummary.Branches"/>).</summary>
    public IReadOnlyList<Procedures.CompiledProcedure> CoveredProcedures { get; init; } = [];

    public MissionSummary Summarize(RunResult result)
    {
        var endS = result.FinalTime.SecondsSinceEpoch;
        _mission.Figures.Finish(endS);
        foreach (var (_, tally) in _landers) tally.Figures.Finish(endS);
        return new MissionSummary(
            result.Outcome,
            endS,
            _mission.BreakthroughS,
            _mission.DepthM,
            _mission.EnergyJ,
            _mission.FaultsInjected,
            _mission.FramesSent,
            _mission.FramesReceived,
            _mission.FramesLost,
            _mission.VehicleProfiles,
            result.EventsDelivered,
            result.RecordsWritten,
            result.ComponentFailures,
            _faultMeasures.Measures())
        {
            TimeStoppedS = _mission.Figures.TimeStoppedS,
            LongestStopS = _mission.Figures.LongestStopS,
            TimeFrozenS = _mission.Figures.TimeFrozenS,
            TimeBlindS = _mission.Blind.TotalS(),
            FramesHeldMax = _mission.Figures.FramesHeldMax,
            VehiclesLost = _mission.Figures.VehiclesLost,
            RuleFirings = new Dictionary<string, int>(_mission.Figures.RuleFirings, StringComparer.Ordinal),
            Landers = [.. _landers.Select(l => Lander(l.Lander, l.Tally))],
            RulesActed = _coverage.Rules(CoveredRules),
            Branches = _coverage.Branches(CoveredProcedures),
        };
    }

    /// <summary>A lander's figures; its unrecovered faults and its criteria are added when the run is complete (<see cref="PreparedRun.Complete"/>).</summary>
    private static LanderSummary Lander(string name, SummaryTally t) => new(
        name, t.BreakthroughS, t.DepthM, t.EnergyJ, t.FramesSent, t.FramesReceived, t.FramesLost, t.Figures.FramesHeldMax,
        t.Figures.TimeStoppedS, t.Figures.LongestStopS, t.Figures.TimeFrozenS, t.Blind.TotalS(), t.Figures.VehiclesLost, 0, t.FrozeIn, t.StationDead);

    /// <summary>The lander a record is about: its component's, or for the shared link's records the lander they name.</summary>
    private static string? LanderOf(JournalRecord record) =>
        LanderIds.LanderOf(record.Source) ?? (record.Fields.Count > 0 && record.Fields[0].Name == LanderTagSink.Field ? record.Fields[0].Text : null);
}
