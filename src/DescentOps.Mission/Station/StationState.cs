using System.Collections.Immutable;
using DescentOps.Engine.Scheduling;
using DescentOps.Mission.Running;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Station;

/// <summary>
/// The station's committed state. <see cref="FailureCause"/> is "fault" (a station_failure fault, which may clear) or
/// "dose" (for good). <see cref="RecoveringUntil"/> is set while an upset's reset lasts. Frames and commands wait in
/// <see cref="Frames"/> and <see cref="Commands"/> for a window; <see cref="PendingService"/> is the transmitter's
/// next turn; <see cref="WaitingSince"/> marks a wait for a window or a reset, so that its start and end are logged once.
/// </summary>
public sealed record StationState(
    bool Failed,
    long FramesForwarded,
    long FramesLost,
    string? FailureCause,
    SimTime? RecoveringUntil,
    ImmutableQueue<QueuedFrame> Frames,
    int FramesQueued,
    ImmutableQueue<QueuedCommand> Commands,
    int CommandsQueued,
    EventHandle? PendingService,
    SimTime TransmitterFreeAt,
    SimTime? WaitingSince,
    long Upsets,
    long CommandsLost)
{
    /// <summary>The run of consecutive frames lost after the station failed, for one warning per episode.</summary>
    public LossEpisode LossEpisode { get; init; } = LossEpisode.None;
}
