using Microsoft.Playwright;

namespace DescentOps.Rehearsal.Tests;

/// <summary>Debian's Chromium, driven by Playwright through its executable path (no browser download here).</summary>
internal static class DebianChromium
{
    public const string ExecutablePath = "/usr/bin/chromium";

    /// <summary>
    /// True when the browser is installed. Under CI=true a missing browser fails the test (.ci/run installs it); a
    /// developer machine without it skips the browser part.
    /// </summary>
    public static bool Present()
    {
        Assert.True(File.Exists(ExecutablePath) || Environment.GetEnvironmentVariable("CI") != "true", "CI must install chromium (.ci/run does)");
        return File.Exists(ExecutablePath);
    }

    /// <summary>A headless browser with the network features a loopback test does not want switched off.</summary>
    public static Task<IBrowser> LaunchAsync(IPlaywright playwright) => playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
    {
        ExecutablePath = ExecutablePath,
        Headless = true,
        Args = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
    });
}
