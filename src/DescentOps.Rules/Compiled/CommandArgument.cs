namespace DescentOps.Rules.Compiled;

/// <summary>One argument of a command: a quantity in SI (ValueSi) or a word (Word); exactly one is set.</summary>
public sealed record CommandArgument(string Name, double? ValueSi, string? Word)
{
    public override string ToString() =>
        ValueSi is { } value ? $"{Name}={value.ToString("R", System.Globalization.CultureInfo.InvariantCulture)}" : $"{Name}={Word}";
}
