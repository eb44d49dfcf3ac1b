namespace DescentOps.Benchmarks.Phold;

/// <summary>One engine configuration of the side-by-side run: a label and how to run it once.</summary>
public sealed record EngineCase(string Label, Func<PholdOptions, DelayLaw, Task<PholdRun>> RunOnce);
