namespace DescentOps.Mission.Messages;

/// <summary>A lander's station works again (a station_failure fault cleared): it takes its share of the link again.</summary>
public sealed record StationUp(string Lander);
