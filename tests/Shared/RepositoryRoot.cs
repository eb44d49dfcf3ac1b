namespace DescentOps.Tests.Shared;

/// <summary>The repository the tests run from: the folder above the test binaries that holds DescentOps.sln.</summary>
internal static class RepositoryRoot
{
    private static readonly Lazy<string> Found = new(() =>
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(System.IO.Path.Combine(dir.FullName, "DescentOps.sln"))) return dir.FullName;
        }

        throw new InvalidOperationException("DescentOps.sln not found above the test binaries.");
    });

    /// <summary>The repository's root folder.</summary>
    public static string Path => Found.Value;

    /// <summary>A file's text by its path from the root, with line ends as '\n'.</summary>
    public static string Text(string relativePath) =>
        File.ReadAllText(System.IO.Path.Combine(Path, relativePath)).Replace("\r\n", "\n", StringComparison.Ordinal);
}
