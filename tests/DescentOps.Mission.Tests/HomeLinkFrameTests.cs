using DescentOps.Mission.Station;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests;

/// <summary>When the station's transmitter starts a frame: asking again at that instant must give the same instant.</summary>
public sealed class HomeLinkFrameTests
{
    [Theory]
    [InlineData(4096)]          // the scenario's frame: about a second on the air
    [InlineData(100_000_000)]   // about 22 h on the air at about 1.3 kbit/s, longer than any window of an 8 h turn (41 % open)
    public void A_frame_start_is_a_fixed_point(long frameBits)
    {
        var text = TestScenario.BuiltIn("station-dies-before-breakthrough.yaml").Replace("frame_bits: 4096", $"frame_bits: {frameBits}")
            .Replace("rotation_period: 260 h", "rotation_period: 8 h").Text;
        var link = new HomeLink(ScenarioLoader.LoadText(text, "s.yaml"));

        // Times spread over three turns of the body; the station asks again when the start comes, and must then send.
        for (var t = 0.0; t < 3 * 8 * 3600; t += 317)
        {
            var start = link.NextFrameStartS(t);
            Assert.True(start >= t);
            Assert.Equal(start, link.NextFrameStartS(start));
        }
    }
}
