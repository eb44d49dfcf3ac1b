using System.Globalization;

namespace DescentOps.Primitives.Units;

/// <summary>
/// Reads a decimal number the one way every input of the tool writes it: an optional sign, digits with at most one
/// '.' as the decimal point, and an optional exponent ("12", "-0.5", ".25", "6.1e8"). Nothing else: a comma is
/// refused because "1,5" is one and a half to some readers and fifteen to others, digit grouping ("1 500", "1_500",
/// "1'500") because it hides a misplaced separator, and NaN, infinities and values beyond the double range because
/// no physical input is one of them.
/// </summary>
public static class StrictNumber
{
    /// <summary>The length of the number at the start of <paramref name="text"/> (0 when there is none).</summary>
    public static int Length(ReadOnlySpan<char> text)
    {
        var i = 0;
        if (i < text.Length && text[i] is '+' or '-') i++;
        var digits = 0;
        while (i < text.Length && char.IsAsciiDigit(text[i])) { i++; digits++; }
        if (i < text.Length && text[i] == '.')
        {
            i++;
            while (i < text.Length && char.IsAsciiDigit(text[i])) { i++; digits++; }
        }

        if (digits == 0) return 0;
        if (i < text.Length && text[i] is 'e' or 'E')
        {
            var j = i + 1;
            if (j < text.Length && text[j] is '+' or '-') j++;
            var exponentDigits = 0;
            while (j < text.Length && char.IsAsciiDigit(text[j])) { j++; exponentDigits++; }
            if (exponentDigits > 0) i = j;
        }

        return i;
    }

    /// <summary>Reads all of <paramref name="text"/> as one number; the error says why it is not one.</summary>
    public static bool TryParse(string text, out double value, out string error)
    {
        var trimmed = text.Trim();
        var length = Length(trimmed);
        if (length == 0 || length != trimmed.Length)
        {
            value = double.NaN;
            error = WhyNot(trimmed, length) ?? $"'{trimmed}' is not a number";
            return false;
        }

        return TryConvert(trimmed, out value, out error);
    }

    /// <summary>Converts a span that <see cref="Length"/> accepted whole; refuses what overflows the double range.</summary>
    public static bool TryConvert(ReadOnlySpan<char> number, out double value, out string error)
    {
        value = double.Parse(number, NumberStyles.Float, CultureInfo.InvariantCulture);
        if (double.IsFinite(value))
        {
            error = "";
            return true;
        }

        error = $"'{number}' is too large: numbers must lie within ±1.8e308";
        value = double.NaN;
        return false;
    }

    /// <summary>
    /// Why <paramref name="text"/>, whose first <paramref name="length"/> characters are a number, does not read as
    /// one: a separator inside it, or a word for a non-finite value. Null when nothing specific is wrong.
    /// </summary>
    public static string? WhyNot(string text, int length)
    {
        var body = text.TrimStart('+', '-');
        if (body.StartsWith("nan", StringComparison.OrdinalIgnoreCase) || body.StartsWith(".nan", StringComparison.OrdinalIgnoreCase)
            || body.StartsWith("inf", StringComparison.OrdinalIgnoreCase) || body.StartsWith(".inf", StringComparison.OrdinalIgnoreCase)
            || body.StartsWith('∞'))
        {
            return $"'{text}' is not a finite number: NaN and infinities are not accepted";
        }

        if (length == 0 || length >= text.Length) return null;
        var next = text[length];
        var afterNext = length + 1 < text.Length ? text[length + 1] : '\0';
        if (next == ',' && char.IsAsciiDigit(afterNext))
        {
            return $"'{text}': a comma is not accepted in a number (it reads as a decimal comma to some and as digit grouping to others); write the decimal point as '.' and no grouping, e.g. 1.5 or 1500";
        }

        if (next is '_' or '\'' or '\u00A0' or '\u202F' && char.IsAsciiDigit(afterNext))
        {
            return $"'{text}': digit grouping is not accepted in a number; write the digits together, e.g. 1500";
        }

        if (next == ' ' && IsGroupAfterSpace(text, length))
        {
            return $"'{text}': digit grouping is not accepted in a number; write the digits together, e.g. 1500";
        }

        if (next == '.' && char.IsAsciiDigit(afterNext))
        {
            return $"'{text}': a number has at most one decimal point, and no '.' grouping";
        }

        return null;
    }

    /// <summary>"1 500 m": after the number and its spaces comes another digit, which no unit starts with.</summary>
    private static bool IsGroupAfterSpace(string text, int length)
    {
        var i = length;
        while (i < text.Length && text[i] == ' ') i++;
        return i < text.Length && char.IsAsciiDigit(text[i]);
    }
}
