namespace DescentOps.Mission.Ground;

/// <summary>Home rises (<paramref name="InView"/>) or sets at the station at <paramref name="StationTimeS"/>; the ground sees it a light time later.</summary>
public sealed record StationViewEdge(bool InView, double StationTimeS);
