namespace DescentOps.Benchmarks.Phold;

/// <summary>What one engine's run delivered: token events (starts and reports excluded) and the order checksum.</summary>
public readonly record struct PholdRun(long TokenEvents, ulong Checksum);
