namespace DescentOps.Reports;

/// <summary>A vehicle the run lost: its component, when, and the reason the log gives.</summary>
public sealed record VehicleLoss(string Source, double TimeS, string Reason);
