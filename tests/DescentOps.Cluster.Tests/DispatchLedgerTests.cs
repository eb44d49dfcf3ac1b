using Xunit;

namespace DescentOps.Cluster.Tests;

public sealed class DispatchLedgerTests
{
    private static List<RunKey> Work(int runs, params string[] variants) =>
        [.. Enumerable.Range(0, runs).SelectMany(i => variants.Select(v => new RunKey(v, i)))];

    [Fact]
    public void Nothing_goes_to_a_worker_that_did_not_ask_and_runs_go_out_in_the_campaigns_order()
    {
        var ledger = new DispatchLedger(Work(3, "baseline", "no-boost"));
        ledger.AddWorker("a");
        ledger.AddWorker("b");
        Assert.Empty(ledger.Dispatch()); // no free slot asked for: work pulling, nothing pushed

        ledger.Ask("a", 2);
        ledger.Ask("b", 1);
        var handed = ledger.Dispatch();
        Assert.Equal([("a", new RunKey("baseline", 0)), ("b", new RunKey("no-boost", 0)), ("a", new RunKey("baseline", 1))], handed);
        Assert.Empty(ledger.Dispatch());
        Assert.Equal(3, ledger.InFlight);
        Assert.Equal(3, ledger.Pending);
    }

    [Fact]
    public void A_lost_workers_runs_go_back_to_their_place_and_to_the_next_worker_that_asks()
    {
        var ledger = new DispatchLedger(Work(4, "baseline"));
        ledger.AddWorker("a");
        ledger.AddWorker("b");
        ledger.Ask("a", 2);
        ledger.Dispatch(); // a holds runs 0 and 1
        ledger.Ask("b", 1);
        Assert.Equal([("b", new RunKey("baseline", 2))], ledger.Dispatch());
        Assert.Equal(ResultVerdict.Accepted, ledger.Complete(new RunKey("baseline", 1)));

        Assert.Equal([new RunKey("baseline", 0)], ledger.RemoveWorker("a")); // run 1 is done: only run 0 goes back
        Assert.Equal(1, ledger.Workers);
        ledger.Ask("b", 2);
        Assert.Equal([("b", new RunKey("baseline", 0)), ("b", new RunKey("baseline", 3))], ledger.Dispatch()); // earliest first
        Assert.False(ledger.Finished);
        foreach (var i in new[] { 0, 2, 3 }) Assert.Equal(ResultVerdict.Accepted, ledger.Complete(new RunKey("baseline", i)));
        Assert.True(ledger.Finished);
        Assert.Equal(4, ledger.Done);
    }

    [Fact]
    public void A_result_is_accepted_once_and_a_late_duplicate_is_discarded()
    {
        var ledger = new DispatchLedger(Work(2, "baseline"));
        ledger.AddWorker("a");
        ledger.AddWorker("b");
        ledger.Ask("a", 1);
        ledger.Dispatch();
        ledger.RemoveWorker("a"); // a is thought lost; its run goes to b
        ledger.Ask("b", 1);
        Assert.Equal([("b", new RunKey("baseline", 0))], ledger.Dispatch());

        Assert.Equal(ResultVerdict.Accepted, ledger.Complete(new RunKey("baseline", 0))); // a's result arrives after all
        Assert.Equal(ResultVerdict.Duplicate, ledger.Complete(new RunKey("baseline", 0))); // then b's
        Assert.Equal(ResultVerdict.Unknown, ledger.Complete(new RunKey("baseline", 9)));
        Assert.Equal(ResultVerdict.Unknown, ledger.Complete(new RunKey("other", 0)));
        Assert.Empty(ledger.HeldBy("b"));
        Assert.Equal(1, ledger.Pending);
    }

    [Fact]
    public void A_stopping_worker_hands_back_only_what_it_holds()
    {
        var ledger = new DispatchLedger(Work(3, "baseline"));
        ledger.AddWorker("a");
        ledger.AddWorker("b");
        ledger.Ask("a", 1);
        ledger.Ask("b", 1);
        ledger.Dispatch();
        Assert.Empty(ledger.HandBack("a", [new RunKey("baseline", 1)])); // b's run: not a's to give back
        Assert.Equal([new RunKey("baseline", 0)], ledger.HandBack("a", [new RunKey("baseline", 0)]));
        Assert.Equal(2, ledger.Pending);
        ledger.Ask("b", 1);
        Assert.Equal([("b", new RunKey("baseline", 0))], ledger.Dispatch());
    }

