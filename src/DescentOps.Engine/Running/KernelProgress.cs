using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Running;

/// <summary>A snapshot for progress displays; reported from the kernel's thread, so receivers must not block.</summary>
public readonly record struct KernelProgress(SimTime Now, SimTime Until, long EventsDelivered);
