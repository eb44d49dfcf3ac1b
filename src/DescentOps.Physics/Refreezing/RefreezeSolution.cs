namespace DescentOps.Physics.Refreezing;

/// <summary>Freeze-in of a water-filled gap: the Stefan number Δh_s/L, the front constant λ, and the time to close the gap.</summary>
public sealed record RefreezeSolution(double StefanNumber, double FrontConstant, double FreezeTimeS);
