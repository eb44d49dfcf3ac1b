using System.Diagnostics;
using DescentOps.Tests.Shared;

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

    /// <summary>A fresh folder inside this run's folder, which goes when the test process ends.</summary>
    public static string NewTempDirectory() => TestFolders.New();
}
