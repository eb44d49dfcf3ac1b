using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.LinkHome;

/// <summary>A frame put on the air: by which lander, on which channel, from <see cref="Start"/> to <see cref="End"/>.</summary>
public sealed record LinkTransmission(string Lander, TelemetryFrame Frame, int Channel, SimTime Start, SimTime End);
