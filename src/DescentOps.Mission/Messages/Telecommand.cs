using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;

namespace DescentOps.Mission.Messages;

/// <summary>A command on its way to the probe: what, which rule (or operator) sent it, from where and when.</summary>
public sealed record Telecommand(CommandAction Command, string Origin, string Placement, SimTime IssuedAt);
