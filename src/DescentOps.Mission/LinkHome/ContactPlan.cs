using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.LinkHome;

/// <summary>
/// The contact plan's windows as a function of run time: which lander's window is open, when one opens next and when
/// it closes. A repeating plan is read modulo its period. Times are seconds of run time; a window is open from its
/// start (within a microsecond tick, so an instant rounded up to a tick still counts) to just before its end.
/// </summary>
public sealed class ContactPlan
{
    private const double SlackS = 1e-6;
    private readonly IReadOnlyList<ContactWindowModel> _windows;
    private readonly double? _periodS;

    public ContactPlan(IReadOnlyList<ContactWindowModel> windows, double? periodS)
    {
        _windows = windows;
        _periodS = periodS;
    }

    public bool IsOpen(string lander, double tS) => _windows.Any(w => w.Lander == lander && Contains(w, tS));

    /// <summary>Landers whose window is open at <paramref name="tS"/>, in the plan's order.</summary>
    public IEnumerable<string> OpenLanders(double tS) => _windows.Where(w => Contains(w, tS)).Select(w => w.Lander).Distinct();

    /// <summary>The first instant at or after <paramref name="tS"/> when a window of <paramref name="lander"/> is open; infinity if none.</summary>
    public double NextOpeningS(string lander, double tS) =>
        IsOpen(lander, tS) ? tS : _windows.Where(w => w.Lander == lander).Select(w => NextStartS(w, tS)).DefaultIfEmpty(double.PositiveInfinity).Min();

    /// <summary>The first instant after <paramref name="tS"/> when any window of <paramref name="landers"/> opens; infinity if none.</summary>
    public double NextStartOfAnyS(IEnumerable<string> landers, double tS)
    {
        var set = landers.ToHashSet(StringComparer.Ordinal);
        return _windows.Where(w => set.Contains(w.Lander)).Select(w => NextStartS(w, tS)).DefaultIfEmpty(double.PositiveInfinity).Min();
    }

    private bool Contains(ContactWindowModel w, double tS)
    {
        var local = Local(tS);
        return local >= w.FromS - SlackS && local < w.ToS - SlackS;
    }

    private double Local(double tS) => _periodS is { } p ? tS - Math.Floor(tS / p) * p : tS;

    /// <summary>The first start of <paramref name="w"/> strictly after <paramref name="tS"/> (or at it, within the slack).</summary>
    private double NextStartS(ContactWindowModel w, double tS)
    {
        if (_periodS is not { } p) return w.FromS >= tS - SlackS ? Math.Max(w.FromS, tS) : double.PositiveInfinity;
        var turn = Math.Floor(tS / p);
        var start = turn * p + w.FromS;
        return start >= tS - SlackS ? Math.Max(start, tS) : start + p;
    }
}
