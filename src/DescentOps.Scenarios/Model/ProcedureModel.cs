namespace DescentOps.Scenarios.Model;

/// <summary>
/// An operating procedure as written in a scenario's <c>procedures</c> section: checked against the mission when the run
/// is assembled. <see cref="FieldPath"/> ("procedures[0]") locates its fields through <see cref="Scenario.LocationOf"/>.
/// </summary>
public sealed record ProcedureModel(string Name, double? StartAtS, IReadOnlyList<ProcedureStepModel> Steps, string FieldPath);
