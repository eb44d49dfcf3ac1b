using DescentOps.Mission.Probe;

namespace DescentOps.Mission.Tests;

/// <summary>The bottom metre carries the ocean's salt wherever the scenario's own layers leave it free.</summary>
public sealed class BasalLayerTests
{
    [Theory]
    [InlineData("{ top: 2499.4 m, bottom: 2499.7 m, salinity: 3 g/kg }", 2499.2, 12.0)]   // above a layer wholly inside the basal metre
    [InlineData("{ top: 2499.4 m, bottom: 2499.7 m, salinity: 3 g/kg }", 2499.5, 3.0)]    // inside it
    [InlineData("{ top: 2499.4 m, bottom: 2499.7 m, salinity: 3 g/kg }", 2499.9, 12.0)]   // below it
    [InlineData("{ top: 2400 m, bottom: 2499.5 m, salinity: 3 g/kg }", 2499.2, 3.0)]      // a layer reaching in from above
    [InlineData("{ top: 2400 m, bottom: 2499.5 m, salinity: 3 g/kg }", 2499.8, 12.0)]
    public void The_oceans_salt_fills_the_bottom_metre_around_the_scenarios_layers(string layer, double depthM, double expectedGPerKg)
    {
        // The default scenario's shell is 2.5 km thick over an ocean of 12 g/kg.
        var scenario = MissionHarness.Edited(("  ocean_salinity: 12 g/kg", $"  ocean_salinity: 12 g/kg\n  layers:\n    - {layer}"));
        Assert.Equal(expectedGPerKg, ProbeDescentFactory.Shell(scenario).SalinityGPerKg(depthM), 9);
    }
}
