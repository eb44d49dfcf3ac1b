namespace DescentOps.Journal.Tests;

/// <summary>
/// What a file journal must never do to files around it: write through a symbolic link planted at its temporary
/// name, share a temporary file with another run aimed at the same path, delete an earlier crashed run's partial
/// log, or replace a finished log it was told to keep.
/// </summary>
public sealed class JournalFileSafetyTests
{
    [Fact]
    public void A_symbolic_link_at_the_old_temporary_name_is_not_followed()
    {
        using var directory = new TemporaryDirectory();
        var finalPath = directory.File("run.jsonl");
        var victim = directory.File("victim.txt");
        File.WriteAllText(victim, "precious\n");
        File.CreateSymbolicLink(finalPath + JournalWriter.PartialSuffix, victim);

        using (var writer = JournalWriter.Create(finalPath, JournalSamples.Manifest()))
        {
            writer.Complete(JournalSamples.Summary());
        }

        Assert.Equal("precious\n", File.ReadAllText(victim));
        Assert.True(JournalVerifier.Verify(finalPath).Ok);
    }

    [Fact]
    public void An_earlier_crashed_runs_partial_log_is_left_alone()
    {
        using var directory = new TemporaryDirectory();
        var finalPath = directory.File("run.jsonl");
        var crashed = finalPath + JournalWriter.PartialSuffix;
        File.WriteAllText(crashed, "evidence of a crash\n");

        using (var writer = JournalWriter.Create(finalPath, JournalSamples.Manifest()))
        {
            writer.Abandon();
        }

        Assert.Equal("evidence of a crash\n", File.ReadAllText(crashed));
    }

    [Fact]
    public void Two_runs_to_one_path_write_two_files_and_the_second_may_not_replace_the_first()
    {
        using var directory = new TemporaryDirectory();
        var finalPath = directory.File("run.jsonl");
        using var first = JournalWriter.Create(finalPath, JournalSamples.Manifest(), replaceExisting: false);
        using var second = JournalWriter.Create(finalPath, JournalSamples.Manifest(), replaceExisting: false);
        Assert.NotEqual(first.PartialPath, second.PartialPath);
        foreach (var record in JournalSamples.Events(3)) first.Write(record);
        foreach (var record in JournalSamples.Events(5)) second.Write(record);

        first.Complete(JournalSamples.Summary());
        Assert.Throws<IOException>(() => second.Complete(JournalSamples.Summary()));

        // The first run's log is whole under the final name, the second's whole under its own temporary name.
        Assert.Equal(5, JournalVerifier.Verify(finalPath).LinesChecked); // manifest, 3 events, summary
        var kept = JournalVerifier.Verify(second.PartialPath!);
        Assert.True(kept.Ok);
        Assert.Equal(7, kept.LinesChecked); // manifest, 5 events, summary
    }
}
