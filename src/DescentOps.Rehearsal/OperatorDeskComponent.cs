using System.Globalization;
using System.Text.Json.Nodes;
using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Running;
using DescentOps.Mission;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Faults;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Station;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Catalogue;
using DescentOps.Scenarios.Model;

namespace DescentOps.Rehearsal;

/// <summary>
/// Where the people of a rehearsal reach into the simulation. Every input is journaled at the instant it is handled
/// (<c>operator.input</c>, with its number, kind and body), which is all a replay needs to give it again. A fault goes
/// to the fault injector, a clear too; a telecommand goes up from the ground to the station a light time away, as the
/// ground team's own commands do, under the origin <c>console-N</c>; an answer to a procedure's step goes to the
/// ground team at once (the console is on the ground); an end stops the run; pace changes and marks are only journaled.
/// </summary>
public sealed class OperatorDeskComponent : SimComponent<OperatorDeskState>
{
    public static ComponentId DeskId { get; } = new("console");

    private readonly Scenario _scenario;
    private readonly TelemetryCatalogue _catalogue;
    private readonly SimDuration _uplink;

    public OperatorDeskComponent(Scenario scenario)
        : base(DeskId, FailurePolicy.AbortRun)
    {
        _scenario = scenario;
        _catalogue = MissionCatalogue.For(scenario);
        _uplink = SimDuration.FromSeconds(scenario.Body.DistanceToGroundM / StationComponent.SpeedOfLightMPerS);
    }

    /// <summary>The origin under which the station, the link and the probe log a console command.</summary>
    public static string CommandOrigin(long number) => "console-" + number.ToString(CultureInfo.InvariantCulture);

    public override OperatorDeskState InitialState => new([]);

    public override OperatorDeskState Handle(OperatorDeskState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                // People are at the console: the ground's procedures wait for them on steps that ask for confirmation.
                context.Schedule(MissionIds.Ground, SimDuration.Zero, PeopleAtConsole.Instance, MissionPriority.Command);
                return state;
            case OperatorInput input:
                context.Record("operator.input", Severity.Notice,
                    RecordField.Of("number", input.Number),
                    RecordField.Of("input", input.KindWord),
                    RecordField.Of("body", input.Body),
                    RecordField.Of("at_tick", context.Now.Ticks));
                return Act(state, input, context);
            default:
                throw new InvalidOperationException($"The console cannot handle {message.GetType().Name}.");
        }
    }

    private OperatorDeskState Act(OperatorDeskState state, OperatorInput input, ComponentContext context)
    {
        switch (input.Kind)
        {
            case OperatorInputKind.Fault:
                var fault = FaultEntry.Parse(input.Body, _scenario, context.Now.SecondsSinceEpoch, state.FaultNames, out var faultError);
                if (fault is null) return Refused(state, input, faultError, context);
                context.Schedule(MissionIds.FaultInjector, SimDuration.Zero, new AddFault(fault), MissionPriority.Fault);
                return state with { FaultNames = state.FaultNames.Add(fault.Name) };
            case OperatorInputKind.Clear:
                context.Schedule(MissionIds.FaultInjector, SimDuration.Zero, new ClearFault(Text(input.Body, "name")), MissionPriority.Fault);
                return state;
            case OperatorInputKind.Command:
                var command = CommandEntry.Check(Text(input.Body, "text"), _catalogue, out var commandError);
                if (command is null) return Refused(state, input, commandError, context);
                var origin = CommandOrigin(input.Number);
                context.Record("command.sent", Severity.Notice,
                    RecordField.Of("command", command.ToString()),
                    RecordField.Of("origin", origin),
                    RecordField.Of("uplink_s", _uplink.TotalSeconds));
                context.Schedule(MissionIds.Station, _uplink, new Telecommand(command, origin, "ground", context.Now), MissionPriority.Command);
                return state;
            case OperatorInputKind.Step:
                context.Schedule(MissionIds.Ground, SimDuration.Zero, StepAnswer.Parse(input), MissionPriority.Command);
                return state;
            case OperatorInputKind.End:
                context.StopRun(RunOutcomeKind.TimeLimit, "the rehearsal was ended at the console");
                return state;
            default:
                return state;
        }
    }

    private static OperatorDeskState Refused(OperatorDeskState state, OperatorInput input, string error, ComponentContext context)
    {
        context.Record("operator.refused", Severity.Warning, RecordField.Of("number", input.Number), RecordField.Of("reason", error));
        return state;
    }

    private static string Text(string body, string field) =>
        JsonNode.Parse(body) is JsonObject o && o[field] is JsonValue v && v.TryGetValue<string>(out var text) ? text : "";
}
