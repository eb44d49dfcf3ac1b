using System.Diagnostics;
using System.Globalization;

namespace DescentOps.Tests.Shared;

/// <summary>
/// Temporary folders for tests that clean up after themselves. Each test process gets its own folder under one parent
/// (other checkouts on the machine may run their tests at the same time), deleted when the process exits; a process that
/// was killed cannot delete its own, so each new process first removes the folders of processes that are gone, and never
/// another live run's.
/// </summary>
internal static class TestFolders
{
    private const string ParentName = "descentops-tests";

    private static readonly Lazy<string> ProcessFolder = new(() =>
    {
        var parent = Path.Combine(Path.GetTempPath(), ParentName);
        SweepAbandoned(parent);
        var path = Path.Combine(parent, string.Create(CultureInfo.InvariantCulture, $"run-{Environment.ProcessId}-{Path.GetRandomFileName()}"));
        Directory.CreateDirectory(path);
        AppDomain.CurrentDomain.ProcessExit += (_, _) => TryDelete(path);
        return path;
    });

    /// <summary>A new empty folder inside this test process's folder.</summary>
    public static string New()
    {
        var path = Path.Combine(ProcessFolder.Value, Path.GetRandomFileName());
        Directory.CreateDirectory(path);
        return path;
    }

    /// <summary>Deletes the <c>run-PID-*</c> folders whose process no longer exists (best effort).</summary>
    private static void SweepAbandoned(string parent)
    {
        if (!Directory.Exists(parent)) return;
        foreach (var folder in Directory.EnumerateDirectories(parent, "run-*"))
        {
            var parts = Path.GetFileName(folder).Split('-');
            if (parts.Length < 3 || !int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out var pid) || IsAlive(pid)) continue;
            TryDelete(folder);
        }
    }

    private static bool IsAlive(int pid)
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

    private static void TryDelete(string folder)
    {
        try
        {
            Directory.Delete(folder, recursive: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Another sweeper got there first, or a file is still open: left for the system's temporary-file cleanup.
        }
    }
}
