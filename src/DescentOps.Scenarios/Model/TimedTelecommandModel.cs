using DescentOps.Scenarios.Loading;

namespace DescentOps.Scenarios.Model;

/// <summary>
/// A telecommand tagged with a time: <see cref="Send"/> is the command as a rule's send writes it, without the
/// keyword ("probe.wall set_power(power = 3 kW)"); it is checked against the mission's catalogue when the run is
/// assembled, with errors at <see cref="SendLocation"/>.
/// </summary>
public sealed record TimedTelecommandModel(double AtS, TelecommandSender From, string Send, SourceLocation SendLocation, string FieldPath);
