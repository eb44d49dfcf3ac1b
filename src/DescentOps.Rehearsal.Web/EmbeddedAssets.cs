using System.Reflection;

namespace DescentOps.Rehearsal.Web;

/// <summary>The pages, scripts, styles and charting library compiled into the tool.</summary>
public static class EmbeddedAssets
{
    private static readonly Assembly Here = typeof(EmbeddedAssets).Assembly;

    public static IReadOnlyList<string> Names { get; } =
        [.. Here.GetManifestResourceNames().Where(n => n.StartsWith("assets/", StringComparison.Ordinal)).Select(n => n["assets/".Length..])];

    public static byte[]? Read(string name)
    {
        if (!Names.Contains(name)) return null;
        using var stream = Here.GetManifestResourceStream("assets/" + name)!;
        using var copy = new MemoryStream();
        stream.CopyTo(copy);
        return copy.ToArray();
    }

    public static string ContentType(string name) => Path.GetExtension(name) switch
    {
        ".html" => "text/html; charset=utf-8",
        ".js" => "text/javascript; charset=utf-8",
        ".css" => "text/css; charset=utf-8",
        _ => "text/plain; charset=utf-8",
    };
}
