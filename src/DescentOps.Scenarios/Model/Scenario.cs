namespace DescentOps.Scenarios.Model;

/// <summary>
/// A loaded, validated scenario: every quantity in SI units, every reference resolved. <see cref="Power"/> is null
/// when the scenario has no power section; without <see cref="Acoustics"/> the vehicles' link to the probe is always up.
/// </summary>
public sealed record Scenario(
    string Name,
    string Description,
    BodyModel Body,
    ShellModel Shell,
    ProbeModel Probe,
    TetherModel Tether,
    StationModel Station,
    IReadOnlyList<VehicleModel> Vehicles,
    IReadOnlyList<FaultModel> Faults,
    RulesSource Rules,
    RunModel Run,
    string SourceName,
    string SourceText,
    PowerModel? Power = null,
    AcousticsModel? Acoustics = null,
    RelayPlanModel? Relays = null)
{
    /// <summary>Values drawn per run from the run's own stream (the <c>uncertain</c> section).</summary>
    public IReadOnlyList<Campaign.UncertainInput> Uncertain { get; init; } = [];

    /// <summary>Named pass/fail criteria over a run (the <c>criteria</c> section).</summary>
    public IReadOnlyList<Campaign.MissionCriterion> Criteria { get; init; } = [];

    /// <summary>Where each field's value stands in the file, by field path ("probe.radius", "faults[0].at"): checks made after loading are located with it.</summary>
    public IReadOnlyDictionary<string, Loading.SourceLocation> FieldLocations { get; init; } = new Dictionary<string, Loading.SourceLocation>();

    /// <summary>The probe's on-board sensor rates; null: every point is sampled with the frames, as before.</summary>
    public OnboardSamplingModel? OnboardSampling { get; init; }

    /// <summary>Telecommands tagged with times (the scenario's <c>telecommands:</c>, and a branch's additions), in time order.</summary>
    public IReadOnlyList<TimedTelecommandModel> Telecommands { get; init; } = [];

    /// <summary>Rule sets uplinked during the run (a branch's <c>uplink_rules:</c>), in time order; empty for a scenario as written.</summary>
    public IReadOnlyList<RuleUplinkModel> RuleUplinks { get; init; } = [];

    /// <summary>The ground team's operating procedures (the <c>procedures</c> section), in the order written.</summary>
    public IReadOnlyList<ProcedureModel> Procedures { get; init; } = [];

    /// <summary>
    /// The landers of a scenario with a <c>landers</c> list, in file order; empty for the single-lander format. With
    /// landers, <see cref="Probe"/>, <see cref="Tether"/>, <see cref="Station"/>, <see cref="Vehicles"/> and the other
    /// per-lander parts are the first lander's, and <see cref="Faults"/> holds every lander's faults in file order.
    /// </summary>
    public IReadOnlyList<LanderModel> Landers { get; init; } = [];

    /// <summary>The link home the landers share; null without landers.</summary>
    public LinkHomeModel? LinkHome { get; init; }

    /// <summary>
    /// The mission's own ground rules across its landers (the <c>mission_rules</c> section; with landers only): they read
    /// and command a lander's points and targets as "LANDER/name". Empty when the scenario has none.
    /// </summary>
    public RulesSource MissionRules { get; init; } = RulesSource.None;

    /// <summary>The place of <paramref name="fieldPath"/>, or of its nearest enclosing field, or the file's start.</summary>
    public Loading.SourceLocation LocationOf(string fieldPath)
    {
        for (var path = fieldPath; path.Length > 0; path = path.Contains('.', StringComparison.Ordinal) ? path[..path.LastIndexOf('.')] : "")
        {
            if (FieldLocations.TryGetValue(path, out var at)) return at;
        }

        return new Loading.SourceLocation(SourceName, 1, 1);
    }
}
