namespace DescentOps.Scenarios.Model;

/// <summary>A loaded, validated scenario: every quantity in SI units, every reference resolved.</summary>
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
    RelayPlanModel? Relays = null);
