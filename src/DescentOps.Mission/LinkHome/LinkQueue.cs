using System.Collections.Immutable;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.LinkHome;

/// <summary>
/// One station's store as the shared link sees it: frames and commands waiting for the lander's turn, whether the
/// station is alive, when its transmitter is free, and the frame ledger: <see cref="Offered"/> = <see cref="Sent"/> +
/// <see cref="Lost"/> + the frames queued.
/// </summary>
public sealed record LinkQueue(
    string Name,
    ImmutableQueue<TelemetryFrame> Frames,
    int FramesQueued,
    ImmutableQueue<Telecommand> Commands,
    int CommandsQueued,
    bool Alive,
    SimTime TransmitterFreeAt,
    long Offered,
    long Sent,
    long Lost,
    long CommandsLost)
{
    public static LinkQueue Empty(string name) => new(name, [], 0, [], 0, true, SimTime.Epoch, 0, 0, 0, 0);
}
