using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Station;

/// <summary>A frame waiting at the station; it cannot go before <see cref="ReadyAt"/> (arrival plus the forwarding delay).</summary>
public sealed record QueuedFrame(TelemetryFrame Frame, SimTime ReadyAt);
