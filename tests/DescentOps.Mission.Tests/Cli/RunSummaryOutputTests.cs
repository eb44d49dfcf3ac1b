using System.Text.Json;
using DescentOps.Cli.Output;
using DescentOps.Cli.Terminal;
using DescentOps.Engine.Running;
using DescentOps.Mission.Running;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>What <c>run</c> prints when a run ends, from a summary made by hand (no run needed), and the progress line's scope.</summary>
public sealed class RunSummaryOutputTests
{
    private static MissionSummary Summary() =>
        new(new RunOutcome(RunOutcomeKind.TimeLimit, "time limit reached", SimTime.Epoch + SimDuration.FromSeconds(172_800)),
            FinalTimeS: 172_800, BreakthroughTimeS: null, FinalDepthM: 812.25, EnergyUsedJ: 7.2e9, FaultsInjected: 1,
            FramesSent: 10, FramesReceivedOnGround: 7, FramesLost: 2, VehicleProfiles: 0, EventsDelivered: 500, RecordsWritten: 400,
            ComponentFailures: 0,
            Faults: [new FaultMeasure("dip", "power_dip", 86_400, DetectedAfterS: 1800, FirstActionAfterS: null, RecoveredAfterS: null, Recovery: "NotRecovered")])
        {
            Criteria = [new CriterionResult("depth", "final depth at least 1000 m", 812.25, Passed: false)],
        };

    [Fact]
    public void The_table_balances_the_frame_ledger_and_says_never_for_what_did_not_happen()
    {
        using var text = new StringWriter();
        RunSummaryOutput.WriteText(text, BuiltInScenarios.Default(), Summary(), TimeSpan.FromSeconds(2), "logs/x.jsonl");
        var lines = text.ToString().Split('\n');
        // 10 sent = 7 received + 2 lost + 1 held or in flight: the ledger closes.
        Assert.Contains(lines, l => l.Contains("10 sent = 7 received on ground + 2 lost + 1 held or in flight at the end", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("  time to breakthrough  not reached", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("  energy used           2.00 MWh", StringComparison.Ordinal)); // 7.2e9 J / 3.6e9 J per MWh
        Assert.Contains(lines, l => l.StartsWith("  criterion depth        NOT met: final depth at least 1000 m (measured 812.25)", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("  success               no", StringComparison.Ordinal));
        // Detected half an hour after the start at 1 d; never acted on, never recovered.
        Assert.Contains(lines, l => l.StartsWith("  fault dip (power_dip, at 1.000 d): detected after 0.50 h, first action never, recovered never [NotRecovered]", StringComparison.Ordinal));
    }

    [Fact]
    public void The_json_answer_writes_null_for_a_breakthrough_never_reached_and_lists_the_faults()
    {
        using var text = new StringWriter();
        RunSummaryOutput.WriteJson(text, BuiltInScenarios.Default(), 42, 172_800, Summary(), TimeSpan.FromSeconds(2), "logs/x.jsonl");
        using var json = JsonDocument.Parse(text.ToString());
        var root = json.RootElement;
        Assert.Equal(42, root.GetProperty("seed").GetInt64());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("breakthrough_time_s").ValueKind);
        Assert.Equal(812.25, root.GetProperty("final_depth_m").GetDouble());
        var fault = Assert.Single(root.GetProperty("faults").EnumerateArray().ToList());
        Assert.Equal(1800, fault.GetProperty("detected_after_s").GetDouble());
        Assert.Equal(JsonValueKind.Null, fault.GetProperty("first_action_after_s").ValueKind);
    }

    [Fact]
    public void A_progress_scope_returns_the_works_result_and_lets_its_exception_through()
    {
        var progress = new ProgressLine("  test ", enabled: false);
        Assert.Equal(42, progress.Around(() => 42));
        var thrown = Assert.Throws<InvalidOperationException>(() => progress.Around(() => throw new InvalidOperationException("inner")));
        Assert.Equal("inner", thrown.Message);
        var ran = false;
        progress.Around(() => { ran = true; });
        Assert.True(ran);
    }
}
