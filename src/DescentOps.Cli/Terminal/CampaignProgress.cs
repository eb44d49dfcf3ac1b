using System.Diagnostics;
using System.Globalization;

namespace DescentOps.Cli.Terminal;

/// <summary>A progress bar with runs per second and an ETA on stderr; silent when stderr is not a terminal.</summary>
public sealed class CampaignProgress(int total, int alreadyDone)
{
    private static readonly TimeSpan Refresh = TimeSpan.FromMilliseconds(250);
    private readonly Stopwatch _wall = Stopwatch.StartNew();
    private readonly bool _enabled = !Console.IsErrorRedirected;
    private readonly Lock _gate = new();
    private TimeSpan _lastShown = TimeSpan.MinValue;
    private int _done;

    public int DoneThisSession => _done;

    public double RunsPerSecond => _done / Math.Max(_wall.Elapsed.TotalSeconds, 1e-9);

    public TimeSpan Elapsed => _wall.Elapsed;

    public void RunFinished()
    {
        lock (_gate)
        {
            _done++;
            if (!_enabled) return;
            var elapsed = _wall.Elapsed;
            if (elapsed - _lastShown < Refresh && _done + alreadyDone < total) return;
            _lastShown = elapsed;
            var all = _done + alreadyDone;
            var share = total > 0 ? Math.Clamp(all / (double)total, 0, 1) : 1;
            const int width = 30;
            var filled = (int)Math.Round(share * width);
            var rate = RunsPerSecond;
            var eta = rate > 0 ? TimeSpan.FromSeconds((total - all) / rate) : TimeSpan.Zero;
            Console.Error.Write(string.Create(CultureInfo.InvariantCulture,
                $"\r  [{new string('#', filled)}{new string('.', width - filled)}] {all}/{total} runs  {rate:F2} runs/s  ETA {(int)eta.TotalMinutes}m{eta.Seconds:00}s   "));
        }
    }

    public void Done()
    {
        if (_enabled && _done > 0) Console.Error.Write("\r" + new string(' ', 90) + "\r");
    }
}
