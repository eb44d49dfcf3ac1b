using System.Text.Json;
using System.Text.Json.Nodes;
using DescentOps.Campaigns.Statistics;

namespace DescentOps.Campaigns;

/// <summary>
/// The campaign's answer, computed from the stored runs alone (so a resumed campaign and an uninterrupted one agree):
/// per variant the success rate with its Wilson interval, breakthrough-time quantiles with distribution-free intervals,
/// criteria passes, fault measures, rule coverage (runs in which each rule fired, and acted) and procedure-branch
/// coverage (runs that took each branch); per pair of variants on common seeds the paired table, the exact
/// McNemar p-value, the Newcombe interval of the difference and the runs where they disagree.
/// </summary>
public static class CampaignSummary
{
    public static readonly double[] Quantiles = [0.1, 0.5, 0.9];

    public static JsonObject Build(IReadOnlyDictionary<string, string> settings, IReadOnlyList<RunRecord> runs)
    {
        var variants = JsonSerializer.Deserialize<List<string>>(settings.GetValueOrDefault("variants", "[]")) ?? [];
        var byVariant = variants.ToDictionary(v => v, v => runs.Where(r => r.Variant == v).OrderBy(r => r.Index).ToList(), StringComparer.Ordinal);
        var root = new JsonObject
        {
            ["scenario"] = settings.GetValueOrDefault("scenario_name"),
            ["scenario_sha256"] = settings.GetValueOrDefault("scenario_sha256"),
            ["seed"] = long.Parse(settings.GetValueOrDefault("seed", "0"), System.Globalization.CultureInfo.InvariantCulture),
            ["seed_scheme"] = RunSeeds.Scheme,
            ["tool_version"] = settings.GetValueOrDefault("tool_version"),
            ["runs_requested"] = int.Parse(settings.GetValueOrDefault("runs", "0"), System.Globalization.CultureInfo.InvariantCulture),
            ["interval"] = "95 %: Wilson 1927 for a rate, Newcombe 1998 method 10 for a paired difference, order statistics for quantiles",
        };
        var variantNodes = new JsonArray();
        foreach (var name in variants) variantNodes.Add(Variant(name, byVariant[name]));
        root["variants"] = variantNodes;
        var pairs = new JsonArray();
        for (var i = 0; i < variants.Count; i++)
        {
            for (var j = i + 1; j < variants.Count; j++) pairs.Add(Pair(variants[i], byVariant[variants[i]], variants[j], byVariant[variants[j]]));
        }

        root["pairs"] = pairs;
        return root;
    }

    public static string ToJson(JsonObject summary) => summary.ToJsonString(new JsonSerializerOptions { WriteIndented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping }) + "\n";

    /// <summary>The 95 % Wilson half-width of a variant's success rate, for the precision stop.</summary>
    public static double HalfWidth(int successes, int n)
    {
        var (low, high) = WilsonInterval.Compute95(successes, n);
        return (high - low) / 2;
    }

    private static JsonObject Variant(string name, List<RunRecord> runs)
    {
        var n = runs.Count;
        var successes = runs.Count(r => r.Success);
        var (low, high) = WilsonInterval.Compute95(successes, n);
        var breakthrough = runs.Select(r => r.BreakthroughTimeS ?? double.PositiveInfinity).ToList();
        var quantiles = new JsonArray();
        foreach (var p in Quantiles)
        {
            var (estimate, qLow, qHigh) = QuantileInterval.Compute(breakthrough, p);
            quantiles.Add(new JsonObject { ["p"] = p, ["t_s"] = estimate, ["ci95"] = new JsonArray(qLow, qHigh) });
        }

        var criteria = new JsonObject();
        foreach (var criterion in runs.SelectMany(r => r.Criteria).Select(c => c.Name).Distinct())
        {
            criteria[criterion] = runs.Count(r => r.Criteria.Any(c => c.Name == criterion && c.Passed));
        }

        var rules = runs.SelectMany(r => r.RuleFirings).Select(f => f.Rule).Distinct().ToList();
        var firedIn = new JsonObject();
        foreach (var rule in rules) firedIn[rule] = runs.Count(r => r.RuleFirings.Any(f => f.Rule == rule && f.Firings > 0));
        var faults = new JsonObject();
        foreach (var fault in runs.SelectMany(r => r.Faults).Select(f => f.Fault).Distinct())
        {
            var measures = runs.SelectMany(r => r.Faults.Where(f => f.Fault == fault).Take(1)).ToList();
            var detected = measures.Where(m => m.DetectedAfterS is not null).Select(m => m.DetectedAfterS!.Value).ToList();
            var recovered = measures.Where(m => m.RecoveredAfterS is not null).Select(m => m.RecoveredAfterS!.Value).ToList();
            faults[fault] = new JsonObject
            {
                ["runs"] = measures.Count,
                ["detected"] = detected.Count,
                ["detection_median_s"] = detected.Count > 0 ? QuantileInterval.Compute(detected, 0.5).Estimate : null,
                ["recovered"] = recovered.Count,
                ["recovery_median_s"] = recovered.Count > 0 ? QuantileInterval.Compute(recovered, 0.5).Estimate : null,
            };
        }

        var node = new JsonObject
        {
            ["name"] = name,
            ["runs"] = n,
            ["completed"] = runs.Count(r => r.Outcome == "Completed"),
            ["successes"] = successes,
            ["success_rate"] = n > 0 ? successes / (double)n : null,
            ["success_ci95"] = new JsonArray(low, high),
            ["breakthrough_quantiles"] = quantiles,
            ["criteria_passed"] = criteria,
            ["faults"] = faults,
            ["rules_fired_in_runs"] = firedIn,
            ["rules_never_fired"] = new JsonArray([.. rules.Where(r => firedIn[r]!.GetValue<int>() == 0).Select(r => (JsonNode?)r)]),
        };
        var acted = new JsonObject();
        foreach (var rule in runs.SelectMany(r => r.RulesActed).Select(a => a.Rule).Distinct())
        {
            acted[rule] = runs.Count(r => r.RulesActed.Any(a => a.Rule == rule && a.Acted));
        }

        node["rules_acted_in_runs"] = acted;
        var branches = new JsonArray();
        foreach (var branch in runs.SelectMany(r => r.Branches).Select(b => (b.Procedure, b.Step, b.Branch)).Distinct())
        {
            var taken = runs.SelectMany(r => r.Branches.Where(b => (b.Procedure, b.Step, b.Branch) == branch)).ToList();
            branches.Add(new JsonObject
            {
                ["procedure"] = branch.Procedure,
                ["step"] = branch.Step,
                ["branch"] = branch.Branch,
                ["runs"] = taken.Count(b => b.Taken > 0),
                ["taken"] = taken.Sum(b => (long)b.Taken),
            });
        }

        node["procedure_branches"] = branches;

        // Only scenarios with landers have the key, so a single-lander campaign's summary is what it always was.
        if (runs.Any(r => r.Landers.Count > 0)) node["landers"] = Landers(runs);
        return node;
    }

