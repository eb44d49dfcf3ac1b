using System.Diagnostics;
using System.Globalization;
using DescentOps.Records;
using DescentOps.Mission.Probe;
using DescentOps.Mission.Running;
using DescentOps.Physics.Descent;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Model;

namespace DescentOps.Benchmarks.Physics;

/// <summary>
/// How cheap the descent physics is next to a run, and how much the shell crossing time moves with the modelling
/// choices the physics reference marks as ours (node spacing of the cached solutions, the conductivity coefficient of
/// the 1/T lid, the surface temperature). Figures are ratios and counts measured in one process.
/// </summary>
public static class PhysicsBenchmark
{
    private const double LidCoefficient = DescentOps.Physics.Ice.IceConductivity.ReciprocalCoefficientWPerM;

    public static async Task<int> RunAsync(TextWriter output)
    {
        var c = CultureInfo.InvariantCulture;
        var scenario = BuiltInScenarios.Default();
        var geometry = new ProbeGeometry(scenario.Probe.RadiusM, scenario.Probe.LengthM, scenario.Probe.MassKg);

        // 1. Full steady solutions, the expensive call, over the default shell's temperature range.
        const int solves = 400;
        SteadyDescent.Solve(geometry, 6000, 3000, 200, 2e6, 1.0);
        var watch = Stopwatch.StartNew();
        for (var i = 0; i < solves; i++)
        {
            var t = 135.0 + (135.0 * i / solves);
            SteadyDescent.Solve(geometry, 6000, 3000, t, 1e3 + (2.7e6 * i / solves), 1.0);
        }

        var solveS = watch.Elapsed.TotalSeconds / solves;
        output.WriteLine(string.Create(c, $"SteadyDescent.Solve: {1 / solveS:N0} evaluations/s ({solveS * 1e3:F3} ms each)"));

        // 2. The cached, interpolated rate the probe calls every step.
        var model = new ProbeComponent(scenario).Descent;
        for (var z = 0.0; z < scenario.Shell.ThicknessM; z += 1) model.Rate(z, 6000, 3000);
        const int rates = 2_000_000;
        watch.Restart();
        var sink = 0.0;
        for (var i = 0; i < rates; i++) sink += model.Rate((i % 2_500_000) * 1e-3, 6000, 3000).VelocityMPerS;
        var rateS = watch.Elapsed.TotalSeconds / rates;
        output.WriteLine(string.Create(c, $"ProbeDescentModel.Rate (cached nodes): {1 / rateS:N0} evaluations/s ({rateS * 1e9:F0} ns each; checksum {sink:E3})"));

        // 3. A default run, and the share of its wall time the physics takes.
        watch.Restart();
        var summary = await MissionRunner.RunAsync(scenario, scenario.Run.Seed, scenario.Run.UntilS, NullJournalSink.Instance, KernelChoice.Sequential).ConfigureAwait(false);
        var runS = watch.Elapsed.TotalSeconds;
        var nodes = CountNodes(scenario);
        var steps = summary.FramesSent;
        var physicsS = (nodes * solveS) + (steps * 2 * rateS);
        output.WriteLine(string.Create(c, $"default run (sequential kernel, no log): {runS:F2} s wall for {summary.FinalTimeS / 86400:F1} simulated days; {nodes} steady solutions and ~{steps * 2} rate lookups ≈ {physicsS:F2} s, {physicsS / runS:P0} of the run"));

        // 4. Sensitivity of the crossing time to modelling choices.
        var baseline = CrossingS(scenario, ProbeDescentModel.DefaultNodeSpacingM, LidCoefficient);
        output.WriteLine();
        output.WriteLine("| choice | crossing time (d) | change |");
        output.WriteLine("|---|---|---|");
        output.WriteLine(string.Create(c, $"| baseline (5 m nodes, k = 651/T lid, seal after 2 diameters, 132 K surface) | {baseline / 86400:F3} | |"));
        foreach (var (label, time) in new (string, double)[]
        {
            ("nodes every 1 m", CrossingS(scenario, 1.0, LidCoefficient)),
            ("nodes every 20 m", CrossingS(scenario, 20.0, LidCoefficient)),
            ("lid conductivity +15 % (749/T; the 1/T profile shape does not depend on it)", CrossingS(scenario, 5.0, LidCoefficient * 1.15)),
            ("seal after 1 hole diameter", CrossingS(scenario, 5.0, LidCoefficient, 1.0)),
            ("seal after 20 hole diameters", CrossingS(scenario, 5.0, LidCoefficient, 20.0)),
            ("surface 10 K colder", CrossingS(scenario with { Shell = scenario.Shell with { SurfaceTemperatureK = scenario.Shell.SurfaceTemperatureK - 10 } }, 5.0, LidCoefficient)),
            ("surface 10 K warmer", CrossingS(scenario with { Shell = scenario.Shell with { SurfaceTemperatureK = scenario.Shell.SurfaceTemperatureK + 10 } }, 5.0, LidCoefficient)),
        })
        {
            output.WriteLine(string.Create(c, $"| {label} | {time / 86400:F3} | {Change(time, baseline)} |"));
        }

        return 0;
    }

    private static string Change(double time, double baseline)
    {
        var change = (time / baseline) - 1;
        return Math.Abs(change) < 5e-5 ? "< 0.01 %" : change.ToString("+0.00%;-0.00%", CultureInfo.InvariantCulture);
    }

    private static int CountNodes(Scenario scenario)
    {
        var model = new ProbeComponent(scenario).Descent;
        for (var z = 0.0; z <= scenario.Shell.ThicknessM; z += 1) model.Rate(z, scenario.Probe.HeadPowerW, scenario.Probe.WallPowerW);
        return model.SolutionsComputed;
    }

    /// <summary>∫ dz / v(z) over the shell at full power, midpoint rule on 1 m slices.</summary>
    private static double CrossingS(Scenario scenario, double nodeSpacingM, double conductivityCoefficientWPerM, double sealDiameters = DescentOps.Physics.Vacuum.LiquidOnset.DefaultSealDiameters)
    {
        var model = ProbeDescentFactory.Model(scenario, nodeSpacingM, sealDiameters, conductivityCoefficientWPerM);
        var t = 0.0;
        for (var z = 0.5; z < scenario.Shell.ThicknessM; z += 1.0) t += 1.0 / model.Rate(z, scenario.Probe.HeadPowerW, scenario.Probe.WallPowerW).VelocityMPerS;
        return t;
    }
}
