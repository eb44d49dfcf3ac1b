namespace DescentOps.Cluster;

/// <summary>What a worker has done, readable from any thread (tests and the worker's own status lines).</summary>
public sealed class WorkerCounters
{
    private int _runsDone;
    private int _handedBack;

    public int RunsDone => Volatile.Read(ref _runsDone);

    public int HandedBack => Volatile.Read(ref _handedBack);

    public void RunDone() => Interlocked.Increment(ref _runsDone);

    public void HandBack(int count) => Interlocked.Add(ref _handedBack, count);
}
