using DescentOps.Cli;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>
/// Runs the command line in this process, as <c>Program</c> does, with stdout, stderr and the working folder of its
/// own. Console and working folder are process-wide, so the tests that use it run one at a time.
/// </summary>
internal static class InProcessCli
{
    private static readonly SemaphoreSlim OneAtATime = new(1, 1);

    public static async Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(string workingDirectory, params string[] arguments)
    {
        await OneAtATime.WaitAsync();
        var (oldOut, oldError, oldDirectory) = (Console.Out, Console.Error, Environment.CurrentDirectory);
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();
        try
        {
            Console.SetOut(stdout);
            Console.SetError(stderr);
            Environment.CurrentDirectory = workingDirectory;
            var exit = await CliApp.InvokeAsync(arguments);
            return (exit, stdout.ToString(), stderr.ToString());
        }
        finally
        {
            Console.SetOut(oldOut);
            Console.SetError(oldError);
            Environment.CurrentDirectory = oldDirectory;
            OneAtATime.Release();
        }
    }
}

/// <summary>The tests that swap the console and the working folder; xunit runs them apart from the others.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class InProcessCliCollection
{
    public const string Name = "command line in process";
}
