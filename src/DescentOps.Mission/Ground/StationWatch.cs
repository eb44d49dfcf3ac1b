using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Ground;

/// <summary>
/// What the ground knows of its station, as a pure state machine. The ground hears the station's carrier while the
/// station is up (not dead, not resetting) and home is in view, one light time after the fact. Hearing it, the station
/// is alive at once; losing it with home in view, the ground waits <c>station.silence_timeout</c> and then takes the
/// station for dead (a reset shorter than that is ridden through); losing it because home set, it concludes nothing.
/// <see cref="SilenceEnds"/> is the instant the present silence becomes a death, if one runs.
/// </summary>
public sealed record StationWatch(bool CarrierOn, bool InView, bool Alive, SimTime? SilenceEnds)
{
    public const string AlivePoint = "station.alive";
    public const string InViewPoint = "station.in_view";
    public const string Yes = "yes";
    public const string No = "no";

    /// <summary>The states both points take.</summary>
    public static IReadOnlyList<string> States { get; } = [Yes, No];

    /// <summary>At the start the station is up and heard whenever home is in view.</summary>
    public static StationWatch Start(bool inView) => new(true, inView, true, null);

    public bool Heard => CarrierOn && InView;

    /// <summary>The carrier came or went (as the ground hears it, a light time after the station).</summary>
    public StationWatch Carrier(bool on, SimTime now, SimDuration timeout) => Settle(this with { CarrierOn = on }, now, timeout);

    /// <summary>Home rose or set (as the ground sees the edge, a light time after the station).</summary>
    public StationWatch View(bool inView, SimTime now, SimDuration timeout) => Settle(this with { InView = inView }, now, timeout);

    /// <summary>The silence has lasted its time: the station is taken for dead, unless the watch has moved on.</summary>
    public StationWatch SilenceOver(SimTime now) => SilenceEnds == now ? this with { Alive = false, SilenceEnds = null } : this;

    private static StationWatch Settle(StationWatch next, SimTime now, SimDuration timeout) =>
        next.Heard ? next with { Alive = true, SilenceEnds = null }
        : next.InView ? next with { SilenceEnds = next.SilenceEnds ?? now + timeout }
        : next with { SilenceEnds = null };
}
