using DescentOps.Journal;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>What commands may and may not do to files: inputs are never written, outputs never silently replaced.</summary>
[Collection(InProcessCliCollection.Name)]
public sealed class OutputFileTests
{
    [Fact]
    public async Task A_run_never_writes_over_its_own_scenario_even_with_force()
    {
        var folder = ToolProcess.NewTempDirectory();
        var scenario = Path.Combine(folder, "x.yaml");
        await File.WriteAllTextAsync(scenario, MissionHarness.DefaultText);

        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, "run", "x.yaml", "--until", "1 d", "--log", "x.yaml", "--force");

        Assert.Equal(9, exit); // ExitCode.OutputRefused
        Assert.Contains("input", stderr, StringComparison.Ordinal);
        Assert.Equal(MissionHarness.DefaultText, await File.ReadAllTextAsync(scenario));
    }

    [Fact]
    public async Task An_existing_output_is_refused_unless_forced()
    {
        var folder = ToolProcess.NewTempDirectory();
        var log = Path.Combine(folder, "out.jsonl");
        await File.WriteAllTextAsync(log, "someone's notes\n");

        var (refused, _, stderr) = await InProcessTool.RunAsync(folder, "run", "--until", "1 d", "-o", "out.jsonl");
        Assert.Equal(9, refused);
        Assert.Contains("--force", stderr, StringComparison.Ordinal);
        Assert.Equal("someone's notes\n", await File.ReadAllTextAsync(log));

        var (forced, _, _) = await InProcessTool.RunAsync(folder, "run", "--until", "1 d", "-o", "out.jsonl", "--force");
        Assert.Equal(4, forced); // stopped by its time limit
        Assert.True(JournalVerifier.Verify(log).Ok);
    }

    [Fact]
    public async Task Two_runs_of_the_same_scenario_and_seed_keep_both_logs()
    {
        var folder = ToolProcess.NewTempDirectory();
        await InProcessTool.RunAsync(folder, "run", "--until", "1 d");
        await InProcessTool.RunAsync(folder, "run", "--until", "2 d");

        var logs = Directory.GetFiles(Path.Combine(folder, "logs")).Select(f => Path.GetFileName(f)!).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(["longfall-tarn-flats-seed20261202-2.jsonl", "longfall-tarn-flats-seed20261202.jsonl"], logs);
        // The first log is the one-day run, untouched by the second.
        Assert.Contains("\"final_t\":86400", File.ReadLines(Path.Combine(folder, "logs", "longfall-tarn-flats-seed20261202.jsonl")).Last(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_refused_run_creates_no_folder_and_leaves_an_earlier_partial_log_alone()
    {
        var folder = ToolProcess.NewTempDirectory();
        // Loads, then cannot be assembled: the conductive lid needs a base colder than the surface (a scenario
        // check may come to refuse it earlier; either way the run must create nothing).
        var scenario = Path.Combine(folder, "warm.yaml");
        await File.WriteAllTextAsync(scenario, System.Text.RegularExpressions.Regex.Replace(MissionHarness.DefaultText, "surface_temperature: .*", "surface_temperature: 273.15 K"));
        Directory.CreateDirectory(Path.Combine(folder, "keep"));
        var crashed = Path.Combine(folder, "keep", "w.jsonl" + JournalWriter.PartialSuffix);
        await File.WriteAllTextAsync(crashed, "an earlier crashed run\n");

        var (intoNewFolder, _, _) = await InProcessTool.RunAsync(folder, "run", "warm.yaml", "-o", Path.Combine("new", "w.jsonl"));
        var (besidePartial, _, _) = await InProcessTool.RunAsync(folder, "run", "warm.yaml", "-o", Path.Combine("keep", "w.jsonl"));

        Assert.NotEqual(0, intoNewFolder);
        Assert.NotEqual(0, besidePartial);
        Assert.False(Directory.Exists(Path.Combine(folder, "new")));
        Assert.Equal(["w.jsonl" + JournalWriter.PartialSuffix], Directory.GetFiles(Path.Combine(folder, "keep")).Select(f => Path.GetFileName(f)!));
        Assert.Equal("an earlier crashed run\n", await File.ReadAllTextAsync(crashed));
    }

    [Fact]
    public async Task A_report_is_not_written_over_an_existing_file_or_its_own_log()
    {
        var folder = ToolProcess.NewTempDirectory();
        await InProcessTool.RunAsync(folder, "run", "--until", "1 d", "-o", "a.jsonl");
        var log = Path.Combine(folder, "a.jsonl");
        var before = await File.ReadAllBytesAsync(log);

        var (ontoLog, _, _) = await InProcessTool.RunAsync(folder, "report", "a.jsonl", "-o", "a.jsonl", "--force");
        await File.WriteAllTextAsync(Path.Combine(folder, "a.html"), "kept\n");
        var (ontoOther, _, _) = await InProcessTool.RunAsync(folder, "report", "a.jsonl");

        Assert.Equal(9, ontoLog);
        Assert.Equal(9, ontoOther);
        Assert.Equal(before, await File.ReadAllBytesAsync(log));
        Assert.Equal("kept\n", await File.ReadAllTextAsync(Path.Combine(folder, "a.html")));
    }
}
