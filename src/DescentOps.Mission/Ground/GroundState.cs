using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Ground;

/// <summary>What the ground team has seen: the last frame number, gaps, the latest latency; its rules' and procedures' state.</summary>
public sealed record GroundState(long FramesReceived, long LastFrame, long FramesMissing, double LastLatencyS, int RulesVersion = 0)
{
    /// <summary>How many inputs the procedure desk has taken (its part of the state).</summary>
    public int ProceduresVersion { get; init; }

    /// <summary>The timer of the next procedure step that runs out of time.</summary>
    public EventHandle? ProcedureWake { get; init; }

    /// <summary>Whether people at a rehearsal console answer the procedure steps that ask for confirmation.</summary>
    public bool PeopleAnswer { get; init; }

    /// <summary>What the ground knows of its station; null unless a ground rule or procedure reads it.</summary>
    public StationWatch? Station { get; init; }

    /// <summary>The timer of the present silence's end (<see cref="StationWatch.SilenceEnds"/>).</summary>
    public EventHandle? StationSilence { get; init; }

    /// <summary>The latest sampling time of the frames received: the stamp of what the ground learns between frames.</summary>
    public SimTime LatestSampledAt { get; init; }
}
