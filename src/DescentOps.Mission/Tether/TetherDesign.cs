using DescentOps.Mission.Probe;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tether;

/// <summary>
/// What the link is built from, fixed for a run: the fibre and its optics, the relay plan and radio (null without
/// relays), and the depths the plan drops relays at. Every part of the link's logic reads it; none changes it.
/// </summary>
public sealed class TetherDesign
{
    public TetherDesign(Scenario scenario, LanderIds ids)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        Ids = ids;
        Tether = scenario.Tether;
        Optics = new TetherOptics(scenario.Tether);
        Plan = scenario.Relays;
        if (Plan is not null)
        {
            Radio = new RelayRadio(Plan, ProbeDescentFactory.Shell(scenario).TemperatureK);
            PlannedDropsM = Plan.IntervalM is { } interval
                ? [.. Enumerable.Range(1, Plan.Carried).Select(k => k * interval).TakeWhile(d => d < scenario.Shell.ThicknessM)]
                : Plan.DropDepthsM;
        }
        else
        {
            PlannedDropsM = [];
        }
    }

    public TetherModel Tether { get; }

    /// <summary>The ids of the lander the link belongs to (its probe's and station's).</summary>
    public LanderIds Ids { get; }

    public TetherOptics Optics { get; }

    public RelayPlanModel? Plan { get; }

    public RelayRadio? Radio { get; }

    /// <summary>The depths the plan drops relays at, shallowest first.</summary>
    public IReadOnlyList<double> PlannedDropsM { get; }

    /// <summary>Light's travel time up the paid-out fibre.</summary>
    public SimDuration FibreDelay(TetherState state) => SimDuration.FromSeconds(state.PaidOutM / Tether.SignalSpeedMPerS);
}
