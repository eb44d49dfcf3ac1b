using DescentOps.Primitives.Time;

namespace DescentOps.Mission.LinkHome;

/// <summary>
/// What the shared link home needs to know of one lander's station: how long a frame holds a channel, when the station
/// sees home (<see cref="InView"/>, <see cref="NextOpeningS"/>, and <see cref="NextFrameStartS"/>, the first instant a
/// whole frame fits), and how many frames and commands its store holds while it waits for its turn.
/// </summary>
public sealed record LinkLanderSpec(
    string Name,
    SimDuration FrameTime,
    Func<double, bool> InView,
    Func<double, double> NextOpeningS,
    Func<double, double> NextFrameStartS,
    long FrameCapacity,
    long CommandCapacity)
{
    /// <summary>A station that always sees home.</summary>
    public static LinkLanderSpec AlwaysInView(string name, SimDuration frameTime, long frameCapacity = long.MaxValue, long commandCapacity = long.MaxValue) =>
        new(name, frameTime, _ => true, t => t, t => t, frameCapacity, commandCapacity);

    /// <summary>A lander's station as its scenario describes it: the windows and the frame time of its <see cref="Station.HomeLink"/>.</summary>
    public static LinkLanderSpec From(string name, Station.HomeLink link, long? frameCapacity, long? commandCapacity) =>
        new(name, SimDuration.FromSeconds(link.FrameTimeS), link.IsOpen, link.NextOpeningS, link.NextFrameStartS, frameCapacity ?? long.MaxValue, commandCapacity ?? long.MaxValue);
}
