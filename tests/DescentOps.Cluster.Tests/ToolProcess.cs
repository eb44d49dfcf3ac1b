using System.Diagnostics;
using System.Globalization;
using System.Text;

namespace DescentOps.Cluster.Tests;

/// <summary>A <c>descentops</c> process (the CLI built beside the tests) with its output gathered as it comes.</summary>
internal sealed class ToolProcess : IDisposable
{
    private readonly Process _process;
    private readonly StringBuilder _stdout = new();
    private readonly StringBuilder _stderr = new();

    public ToolProcess(string workingDirectory, params string[] arguments)
    {
        var start = new ProcessStartInfo("dotnet") { WorkingDirectory = workingDirectory, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        start.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "descentops.dll"));
        foreach (var argument in arguments) start.ArgumentList.Add(argument);
        _process = new Process { StartInfo = start };
        _process.OutputDataReceived += (_, e) => { lock (_stdout) _stdout.AppendLine(e.Data); };
        _process.ErrorDataReceived += (_, e) => { lock (_stderr) _stderr.AppendLine(e.Data); };
        _process.Start();
        _process.BeginOutputReadLine();
        _process.BeginErrorReadLine();
    }

    public int Id => _process.Id;

    public bool HasExited => _process.HasExited;

    public int ExitCode => _process.ExitCode;

    public string Stdout { get { lock (_stdout) return _stdout.ToString(); } }

    public string Stderr { get { lock (_stderr) return _stderr.ToString(); } }

    /// <summary>SIGKILL, by this process's id: no hand-back, no goodbye.</summary>
    public void KillHard() => _process.Kill();

    /// <summary>A signal by name (TERM, INT) through kill(1).</summary>
    public async Task SignalAsync(string signal)
    {
        using var kill = Process.Start("kill", ["-" + signal, Id.ToString(CultureInfo.InvariantCulture)]);
        await kill.WaitForExitAsync();
    }

    public async Task WaitAsync(TimeSpan guard)
    {
        try
        {
            await _process.WaitForExitAsync().WaitAsync(guard);
        }
        catch (TimeoutException)
        {
            throw new TimeoutException($"descentops {string.Join(' ', _process.StartInfo.ArgumentList.Skip(1))} still running after {guard.TotalSeconds} s\n--- stdout\n{Stdout}\n--- stderr\n{Stderr}");
        }

        _process.WaitForExit(); // drains the asynchronous output readers
    }

    public void Dispose()
    {
        if (!_process.HasExited) _process.Kill();
        _process.Dispose();
    }
}