    [Fact]
    public void A_precision_stop_drops_later_runs_and_finishes_without_them()
    {
        var ledger = new DispatchLedger(Work(30, "baseline"));
        ledger.AddWorker("a");
        ledger.Ask("a", 2);
        ledger.Dispatch(); // 0 and 1
        ledger.StopAt(1);
        Assert.Equal(0, ledger.Pending);
        Assert.Equal(ResultVerdict.Accepted, ledger.Complete(new RunKey("baseline", 0)));
        Assert.True(ledger.Finished); // run 1 is in flight but beyond the stop
    }

    [Fact]
    public void A_listed_twice_run_is_refused() =>
        Assert.Throws<ArgumentException>(() => new DispatchLedger([new RunKey("baseline", 0), new RunKey("baseline", 0)]));

    /// <summary>
    /// Workers join, ask, finish, send duplicates, hand back and vanish at random (seeded, so a failure repeats); whatever
    /// happens, every run is accepted exactly once, no run is held by two workers, and the ledger finishes.
    /// </summary>
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    public void Under_random_churn_every_run_is_accepted_exactly_once(int seed)
    {
        var random = new Random(seed);
        var work = Work(40, "baseline", "variant");
        var ledger = new DispatchLedger(work);
        var holding = new Dictionary<string, List<RunKey>>();
        var accepted = new Dictionary<RunKey, int>();
        var finishedLate = new List<RunKey>(); // results of lost workers that still arrive
        var next = 0;
        for (var step = 0; step < 20_000 && !ledger.Finished; step++)
        {
            switch (random.Next(10))
            {
                case 0 when holding.Count < 4:
                    var id = $"w{next++}";
                    ledger.AddWorker(id);
                    holding[id] = [];
                    ledger.Ask(id, random.Next(1, 4));
                    break;
                case 1 when holding.Count > 0:
                    var lost = holding.Keys.ElementAt(random.Next(holding.Count));
                    finishedLate.AddRange(holding[lost].Where(_ => random.Next(3) == 0));
                    ledger.RemoveWorker(lost);
                    holding.Remove(lost);
                    break;
                case 2 when finishedLate.Count > 0:
                    Count(ledger.Complete(finishedLate[^1]), finishedLate[^1]);
                    finishedLate.RemoveAt(finishedLate.Count - 1);
                    break;
                case 3 when holding.Count > 0:
                    var stopping = holding.Keys.ElementAt(random.Next(holding.Count));
                    ledger.HandBack(stopping, holding[stopping]); // Ctrl-C: hands back, then leaves
                    ledger.RemoveWorker(stopping);
                    holding.Remove(stopping);
                    break;
                default:
                    foreach (var (worker, key) in ledger.Dispatch()) holding[worker].Add(key);
                    if (holding.Count == 0) break;
                    var busy = holding.Keys.ElementAt(random.Next(holding.Count));
                    if (holding[busy].Count == 0) break;
                    var done = holding[busy][random.Next(holding[busy].Count)];
                    holding[busy].Remove(done);
                    Count(ledger.Complete(done), done);
                    if (random.Next(5) == 0) Count(ledger.Complete(done), done); // sent twice
                    ledger.Ask(busy, 1);
                    break;
            }

            var held = holding.Values.SelectMany(h => h).ToList();
            Assert.Equal(held.Count, held.Distinct().Count());
        }

        Assert.True(ledger.Finished, $"seed {seed}: not finished, {ledger.Pending} pending, {ledger.InFlight} in flight");
        Assert.Equal(work.Count, accepted.Count);
        Assert.All(accepted.Values, n => Assert.Equal(1, n));

        void Count(ResultVerdict verdict, RunKey key)
        {
            if (verdict == ResultVerdict.Accepted) accepted[key] = accepted.GetValueOrDefault(key) + 1;
        }
    }
}
