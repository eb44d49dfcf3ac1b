using DescentOps.Mission.Autonomy;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Rehearsal.Tests;

/// <summary>The team's limit panel states each limit in plain numbers with the point's SI unit.</summary>
public sealed class RuleLimitTests
{
    [Fact]
    public void Limits_read_in_plain_numbers_with_their_SI_unit()
    {
        // power-dip-load-shedding.yaml's rules: shed below 8 kW available, restore above 12 kW with the head below 5 kW.
        var scenario = ScenarioLoader.LoadText(BuiltInScenarios.Text("power-dip-load-shedding.yaml"), "builtin:power-dip-load-shedding.yaml");
        var limits = RuleLimit.Of(MissionRules.Compile(scenario), MissionCatalogue.For(scenario)).Select(l => l.Describe()).ToList();

        Assert.Contains("probe.bus_power_available below 8000 W", limits);
        Assert.Contains("probe.bus_power_available above 12000 W", limits);
        Assert.Contains("probe.head_power below 5000 W", limits);
    }
}
