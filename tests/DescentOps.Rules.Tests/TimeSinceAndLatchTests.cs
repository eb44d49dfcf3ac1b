using DescentOps.Rules.Text;

namespace DescentOps.Rules.Tests;

/// <summary>
/// 'time since (A) above|below D' measures from A's latest start; 'latched (A)' holds from A's first holding until the
/// rule is disabled. Both change between samples only at instants the evaluator wakes for.
/// </summary>
public sealed class TimeSinceAndLatchTests
{
    private static string Rule(string when, string extra = "") =>
        $"rule r {{ runs on board severity high {extra}\n when {when}\n then {{ send probe pause_descent }} }}\n";

    [Fact]
    public void Time_since_above_fires_one_tick_after_the_duration_from_the_event_even_with_no_sample()
    {
        var run = new EvaluatorHarness(Rule("time since (station.link is down) above 30 min"))
            .State("station.link", 0, "up").State("station.link", 600, "down").Until(10_000);

        // The event is the change to 'down' at 600 s; 'above' is strict, so the rule fires 1 µs after 600 + 1800 s.
        var firing = Assert.Single(run.Firings);
        Assert.Equal(EvaluatorHarness.At(2400) + new Primitives.Time.SimDuration(1), firing.Time);
        Assert.Equal(("station.link", "down", 600.0), (firing.Evidence[0].Point, firing.Evidence[0].Value.ToString(), firing.Evidence[0].Time.SecondsSinceEpoch));
    }

    [Fact]
    public void Time_since_counts_from_the_latest_start_not_the_first()
    {
        var run = new EvaluatorHarness(Rule("time since (station.link is down) above 30 min"))
            .State("station.link", 0, "down").State("station.link", 1000, "up").State("station.link", 1500, "down").Until(10_000);
        // 0 s starts the first event; 1500 s the latest; 1500 + 1800 = 3300 s (and one tick).
        Assert.Equal(3300.000001, Assert.Single(run.Firings).Time.SecondsSinceEpoch, 9);
    }

    [Fact]
    public void Time_since_below_holds_only_within_the_duration_of_the_event()
    {
        // A rule on "it went down less than 10 min ago and it is up now": a short drop-out, already over.
        var run = new EvaluatorHarness(Rule("time since (station.link is down) below 10 min and station.link is up"))
            .State("station.link", 0, "up").State("station.link", 100, "down").State("station.link", 400, "up")
            .State("station.link", 2000, "down").State("station.link", 2800, "up");
        // 400 s: up again 300 s after the drop; 2800 s: up again 800 s after, too late for 'below 10 min'.
        Assert.Equal([400.0], run.Firings.Select(f => f.Time.SecondsSinceEpoch));
    }

    [Fact]
    public void Time_since_never_holds_before_its_event_happened()
    {
        var run = new EvaluatorHarness(Rule("time since (station.link is down) above 1 s")).State("station.link", 0, "up").Until(100_000);
        Assert.Empty(run.Firings);
    }

    [Fact]
    public void A_latch_holds_after_its_condition_clears()
    {
        var run = new EvaluatorHarness(Rule("latched (probe.head_temp above 420 K) and probe.head_temp below 300 K"))
            .Number("probe.head_temp", 10, 290).Number("probe.head_temp", 20, 430).Number("probe.head_temp", 30, 350).Number("probe.head_temp", 40, 280);
        // 10 s: cold but never hot yet; 40 s: cold after having been hot at 20 s.
        var firing = Assert.Single(run.Firings);
        Assert.Equal(40.0, firing.Time.SecondsSinceEpoch);
        Assert.Contains(firing.Evidence, e => e.Time.SecondsSinceEpoch == 20.0);
    }

    [Fact]
    public void A_disabled_and_re_enabled_rule_forgets_its_latch()
    {
        const string text = """
            rule r { runs on board severity high when latched (probe.head_temp above 420 K) and probe.head_temp below 300 K then { send probe pause_descent } }
            rule switch-off { runs on board severity low when station.link is down then { disable r } }
            rule switch-on { runs on board severity low when station.link is up then { enable r } }
            """;
        var run = new EvaluatorHarness(text)
            .Number("probe.head_temp", 10, 430).State("station.link", 20, "down").State("station.link", 30, "up").Number("probe.head_temp", 40, 280);
        Assert.DoesNotContain(run.Firings, f => f.Rule == "r");
    }

    [Theory]
    [InlineData("time since station.link is down above 1 h", "expected '(' to open the event after 'time since'")]
    [InlineData("time since (station.link is down) inside 1 h to 2 h", "expected 'above' or 'below' and a duration")]
    [InlineData("latched probe.head_temp above 420 K", "expected '(' to open the condition after 'latched'")]
    public void Time_since_and_latched_need_their_brackets_and_comparison(string condition, string message)
    {
        var result = TestCatalogue.Check(Rule(condition));
        Assert.Contains(result.Errors, e => e.Code == DiagnosticCode.UnexpectedToken && e.Message.Contains(message, StringComparison.Ordinal));
    }

    [Fact]
    public void A_time_since_duration_is_checked_as_a_duration()
    {
        var result = TestCatalogue.Check(Rule("time since (station.link is down) above 3 kW"));
        Assert.Contains(result.Errors, e => e.Code == DiagnosticCode.UnitMismatch);
    }
}
