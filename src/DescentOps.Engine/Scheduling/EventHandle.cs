using DescentOps.Primitives.Identity;

namespace DescentOps.Engine.Scheduling;

/// <summary>Names one scheduled event so that its sender can cancel it (a rule's timer, the end of a fault).</summary>
public readonly record struct EventHandle(ComponentId Sender, long SenderSequence);
