using DescentOps.Engine.Components;
using DescentOps.Mission.Faults;
using DescentOps.Mission.Ground;
using DescentOps.Mission.Probe;
using DescentOps.Mission.Station;
using DescentOps.Mission.Tether;
using DescentOps.Mission.Vehicles;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Running;

/// <summary>Builds the components of a mission from its scenario.</summary>
public static class MissionAssembly
{
    public static IReadOnlyList<ISimComponent> Components(Scenario scenario) =>
    [
        new ProbeComponent(scenario),
        new TetherComponent(scenario),
        new StationComponent(scenario),
        new GroundTeamComponent(),
        new FaultInjectorComponent(scenario),
        .. scenario.Vehicles.Select(v => new VehicleComponent(v)),
    ];
}
