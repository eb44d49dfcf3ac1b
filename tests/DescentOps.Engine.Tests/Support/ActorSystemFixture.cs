using Akka.Actor;
using Akka.Configuration;

namespace DescentOps.Engine.Tests.Support;

/// <summary>One actor system per test class: starting one costs far more than a small run.</summary>
public sealed class ActorSystemFixture : IAsyncLifetime
{
    // Quiet logging keeps test output readable; the kernel reports through its result, not Akka's log.
    private static readonly Config Quiet = ConfigurationFactory.ParseString("akka { loglevel = WARNING, stdout-loglevel = WARNING }");

    public ActorSystem System { get; } = ActorSystem.Create("engine-tests", Quiet);

    public Task InitializeAsync() => Task.CompletedTask;

    public Task DisposeAsync() => System.Terminate();
}
