namespace DescentOps.Rehearsal;

/// <summary>
/// Simulated time against the wall clock: <see cref="Pace"/> simulated seconds pass per wall second while running,
/// none while paused. Pure: the wall time is always passed in, so it is tested without waiting.
/// </summary>
public sealed class PaceClock
{
    /// <summary>The fastest pace offered: a year in about six minutes.</summary>
    public const double MaxPace = 1e5;

    private double _anchorSimS;
    private double _anchorWallS;

    public PaceClock(double startSimS, double pace, bool paused, double wallS)
    {
        CheckPace(pace);
        _anchorSimS = startSimS;
        _anchorWallS = wallS;
        Pace = pace;
        Paused = paused;
    }

    public double Pace { get; private set; }

    public bool Paused { get; private set; }

    public double SimAt(double wallS) => Paused ? _anchorSimS : _anchorSimS + Pace * Math.Max(0, wallS - _anchorWallS);

    public void SetPace(double pace, double wallS)
    {
        CheckPace(pace);
        Rebase(SimAt(wallS), wallS);
        Pace = pace;
    }

    public void Pause(double wallS)
    {
        Rebase(SimAt(wallS), wallS);
        Paused = true;
    }

    public void Resume(double wallS)
    {
        _anchorWallS = wallS;
        Paused = false;
    }

    /// <summary>Restarts the clock from <paramref name="simS"/> now (when the simulation fell behind the pace).</summary>
    public void Rebase(double simS, double wallS)
    {
        _anchorSimS = simS;
        _anchorWallS = wallS;
    }

    public static bool IsValidPace(double pace) => double.IsFinite(pace) && pace > 0 && pace <= MaxPace;

    private static void CheckPace(double pace)
    {
        if (!IsValidPace(pace)) throw new ArgumentOutOfRangeException(nameof(pace), pace, $"A pace is above 0 and at most {MaxPace}.");
    }
}
