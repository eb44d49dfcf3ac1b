namespace DescentOps.Mission.Messages;

/// <summary>The surface dwell is over: the probe may start melting. Carries what the dwell achieved, for the probe's log.</summary>
public sealed record DescentCleared(double DwellS, double LogReduction);
