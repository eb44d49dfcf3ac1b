using DescentOps.Engine.Scheduling;

namespace DescentOps.Mission.Ground;

/// <summary>What the ground team has seen: the last frame number, gaps, the latest latency; its rules' and procedures' state.</summary>
public sealed record GroundState(long FramesReceived, long LastFrame, long FramesMissing, double LastLatencyS, int RulesVersion = 0)
{
    /// <summary>How many inputs the procedure desk has taken (its part of the state).</summary>
    public int ProceduresVersion { get; init; }

    /// <summary>The timer of the next procedure step that runs out of time.</summary>
    public EventHandle? ProcedureWake { get; init; }
}
