using System.CommandLine;
using DescentOps.Cli.Commands;
using DescentOps.Cli.Files;
using DescentOps.Cli.Output;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Cli;

/// <summary>
/// The whole command line: the commands, and the one mapping from failures to messages and exit codes (see
/// <see cref="ExitCode"/>). <c>Program</c> calls it; tests call it in process.
/// </summary>
public static class CliApp
{
    public static RootCommand Root() => new("DescentOps: rehearse melt-probe missions against physics, inject faults, and keep a verifiable log of every run.")
    {
        RunCommand.Create(),
        VerifyCommand.Create(),
        ReplayCommand.Create(),
        BranchCommand.Create(),
        DiffCommand.Create(),
        EventsCommand.Create(),
        CheckCommand.Create(),
        ReportCommand.Create(),
        ExportCommand.Create(),
        ScenariosCommand.Create(),
        RehearseCommand.Create(),
        SchemaCommand.Create(),
        CampaignCommand.Create(),
        Commands.Physics.PhysicsCommand.Create(),
    };

    public static async Task<int> RunAsync(string[] args)
    {
        try
        {
            var parse = Root().Parse(args);
            if (parse.Errors.Count > 0)
            {
                foreach (var error in parse.Errors) Console.Error.WriteLine($"descentops: {ParseErrorText.Clean(error.Message)}");
                Console.Error.WriteLine("Try 'descentops --help'.");
                return (int)ExitCode.UsageError;
            }

            // No termination timeout: commands that can stop cleanly watch Ctrl-C and SIGTERM themselves
            // (Terminal.Interruption); the others end at the signal, as any tool does.
            return await parse.InvokeAsync(new InvocationConfiguration { EnableDefaultExceptionHandler = false, ProcessTerminationTimeout = null }).ConfigureAwait(false);
        }
        catch (ScenarioException exception)
        {
            foreach (var error in exception.Errors) Console.Error.WriteLine($"error: {error}");
            return (int)ExitCode.InvalidInput;
        }
        catch (LogIntegrityException exception)
        {
            Console.Error.WriteLine($"descentops: {exception.Message}");
            return (int)ExitCode.VerificationFailed;
        }
        catch (InvalidDataException exception)
        {
            // A file that is not a journal, or one damaged in a way the reader cannot step over: bad input, not a defect.
            Console.Error.WriteLine($"descentops: not a readable event log: {exception.Message}");
            return (int)ExitCode.InvalidInput;
        }
        catch (OutputRefusedException exception)
        {
            Console.Error.WriteLine($"descentops: {exception.Message}");
            return (int)ExitCode.OutputRefused;
        }
        catch (UsageException exception)
        {
            Console.Error.WriteLine($"descentops: {exception.Message}");
            return (int)ExitCode.UsageError;
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            Console.Error.WriteLine($"descentops: {exception.Message}");
            return (int)ExitCode.IoError;
        }
#pragma warning disable CA1031 // The last line of defence: no stack trace reaches the user, but the defect is named.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            Console.Error.WriteLine($"descentops: internal error ({exception.GetType().Name}): {exception.Message}");
            Console.Error.WriteLine("This is a defect in DescentOps; please report it with the command line and scenario.");
            return (int)ExitCode.InternalError;
        }
    }
}
