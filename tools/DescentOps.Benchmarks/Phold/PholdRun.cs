namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// What one engine's run delivered: token events (starts and reports excluded), the order checksum, and the
/// number of rounds (instants and their zero-delay follow-ups), each of which is one barrier of the actor
/// kernel. The plain loop also counts the batches, the (round, target LP) pairs: the actor kernel sends
/// one message out and one back per batch.
/// </summary>
public readonly record struct PholdRun(long TokenEvents, ulong Checksum, long Rounds, long? Batches = null);
