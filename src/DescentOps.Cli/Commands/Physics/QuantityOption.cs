using System.CommandLine;
using System.Globalization;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// A command-line option that carries a physical quantity with its unit ("250K", "0.1MPa", "12 cm"), read with the
/// same parser as scenario files. A missing, unparseable or wrong-dimension value is a usage error naming the option.
/// </summary>
internal sealed class QuantityOption
{
    private readonly double? _defaultSi;

    private QuantityOption(string name, QuantityKind kind, string description, bool required, double? defaultSi, string? defaultText)
    {
        Name = name;
        Kind = kind;
        _defaultSi = defaultSi;
        var units = $" Units: {kind.ExampleUnits()}.";
        var suffix = defaultSi is null ? "" : $" Default: {defaultText ?? defaultSi.Value.ToString("R", CultureInfo.InvariantCulture) + " " + kind.SiSymbol()}.";
        Option = new Option<string?>(name)
        {
            Description = description + units + suffix,
            Required = required,
            HelpName = kind.ToString().ToLowerInvariant(),
        };
    }

    /// <summary>An option that must be given.</summary>
    public static QuantityOption Required(string name, QuantityKind kind, string description) =>
        new(name, kind, description, true, null, null);

    /// <summary>An option with a documented default, given in SI and as help should read it.</summary>
    public static QuantityOption WithDefault(string name, QuantityKind kind, string description, double defaultSi, string? defaultText = null) =>
        new(name, kind, description, false, defaultSi, defaultText);

    /// <summary>An option whose absence means "not asked for" (see <see cref="Optional"/>).</summary>
    public static QuantityOption NotRequired(string name, QuantityKind kind, string description) =>
        new(name, kind, description, false, null, null);

    public string Name { get; }

    public QuantityKind Kind { get; }

    public Option<string?> Option { get; }

    /// <summary>The value in SI units, or the default when the option was not given.</summary>
    public double Value(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        var text = parse.GetValue(Option);
        if (text is null)
        {
            return _defaultSi ?? throw new UsageException($"{Name} is required.");
        }

        if (!QuantityParser.TryParseSi(Kind, text, out var value, out var error))
        {
            throw new UsageException($"{Name}: {error}");
        }

        // The parser reads "-5 K" as a number like any other; no temperature model can take it, so say so here, naming the option.
        if (Kind == QuantityKind.Temperature && value <= 0)
        {
            throw new UsageException(string.Create(CultureInfo.InvariantCulture, $"{Name}: {value:R} K is at or below absolute zero; a thermodynamic temperature must be positive."));
        }

        return value;
    }

    /// <summary>The value in SI units, or null when the option was not given (for options with no default).</summary>
    public double? Optional(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        return parse.GetValue(Option) is null && _defaultSi is null ? null : Value(parse);
    }
}
