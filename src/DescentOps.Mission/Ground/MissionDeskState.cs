using DescentOps.Engine.Scheduling;

namespace DescentOps.Mission.Ground;

/// <summary>The mission desk's state: how many inputs its rules have consumed, and its pending wake-up.</summary>
public sealed record MissionDeskState(int RulesVersion, EventHandle? Wake);
