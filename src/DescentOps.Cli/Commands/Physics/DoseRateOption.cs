using System.CommandLine;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// An absorbed-dose-rate option such as "0.5 Gy/d", "20 mrad/h" or "1e-6 Gy/s", read by the shared parser that
/// scenario files use.
/// </summary>
internal sealed class DoseRateOption(string name, string description)
{
    public string Name { get; } = name;

    public Option<string?> Option { get; } = new(name)
    {
        Description = description + " Units: a dose over a duration, e.g. Gy/s, mGy/h, krad/yr.",
        Required = true,
        HelpName = "dose-rate",
    };

    /// <summary>Gy/s.</summary>
    public double Value(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        var text = (parse.GetValue(Option) ?? throw new UsageException($"{Name} is required.")).Trim();
        if (QuantityParser.TryParseSi(QuantityKind.AbsorbedDoseRate, text, out var gyPerS, out _)) return gyPerS;

        throw new UsageException($"{Name}: '{text}' is not a dose rate (write e.g. '0.5 Gy/d' or '20 mrad/h')");
    }
}
