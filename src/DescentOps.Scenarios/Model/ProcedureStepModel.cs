namespace DescentOps.Scenarios.Model;

/// <summary>
/// One step of a procedure, as written: the command text, the conditions' text (rule language), the timeout in
/// seconds and the goto targets (step names, or <c>done</c> / <c>abort</c>; null: the defaults).
/// </summary>
public sealed record ProcedureStepModel(
    string Name,
    string? Send,
    string? WaitFor,
    double? WithinS,
    string? Expect,
    string? OnPass,
    string? OnFail,
    string FieldPath)
{
    /// <summary>Whether a person confirms (or skips) the step before its command goes.</summary>
    public bool Confirm { get; init; }
}
