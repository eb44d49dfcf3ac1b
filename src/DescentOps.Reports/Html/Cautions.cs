using System.Reflection;

namespace DescentOps.Reports.Html;

/// <summary>
/// The text every report must carry: one copy, embedded from <c>Cautions.txt</c>, which a test holds equal to
/// the README's "Cautions" section so the two cannot drift apart.
/// </summary>
public static class Cautions
{
    private static readonly Lazy<string> Source = new(Load);

    /// <summary>The embedded text as written, paragraphs separated by blank lines.</summary>
    public static string Text => Source.Value;

    /// <summary>The paragraphs, each on one line (the source's line breaks are only wrapping).</summary>
    public static IReadOnlyList<string> Paragraphs =>
        Text.Replace("\r\n", "\n", StringComparison.Ordinal)
            .Split("\n\n", StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            .Select(p => string.Join(' ', p.Split('\n', StringSplitOptions.TrimEntries)))
            .ToList();

    private static string Load()
    {
        const string name = "DescentOps.Reports.Cautions.txt";
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"The resource {name} is missing from the build.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
