using System.Reflection;
using ScottPlot;
using SkiaSharp;

namespace DescentOps.Reports.Plotting;

/// <summary>
/// Makes ScottPlot draw with the DejaVu Sans files embedded in this assembly, whatever fonts the machine has,
/// and fails loudly when that cannot be done. ScottPlot's font settings are process-wide, so this is set once.
/// </summary>
public static class PlotFonts
{
    /// <summary>The family the SVGs name; the report's style sheet lists fallbacks for viewers without it.</summary>
    public const string Family = "DejaVu Sans";

    private static readonly Lazy<EmbeddedFontResolver> Resolver = new(Install, LazyThreadSafetyMode.ExecutionAndPublication);

    /// <summary>Installs the embedded fonts (once) and checks that ScottPlot resolves them.</summary>
    /// <exception cref="InvalidOperationException">The fonts are missing from the assembly or cannot be loaded.</exception>
    public static void Ensure() => _ = Resolver.Value;

    private static EmbeddedFontResolver Install()
    {
        var resolver = new EmbeddedFontResolver(Family, Load("DejaVuSans.ttf"), Load("DejaVuSans-Bold.ttf"));
        Fonts.FontResolvers.Insert(0, resolver);
        Fonts.Default = Family;
        Fonts.Sans = Family;
        var check = Fonts.GetTypeface(Family, bold: false, italic: false);
        if (check is null || !string.Equals(check.FamilyName, Family, StringComparison.Ordinal))
        {
            throw new InvalidOperationException($"ScottPlot does not resolve the embedded font '{Family}' (got '{check?.FamilyName}'); plots would have no text.");
        }

        return resolver;
    }

    private static SKTypeface Load(string file)
    {
        var name = "DescentOps.Reports.Fonts." + file;
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"The font resource {name} is missing from the build; plots would have no text.");
        using var copy = new MemoryStream();
        stream.CopyTo(copy);
        using var data = SKData.CreateCopy(copy.ToArray());
        return SKTypeface.FromData(data)
            ?? throw new InvalidOperationException($"The font resource {name} is not a font Skia can read; plots would have no text.");
    }
}
