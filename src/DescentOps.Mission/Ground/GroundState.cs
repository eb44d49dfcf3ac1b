using DescentOps.Engine.Scheduling;

namespace DescentOps.Mission.Ground;

/// <summary>What the ground team has seen: the last frame number, gaps, the latest latency; and its rules' wake-up.</summary>
public sealed record GroundState(long FramesReceived, long LastFrame, long FramesMissing, double LastLatencyS, EventHandle? PendingWake, int RulesVersion = 0);
