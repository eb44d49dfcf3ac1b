namespace DescentOps.Mission.Vehicles;

/// <summary>A position or velocity in the ocean relative to the probe's dock: east, north and down (below the ice), in m or m/s.</summary>
public readonly record struct OceanVector(double East, double North, double Down)
{
    public static OceanVector Zero => default;

    public double Length => Math.Sqrt((East * East) + (North * North) + (Down * Down));

    /// <summary>A horizontal vector of a length along a heading clockwise from north.</summary>
    public static OceanVector Horizontal(double length, double headingRad) => new(length * Math.Sin(headingRad), length * Math.Cos(headingRad), 0.0);

    public static OceanVector operator +(OceanVector a, OceanVector b) => new(a.East + b.East, a.North + b.North, a.Down + b.Down);

    public static OceanVector operator -(OceanVector a, OceanVector b) => new(a.East - b.East, a.North - b.North, a.Down - b.Down);

    public static OceanVector operator *(OceanVector a, double k) => new(a.East * k, a.North * k, a.Down * k);

    public double Dot(OceanVector other) => (East * other.East) + (North * other.North) + (Down * other.Down);
}
