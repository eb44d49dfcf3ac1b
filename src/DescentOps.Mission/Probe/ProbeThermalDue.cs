namespace DescentOps.Mission.Probe;

/// <summary>The probe's thermal timer: the stopped probe's gap has frozen, or the frozen gap has been melted open.</summary>
public sealed record ProbeThermalDue(ProbeRegime Completes);
