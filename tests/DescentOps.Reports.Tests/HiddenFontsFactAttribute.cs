using System.Diagnostics;

namespace DescentOps.Reports.Tests;

/// <summary>
/// A fact that hides the system's fonts from a child process with a private mount namespace (<c>unshare -m</c>,
/// which needs root or user namespaces). Where that is not allowed the test is skipped: it is an extra proof
/// that the report does not lean on system fonts, not the only one (the plot tests check text in every SVG).
/// </summary>
public sealed class HiddenFontsFactAttribute : FactAttribute
{
    private static readonly Lazy<bool> CanHide = new(() =>
    {
        try
        {
            using var probe = Process.Start(new ProcessStartInfo("unshare", ["-m", "true"]) { UseShellExecute = false, RedirectStandardError = true })!;
            probe.WaitForExit(10_000);
            return probe.HasExited && probe.ExitCode == 0 && Directory.Exists(SystemFonts);
        }
        catch (System.ComponentModel.Win32Exception)
        {
            return false;
        }
    });

    public HiddenFontsFactAttribute()
    {
        if (!CanHide.Value) Skip = "cannot make a private mount namespace here (unshare -m) to hide the system fonts";
    }

    public const string SystemFonts = "/usr/share/fonts";
}
