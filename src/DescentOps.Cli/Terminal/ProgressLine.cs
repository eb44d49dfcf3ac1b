using System.Diagnostics;
using System.Globalization;

namespace DescentOps.Cli.Terminal;

/// <summary>
/// A one-line progress display on stderr for work that takes more than a moment, with an estimate of the time left.
/// It stays silent when stderr is not a terminal, so logs of scripted runs hold no carriage returns.
/// </summary>
public sealed class ProgressLine
{
    private static readonly TimeSpan FirstShowAfter = TimeSpan.FromMilliseconds(500);
    private static readonly TimeSpan Refresh = TimeSpan.FromMilliseconds(200);
    private readonly Stopwatch _wall = Stopwatch.StartNew();
    private readonly bool _enabled;
    private readonly string _label;
    private TimeSpan _lastShown = TimeSpan.Zero;
    private int _shownWidth;

    public ProgressLine(string label = "", bool? enabled = null)
    {
        _label = label;
        _enabled = enabled ?? !Console.IsErrorRedirected;
    }

    public TimeSpan Elapsed => _wall.Elapsed;

    /// <summary>Shows a share of the work done (0 to 1) with the time left at the pace so far.</summary>
    public void Fraction(double fraction, string detail = "")
    {
        if (!Due()) return;
        Show(string.Create(CultureInfo.InvariantCulture, $"{_label}{Math.Clamp(fraction, 0, 1),6:P1}  {Eta(_wall.Elapsed, fraction)}{(detail.Length > 0 ? "  " + detail : "")}"));
    }

    /// <summary>Shows a line of its own (the caller computes the estimate).</summary>
    public void Text(Func<TimeSpan, string> text)
    {
        if (!Due()) return;
        Show(_label + text(_wall.Elapsed));
    }

    public void Done()
    {
        if (_shownWidth > 0) Console.Error.Write("\r" + new string(' ', _shownWidth) + "\r");
        _shownWidth = 0;
    }

    /// <summary>Runs <paramref name="work"/> and clears the line after it, also when it throws; its result.</summary>
    public T Around<T>(Func<T> work)
    {
        ArgumentNullException.ThrowIfNull(work);
        try
        {
            return work();
        }
        finally
        {
            Done();
        }
    }

    /// <summary>Runs <paramref name="work"/> and clears the line after it, also when it throws.</summary>
    public void Around(Action work)
    {
        ArgumentNullException.ThrowIfNull(work);
        Around(() =>
        {
            work();
            return true;
        });
    }

    /// <summary>"ETA 1 min 20 s" from the time spent and the share done; "ETA --" until there is a pace to go by.</summary>
    public static string Eta(TimeSpan elapsed, double fraction)
    {
        if (!(fraction > 0.001) || !double.IsFinite(fraction)) return "ETA --";
        var left = elapsed.TotalSeconds * (1 - Math.Min(fraction, 1)) / fraction;
        return "ETA " + Duration(left);
    }

    /// <summary>A wall-clock duration in at most two units: "45 s", "3 min 05 s", "2 h 10 min".</summary>
    public static string Duration(double seconds)
    {
        var s = (long)Math.Round(Math.Max(0, seconds));
        return s switch
        {
            < 60 => string.Create(CultureInfo.InvariantCulture, $"{s} s"),
            < 3600 => string.Create(CultureInfo.InvariantCulture, $"{s / 60} min {s % 60:00} s"),
            _ => string.Create(CultureInfo.InvariantCulture, $"{s / 3600} h {s % 3600 / 60:00} min"),
        };
    }

    private bool Due()
    {
        if (!_enabled) return false;
        var elapsed = _wall.Elapsed;
        if (elapsed < FirstShowAfter || elapsed - _lastShown < Refresh) return false;
        _lastShown = elapsed;
        return true;
    }

    private void Show(string text)
    {
        var padding = Math.Max(0, _shownWidth - text.Length);
        Console.Error.Write("\r" + text + new string(' ', padding));
        _shownWidth = Math.Max(_shownWidth, text.Length);
    }
}
