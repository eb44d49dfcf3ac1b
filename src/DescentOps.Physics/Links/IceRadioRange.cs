namespace DescentOps.Physics.Links;

/// <summary>Longest relay spacing that closes the link; <see cref="LimitedBySearch"/> marks a result pinned at the search bound.</summary>
public sealed record IceRadioRange(double SpacingM, double AllowedPathLossDb, bool LimitedBySearch);
