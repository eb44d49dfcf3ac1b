namespace DescentOps.Mission.Ground;

/// <summary>What the ground team has seen: the last frame number, gaps, and the latest latency.</summary>
public sealed record GroundState(long FramesReceived, long LastFrame, long FramesMissing, double LastLatencyS);
