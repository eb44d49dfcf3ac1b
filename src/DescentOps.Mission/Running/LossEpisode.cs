using DescentOps.Records;

namespace DescentOps.Mission.Running;

/// <summary>
/// Consecutive frames lost at one place are one episode: its first loss is a warning, the rest are logged at info with
/// the episode's number and running count, so every frame keeps its record while a blind week raises one warning,
/// not hundreds. A frame that breaks the run of sequence numbers (one got through) opens a new episode.
/// </summary>
/// <param name="Number">Episodes so far at this place (0: none yet).</param>
/// <param name="LastFrame">Sequence number of the last frame lost.</param>
/// <param name="Count">Frames lost in the current episode.</param>
public sealed record LossEpisode(long Number, long LastFrame, long Count)
{
    public static LossEpisode None { get; } = new(0, long.MinValue, 0);

    /// <summary>The episode after losing <paramref name="frame"/>.</summary>
    public LossEpisode After(long frame) =>
        Number > 0 && frame == LastFrame + 1 ? this with { LastFrame = frame, Count = Count + 1 } : new LossEpisode(Number + 1, frame, 1);

    /// <summary>Warning for the loss that opens an episode, info for the rest.</summary>
    public Severity Severity => Count == 1 ? Severity.Warning : Severity.Info;

    /// <summary>The episode's fields for the loss record.</summary>
    public RecordField[] Fields() => [RecordField.Of("episode", Number), RecordField.Of("lost_in_episode", Count)];
}
