using DescentOps.Tests.Shared;
namespace DescentOps.Reports.Tests;

/// <summary>Files of the repository the tests run from (the folder holding DescentOps.sln).</summary>
internal static class RepositoryFiles
{
    public static string Root => RepositoryRoot.Path;

    public static string Readme => File.ReadAllText(Path.Combine(Root, "README.md"));

    /// <summary>The text of a "## Heading" section of README, up to the next heading of that level.</summary>
    public static string ReadmeSection(string heading)
    {
        var text = Readme.Replace("\r\n", "\n", StringComparison.Ordinal);
        var start = text.IndexOf("\n## " + heading + "\n", StringComparison.Ordinal);
        Assert.True(start >= 0, $"README has no '## {heading}' section");
        start = text.IndexOf('\n', start + 1) + 1;
        var end = text.IndexOf("\n## ", start, StringComparison.Ordinal);
        return end < 0 ? text[start..] : text[start..end];
    }

    /// <summary>Whitespace runs as single spaces, to compare texts that wrap differently.</summary>
    public static string Normalized(string text) => string.Join(' ', text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries));
}
