using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Tether;

/// <summary>A dropped relay: where it sits, when it went, whether its battery is flat, and the frames it holds.</summary>
public sealed record RelayState(int Number, double DepthM, SimTime DroppedAt, bool Dead, FrameHold<TelemetryFrame> Hold)
{
    public string Name => $"relay-{Number}";
}
