namespace DescentOps.Physics.Links;

/// <summary>Optical budget of one frame: total loss, received power, margin over sensitivity, and the up/down verdict.</summary>
public sealed record FibreLinkBudgetResult(double TotalLossDb, double ReceivedPowerDbm, double MarginDb, bool LinkUp);
