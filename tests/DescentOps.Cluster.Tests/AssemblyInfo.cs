using Xunit;

// Clusters and processes compete for two cores; one test at a time keeps each one's run short and its guards far away.
[assembly: CollectionBehavior(DisableTestParallelization = true)]
