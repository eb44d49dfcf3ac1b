using System.Globalization;
using DescentOps.Records;
using DescentOps.Engine.Running;

namespace DescentOps.Cli.Running;

/// <summary>
/// Where the mission stands, for the progress line: the probe's depth of the shell's thickness and its regime while
/// it descends, then the ocean phase. The time left is estimated from the depth still to melt at the pace so far,
/// not from the run's time limit, which a mission rarely reaches. It watches the records the run writes.
/// </summary>
public sealed class MissionProgress(double shellThicknessM) : IJournalSink
{
    private double _depthM;
    private string _regime = "on the surface";
    private double? _breakthroughS;
    private double? _descentStartWallS;
    private double _depthAtStartM;

    public void Write(JournalRecord record)
    {
        ArgumentNullException.ThrowIfNull(record);
        if (record.Kind == "probe.breakthrough")
        {
            _breakthroughS = record.Time.SinceEpoch.TotalSeconds;
            return;
        }

        if (record.Kind != "probe.telemetry") return;
        foreach (var field in record.Fields)
        {
            if (field.Name == "depth_m" && field.Kind == RecordFieldKind.Number) _depthM = field.Number;
            else if (field.Name == "regime" && field.Text is { } regime) _regime = regime;
        }
    }

    /// <summary>The progress text at this moment of the run; <paramref name="wall"/> is the wall time spent so far.</summary>
    public string Describe(KernelProgress progress, TimeSpan wall)
    {
        var c = CultureInfo.InvariantCulture;
        var day = progress.Now.SinceEpoch.TotalDays;
        if (_breakthroughS is { } b)
        {
            return string.Create(c, $"in the ocean since day {b / 86400:F1}: vehicles at work, day {day:F1}  {progress.EventsDelivered:N0} events");
        }

        if (_descentStartWallS is null && _depthM > 0)
        {
            _descentStartWallS = wall.TotalSeconds;
            _depthAtStartM = _depthM;
        }

        var share = shellThicknessM > 0 ? _depthM / shellThicknessM : 0;
        var eta = "ETA --";
        if (_descentStartWallS is { } start && _depthM > _depthAtStartM)
        {
            var pace = (_depthM - _depthAtStartM) / Math.Max(wall.TotalSeconds - start, 1e-3);
            eta = "ETA to breakthrough " + Terminal.ProgressLine.Duration((shellThicknessM - _depthM) / pace);
        }

        return string.Create(c, $"depth {_depthM,8:F1} m of {shellThicknessM:F0} m ({share,6:P1})  {_regime,-12} day {day,7:F1}  {eta}");
    }
}
