namespace DescentOps.Reports;

/// <summary>
/// Writes a file under a temporary name beside its target and renames it when complete, so that a reader never
/// sees half a report or export, and a failed write leaves the previous file as it was.
/// </summary>
public static class AtomicFile
{
    public const string PartialSuffix = ".partial";

    /// <summary>Runs <paramref name="write"/> on the temporary path, then moves it over <paramref name="path"/>.</summary>
    /// <param name="path">The final file.</param>
    /// <param name="write">Writes the whole content to the path it is given.</param>
    /// <param name="startFromExisting">Copy the current file first (for a database that receives one more run).</param>
    public static void Write(string path, Action<string> write, bool startFromExisting = false)
    {
        ArgumentNullException.ThrowIfNull(write);
        var full = Path.GetFullPath(path);
        var directory = Path.GetDirectoryName(full);
        if (!string.IsNullOrEmpty(directory)) Directory.CreateDirectory(directory);
        // A temporary name of its own, drawn at random: not a fixed name where a link could be planted in advance,
        // and never another writer's temporary file.
        var partial = $"{full}.{Convert.ToHexStringLower(System.Security.Cryptography.RandomNumberGenerator.GetBytes(8))}{PartialSuffix}";

        try
        {
            if (startFromExisting && File.Exists(full)) File.Copy(full, partial, overwrite: true);
            write(partial);
            File.Move(partial, full, overwrite: true);
        }
        catch
        {
            File.Delete(partial);
            throw;
        }
    }
}