    /// <summary>
    /// Per lander, in the scenario's order: its success (the run completed and the lander met every criterion judged on
    /// it), reaching the ocean, a probe that froze in, a station dead at the end, each with its Wilson interval; its
    /// breakthrough quantiles with their intervals; its criteria passed.
    /// </summary>
    private static JsonArray Landers(List<RunRecord> runs)
    {
        var names = runs.SelectMany(r => r.Landers).Select(l => l.Lander).Distinct().ToList();
        var nodes = new JsonArray();
        foreach (var name in names)
        {
            var own = runs.SelectMany(r => r.Landers.Where(l => l.Lander == name)).ToList();
            var n = own.Count;
            var node = new JsonObject { ["name"] = name, ["runs"] = n };
            foreach (var (key, pick) in new (string, Func<Mission.Running.LanderSummary, bool>)[]
            {
                ("successes", l => l.Success), ("reached_ocean", l => l.ReachedOcean), ("stalled", l => l.Stalled), ("station_dead", l => l.StationDead),
            })
            {
                var count = own.Count(pick);
                var (low, high) = WilsonInterval.Compute95(count, n);
                var stem = key == "successes" ? "success" : key;
                node[key] = count;
                node[stem + "_rate"] = n > 0 ? count / (double)n : null;
                node[stem + "_ci95"] = new JsonArray(low, high);
            }

            var quantiles = new JsonArray();
            var breakthrough = own.Select(l => l.BreakthroughTimeS ?? double.PositiveInfinity).ToList();
            foreach (var p in Quantiles)
            {
                var (estimate, qLow, qHigh) = QuantileInterval.Compute(breakthrough, p);
                quantiles.Add(new JsonObject { ["p"] = p, ["t_s"] = estimate, ["ci95"] = new JsonArray(qLow, qHigh) });
            }

            node["breakthrough_quantiles"] = quantiles;
            var depths = own.Select(l => l.FinalDepthM).ToList();
            var (depth, depthLow, depthHigh) = QuantileInterval.Compute(depths, 0.5);
            node["final_depth_median_m"] = depth;
            node["final_depth_median_ci95"] = new JsonArray(depthLow, depthHigh);
            var criteria = new JsonObject();
            foreach (var criterion in own.SelectMany(l => l.Criteria).Select(c => c.Name).Distinct())
            {
                criteria[criterion] = own.Count(l => l.Criteria.Any(c => c.Name == criterion && c.Passed));
            }

            node["criteria_passed"] = criteria;
            nodes.Add(node);
        }

        return nodes;
    }

    private static JsonObject Pair(string first, List<RunRecord> firstRuns, string second, List<RunRecord> secondRuns)
    {
        var other = secondRuns.ToDictionary(r => r.Index);
        long both = 0, firstOnly = 0, secondOnly = 0, neither = 0;
        var disagreeing = new JsonArray();
        foreach (var a in firstRuns)
        {
            if (!other.TryGetValue(a.Index, out var b)) continue;
            if (a.Success && b.Success) both++;
            else if (a.Success) firstOnly++;
            else if (b.Success) secondOnly++;
            else neither++;
            if (a.Success != b.Success)
            {
                disagreeing.Add(new JsonObject { ["run"] = a.Index, ["seed"] = a.Seed, [first] = a.Success, [second] = b.Success });
            }
        }

        var (difference, low, high) = NewcombePairedDifference.Compute95(both, firstOnly, secondOnly, neither);
        return new JsonObject
        {
            ["first"] = first,
            ["second"] = second,
            ["runs"] = both + firstOnly + secondOnly + neither,
            ["both"] = both,
            ["first_only"] = firstOnly,
            ["second_only"] = secondOnly,
            ["neither"] = neither,
            ["mcnemar_p"] = McNemarExact.PValue(firstOnly, secondOnly),
            ["difference"] = difference,
            ["difference_ci95"] = new JsonArray(low, high),
            ["disagreeing_runs"] = disagreeing,
        };
    }
}
