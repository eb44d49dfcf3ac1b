using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Units;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Tests;

/// <summary>
/// An invented probe's catalogue. Ranges are round numbers chosen for these tests, not a design: head
/// temperature 0–1000 K, depth 0–5000 m, head power 0–10 kW, wall power 0–3 kW, descent speed 0–10 m/h.
/// </summary>
internal static class TestCatalogue
{
    public static TelemetryCatalogue Instance { get; } = new(
        [
            new NumericPointSpec("probe.head_temp", PhysicalDimension.Temperature, 0.0, 1000.0),
            new NumericPointSpec("probe.depth", PhysicalDimension.Length, 0.0, 5000.0),
            new NumericPointSpec("probe.head_power", PhysicalDimension.Power, 0.0, 10_000.0),
            new NumericPointSpec("probe.descent_speed", PhysicalDimension.Speed, 0.0, 10.0 / 3600.0),
            new DiscretePointSpec("probe.mode", ["descending", "paused", "safe"]),
            new DiscretePointSpec("station.link", ["up", "down"]),
        ],
        [
            new CommandSpec(new ComponentId("probe.head"), "set_power", [new QuantityArgumentSpec("power", PhysicalDimension.Power, 0.0, 8000.0)]),
            new CommandSpec(new ComponentId("probe.wall"), "set_power", [new QuantityArgumentSpec("power", PhysicalDimension.Power, 0.0, 3000.0)]),
            new CommandSpec(new ComponentId("probe.heater-3"), "switch", [new WordArgumentSpec("state", ["on", "off"])]),
            new CommandSpec(new ComponentId("probe"), "pause_descent", []),
            new CommandSpec(new ComponentId("probe"), "enter_safe_mode", []),
            new CommandSpec(new ComponentId("probe"), "steer", [new QuantityArgumentSpec("heading", PhysicalDimension.Angle, 0.0, 2.0 * Math.PI)]),
            new CommandSpec(new ComponentId("station"), "drop_relay", [new QuantityArgumentSpec("relay", PhysicalDimension.Dimensionless, 1.0, 4.0)]),
            new CommandSpec(new ComponentId("wisp-1"), "recall", []),
        ]);

    public static RuleCheckResult Check(string text) => RuleChecker.CheckSource(new RuleSource("test.dorules", text), Instance);

    public static CompiledRuleSet Compile(string text)
    {
        var result = Check(text);
        Assert.True(result.Succeeded, string.Join("\n", result.Errors));
        return result.RuleSet!;
    }
}
