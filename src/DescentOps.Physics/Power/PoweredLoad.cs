namespace DescentOps.Physics.Power;

/// <summary>A consumer on the bus; lower <see cref="Priority"/> numbers are kept longer (0 = last to go).</summary>
public sealed record PoweredLoad(string Name, int Priority, double PowerW);
