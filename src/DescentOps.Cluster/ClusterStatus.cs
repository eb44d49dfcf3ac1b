namespace DescentOps.Cluster;

/// <summary>What the campaign node's progress line shows, published by the dispatcher after every change.</summary>
public sealed record ClusterStatus(int Workers, int InFlight, int Pending, int Accepted, int Duplicates)
{
    public static ClusterStatus Empty { get; } = new(0, 0, 0, 0, 0);
}
