namespace DescentOps.Scenarios.Model;

/// <summary>
/// Discharges of the charged environment that upset the station: a Poisson process with a mean time between upsets;
/// each upset resets the station for <see cref="RecoveryTimeS"/>, during which arriving frames and commands are queued
/// (<see cref="QueueWhileRecovering"/>) or lost.
/// </summary>
public sealed record StationChargingModel(double MeanTimeBetweenUpsetsS, double RecoveryTimeS, bool QueueWhileRecovering);
