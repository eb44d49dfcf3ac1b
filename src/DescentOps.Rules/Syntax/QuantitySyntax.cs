using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>A number as written with its unit text (empty when none); the checker converts it to SI.</summary>
public sealed record QuantitySyntax(double Number, string Unit, SourceLocation Location, SourceLocation UnitLocation)
{
    public bool HasUnit => Unit.Length > 0;

    public override string ToString() =>
        HasUnit ? $"{Number.ToString("R", System.Globalization.CultureInfo.InvariantCulture)} {Unit}" : Number.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
}
