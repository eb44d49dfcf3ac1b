using System.Diagnostics;

namespace DescentOps.Reports.Tests;

/// <summary>Opens a local page in headless Chromium and collects what it printed, as a reader's browser would see it.</summary>
internal static class HeadlessChromium
{
    public const string Executable = "/usr/bin/chromium";

    public static bool IsInstalled => File.Exists(Executable);

    public static bool UnderCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    /// <summary>Loads <paramref name="page"/> with <c>--dump-dom</c>; returns the serialized DOM and the console messages.</summary>
    public static async Task<(string Dom, IReadOnlyList<string> ConsoleLines, string Stderr)> DumpDomAsync(string page)
    {
        Assert.True(IsInstalled, $"{Executable} is missing: CI's .ci/run installs Debian's chromium before the tests");
        var profile = Directory.CreateTempSubdirectory("descentops-chromium-").FullName;
        try
        {
            var start = new ProcessStartInfo(Executable)
            {
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
            };
            foreach (var argument in new[]
            {
                "--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--no-first-run", $"--user-data-dir={profile}", "--enable-logging=stderr", "--v=0",
                "--dump-dom", new Uri(Path.GetFullPath(page)).AbsoluteUri,
            })
            {
                start.ArgumentList.Add(argument);
            }

            using var process = Process.Start(start)!;
            var stdout = process.StandardOutput.ReadToEndAsync();
            var stderr = process.StandardError.ReadToEndAsync();
            try
            {
                // A hang guard, not a timing assertion: Chromium loads a local page in a few seconds.
                await process.WaitForExitAsync().WaitAsync(TimeSpan.FromMinutes(2));
            }
            catch (TimeoutException)
            {
                process.Kill(entireProcessTree: true);
                throw;
            }

            var errors = await stderr;
            // Chromium logs every console message of the page (log, warning, error, uncaught exception, refused
            // fetch) as a CONSOLE line on stderr when logging goes there; its own chatter (D-Bus, GPU) has other tags.
            var console = errors.Split('\n').Where(l => l.Contains(":CONSOLE", StringComparison.Ordinal)).ToList();
            return (await stdout, console, errors);
        }
        finally
        {
            Directory.Delete(profile, recursive: true);
        }
    }
}
