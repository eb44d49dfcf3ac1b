using System.CommandLine;
using System.Globalization;
using DescentOps.Primitives.Units;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// An option carrying a logarithmic level or ratio ("-11", "-11 dBm", "3 dB"). The unit table has no levels
/// (dB re 1 µPa, dBi are references, not units), so the number is read strictly and the unit, if written, must be
/// the one the option expects: "3 dB" for a power in dBm would be a slip, and is refused.
/// </summary>
internal sealed class LevelOption
{
    private readonly double? _default;

    private LevelOption(string name, string unit, string description, bool required, double? defaultValue)
    {
        Name = name;
        Unit = unit;
        _default = defaultValue;
        var suffix = defaultValue is null ? "" : string.Create(CultureInfo.InvariantCulture, $" Default: {defaultValue.Value:R} {unit}.");
        Option = new Option<string?>(name) { Description = $"{description} In {unit}.{suffix}", Required = required, HelpName = unit };
    }

    public string Name { get; }

    public string Unit { get; }

    public Option<string?> Option { get; }

    public static LevelOption WithDefault(string name, string unit, string description, double defaultValue) =>
        new(name, unit, description, false, defaultValue);

    public static LevelOption NotRequired(string name, string unit, string description) =>
        new(name, unit, description, false, null);

    /// <summary>The value, the default, or null when the option has neither.</summary>
    public double? Optional(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        var text = parse.GetValue(Option);
        if (text is null) return _default;
        var number = text.Trim();
        if (number.EndsWith(Unit, StringComparison.Ordinal)) number = number[..^Unit.Length].TrimEnd();
        if (!StrictNumber.TryParse(number, out var value, out var error))
        {
            throw new UsageException($"{Name}: '{text}' is not a level in {Unit} (write e.g. '-11 {Unit}' or '-11'): {error}");
        }

        return value;
    }

    public double Value(ParseResult parse) => Optional(parse) ?? throw new UsageException($"{Name} is required.");
}
