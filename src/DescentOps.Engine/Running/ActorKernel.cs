using Akka.Actor;

namespace DescentOps.Engine.Running;

/// <summary>
/// Runs every component in its own Akka.NET actor. Within one instant the actors handle their events in
/// parallel; the coordinator waits for every acknowledgement before it commits the instant and moves time
/// on, so the journal does not depend on thread timing.
/// </summary>
public static class ActorKernel
{
    /// <summary>Runs to the end on <paramref name="system"/>; the actors it creates are stopped afterwards.</summary>
    public static Task<RunResult> RunAsync(ActorSystem system, KernelSetup setup)
    {
        var completion = new TaskCompletionSource<RunResult>(TaskCreationOptions.RunContinuationsAsynchronously);
        system.ActorOf(Props.Create(() => new KernelActor(setup, completion)));
        return completion.Task;
    }
}
