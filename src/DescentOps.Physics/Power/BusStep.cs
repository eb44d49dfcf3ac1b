namespace DescentOps.Physics.Power;

/// <summary>The bus held at one allocation for a time: the battery's state of charge after it, and the energy moved.</summary>
public sealed record BusStep(double StateOfCharge, BusEnergy Energy);
