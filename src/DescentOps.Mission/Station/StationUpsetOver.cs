using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Station;

/// <summary>The recovery that began with an upset is due to end at <see cref="Until"/> (a later upset may have pushed it on).</summary>
public sealed record StationUpsetOver(SimTime Until);
