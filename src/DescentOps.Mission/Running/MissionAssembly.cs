using DescentOps.Engine.Components;
using DescentOps.Mission.Autonomy;
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
    /// <summary>The components of a run; the scenario's rules are compiled first, so a bad rule stops the run before it starts.</summary>
    public static IReadOnlyList<ISimComponent> Components(Scenario scenario) => Components(scenario, MissionRules.Compile(scenario));

    /// <summary>The components of a run with its rules already compiled.</summary>
    public static IReadOnlyList<ISimComponent> Components(Scenario scenario, Rules.Compiled.CompiledRuleSet rules)
    {
        var timed = MissionTimeline.CompileTelecommands(scenario);
        var uplinks = MissionTimeline.CompileUplinks(scenario);
        return
        [
            new ProbeComponent(scenario, rules),
            new TetherComponent(scenario),
            new StationComponent(scenario),
            new GroundTeamComponent(scenario, rules, timed, uplinks, Procedures.MissionProcedures.Compile(scenario)),
            new OnboardAutonomyComponent(rules, timed, uplinks),
            new FaultInjectorComponent(scenario),
            .. scenario.Vehicles.Select(v => new VehicleComponent(v, scenario)),
        ];
    }
}
