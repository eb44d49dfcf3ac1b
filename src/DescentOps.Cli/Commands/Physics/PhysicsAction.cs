using System.CommandLine;
using DescentOps.Physics;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// Runs one physics subcommand: computes its report, prints it as a table or JSON, and turns a model's refusal
/// (<see cref="ArgumentOutOfRangeException"/>, whose message names the quantity and its valid range) into one
/// line on stderr and <see cref="ExitCode.InvalidInput"/>, with no stack trace.
/// </summary>
internal static class PhysicsAction
{
    public static Option<bool> JsonOption() => new("--json") { Description = "Print exactly one JSON object (snake_case names, SI units) instead of the table." };

    /// <param name="subcommand">Name used in the error line.</param>
    /// <param name="parse">The parsed command line.</param>
    /// <param name="json">The subcommand's --json option.</param>
    /// <param name="compute">Reads the options and evaluates the models.</param>
    /// <param name="optionsByParameter">Physics parameter names mapped to the options that feed them, so a refusal names the option too.</param>
    public static int Run(string subcommand, ParseResult parse, Option<bool> json, Func<ParseResult, PhysicsReport> compute, ParameterOptions? optionsByParameter = null)
    {
        ArgumentNullException.ThrowIfNull(parse);
        ArgumentNullException.ThrowIfNull(compute);
        PhysicsReport report;
        try
        {
            report = compute(parse);
        }
        catch (ArgumentOutOfRangeException exception)
        {
            Console.Error.WriteLine($"descentops physics {subcommand}: {Describe(exception, optionsByParameter)}");
            return (int)ExitCode.InvalidInput;
        }

        report.Write(Console.Out, parse.GetValue(json));
        return (int)ExitCode.Ok;
    }

    /// <summary>The model's own sentence, without the runtime's "(Parameter 'x')" and "Actual value was" additions.</summary>
    internal static string Describe(ArgumentOutOfRangeException exception, ParameterOptions? optionsByParameter)
    {
        if (exception is ModelRangeException refusal)
        {
            // The range is data: the sentence is formatted from it, and the option is found by the quantity's name.
            return optionsByParameter is not null && optionsByParameter.TryGetOption(refusal.Range.Quantity, out var named)
                ? $"{named}: {refusal.Sentence}"
                : refusal.Sentence;
        }

        var message = exception.Message.Split('\n')[0].TrimEnd('\r');
        var marker = message.LastIndexOf(" (Parameter '", StringComparison.Ordinal);
        if (marker >= 0) message = message[..marker];
        if (exception.ParamName is { } parameter && optionsByParameter is not null && optionsByParameter.TryGetOption(parameter, out var option))
        {
            return $"{option}: {message}";
        }

        return message;
    }
}
