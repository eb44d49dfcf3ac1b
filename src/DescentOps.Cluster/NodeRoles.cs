namespace DescentOps.Cluster;

/// <summary>The cluster's names: the actor system every node shares, the two roles, and where the dispatcher lives.</summary>
public static class NodeRoles
{
    public const string SystemName = "descentops";
    public const string Campaign = "campaign";
    public const string Worker = "worker";
    public const string DispatcherName = "dispatcher";
    public const string WorkerName = "worker";
}
