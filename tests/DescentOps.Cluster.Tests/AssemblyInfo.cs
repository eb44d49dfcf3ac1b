using Xunit;

// Two test collections at a time: the campaign-node-and-workers processes (ProcessClusterTests), which mostly wait on
// real failure detectors, beside the clusters made in this process (InProcessClusterCollection), one of each at a time
// so that each keeps its runs short and its guards far away. The pure tests fill in.
[assembly: CollectionBehavior(MaxParallelThreads = 2)]
