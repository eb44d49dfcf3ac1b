namespace DescentOps.Mission.Messages;

/// <summary>A vehicle reports its task over, with why and what it did; <see cref="Lost"/> when it will not come back.</summary>
public sealed record VehicleFinished(string Vehicle, string Reason, int ProfilesCompleted, double EnergyLeftJ, bool Lost = false);
