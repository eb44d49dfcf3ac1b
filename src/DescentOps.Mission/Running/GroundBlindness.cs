namespace DescentOps.Mission.Running;

/// <summary>
/// How long the ground was blind, counted in the time frames were taken: the sum of the gaps longer than two
/// telemetry intervals between consecutive frames the ground received (frames lost or held late in between), and
/// at the end the frames sent after the last one received that were not simply still on their way (older than the
/// last latency). The interval is the spacing of the probe's first two frames.
/// </summary>
public sealed class GroundBlindness
{
    private double? _firstSentS;
    private double? _intervalS;
    private double _lastSentS;
    private double? _lastReceivedTakenS;
    private double _lastLatencyS;
    private double _blindS;

    public void FrameSent(double timeS)
    {
        if (_firstSentS is null) _firstSentS = timeS;
        else _intervalS ??= timeS - _firstSentS.Value;
        _lastSentS = timeS;
    }

    public void FrameReceived(double timeS, double latencyS)
    {
        var taken = timeS - latencyS;
        // Frames arrive in order of arrival, not always of taking (held frames come late): only a later frame moves on.
        if (_lastReceivedTakenS is { } last && taken > last)
        {
            if (IsGap(taken - last)) _blindS += taken - last;
        }

        if (_lastReceivedTakenS is null || taken > _lastReceivedTakenS) _lastReceivedTakenS = taken;
        _lastLatencyS = latencyS;
    }

    public double TotalS()
    {
        var from = _lastReceivedTakenS ?? _firstSentS;
        if (from is null) return 0;
        var tail = _lastSentS - from.Value - _lastLatencyS;
        return _blindS + (IsGap(tail) ? tail : 0);
    }

    private bool IsGap(double seconds) => _intervalS is { } interval && interval > 0 && seconds > 2 * interval;
}
