namespace DescentOps.Engine.Running;

/// <summary>
/// Runs the components one after another on the calling thread. It commits through the same
/// <see cref="KernelCore"/> as the actor kernel, so the two must write identical journals: the sequential
/// kernel is the reference that tests hold the actor kernel to, and the baseline its benchmark measures.
/// </summary>
public static class SequentialKernel
{
    public static RunResult Run(KernelSetup setup)
    {
        var core = new KernelCore(setup);
        var hosts = setup.Components.ToDictionary(c => c.Id, c => new ComponentHost(c, setup.Seed));
        var results = new List<EventResult[]>();
        while (core.TryBeginRound(out var batches))
        {
            results.Clear();
            foreach (var (target, events) in batches)
            {
                results.Add(hosts[target].HandleBatch(core.Now, events));
            }

            core.CommitRound(results);
        }

        return core.Result();
    }
}
