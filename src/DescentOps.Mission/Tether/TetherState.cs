namespace DescentOps.Mission.Tether;

/// <summary>The tether's committed state: how much fibre is out, whether it still carries light, what it carried.</summary>
public sealed record TetherState(double PaidOutM, bool Broken, double? BrokenAtDepthM, long FramesCarried, long FramesLost, int PayoutMilestone);
