namespace DescentOps.Reports.Tests;

/// <summary>Shares one <see cref="RunLogs"/> among the test classes: a mission run is the costliest step.</summary>
[CollectionDefinition(Name)]
public sealed class RunLogsCollection : ICollectionFixture<RunLogs>
{
    public const string Name = "run logs";
}
