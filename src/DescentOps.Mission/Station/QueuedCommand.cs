using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Station;

/// <summary>A command from home that reached the station's queue at <see cref="ArrivedAt"/> and waits for a window.</summary>
public sealed record QueuedCommand(Telecommand Command, SimTime ArrivedAt);
