using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Station;

/// <summary>
/// What the station is built from, fixed for a run: its model, the lander it serves, the delays home, the dose model
/// (null without radiation) and the link home its transmitter follows. Every part of the station's logic reads it;
/// none changes it.
/// </summary>
public sealed class StationDesign
{
    /// <summary>Events further off than this (about 300 years) never happen within a run and are not scheduled.</summary>
    public const double MaxTimerS = 1e10;

    public StationDesign(Scenario scenario, LanderIds ids, bool reportsCarrier = false)
    {
        ReportsCarrier = reportsCarrier;
        ArgumentNullException.ThrowIfNull(scenario);
        Ids = ids;
        Station = scenario.Station;
        SiteLink = new HomeLink(scenario);
        OneWayLightTimeS = SiteLink.OneWayLightTimeS;
        DelayHome = SimDuration.FromSeconds(scenario.Station.ForwardingDelayS + OneWayLightTimeS);
        Forwarding = SimDuration.FromSeconds(scenario.Station.ForwardingDelayS);
        Dose = scenario.Station.Radiation is { } radiation ? new StationDose(radiation) : null;
        // A lander of several hands its frames to the shared link home, which holds them for the lander's turn and
        // sees the station's windows; the station itself then only forwards.
        Shared = ids.Lander is not null;
        // With several landers the shared link home sees the windows; the station's own queue then holds only what
        // arrives while it recovers from a reset, as if home were always in view.
        Link = Shared ? new HomeLink(scenario with { Station = scenario.Station with { Link = null } }) : SiteLink;
        Queued = (scenario.Station.Link is not null && !Shared) || scenario.Station.Charging is not null || scenario.Faults.Any(f => f.Kind == FaultKind.StationUpset);
    }

    public StationModel Station { get; }

    /// <summary>The ids of the lander the station serves (its ground team's, tether's and probe's).</summary>
    public LanderIds Ids { get; }

    /// <summary>Whether the station hands frames to a link home shared by several landers.</summary>
    public bool Shared { get; }

    /// <summary>Its own handling delay plus the one-way light time: how long a frame passed at once takes home.</summary>
    public SimDuration DelayHome { get; }

    /// <summary>The station's own handling delay.</summary>
    public SimDuration Forwarding { get; }

    public double OneWayLightTimeS { get; }

    /// <summary>The station's dose model, or null when the scenario gives no radiation.</summary>
    public StationDose? Dose { get; }

    /// <summary>The site's own view of home (its windows), whoever sends.</summary>
    public HomeLink SiteLink { get; }

    /// <summary>The link the station's transmitter follows: the site's, or always open when a shared link home sends.</summary>
    public HomeLink Link { get; }

    /// <summary>Whether frames and commands go through the queues: only when windows or upsets (discharges or faults) can hold them up.</summary>
    public bool Queued { get; }

    /// <summary>Whether the ground is told of the carrier's changes (only when its rules or procedures read the station's points).</summary>
    public bool ReportsCarrier { get; }

    /// <summary>What the scenario's charging part says, or queue when only upset faults reset the station.</summary>
    public bool QueueWhileRecovering => Station.Charging?.QueueWhileRecovering ?? true;
}
