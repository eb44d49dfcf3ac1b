using Xunit;

namespace DescentOps.Cluster.Tests;

/// <summary>Clusters of actor systems in this test process: one such test at a time.</summary>
[CollectionDefinition(Name)]
public sealed class InProcessClusterCollection
{
    public const string Name = "clusters in this process";
}
