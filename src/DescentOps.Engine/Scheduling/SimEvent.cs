using DescentOps.Primitives.Identity;

namespace DescentOps.Engine.Scheduling;

/// <summary>
/// One scheduled delivery. The payload must be immutable (a record of values): it crosses actor boundaries
/// and may be journaled after delivery.
/// </summary>
public sealed record SimEvent(EventKey Key, ComponentId Target, object Payload);
