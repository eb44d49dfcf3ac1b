namespace DescentOps.Cli.Files;

/// <summary>
/// The one rule for every file a command writes: never an input of the same command, never an existing file
/// unless the user said <c>--force</c>, and a fresh name when the user named none.
/// </summary>
public static class OutputPaths
{
    /// <summary>
    /// Checks that <paramref name="path"/> may be written and returns its full path. Refusals are
    /// <see cref="OutputRefusedException"/> (exit code <see cref="ExitCode.OutputRefused"/>); nothing is created.
    /// </summary>
    /// <param name="path">The output as the user gave it (or as the default was made).</param>
    /// <param name="force">Whether an existing output may be replaced (never an input).</param>
    /// <param name="inputs">Every file the command reads.</param>
    public static string Claim(string path, bool force, params IEnumerable<string?> inputs)
    {
        var full = Path.GetFullPath(path);
        foreach (var input in inputs)
        {
            if (input is not null && SameFile(full, input))
            {
                throw new OutputRefusedException($"{path} is also an input of this command; refusing to write over it (name another output).");
            }
        }

        if (Directory.Exists(full))
        {
            throw new OutputRefusedException($"{path} is a folder; name a file.");
        }

        if (!force && (File.Exists(full) || IsLink(full)))
        {
            throw new OutputRefusedException($"{path} exists; refusing to replace it (add --force to replace it, or name another output).");
        }

        return full;
    }

    /// <summary>
    /// The first of <c>stem.ext</c>, <c>stem-2.ext</c>, <c>stem-3.ext</c>... in <paramref name="directory"/> that no
    /// file takes: a default output never replaces an earlier run's.
    /// </summary>
    public static string Fresh(string directory, string stem, string extension)
    {
        var full = Path.GetFullPath(directory);
        for (var n = 1; ; n++)
        {
            var name = n == 1 ? $"{stem}{extension}" : $"{stem}-{n}{extension}";
            var candidate = Path.Combine(full, name);
            if (!File.Exists(candidate) && !Directory.Exists(candidate) && !IsLink(candidate)) return candidate;
        }
    }

    /// <summary>Whether two paths name the same file, through symbolic links and relative parts.</summary>
    public static bool SameFile(string a, string b)
    {
        var comparison = OperatingSystem.IsWindows() || OperatingSystem.IsMacOS() ? StringComparison.OrdinalIgnoreCase : StringComparison.Ordinal;
        return string.Equals(Resolve(a), Resolve(b), comparison);
    }

    private static string Resolve(string path)
    {
        var full = Path.GetFullPath(path);
        try
        {
            // The link itself may point at the input; so may a link among the folders above it.
            var target = new FileInfo(full).ResolveLinkTarget(returnFinalTarget: true);
            if (target is not null) full = target.FullName;
            var directory = Path.GetDirectoryName(full);
            if (directory is not null && Directory.Exists(directory))
            {
                var resolvedDirectory = new DirectoryInfo(directory).ResolveLinkTarget(returnFinalTarget: true)?.FullName ?? directory;
                full = Path.Combine(resolvedDirectory, Path.GetFileName(full));
            }
        }
        catch (IOException)
        {
            // A dangling or looping link: compare the path as written.
        }

        return full;
    }

    private static bool IsLink(string path)
    {
        try
        {
            return new FileInfo(path).LinkTarget is not null;
        }
        catch (IOException)
        {
            return false;
        }
    }
}
