using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.LinkHome;

/// <summary>What one service of the shared link did: the frames it put on the air and the commands it sent up, and when it must look again (null: nothing waits that time alone could release).</summary>
public sealed record LinkRound(LinkHomeState State, IReadOnlyList<LinkTransmission> Sent, IReadOnlyList<(string Lander, Telecommand Command)> CommandsUp, SimTime? NextLook);
