using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Messages;
using DescentOps.Rules.Catalogue;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Model;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests;

/// <summary>
/// The probe's telemetry points are named in three places (what the probe reports, what rules may read, what a
/// sensor fault may name); this keeps the three lists the same.
/// </summary>
public sealed class CatalogueAgreementTests
{
    [Fact]
    public void Frames_catalogue_and_scenario_format_name_the_same_numeric_points()
    {
        var scenario = BuiltInScenarios.Default();
        var catalogue = MissionCatalogue.For(scenario);
        var formatPoints = ProbeTelemetryPoints.Numeric.Select(p => p.Name).Order(StringComparer.Ordinal).ToList();
        var cataloguePoints = formatPoints.Where(p => catalogue.FindPoint(p) is NumericPointSpec).ToList();
        Assert.Equal(formatPoints, cataloguePoints);
        Assert.IsType<DiscretePointSpec>(catalogue.FindPoint("probe.regime"));

        var framePoints = FirstFrame(new Probe.ProbeComponent(scenario)).Readings.Select(r => r.Point).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(formatPoints, framePoints);
    }

    [Theory]
    [InlineData("default.yaml")]
    [InlineData("power-dip-load-shedding.yaml")]
    public void The_readme_documents_every_point_rules_and_triggers_may_read_and_which_are_true_state_or_ground_only(string scenarioName)
    {
        var catalogue = MissionCatalogue.For(DescentOps.Scenarios.Loading.ScenarioLoader.LoadText(BuiltInScenarios.Text(scenarioName), scenarioName));
        var rows = File.ReadAllLines(Path.Combine(RepositoryRoot.Path, "README.md"))
            .Where(l => l.StartsWith("| `probe.", StringComparison.Ordinal) || l.StartsWith("| `station.", StringComparison.Ordinal))
            .Select(l => l.Split('|', StringSplitOptions.TrimEntries))
            .ToDictionary(c => c[1].Trim('`'), c => c[4]);
        // A row written with NAME stands for one point per name the scenario gives (its bus loads); it must match some.
        var names = catalogue.Points.Select(p => p.Name).ToList();
        string RowOf(string point) => rows.ContainsKey(point) ? point
            : rows.Keys.SingleOrDefault(r => r.EndsWith(".NAME", StringComparison.Ordinal) && point.StartsWith(r[..^"NAME".Length], StringComparison.Ordinal)) ?? point;
        Assert.Equal(rows.Keys.Where(r => !r.EndsWith(".NAME", StringComparison.Ordinal)).Order(StringComparer.Ordinal),
            names.Select(RowOf).Where(r => !r.EndsWith(".NAME", StringComparison.Ordinal)).Distinct().Order(StringComparer.Ordinal));
        Assert.All(names, n => Assert.True(rows.ContainsKey(RowOf(n)), $"README has no row for {n}"));
        foreach (var point in catalogue.Points)
        {
            Assert.Equal(point.TrueStateOnly, rows[RowOf(point.Name)] == "triggers only");
            Assert.Equal(point.GroundOnly, rows[RowOf(point.Name)] == "ground rules, procedures");
        }

        if (scenarioName == "power-dip-load-shedding.yaml")
        {
            Assert.Equal(["probe.load.electronics", "probe.load.head", "probe.load.sampling-pump", "probe.load.wall"], names.Where(n => n.StartsWith("probe.load.", StringComparison.Ordinal)).Order(StringComparer.Ordinal));
        }
    }

    /// <summary>Runs the probe alone for its first second and returns the first frame it sends.</summary>
    internal static TelemetryFrame FirstFrame(Probe.ProbeComponent probe)
    {
        var caught = new List<TelemetryFrame>();
        var setup = new Engine.Running.KernelSetup(
            [probe, new FrameCatcher(MissionIds.Tether, caught), new FrameCatcher(MissionIds.Autonomy, caught), new FrameCatcher(MissionIds.FaultInjector, caught)],
            1, Primitives.Time.SimTime.FromSecondsSinceEpoch(1), Records.NullJournalSink.Instance);
        Engine.Running.SequentialKernel.Run(setup);
        return caught.First();
    }

    /// <summary>Stands in for the probe's neighbours and keeps the frames it is sent.</summary>
    private sealed class FrameCatcher(Primitives.Identity.ComponentId id, List<TelemetryFrame> caught) : Engine.Components.SimComponent<int>(id)
    {
        public override int InitialState => 0;

        public override int Handle(int state, object message, Engine.Components.ComponentContext context)
        {
            if (message is TelemetryFrame frame) caught.Add(frame);
            return state + 1;
        }
    }
}
