using DescentOps.Engine.Components;
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

    public OnboardAutonomyComponent(CompiledRuleSet rules)
        : base(MissionIds.Autonomy, FailurePolicy.RestartFromLastState)
    {
        _rules = new RuleHost(rules, Placement.Board);
    }

    public override AutonomyState InitialState => new(null, 0);

    public override AutonomyState Handle(AutonomyState state, object message, ComponentContext context)
    {
        _rules.RestoreTo(state.RulesVersion);
        var commands = message switch
        {
            RunStarted => [],
            TelemetryFrame frame => _rules.OnFrame(frame, context),
            OnboardSamples samples => _rules.OnSamples(OnboardSampleInputs.Of(samples), context),
            RulesWake => _rules.OnWake(context),
            _ => throw new InvalidOperationException($"The on-board autonomy cannot handle {message.GetType().Name}."),
        };
        foreach (var command in commands)
        {
            context.Schedule(RuleHost.Executor(command.Command), SimDuration.Zero, command, MissionPriority.Command);
        }

        var wake = _rules.Rearm(message is RulesWake ? null : state.PendingWake, context, RulesWake.Instance);
        return new AutonomyState(wake, state.CommandsIssued + commands.Count, _rules.Version);
    }
}
