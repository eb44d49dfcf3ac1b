namespace DescentOps.Physics.Refreezing;

/// <summary>
/// Freeze-in of a water-filled gap: the Stefan number Δh_s/L, the constant-property (Neumann) front constant λ, and the
/// time to close the gap. Around a probe, <see cref="VariablePropertyFrontMPerRootS"/> is the planar front λ′ (m/√s) of
/// s = 2λ′√t with the ice's properties at each temperature, the limit the cylinder's time is tied to.
/// </summary>
public sealed record RefreezeSolution(double StefanNumber, double FrontConstant, double FreezeTimeS)
{
    /// <summary>λ′ in m/√s of the variable-property planar front (cylinder geometry only; null for the planar case).</summary>
    public double? VariablePropertyFrontMPerRootS { get; init; }
}
