using DescentOps.Engine.Components;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation;
using DescentOps.Rules.Syntax;

namespace DescentOps.Mission.Ground;

/// <summary>
/// The ground's desk for the mission as a whole (a scenario's <c>mission_rules</c>): every lander's frame reaches it when
/// it reaches the ground, through the shared link, and its rules read each lander's latest frame as "LANDER/point".
/// Frames of different landers arrive out of their sampling order (each waits its lander's turn on the link), so the
/// desk's rules run on the ground's clock: a frame's readings are taken at the instant the frame arrives. Their
/// commands name the lander they go to and join that lander's queue on the shared link.
/// </summary>
public sealed class MissionDeskComponent : SimComponent<MissionDeskState>
{
    private readonly RuleHost _rules;

    public MissionDeskComponent(CompiledRuleSet rules)
        : base(MissionIds.MissionDesk, FailurePolicy.RestartFromLastState)
    {
        _rules = new RuleHost(rules, Placement.Ground);
    }

    public override MissionDeskState InitialState => new(0, null);

    public override MissionDeskState Handle(MissionDeskState state, object message, ComponentContext context)
    {
        _rules.RestoreTo(state.RulesVersion);
        IReadOnlyList<Telecommand> commands;
        switch (message)
        {
            case RunStarted:
                return state;
            case LanderFrame arrived:
                commands = _rules.OnSamples(Samples(arrived, context.Now), context);
                break;
            case MissionDeskWake:
                commands = _rules.OnWake(context);
                state = state with { Wake = null };
                break;
            default:
                throw new InvalidOperationException($"The mission desk cannot handle {message.GetType().Name}.");
        }

        foreach (var command in commands)
        {
            var (lander, routed) = MissionDeskRules.Route(command.Command);
            context.Schedule(MissionIds.LinkHome, SimDuration.Zero, new UplinkBound(lander, command with { Command = routed }), MissionPriority.Command);
        }

        return new MissionDeskState(_rules.Version, _rules.Rearm(state.Wake, context, MissionDeskWake.Instance));
    }

    /// <summary>The frame's readings as the lander's qualified points, taken at the arrival instant.</summary>
    public static IReadOnlyList<TelemetrySample> Samples(LanderFrame arrived, SimTime arrival) =>
        [.. FrameSamples.Of(arrived.Frame).Select(s => new TelemetrySample(MissionDeskRules.Qualified(arrived.Lander, s.Point), arrival, s.Value))];
}
