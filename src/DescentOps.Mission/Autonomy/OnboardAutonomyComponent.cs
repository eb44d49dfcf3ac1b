using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Scenarios.Model;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;

namespace DescentOps.Mission.Autonomy;

/// <summary>
/// The probe's on-board rules: they see each frame the moment it is sampled and their commands reach the probe's
/// actuators at once, which is what on-board autonomy buys over a ground team hours of light and links away.
/// </summary>
public sealed class OnboardAutonomyComponent : SimComponent<AutonomyState>
{
    private readonly RuleHost _rules;
    private readonly LanderIds _ids;
    private readonly IReadOnlyList<TimedTelecommand> _timed;
    private readonly IReadOnlyList<CompiledRuleSet> _uplinks;

    /// <param name="rules">The mission's rules; the on-board ones run here.</param>
    /// <param name="timed">The mission's time-tagged telecommands; the probe's store releases those it holds at their times.</param>
    /// <param name="uplinks">Rule sets the ground may uplink; an upload names one by its index.</param>
    /// <param name="ids">The ids of the lander it serves (its probe); a single lander's by default.</param>
    public OnboardAutonomyComponent(CompiledRuleSet rules, IReadOnlyList<TimedTelecommand>? timed = null, IReadOnlyList<CompiledRuleSet>? uplinks = null, LanderIds? ids = null)
        : base((ids ?? LanderIds.Single).Autonomy, FailurePolicy.RestartFromLastState)
    {
        _ids = ids ?? LanderIds.Single;
        _rules = new RuleHost(rules, Placement.Board);
        _timed = timed ?? [];
        _uplinks = uplinks ?? [];
    }

    public override AutonomyState InitialState => new(null, 0);

    public override AutonomyState Handle(AutonomyState state, object message, ComponentContext context)
    {
        _rules.RestoreTo(state.RulesVersion);
        var commands = message switch
        {
            RunStarted => Store(context),
            TelemetryFrame frame => _rules.OnFrame(frame, context),
            OnboardSamples samples => _rules.OnSamples(OnboardSampleInputs.Of(samples), context),
            RulesWake => _rules.OnWake(context),
            TimedTelecommandDue due => Release(_timed[due.Index], context),
            Telecommand { Command.Command: MissionTimeline.LoadRulesCommand } upload => LoadRules(upload, context),
            _ => throw new InvalidOperationException($"The on-board autonomy cannot handle {message.GetType().Name}."),
        };
        foreach (var command in commands)
        {
            context.Schedule(_ids.Of(RuleHost.Executor(command.Command)), SimDuration.Zero, command, MissionPriority.Command);
        }

        var wake = _rules.Rearm(message is RulesWake ? null : state.PendingWake, context, RulesWake.Instance);
        return new AutonomyState(wake, state.CommandsIssued + commands.Count, _rules.Version);
    }

    /// <summary>Stored telecommands wait in the probe's store for their times.</summary>
    private IReadOnlyList<Telecommand> Store(ComponentContext context)
    {
        for (var i = 0; i < _timed.Count; i++)
        {
            if (_timed[i].From == TelecommandSender.Board) context.ScheduleSelf(SimDuration.FromSeconds(_timed[i].AtS), new TimedTelecommandDue(i), MissionPriority.Command);
        }

        return [];
    }

    private static IReadOnlyList<Telecommand> Release(TimedTelecommand timed, ComponentContext context)
    {
        context.Record(CommandRecords.Released, Severity.Notice,
            RecordField.Of("command", timed.Command.ToString()),
            RecordField.Of("origin", timed.Origin));
        return [new Telecommand(timed.Command, timed.Origin, "board", context.Now)];
    }

    private IReadOnlyList<Telecommand> LoadRules(Telecommand upload, ComponentContext context)
    {
        var index = (int)upload.Command.Arguments[0].ValueSi!.Value;
        var count = _rules.Load(_uplinks[index], context);
        context.Record(RuleRecords.SetLoaded, Severity.Notice,
            RecordField.Of("origin", upload.Origin),
            RecordField.Of("placement", "board"),
            RecordField.Of("rules", count),
            RecordField.Of("issued_t_s", upload.IssuedAt.SecondsSinceEpoch),
            RecordField.Of("latency_s", (context.Now - upload.IssuedAt).TotalSeconds));
        return [];
    }
}
