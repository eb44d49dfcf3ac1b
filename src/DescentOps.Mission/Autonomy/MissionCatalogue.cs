using DescentOps.Primitives.Units;
using DescentOps.Rules.Catalogue;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Autonomy;

/// <summary>
/// What rules may read and command in a mission: the probe's telemetry points with their physical ranges, and the
/// telecommands the probe obeys with the ranges of their arguments, and the recall of each vehicle (sent through the probe's modem). The ranges come from the scenario (a depth
/// cannot exceed the shell, a power its heater's maximum), so the checker can refuse a threshold no probe could reach.
/// </summary>
public static class MissionCatalogue
{
    public const string Head = "probe.head";
    public const string Wall = "probe.wall";

    /// <summary>The probe's power bus, target of the load commands (only with a power system).</summary>
    public const string Bus = "probe.bus";

    /// <summary>The probe's hot-water jets (only a probe with a jets section).</summary>
    public const string Jets = "probe.jets";

    public static IReadOnlyList<string> Regimes { get; } = [.. Enum.GetNames<Probe.ProbeRegime>()];

    public static TelemetryCatalogue For(Scenario scenario)
    {
        var maxPowerW = Math.Max(scenario.Probe.MaxHeadPowerW, scenario.Probe.MaxWallPowerW);
        var power = scenario.Power is { } p ? new Probe.ProbePowerSystem(p, scenario.Probe) : null;
        // Without a power system the bus offers exactly what it delivers, at most both heaters and the electronics.
        var maxBusW = power?.MaxAvailablePowerW() ?? scenario.Probe.MaxHeadPowerW + scenario.Probe.MaxWallPowerW + scenario.Probe.ElectronicsPowerW;
        TelemetryPointSpec[] points =
        [
            new NumericPointSpec("probe.depth", PhysicalDimension.Length, 0, scenario.Shell.ThicknessM),
            // Speed bound: a melt probe never exceeds a few metres per hour; 1 m/s is a generous physical ceiling.
            new NumericPointSpec("probe.velocity", PhysicalDimension.Speed, 0, 1.0),
            new NumericPointSpec("probe.ice_temperature", PhysicalDimension.Temperature, 0, 273.16),
            new NumericPointSpec("probe.head_power", PhysicalDimension.Power, 0, scenario.Probe.MaxHeadPowerW),
            new NumericPointSpec("probe.wall_power", PhysicalDimension.Power, 0, scenario.Probe.MaxWallPowerW),
            new NumericPointSpec("probe.energy_used", PhysicalDimension.Energy, 0, maxPowerW * 3 * 1000 * 365.25 * 86400),
            new NumericPointSpec("probe.tilt", PhysicalDimension.Angle, -Math.PI / 2, Math.PI / 2),
            new NumericPointSpec("probe.battery_soc", PhysicalDimension.Dimensionless, 0, 1),
            new NumericPointSpec("probe.bus_power_available", PhysicalDimension.Power, 0, maxBusW),
            new NumericPointSpec("probe.buffer_fill", PhysicalDimension.Dimensionless, 0, 1),
            // Without jets the jet power is always 0 and the hole is the probe's own radius.
            new NumericPointSpec("probe.jet_power", PhysicalDimension.Power, 0, scenario.Probe.Jets?.MaxHeatW ?? 0.0),
            new NumericPointSpec("probe.hole_radius", PhysicalDimension.Length, 0, scenario.Probe.Jets is null ? scenario.Probe.RadiusM : Scenarios.Model.ProbeJetsModel.MaxHoleRadiusM),
            new DiscretePointSpec("probe.regime", Regimes),
            // What carries the frames, as the probe's transceivers sense it (the link tells the probe when it changes).
            new DiscretePointSpec("probe.link_path", Tether.LinkPaths.All),
            // No sensor measures the sideways drift: true state, for fault triggers only.
            new NumericPointSpec("probe.lateral_drift", PhysicalDimension.Length, -scenario.Shell.ThicknessM, scenario.Shell.ThicknessM) { TrueStateOnly = true },
            // Each bus load's state, as the power controller reports it (only with a power system).
            .. power is null ? [] : Probe.ProbeLoadStates.Points(power),
            // The station as the ground hears it (Ground/StationWatch): the ground's own knowledge, for ground rules and procedures.
            new DiscretePointSpec(Ground.StationWatch.AlivePoint, Ground.StationWatch.States) { GroundOnly = true },
            new DiscretePointSpec(Ground.StationWatch.InViewPoint, Ground.StationWatch.States) { GroundOnly = true },
        ];
        CommandSpec[] commands =
        [
            new(new(Head), "set_power", [new QuantityArgumentSpec("power", PhysicalDimension.Power, 0, scenario.Probe.MaxHeadPowerW)]),
            new(new(Wall), "set_power", [new QuantityArgumentSpec("power", PhysicalDimension.Power, 0, scenario.Probe.MaxWallPowerW)]),
            new(MissionIds.Probe, "steer", [new QuantityArgumentSpec("power_difference", PhysicalDimension.Power, -scenario.Probe.MaxHeadPowerW / 2, scenario.Probe.MaxHeadPowerW / 2)]),
            new(MissionIds.Probe, "pause_descent", []),
            new(MissionIds.Probe, "resume_descent", []),
            new(MissionIds.Probe, "enter_safe_mode", []),
            new(MissionIds.Probe, "drop_relay", []),
            .. power is null ? [] : BusCommands(power),
            .. scenario.Probe.Jets is not { } jets ? [] : JetCommands(jets),
            // Each vehicle is its own actuator, so that rules recalling different vehicles never exclude each other.
            .. scenario.Vehicles.Select(v => new CommandSpec(MissionIds.Vehicle(v.Name), Vehicles.VehicleComponent.RecallCommand, [])),
        ];
        return new TelemetryCatalogue(points, commands) { Procedures = new HashSet<string>(scenario.Procedures.Select(p => p.Name), StringComparer.Ordinal) };
    }

    /// <summary>The jets' heat (0 W: off) and the hole radius they cut.</summary>
    private static CommandSpec[] JetCommands(ProbeJetsModel jets) =>
    [
        new(new(Jets), "set_power", [new QuantityArgumentSpec("power", PhysicalDimension.Power, 0, jets.MaxHeatW)]),
        new(new(Jets), "set_hole_radius", [new QuantityArgumentSpec("radius", PhysicalDimension.Length, jets.MinimumHoleRadiusM, ProbeJetsModel.MaxHoleRadiusM)]),
    ];

    /// <summary>Switching a bus load off and on again, by the names the scenario gives its loads.</summary>
    private static CommandSpec[] BusCommands(Probe.ProbePowerSystem power)
    {
        string[] names = [.. power.LoadModels.Select(l => l.Name)];
        return
        [
            new(new(Bus), "shed_load", [new WordArgumentSpec("load", names)]),
            new(new(Bus), "restore_load", [new WordArgumentSpec("load", names)]),
        ];
    }
}
