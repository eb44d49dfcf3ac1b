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
        if (scenario.Landers.Count == 0) return Lander(scenario, rules, LanderIds.Single);
        var desk = MissionDeskRules.Compile(scenario);
        var hasDesk = desk.Rules.Count > 0; // a section of comments alone compiles to no rule, and then there is no desk to feed
        return
        [
            .. scenario.Landers.SelectMany(l => Lander(l.View, MissionRules.Compile(l.View), LanderIds.For(l.Name))),
            new LinkHome.LinkHomeComponent(scenario, hasDesk),
            .. hasDesk ? [new MissionDeskComponent(desk)] : Array.Empty<ISimComponent>(),
        ];
    }

    /// <summary>The components of one lander: alone, with the fixed ids; one of several, with its own.</summary>
    private static IReadOnlyList<ISimComponent> Lander(Scenario scenario, Rules.Compiled.CompiledRuleSet rules, LanderIds ids)
    {
        var timed = MissionTimeline.CompileTelecommands(scenario);
        var uplinks = MissionTimeline.CompileUplinks(scenario);
        var procedures = Procedures.MissionProcedures.Compile(scenario);
        return
        [
            new ProbeComponent(scenario, rules, ids),
            new TetherComponent(scenario, ids),
            new StationComponent(scenario, ids, StationHearing.IsRead(rules, uplinks, procedures)),
            new GroundTeamComponent(scenario, rules, timed, uplinks, ids, procedures),
            new OnboardAutonomyComponent(rules, timed, uplinks, ids),
            new FaultInjectorComponent(scenario, ids),
            .. scenario.Vehicles.Select(v => new VehicleComponent(v, scenario, ids)),
        ];
    }
}
