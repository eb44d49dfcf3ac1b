namespace DescentOps.Primitives.Units;

/// <summary>What a unit measures. Scenario fields, command-line options and rule text all resolve units against these.</summary>
public enum PhysicalDimension
{
    Dimensionless,
    Length,
    Duration,
    Speed,
    Acceleration,
    Temperature,
    Power,
    Energy,
    Angle,
    Voltage,
    Current,
    Pressure,
    Mass,
    Frequency,
    MassFraction,
    AbsorbedDose,
    Density,
}
