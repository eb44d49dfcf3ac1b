namespace DescentOps.Cluster;

/// <summary>The campaign node would not take this worker (another build, no shared secret, a campaign it cannot read).</summary>
public sealed class WorkerRefusedException(string reason) : Exception(reason);
