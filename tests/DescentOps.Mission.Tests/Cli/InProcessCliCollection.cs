namespace DescentOps.Mission.Tests.Cli;

/// <summary>The tests that swap the console and the working folder; xunit runs them apart from the others.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class InProcessCliCollection
{
    public const string Name = "command line in process";
}
