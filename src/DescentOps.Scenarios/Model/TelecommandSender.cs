namespace DescentOps.Scenarios.Model;

/// <summary>
/// Who holds a time-tagged telecommand until its time: the ground sends it then, and it reaches the probe one uplink
/// later (light time, the station, the fibre or relays); the probe's own store releases it exactly then.
/// </summary>
public enum TelecommandSender
{
    Ground,
    Board,
}
