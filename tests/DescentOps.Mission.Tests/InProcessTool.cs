using DescentOps.Cli;

namespace DescentOps.Mission.Tests;

/// <summary>
/// Runs the descentops command line in this process through <see cref="CliApp.RunAsync"/>: the same parsing, commands
/// and exit codes as the executable, without starting a runtime per call. The console and the working directory are
/// process-wide, so calls take turns; a test that needs a real process (a kill, a separate runtime) uses
/// <see cref="ToolProcess"/>.
/// </summary>
internal static class InProcessTool
{
    private static readonly SemaphoreSlim Turn = new(1, 1);

    public static async Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(string workingDirectory, params string[] arguments)
    {
        await Turn.WaitAsync();
        var (oldOut, oldError, oldDirectory) = (Console.Out, Console.Error, Environment.CurrentDirectory);
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();
        try
        {
            Console.SetOut(stdout);
            Console.SetError(stderr);
            Environment.CurrentDirectory = workingDirectory;
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
