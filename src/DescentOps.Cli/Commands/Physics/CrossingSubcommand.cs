using System.CommandLine;
using DescentOps.Mission.Probe;
using DescentOps.Physics.Descent;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// <c>physics crossing SCENARIO</c>: how long the scenario's probe takes to cross its shell at full power, from the
/// descent model the simulated probe itself is built with (<see cref="ProbeDescentFactory"/>).
/// </summary>
internal static class CrossingSubcommand
{
    public static Command Create()
    {
        var scenarioArgument = new Argument<string?>("SCENARIO")
        {
            Description = "Scenario file, or the name of a built-in scenario; the built-in default when omitted.",
            Arity = ArgumentArity.ZeroOrOne,
        };
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "crossing",
            "Time and energy for the scenario's probe to cross its shell at full head and wall power, with no faults and no stops: "
            + "t = ∫dz/v over the simulator's own descent model; energy = (head + wall + electronics power) · t. "
            + "regimes gives the seconds spent sublimating and melting; they add up to time_s. A probe that stalls has time_s null and stall_depth_m set.")
        {
            scenarioArgument, json,
        };
        command.SetAction(parse => PhysicsAction.Run("crossing", parse, json, p =>
        {
            var scenario = ScenarioSource.Load(p.GetValue(scenarioArgument));
            var model = ProbeDescentFactory.Model(scenario);
            var probe = scenario.Probe;
            var crossing = ShellCrossing.Integrate(model, probe.HeadPowerW, probe.WallPowerW);
            var busW = probe.HeadPowerW + probe.WallPowerW + probe.ElectronicsPowerW;
            var regimes = new PhysicsReport("regimes");
            foreach (var (regime, seconds) in crossing.RegimeTimesS.OrderBy(r => r.Key))
            {
                regimes.Number(regime.ToString().ToLowerInvariant(), regime.ToString().ToLowerInvariant(), seconds, "s");
            }

            var report = new PhysicsReport($"shell crossing: {scenario.Name}")
                .Text("scenario", "scenario", scenario.Name)
                .Number("time_s", "time to cross", crossing.TimeS, "s")
                .Number("time_d", "  in days", crossing.TimeS / 86_400.0, "d")
                .Number("energy_j", "energy (bus power × time)", busW * crossing.TimeS, "J")
                .Number("bus_power_w", "bus power (head + wall + electronics)", busW, "W")
                .Section("regimes", "time in each regime", regimes)
                .Number("shell_thickness_m", "shell thickness", model.Shell.ThicknessM, "m")
                .Number("liquid_onset_depth_m", "depth where melting can start", model.LiquidOnsetDepthM, "m")
                .Number("base_temperature_k", "base temperature", model.Shell.BaseTemperatureK, "K")
                .Number("mean_velocity_m_s", "mean speed", model.Shell.ThicknessM / crossing.TimeS, "m/s");
            return crossing.StallDepthM is { } stall ? report.Number("stall_depth_m", "stalls at depth", stall, "m") : report;
        }));
        return command;
    }
}
