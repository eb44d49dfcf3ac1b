namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// What one engine's run delivered: token events (starts and reports excluded), the order checksum, and for
/// the kernels the number of rounds (instants and their zero-delay follow-ups), each one barrier of the actor kernel.
/// </summary>
public readonly record struct PholdRun(long TokenEvents, ulong Checksum, long? Rounds = null);
