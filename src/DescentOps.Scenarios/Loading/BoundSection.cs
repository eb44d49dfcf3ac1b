namespace DescentOps.Scenarios.Loading;

/// <summary>
/// A section of a scenario file after validation against its <see cref="Format.SectionField"/>: values are
/// already in SI units and in range. Reading a field the format does not define is a programming error,
/// and every read is noted so a test can prove the loader uses every field the format offers.
/// </summary>
public sealed class BoundSection
{
    private readonly Dictionary<string, object> _values;
    private readonly ISet<string>? _readPaths;

    private readonly Dictionary<string, SourceLocation> _locations;

    internal BoundSection(string path, SourceLocation location, Dictionary<string, object> values, Dictionary<string, SourceLocation> locations, ISet<string>? readPaths)
    {
        Path = path;
        Location = location;
        _values = values;
        _locations = locations;
        _readPaths = readPaths;
    }

    /// <summary>Where a field's value starts in the file (the section's own place when the field is absent).</summary>
    public SourceLocation LocationOf(string name) => _locations.GetValueOrDefault(name, Location);

    public string Path { get; }

    public SourceLocation Location { get; }

    public double Quantity(string name) => Get<double>(name);

    public double? OptionalQuantity(string name) => GetOptional<double>(name);

    public double Number(string name) => Get<double>(name);

    public double? OptionalNumber(string name) => GetOptional<double>(name);

    public long Integer(string name) => Get<long>(name);

    public long? OptionalInteger(string name) => GetOptional<long>(name);

    public string Text(string name) => Get<string>(name);

    public string? OptionalText(string name) => GetOptionalRef<string>(name);

    public BoundSection Section(string name) => Get<BoundSection>(name);

    public BoundSection? OptionalSection(string name) => GetOptionalRef<BoundSection>(name);

    public IReadOnlyList<BoundSection> List(string name) => GetOptionalRef<IReadOnlyList<BoundSection>>(name) ?? [];

    private T Get<T>(string name)
        where T : notnull
    {
        Note(name);
        return _values.TryGetValue(name, out var value)
            ? (T)value
            : throw new InvalidOperationException($"The loader read required field '{Qualified(name)}' that validation did not provide.");
    }

    private T? GetOptional<T>(string name)
        where T : struct
    {
        Note(name);
        return _values.TryGetValue(name, out var value) ? (T)value : null;
    }

    private T? GetOptionalRef<T>(string name)
        where T : class
    {
        Note(name);
        return _values.TryGetValue(name, out var value) ? (T)value : null;
    }

    private void Note(string name) => _readPaths?.Add(SpecPath(Qualified(name)));

    private string Qualified(string name) => Path.Length == 0 ? name : Path + "." + name;

    /// <summary>"vehicles[2].speed" becomes "vehicles[].speed": the format's path, not the instance's.</summary>
    private static string SpecPath(string path) => System.Text.RegularExpressions.Regex.Replace(path, @"\[\d+\]", "[]");
}
