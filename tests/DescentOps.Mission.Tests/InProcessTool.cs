using DescentOps.Cli;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests;

/// <summary>
/// Runs the descentops command line in this process through <see cref="CliApp.RunAsync"/>: the same parsing, commands
/// and exit codes as the executable, without starting a runtime per call. The console and the working directory are
/// process-wide, so calls take turns; a test that needs a real process (a kill, a separate runtime) uses
/// <see cref="ToolProcess"/>.
/// </summary>
internal static class InProcessTool
{
    public static Task<(int ExitCode, string Stdout, string Stderr)> RunAsync(string workingDirectory, params string[] arguments) =>
        InProcessCli.RunInAsync(workingDirectory, arguments);
}
