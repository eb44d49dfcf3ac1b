using System.Reflection;

namespace DescentOps.Reports.Html;

/// <summary>
/// The @font-face rules that give the page the very DejaVu Sans files the plots were laid out with (embedded in
/// this assembly), as data URIs: the SVG text then renders in those glyphs on any machine, with or without the
/// font installed, and ScottPlot's measured widths match what the reader sees.
/// </summary>
internal static class EmbeddedFontFaces
{
    private static readonly Lazy<string> Rules = new(Build, LazyThreadSafetyMode.ExecutionAndPublication);

    public static string Css => Rules.Value;

    private static string Build() =>
        Face("DejaVuSans.ttf", "normal") + Face("DejaVuSans-Bold.ttf", "bold");

    private static string Face(string file, string weight)
    {
        var name = "DescentOps.Reports.Fonts." + file;
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"The font resource {name} is missing from the build.");
        using var copy = new MemoryStream();
        stream.CopyTo(copy);
        return $"@font-face {{ font-family: \"{Plotting.PlotFonts.Family}\"; font-weight: {weight}; font-style: normal; src: url(data:font/ttf;base64,{Convert.ToBase64String(copy.GetBuffer(), 0, (int)copy.Length)}) format(\"truetype\"); }}\n";
    }
}
