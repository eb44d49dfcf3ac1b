using DescentOps.Engine.Running;
using DescentOps.Physics.Seawater;
using DescentOps.Scenarios.Envelope;

namespace DescentOps.Mission.Tests;

/// <summary>
/// The built-in thick shell: 25 km of ice over a cold ocean under some 23 MPa, crossed to the end with its vehicles at
/// work in water at its own freezing point. Time-compressed (a 14 kW head, 12-hour telemetry) so the run takes a few
/// thousand events.
/// </summary>
public sealed class ThickShellScenarioTests
{
    [Fact]
    public async Task The_thick_shell_runs_to_completion_with_its_vehicles_in_the_cold_high_pressure_ocean()
    {
        var (scenario, summary, sink, _) = await SharedRuns.OfBuiltInAsync("thick-shell-deep-ocean.yaml");
        Assert.True(scenario.Shell.ThicknessM >= 20_000);


        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
        Assert.Equal(0, summary.ComponentFailures);
        Assert.Equal(2, sink.OfKind("vehicle.task_complete").Count());

        // The ocean the vehicles met: TEOS-10 water at its freezing point under the shell's pressure, colder than −2 °C and
        // under more than 20 MPa; the acoustic link's sound speed is that water's (GSW sound_speed_t_exact is what the
        // Seawater tests hold the Gibbs function to).
        var shell = ScenarioShell.Build(scenario);
        var ocean = ScenarioOcean.Build(scenario, shell);
        Assert.True(ocean.Water.SeaPressurePa > 20e6);
        Assert.Equal(ocean.Water.FreezingTemperatureK, ocean.TemperatureK);
        Assert.True(ocean.TemperatureK < 271.15);
        Assert.Equal(Teos10Seawater.AtFreezing(30.0, ocean.Water.SeaPressurePa).SoundSpeedMPerS, ocean.SoundSpeedMPerS);
        foreach (var link in sink.OfKind("vehicle.acoustic_link"))
        {
            Assert.Equal(ocean.SoundSpeedMPerS, CollectingSink.Field(link, "sound_speed_m_s"), 9);
        }
    }

    // The 40 km variants (completing under Ainslie-McColm, refused under Francois-Garrison) are ThickShellRefuseOrCompleteTests.
}
