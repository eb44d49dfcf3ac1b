using System.Diagnostics;
using DescentOps.Engine.Running;

namespace DescentOps.Cli.Terminal;

/// <summary>
/// A one-line progress display on stderr for runs that take more than a moment. It stays silent when stderr
/// is not a terminal, so logs of scripted runs hold no carriage returns.
/// </summary>
public sealed class ProgressLine
{
    private static readonly TimeSpan FirstShowAfter = TimeSpan.FromMilliseconds(500);
    private static readonly TimeSpan Refresh = TimeSpan.FromMilliseconds(200);
    private readonly Stopwatch _wall = Stopwatch.StartNew();
    private readonly bool _enabled = !Console.IsErrorRedirected;
    private TimeSpan _lastShown = TimeSpan.Zero;
    private bool _shown;

    public void Report(KernelProgress progress)
    {
        if (!_enabled) return;
        var elapsed = _wall.Elapsed;
        if (elapsed < FirstShowAfter || elapsed - _lastShown < Refresh) return;
        _lastShown = elapsed;
        _shown = true;
        var fraction = progress.Until.Ticks > 0 ? Math.Clamp(progress.Now.Ticks / (double)progress.Until.Ticks, 0, 1) : 0;
        Console.Error.Write($"\r  day {progress.Now.SinceEpoch.TotalDays,8:F2} of {progress.Until.SinceEpoch.TotalDays:F0} ({fraction,6:P1})  {progress.EventsDelivered,12:N0} events  ");
    }

    public void Done()
    {
        if (_shown) Console.Error.Write("\r" + new string(' ', 78) + "\r");
    }
}
