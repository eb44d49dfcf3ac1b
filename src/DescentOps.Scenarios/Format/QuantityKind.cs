using DescentOps.Primitives.Units;

namespace DescentOps.Scenarios.Format;

/// <summary>The physical dimensions a scenario value can carry.</summary>
public enum QuantityKind
{
    Length,
    Power,
    Temperature,
    Duration,
    Mass,
    Speed,
    Acceleration,
    Energy,
    MassFraction,
    Pressure,
    Angle,
    Frequency,
    AbsorbedDose,
    Density,

    /// <summary>A dimensionless share (a state of charge, a buffer's fill): a percentage or a bare number.</summary>
    Ratio,
    /// <summary>Absorbed dose per time, written as a dose over one unit of duration ("5 Gy/d").</summary>
    AbsorbedDoseRate,
}

public static class QuantityKindInfo
{
    /// <summary>What the kind's units measure in the shared unit table.</summary>
    public static PhysicalDimension Dimension(this QuantityKind kind) => kind switch
    {
        QuantityKind.Length => PhysicalDimension.Length,
        QuantityKind.Power => PhysicalDimension.Power,
        QuantityKind.Temperature => PhysicalDimension.Temperature,
        QuantityKind.Duration => PhysicalDimension.Duration,
        QuantityKind.Mass => PhysicalDimension.Mass,
        QuantityKind.Speed => PhysicalDimension.Speed,
        QuantityKind.Acceleration => PhysicalDimension.Acceleration,
        QuantityKind.Energy => PhysicalDimension.Energy,
        QuantityKind.MassFraction => PhysicalDimension.MassFraction,
        QuantityKind.Pressure => PhysicalDimension.Pressure,
        QuantityKind.Angle => PhysicalDimension.Angle,
        QuantityKind.Frequency => PhysicalDimension.Frequency,
        QuantityKind.AbsorbedDose => PhysicalDimension.AbsorbedDose,
        QuantityKind.Density => PhysicalDimension.Density,
        QuantityKind.Ratio => PhysicalDimension.Dimensionless,
        QuantityKind.AbsorbedDoseRate => throw new ArgumentException("A dose rate is read as a dose over a duration.", nameof(kind)),
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };

    /// <summary>The kind as a word in messages ("a mass fraction").</summary>
    public static string Word(this QuantityKind kind) => kind switch
    {
        QuantityKind.MassFraction => "mass fraction",
        QuantityKind.AbsorbedDose => "absorbed dose",
        QuantityKind.AbsorbedDoseRate => "dose rate",
        _ => kind.ToString().ToLowerInvariant(),
    };

    /// <summary>The SI unit the loader converts to, as written in messages and the schema.</summary>
    public static string SiSymbol(this QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "m",
        QuantityKind.Power => "W",
        QuantityKind.Temperature => "K",
        QuantityKind.Duration => "s",
        QuantityKind.Mass => "kg",
        QuantityKind.Speed => "m/s",
        QuantityKind.Acceleration => "m/s²",
        QuantityKind.Energy => "J",
        QuantityKind.MassFraction => "kg/kg",
        QuantityKind.Pressure => "Pa",
        QuantityKind.Angle => "rad",
        QuantityKind.Frequency => "Hz",
        QuantityKind.AbsorbedDose => "Gy",
        QuantityKind.Density => "kg/m³",
        QuantityKind.Ratio => "1",
        QuantityKind.AbsorbedDoseRate => "Gy/s",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };

    /// <summary>Unit symbols offered as examples in error messages and schema descriptions.</summary>
    public static string ExampleUnits(this QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "m, cm, mm, km",
        QuantityKind.Power => "W, kW, MW",
        QuantityKind.Temperature => "K, °C",
        QuantityKind.Duration => "s, min, h, d, yr",
        QuantityKind.Mass => "kg, g, t",
        QuantityKind.Speed => "m/s, km/h",
        QuantityKind.Acceleration => "m/s², m/s^2",
        QuantityKind.Energy => "J, kJ, Wh, kWh",
        QuantityKind.MassFraction => "g/kg, %",
        QuantityKind.Pressure => "Pa, kPa, MPa, bar",
        QuantityKind.Angle => "deg, °, rad",
        QuantityKind.Frequency => "Hz, kHz, MHz, GHz",
        QuantityKind.AbsorbedDose => "Gy, mGy, rad, krad",
        QuantityKind.Density => "kg/m³, g/cm³",
        QuantityKind.Ratio => "%, or a bare number",
        QuantityKind.AbsorbedDoseRate => "Gy/d, mGy/h, rad/h, krad/yr",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };
}
