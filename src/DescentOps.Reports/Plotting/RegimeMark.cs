namespace DescentOps.Reports.Plotting;

/// <summary>A change of the probe's regime (sublimating, melting, stopped...), in days.</summary>
public sealed record RegimeMark(double Day, string From, string To);
