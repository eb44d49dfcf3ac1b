using System.Collections.Immutable;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Running;

namespace DescentOps.Mission.Tether;

/// <summary>
/// The link's committed state: how much fibre is out, whether it still carries light and its budget closes, what it
/// carried; the frames held at the probe end and the commands held at the surface end while no path is up; the relays
/// dropped so far (in drop order), those failed by a fault, and whether the relay chain reaches the surface (null while
/// the fibre carries the frames and nobody looks).
/// <see cref="ProbeDepthM"/> is the head's depth from the latest frame, which goes on growing after the fibre parts.
/// <see cref="FramesProduced"/> = <see cref="FramesCarried"/> (by fibre) + <see cref="FramesByRelays"/> + held + <see cref="FramesLost"/>.
/// </summary>
public sealed record TetherState(
    double PaidOutM,
    bool Broken,
    double? BrokenAtDepthM,
    long FramesCarried,
    long FramesLost,
    int PayoutMilestone,
    bool FibreUp,
    FrameHold<TelemetryFrame> ProbeHold,
    FrameHold<Telecommand> CommandHold,
    ImmutableList<RelayState> Relays,
    int NextPlannedDrop,
    ImmutableSortedSet<int> FailedRelays,
    bool? RelayPathUp,
    long FramesProduced,
    long FramesByRelays,
    double ReportedFill,
    double ProbeDepthM)
{
    /// <summary>The run of consecutive frames lost, for one warning per episode.</summary>
    public LossEpisode LossEpisode { get; init; } = LossEpisode.None;

    /// <summary>The path the probe was last told carries its frames (<see cref="LinkPaths"/>).</summary>
    public string ReportedPath { get; init; } = LinkPaths.Fibre;

    public long FramesHeld => ProbeHold.Count + Relays.Sum(r => (long)r.Hold.Count);
}
