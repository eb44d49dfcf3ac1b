namespace DescentOps.Mission.Station;

/// <summary>The instant the electronics' accumulated dose reaches the failure dose drawn at the start.</summary>
public sealed record StationDoseLimit(double FailureDoseGy);
