using System.Text;

namespace DescentOps.Reports;

/// <summary>Internal keys (regime names, component ids, outcome kinds) as a reader would write them.</summary>
public static class HumanText
{
    /// <summary><c>AtOcean</c> → <c>at ocean</c>, <c>FrozenIn</c> → <c>frozen in</c>.</summary>
    public static string Words(string key)
    {
        ArgumentNullException.ThrowIfNull(key);
        var text = new StringBuilder(key.Length + 4);
        for (var i = 0; i < key.Length; i++)
        {
            var c = key[i];
            if (c is '_' or '.') { text.Append(' '); continue; }
            if (char.IsUpper(c) && i > 0 && !char.IsUpper(key[i - 1]) && key[i - 1] != ' ') text.Append(' ');
            text.Append(char.ToLowerInvariant(c));
        }

        return text.ToString();
    }

    /// <summary>An outcome kind as the start of a sentence: <c>MissionLost</c> → <c>Mission lost</c>.</summary>
    public static string Sentence(string key)
    {
        var words = Words(key);
        return words.Length == 0 ? words : char.ToUpperInvariant(words[0]) + words[1..];
    }

    /// <summary>A component id without its kind prefix: <c>vehicle-wisp-1</c> → <c>wisp-1</c>.</summary>
    public static string Source(string source)
    {
        ArgumentNullException.ThrowIfNull(source);
        return source.StartsWith("vehicle-", StringComparison.Ordinal) && source.Length > 8 ? source[8..] : source;
    }
}
