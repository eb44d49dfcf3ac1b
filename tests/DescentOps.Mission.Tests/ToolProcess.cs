using System.Diagnostics;

namespace DescentOps.Mission.Tests;

/// <summary>Runs the built descentops executable in a separate process, as a user would.</summary>
internal static class ToolProcess
{
    public static async Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(string workingDirectory, params string[] arguments)
    {
        var tool = Path.Combine(AppContext.BaseDirectory, "descentops.dll");
        var start = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = workingDirectory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add(tool);
        foreach (var argument in arguments) start.ArgumentList.Add(argument);

        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        // A hang guard only, not a timing assertion: a healthy default run takes seconds.
        await process.WaitForExitAsync().WaitAsync(TimeSpan.FromMinutes(3));
        return (process.ExitCode, await stdout, await stderr);
    }

    /// <summary>
    /// This test run's own folder under the temporary directory; deleted when the test process exits. A test process
    /// that is killed (a timeout, Ctrl-C) cannot delete its folder, so each new run first removes the folders of runs
    /// whose process is gone.
    /// </summary>
    private static readonly Lazy<string> RunFolder = new(() =>
    {
        var parent = Path.Combine(Path.GetTempPath(), "descentops-tests");
        SweepAbandoned(parent);
        var path = Path.Combine(parent, $"run-{Environment.ProcessId}-{Path.GetRandomFileName()}");
        Directory.CreateDirectory(path);
        AppDomain.CurrentDomain.ProcessExit += (_, _) =>
        {
            try
            {
                Directory.Delete(path, recursive: true);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                // Best effort: a file still open at exit is left for the system's temporary-file cleanup.
            }
        };
        return path;
    });

    /// <summary>Deletes <c>run-PID-*</c> folders whose process no longer exists (best effort).</summary>
    private static void SweepAbandoned(string parent)
    {
        if (!Directory.Exists(parent)) return;
        foreach (var folder in Directory.EnumerateDirectories(parent, "run-*"))
        {
            var parts = Path.GetFileName(folder).Split('-');
            if (parts.Length < 3 || !int.TryParse(parts[1], out var pid) || ProcessIsAlive(pid)) continue;
            try
            {
                Directory.Delete(folder, recursive: true);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                // Another sweeper got there first, or the folder is not ours to delete.
            }
        }
    }

    private static bool ProcessIsAlive(int pid)
    {
        try
        {
            using var process = Process.GetProcessById(pid);
            return !process.HasExited;
        }
        catch (ArgumentException)
        {
            return false;
        }
    }

    /// <summary>A fresh folder inside this run's folder, which goes when the test process ends.</summary>
    public static string NewTempDirectory()
    {
        var path = Path.Combine(RunFolder.Value, Path.GetRandomFileName());
        Directory.CreateDirectory(path);
        return path;
    }
}
