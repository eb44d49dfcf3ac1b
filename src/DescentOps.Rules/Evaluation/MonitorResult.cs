namespace DescentOps.Rules.Evaluation;

/// <summary>Whether a condition holds, and the samples it looked at to decide.</summary>
internal readonly record struct MonitorResult(bool Holds, IReadOnlyList<TelemetrySample> Evidence)
{
    public static MonitorResult NoData { get; } = new(false, []);
}
