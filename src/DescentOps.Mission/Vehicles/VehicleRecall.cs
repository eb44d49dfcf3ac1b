using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Vehicles;

/// <summary>A recall goes out from the probe's modem: heard at once in contact, otherwise held until contact returns; a recalled vehicle heads home.</summary>
public static class VehicleRecall
{
    public const string Command = "recall_vehicle";

    public static VehicleState Recall(VehicleDesign design, VehicleState state, Telecommand command, ComponentContext context)
    {
        context.Record(CommandRecords.Executed, Severity.Notice,
            RecordField.Of("command", command.Command.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("placement", command.Placement),
            RecordField.Of("issued_t_s", command.IssuedAt.SecondsSinceEpoch),
            RecordField.Of("latency_s", (context.Now - command.IssuedAt).TotalSeconds),
            RecordField.Of("vehicle_phase", state.Phase.ToString()));
        if (state.Finished || !state.Released || state.Recalled) return state;
        if (!state.Link.Up || state.Link.Faulted)
        {
            context.Record(VehicleRecords.CommandHeld, Severity.Warning, RecordField.Of("command", Command), RecordField.Of("reason", "out of acoustic contact"));
            return state with { RecallHeld = true };
        }

        return DoRecall(design, state, context);
    }

    public static VehicleState DoRecall(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        context.Record(VehicleRecords.Recalled, Severity.Notice, RecordField.Of("phase", state.Phase.ToString()), RecordField.Of("range_m", VehicleLegs.PositionNow(state, context.Now).Length));
        state = state with { Recalled = true };
        if (state.Phase != VehiclePhase.Working || state.Leg is { Held: true }) return state;
        return VehicleLegPlanner.StartHome(design, VehicleLegs.Interrupt(state, context) with { Suspended = null }, "recalled", context);
    }
}
