namespace DescentOps.Reports.Plotting;

/// <summary>A fault from injection to clearing, in days.</summary>
/// <param name="Name">The fault's name in the scenario.</param>
/// <param name="StartDay">When it was injected.</param>
/// <param name="EndDay">When it was cleared; if the log never says, the planned end or the log's last event.</param>
/// <param name="Cleared">Whether the log records the clearing.</param>
public sealed record FaultSpan(string Name, double StartDay, double EndDay, bool Cleared);
