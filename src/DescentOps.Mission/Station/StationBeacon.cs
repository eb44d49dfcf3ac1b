using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Station;

/// <summary>
/// The station's carrier, as the ground hears it: on while the station is neither dead nor resetting. When a ground
/// rule or procedure reads the station's points (<see cref="StationDesign.ReportsCarrier"/>), each change reaches the
/// ground one light time after it happens; otherwise nothing is sent, so other runs' logs stay as they were.
/// </summary>
public static class StationBeacon
{
    public static bool CarrierOn(StationState state) => !state.Failed && state.RecoveringUntil is null;

    /// <summary>Tells the ground of a change of the carrier between <paramref name="before"/> and <paramref name="after"/>.</summary>
    public static void Report(StationDesign design, StationState before, StationState after, ComponentContext context)
    {
        if (!design.ReportsCarrier || CarrierOn(before) == CarrierOn(after)) return;
        context.Schedule(design.Ids.Ground, SimDuration.FromSeconds(design.OneWayLightTimeS), new StationCarrier(CarrierOn(after)), MissionPriority.Fault);
    }
}
