using DescentOps.Cli;

namespace DescentOps.Tests.Shared;

/// <summary>
/// Runs the descentops command line in this process through <see cref="CliApp.RunAsync"/>: the same parsing, commands
/// and exit codes as the executable, without starting a runtime per call. The console and the working directory are
/// process-wide, so calls take turns.
/// </summary>
internal static class InProcessCli
{
    private static readonly SemaphoreSlim Turn = new(1, 1);

    /// <summary>Runs the command with its output captured.</summary>
    public static Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(params string[] arguments) => RunInAsync(null, arguments);

    /// <summary>Runs the command from <paramref name="workingDirectory"/> (or the current one) with its output captured.</summary>
    public static async Task<(int ExitCode, string Stdout, string Stderr)> RunInAsync(string? workingDirectory, params string[] arguments)
    {
        await Turn.WaitAsync();
        var (oldOut, oldError, oldDirectory) = (Console.Out, Console.Error, Environment.CurrentDirectory);
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();
        try
        {
            Console.SetOut(stdout);
            Console.SetError(stderr);
            if (workingDirectory is not null) Environment.CurrentDirectory = workingDirectory;
            var exit = await CliApp.RunAsync(arguments);
            return (exit, stdout.ToString(), stderr.ToString());
        }
        finally
        {
            Console.SetOut(oldOut);
            Console.SetError(oldError);
            Environment.CurrentDirectory = oldDirectory;
            Turn.Release();
        }
    }
}
