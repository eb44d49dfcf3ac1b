using System.Globalization;
using Microsoft.Extensions.DependencyInjection;
using Serilog;
using Serilog.Events;

namespace DescentOps.Cli.Terminal;

/// <summary>
/// A cluster node's own diagnostics (Akka's and the host's log lines) through Serilog to stderr: warnings and errors
/// always, the cluster's comings and goings with <c>--verbose</c>. What a person running a campaign needs (workers joined
/// and lost, duplicates discarded) is printed as notices, not logged.
/// </summary>
public static class NodeDiagnostics
{
    public static Action<IServiceCollection> Logging(bool verbose) => services =>
    {
        var logger = new LoggerConfiguration()
            .MinimumLevel.Is(verbose ? LogEventLevel.Information : LogEventLevel.Warning)
            .MinimumLevel.Override("Microsoft", LogEventLevel.Warning)
            // A peer that vanished is reported as a notice (worker lost, campaign node gone); Akka's stack trace for it only with --verbose.
            .Filter.ByExcluding(e => !verbose && e.Exception?.GetType().Name == "EndpointDisassociatedException")
            .WriteTo.Console(
                outputTemplate: "{Timestamp:HH:mm:ss} {Level:u3} {SourceContext}: {Message:lj}{NewLine}{Exception}",
                formatProvider: CultureInfo.InvariantCulture,
                standardErrorFromLevel: LogEventLevel.Verbose)
            .CreateLogger();
        services.AddSerilog(logger, dispose: true);
    };

    /// <summary>A notice line on stdout, with the time of day (UTC) it happened.</summary>
    public static void Notice(string text)
    {
        if (!Console.IsErrorRedirected && !Console.IsOutputRedirected) Console.Error.Write("\r" + new string(' ', 120) + "\r"); // off the progress line
        Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {DateTime.UtcNow:HH:mm:ss} {text}"));
    }
}
