using DescentOps.Rules.Compiled;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Autonomy;

/// <summary>A checked time-tagged telecommand: when, who holds it until then, what, and the scenario field it came from.</summary>
public sealed record TimedTelecommand(double AtS, TelecommandSender From, CommandAction Command, string Origin);
