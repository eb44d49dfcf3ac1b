namespace DescentOps.Mission.Station;

/// <summary>The station's committed state.</summary>
public sealed record StationState(bool Failed, long FramesForwarded, long FramesLost);
