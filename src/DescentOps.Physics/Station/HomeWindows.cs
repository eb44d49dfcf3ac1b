namespace DescentOps.Physics.Station;

/// <summary>
/// When a surface station can talk home, as a function of time. The home direction turns through the station's sky
/// once per rotation period (relative to that direction); home is up while its hour angle H lies within ±H0
/// (<see cref="EarthVisibility.InViewFraction"/> gives H0/π), except while the parent planet hides it, an arc of
/// ±asin(R_p/a) about the planet's hour angle (<see cref="EarthVisibility.OccultationPerOrbitS"/> gives its length).
/// Working in hour angle rather than a table of windows makes every opening and closing exact for any run length.
/// </summary>
public sealed class HomeWindows
{
    private const string Model = "the home-link visibility windows";

    /// <summary>Phase slack at arc ends, rad: a window edge rounded to a microsecond tick still counts as inside.</summary>
    private const double EdgeRad = 1e-9;

    private const double TwoPi = 2 * Math.PI;
    private readonly double _rotationPeriodS;
    private readonly double _startHourAngleRad;

    /// <summary>Open arcs of hour angle within [0, 2π), sorted, disjoint.</summary>
    private readonly (double From, double To)[] _open;

    /// <param name="rotationPeriodS">Time for the home direction to come round the sky once.</param>
    /// <param name="inViewHalfAngleRad">H0, from 0 (never up) to π (always up).</param>
    /// <param name="startHourAngleRad">Home's hour angle at t = 0 (0: on the meridian; negative: still rising).</param>
    /// <param name="occultationHalfAngleRad">Half the arc the planet covers, asin(R_p/a); 0 for no planet in the way.</param>
    /// <param name="planetHourAngleRad">Hour angle of the middle of the occultation.</param>
    public HomeWindows(double rotationPeriodS, double inViewHalfAngleRad, double startHourAngleRad, double occultationHalfAngleRad, double planetHourAngleRad)
    {
        _rotationPeriodS = ValidRange.RequirePositive(rotationPeriodS, nameof(rotationPeriodS), "s", Model);
        ValidRange.Require(inViewHalfAngleRad, 0.0, Math.PI, nameof(inViewHalfAngleRad), "rad", Model);
        ValidRange.Require(occultationHalfAngleRad, 0.0, Math.PI / 2, nameof(occultationHalfAngleRad), "rad", Model);
        _startHourAngleRad = startHourAngleRad;
        var visible = inViewHalfAngleRad >= Math.PI ? [(0.0, TwoPi)] : Arc(-inViewHalfAngleRad, inViewHalfAngleRad);
        var hidden = occultationHalfAngleRad > 0 ? Arc(planetHourAngleRad - occultationHalfAngleRad, planetHourAngleRad + occultationHalfAngleRad) : [];
        _open = [.. Subtract(visible, hidden).Where(a => a.To - a.From > EdgeRad).OrderBy(a => a.From)];
    }

    /// <summary>Share of each rotation with the link open.</summary>
    public double OpenFraction => _open.Sum(a => a.To - a.From) / TwoPi;

    public bool IsOpen(double timeS) => Locate(Phase(timeS)) is { Inside: true };

    /// <summary>The first instant at or after <paramref name="timeS"/> when the link is open; +∞ if never.</summary>
    public double NextOpeningS(double timeS)
    {
        var phase = Phase(timeS);
        return Locate(phase) switch
        {
            null => double.PositiveInfinity,
            { Inside: true } => timeS,
            { Arc: var arc } => timeS + (Forward(phase, arc.From) * _rotationPeriodS / TwoPi),
        };
    }

    /// <summary>When the window open at <paramref name="timeS"/> closes (+∞ for a link always open); <paramref name="timeS"/> itself if closed.</summary>
    public double ClosingS(double timeS)
    {
        var phase = Phase(timeS);
        if (Locate(phase) is not { Inside: true } found) return timeS;
        if (_open.Length == 1 && _open[0].To - _open[0].From >= TwoPi - EdgeRad) return double.PositiveInfinity;
        var end = found.Arc.To;
        // An arc that ends at 2π and one that starts at 0 are one window across the wrap.
        if (end >= TwoPi - EdgeRad && _open[0].From <= EdgeRad) end = TwoPi + _open[0].To;
        var at = phase > found.Arc.To ? phase - TwoPi : phase;
        return timeS + (Math.Max(0.0, end - at) * _rotationPeriodS / TwoPi);
    }

    private double Phase(double timeS) => Wrap(_startHourAngleRad + (TwoPi * timeS / _rotationPeriodS));

    /// <summary>The arc containing the phase, or the next arc to open after it.</summary>
    private (bool Inside, (double From, double To) Arc)? Locate(double phase)
    {
        if (_open.Length == 0) return null;
        foreach (var arc in _open)
        {
            if (phase >= arc.From - EdgeRad && phase < arc.To) return (true, arc);
            if (phase < arc.From) return (false, arc);
        }

        // A phase just below 2π may sit in the first arc's slack at 0.
        return phase >= TwoPi - EdgeRad && _open[0].From <= EdgeRad ? (true, _open[0]) : (false, _open[0]);
    }

    private static double Forward(double from, double to) => Wrap(to - from);

    private static double Wrap(double angle)
    {
        var wrapped = angle % TwoPi;
        return wrapped < 0 ? wrapped + TwoPi : wrapped;
    }

    /// <summary>An arc [from, to] of length under 2π as one or two pieces inside [0, 2π).</summary>
    private static (double From, double To)[] Arc(double from, double to)
    {
        var start = Wrap(from);
        var end = start + (to - from);
        return end <= TwoPi ? [(start, end)] : [(start, TwoPi), (0.0, end - TwoPi)];
    }

    private static IEnumerable<(double From, double To)> Subtract((double From, double To)[] arcs, (double From, double To)[] holes)
    {
        IEnumerable<(double From, double To)> result = arcs;
        foreach (var hole in holes)
        {
            result = result.SelectMany(a => a.To <= hole.From || a.From >= hole.To
                ? [a]
                : new[] { (a.From, Math.Min(a.To, hole.From)), (Math.Max(a.From, hole.To), a.To) }.Where(p => p.Item2 > p.Item1));
        }

        return result;
    }
}
