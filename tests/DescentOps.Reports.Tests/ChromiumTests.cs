namespace DescentOps.Reports.Tests;

[Collection(RunLogsCollection.Name)]
public sealed class ChromiumTests(RunLogs logs)
{
    [ChromiumFact]
    public async Task The_report_loads_in_headless_chromium_without_console_messages()
    {
        var (dom, console, stderr) = await HeadlessChromium.DumpDomAsync(logs.DefaultReport);
        Assert.Empty(console);
        Assert.True(dom.Contains("id=\"cautions\"", StringComparison.Ordinal), $"the page did not load; chromium said:\n{stderr}");
        Assert.Contains("<title>Post-mortem: ", dom, StringComparison.Ordinal);
        Assert.Contains("</html>", dom, StringComparison.Ordinal);
        Assert.Equal(DescentOps.Reports.Plotting.ReportPlots.Default.Count, CountOf(dom, "<svg "));
    }

    /// <summary>Without this, a change in Chromium's logging could make the check above pass on anything.</summary>
    [ChromiumFact]
    public async Task The_check_catches_a_page_that_logs_a_console_error()
    {
        var page = logs.File("console-error.html");
        await File.WriteAllTextAsync(page, "<!DOCTYPE html><html><head><title>canary</title></head><body><script>console.error('canary error'); missingFunction();</script></body></html>");
        var (_, console, _) = await HeadlessChromium.DumpDomAsync(page);
        Assert.Contains(console, l => l.Contains("canary error", StringComparison.Ordinal));
        Assert.Contains(console, l => l.Contains("missingFunction", StringComparison.Ordinal));
    }

    private static int CountOf(string text, string part)
    {
        var count = 0;
        for (var at = text.IndexOf(part, StringComparison.Ordinal); at >= 0; at = text.IndexOf(part, at + part.Length, StringComparison.Ordinal)) count++;
        return count;
    }
}
