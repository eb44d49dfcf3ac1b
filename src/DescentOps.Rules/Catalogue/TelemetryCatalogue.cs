namespace DescentOps.Rules.Catalogue;

/// <summary>What the mission offers rules: the points they may watch and the commands they may send.</summary>
public sealed class TelemetryCatalogue
{
    private readonly Dictionary<string, TelemetryPointSpec> _points = new(StringComparer.Ordinal);
    private readonly Dictionary<(string Target, string Name), CommandSpec> _commands = [];
    private readonly HashSet<string> _targets = new(StringComparer.Ordinal);

    public TelemetryCatalogue(IEnumerable<TelemetryPointSpec> points, IEnumerable<CommandSpec> commands)
    {
        foreach (var point in points)
        {
            _points[point.Name] = point;
        }

        foreach (var command in commands)
        {
            _commands[(command.Target.Name, command.Name)] = command;
            _targets.Add(command.Target.Name);
        }
    }

    /// <summary>Whether conditions checked against this catalogue may read true-state points (fault triggers do, rules do not).</summary>
    public bool ReadsTrueState { get; private init; }

    /// <summary>The same points and commands, read as a fault trigger reads them: true state allowed.</summary>
    public TelemetryCatalogue ForFaultTriggers() => new(_points.Values, _commands.Values) { ReadsTrueState = true, Procedures = Procedures, Landers = Landers };

    /// <summary>The procedures a ground rule may start (by name).</summary>
    public IReadOnlySet<string> Procedures { get; init; } = new HashSet<string>(StringComparer.Ordinal);

    /// <summary>
    /// The landers whose points and targets this catalogue names as "LANDER/point" (a mission's own rules across its
    /// landers); empty for one lander's catalogue. A name with a slash and another prefix is an unknown lander.
    /// </summary>
    public IReadOnlySet<string> Landers { get; init; } = new HashSet<string>(StringComparer.Ordinal);

    /// <summary>The lander a "LANDER/name" names when it is not one of <see cref="Landers"/>; null otherwise.</summary>
    public string? UnknownLanderOf(string name)
    {
        if (Landers.Count == 0) return null;
        var at = name.IndexOf('/', StringComparison.Ordinal);
        if (at < 0) return null;
        var lander = name[..at];
        return Landers.Contains(lander) ? null : lander;
    }

    public TelemetryPointSpec? FindPoint(string name) => _points.GetValueOrDefault(name);

    /// <summary>Every point, in the order given, for documentation and tests.</summary>
    public IEnumerable<TelemetryPointSpec> Points => _points.Values;

    public CommandSpec? FindCommand(string target, string name) => _commands.GetValueOrDefault((target, name));

    public bool HasTarget(string target) => _targets.Contains(target);

    /// <summary>Command names a target accepts, sorted, for messages.</summary>
    public IReadOnlyList<string> CommandsOf(string target) =>
        _commands.Keys.Where(k => k.Target == target).Select(k => k.Name).Order(StringComparer.Ordinal).ToArray();
}
