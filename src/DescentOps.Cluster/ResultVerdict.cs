namespace DescentOps.Cluster;

/// <summary>What the campaign node does with a result: store it, discard it as a late duplicate, or refuse a key it never handed out.</summary>
public enum ResultVerdict
{
    Accepted,
    Duplicate,
    Unknown,
}
