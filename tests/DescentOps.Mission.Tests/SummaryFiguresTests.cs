using DescentOps.Records;
using DescentOps.Mission.Probe;
using DescentOps.Mission.Running;

namespace DescentOps.Mission.Tests;

/// <summary>The summary's words and figures: plurals that agree, loss episodes, and the time the ground was blind.</summary>
public sealed class SummaryFiguresTests
{
    [Fact]
    public void The_closing_sentence_agrees_with_its_number()
    {
        Assert.Equal("the vehicle finished its task", VehicleTally.Reason(1, 0));
        Assert.Equal("all 2 vehicles finished their tasks", VehicleTally.Reason(2, 0));
        Assert.Equal("1 vehicle finished its task, 1 lost", VehicleTally.Reason(1, 1));
        Assert.Equal("2 vehicles finished their tasks, 1 lost", VehicleTally.Reason(2, 1));
        Assert.Equal("the vehicle was lost", VehicleTally.Reason(0, 1));
        Assert.Equal("all 3 vehicles lost", VehicleTally.Reason(0, 3));
    }

    [Fact]
    public void Consecutive_losses_are_one_episode_with_one_warning()
    {
        var episode = LossEpisode.None;
        var severities = new List<Severity>();
        foreach (var frame in new long[] { 10, 11, 12, 13, 20, 21 })
        {
            episode = episode.After(frame);
            severities.Add(episode.Severity);
        }

        Assert.Equal([Severity.Warning, Severity.Info, Severity.Info, Severity.Info, Severity.Warning, Severity.Info], severities);
        Assert.Equal(2, episode.Number);
        Assert.Equal(2, episode.Count);
    }

    [Fact]
    public void The_ground_is_blind_across_a_gap_and_after_its_last_frame_but_not_for_frames_in_flight()
    {
        // Frames every 600 s from 0 to 6000 s, 60 s on the way; the ground receives those taken at 0, 600, 1200,
        // 4200 and 4800 s (the four between are lost).
        var blind = new GroundBlindness();
        for (var t = 0.0; t <= 6000; t += 600) blind.FrameSent(t);
        foreach (var taken in new[] { 0.0, 600, 1200, 4200, 4800 }) blind.FrameReceived(taken + 60, 60);
        // Gap 1200 → 4200 (3000 s > 2 × 600 s) counts; after 4800 the frames of 5400 and 6000 s are 1200 s old,
        // less the 60 s latency: 1140 s, not over two intervals, so in flight or held, not blind.
        Assert.Equal(3000, blind.TotalS(), 9);
    }
}
