namespace DescentOps.Primitives.Failures;

/// <summary>
/// Marks a failure that restarting the component cannot cure: the same state and message would fail the same way
/// (a model asked outside its validity range, for instance). The kernel ends the run at once instead of restarting.
/// </summary>
public interface IAbortsRun;
