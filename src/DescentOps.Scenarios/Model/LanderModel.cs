namespace DescentOps.Scenarios.Model;

/// <summary>
/// One lander of a scenario with landers: its site and <see cref="View"/>, the lander as a complete single-lander
/// scenario (its probe, tether, station, vehicles, relays and power, its faults, its rules, the shared body and shell,
/// the station's link turned to the site's latitude and longitude). Components of a lander are built from its view.
/// </summary>
public sealed record LanderModel(string Name, string Site, double LatitudeRad, double LongitudeRad, Scenario View);
