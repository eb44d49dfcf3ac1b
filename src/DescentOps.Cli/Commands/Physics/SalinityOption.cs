using System.CommandLine;
using DescentOps.Primitives.Units;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// A seawater salinity option. The UNESCO/EOS-80 formulas take practical salinity (PSS-78, dimensionless), so a bare
/// number or "35 psu" is practical salinity. A mass fraction ("35 g/kg", "3.5 %") is taken as Reference-Composition
/// Absolute Salinity S_R and converted with the TEOS-10 reference ratio S_P = S_R · 35 / 35.16504 (no regional
/// anomaly: an ocean of other salts than terrestrial sea salt is outside every formula here anyway).
/// </summary>
internal sealed class SalinityOption
{
    /// <summary>S_R / S_P of reference-composition seawater, g/kg (TEOS-10, Millero et al. 2008).</summary>
    public const double ReferenceSalinityRatioGPerKg = 35.16504 / 35.0;

    public SalinityOption(string name, string description)
    {
        Name = name;
        Option = new Option<string?>(name)
        {
            Description = description + " Practical salinity: a bare number or 'psu'; 'g/kg' or '%' is taken as reference-composition absolute salinity and converted, S_P = S_R·35/35.16504.",
            Required = true,
            HelpName = "salinity",
        };
    }

    public string Name { get; }

    public Option<string?> Option { get; }

    /// <summary>Practical salinity.</summary>
    public double PracticalSalinity(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        var text = (parse.GetValue(Option) ?? throw new UsageException($"{Name} is required.")).Trim();
        var number = text.EndsWith("psu", StringComparison.Ordinal) ? text[..^3].TrimEnd() : text;
        if (StrictNumber.TryParse(number, out var practical, out _))
        {
            return practical;
        }

        if (QuantityParser.TryParseSi(QuantityKind.MassFraction, text, out var kgPerKg, out var error))
        {
            return kgPerKg * 1000.0 / ReferenceSalinityRatioGPerKg;
        }

        throw new UsageException($"{Name}: '{text}' is not a salinity (write e.g. '35', '35 psu' or '35.2 g/kg'): {error}");
    }
}
