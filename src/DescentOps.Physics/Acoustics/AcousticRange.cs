namespace DescentOps.Physics.Acoustics;

/// <summary>
/// Longest range with non-negative margin. When the margin is still positive at the search limit the range is that
/// limit and <see cref="LimitedBySearch"/> is set, so a caller never mistakes the bound for physics.
/// </summary>
public sealed record AcousticRange(double RangeM, bool LimitedBySearch);
