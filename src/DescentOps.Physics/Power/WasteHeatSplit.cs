namespace DescentOps.Physics.Power;

/// <summary>A source's waste heat by destination: the head, the side wall, and rejected elsewhere.</summary>
public readonly record struct WasteHeatSplit(double HeadW, double WallW, double RejectedW);
