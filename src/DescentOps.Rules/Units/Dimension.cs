namespace DescentOps.Rules.Units;

/// <summary>The physical dimensions telemetry points and command arguments carry.</summary>
public enum Dimension
{
    Dimensionless,
    Length,
    Duration,
    Speed,
    Temperature,
    Power,
    Energy,
    Angle,
    Voltage,
    Current,
    Pressure,
    Mass,
    Frequency,
}
