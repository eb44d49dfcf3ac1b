namespace DescentOps.Physics.Descent;

/// <summary>A cylindrical probe: radius of head and body, length, and mass (for the load on the melt film).</summary>
public sealed record ProbeGeometry(double RadiusM, double LengthM, double MassKg)
{
    /// <summary>Displaced volume πR²ℓ, for buoyancy in the meltwater.</summary>
    public double VolumeM3 => Math.PI * RadiusM * RadiusM * LengthM;

    public double HeadAreaM2 => Math.PI * RadiusM * RadiusM;
}
