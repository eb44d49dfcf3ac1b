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
}
