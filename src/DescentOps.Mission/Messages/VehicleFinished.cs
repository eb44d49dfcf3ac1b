namespace DescentOps.Mission.Messages;

/// <summary>A vehicle reports its task over, with why and what it did.</summary>
public sealed record VehicleFinished(string Vehicle, string Reason, int ProfilesCompleted, double EnergyLeftJ);
