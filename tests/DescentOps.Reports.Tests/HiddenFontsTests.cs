using System.Diagnostics;

namespace DescentOps.Reports.Tests;

[Collection(RunLogsCollection.Name)]
public sealed class HiddenFontsTests(RunLogs logs)
{
    /// <summary>
    /// ScottPlot with no fonts draws SVGs without a single text element and raises no error. The report command,
    /// run where the system font folder is an empty directory, must still label every plot.
    /// </summary>
    [HiddenFontsFact]
    public async Task The_report_has_labelled_plots_on_a_machine_without_fonts()
    {
        var empty = Directory.CreateDirectory(logs.File("no-fonts")).FullName;
        var output = logs.File("no-fonts.html");
        var tool = Path.Combine(AppContext.BaseDirectory, "descentops.dll");
        const string script = """
            mount --bind "$1" "$2" || exit 90
            [ -z "$(ls -A "$2")" ] || exit 91
            exec dotnet "$3" report "$4" --output "$5"
            """;
        var start = new ProcessStartInfo("unshare") { UseShellExecute = false, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in new[] { "-m", "sh", "-c", script, "sh", empty, HiddenFontsFactAttribute.SystemFonts, tool, logs.DefaultLog, output }) start.ArgumentList.Add(a);
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        await process.WaitForExitAsync().WaitAsync(TimeSpan.FromMinutes(2));
        Assert.True(process.ExitCode == 0, $"exit {process.ExitCode}: {await stdout}{await stderr}");

        var page = ReportTests.Parse(output);
        var svgs = page.Descendants("{http://www.w3.org/2000/svg}svg").ToList();
        Assert.Equal(DescentOps.Reports.Plotting.ReportPlots.Default.Count, svgs.Count);
        Assert.All(svgs, svg => Assert.Contains(svg.Descendants("{http://www.w3.org/2000/svg}text"), t => t.Value.Trim().Length > 0));
    }
}
