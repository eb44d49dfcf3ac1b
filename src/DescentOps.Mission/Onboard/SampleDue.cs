using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Onboard;

/// <summary>When a point must next be read for the rules, and whether that instant is a limit crossing found exactly.</summary>
public readonly record struct SampleDue(SimTime At, bool AtCrossing);
