using UnitsNet;

namespace DescentOps.Scenarios.Format;

/// <summary>The physical dimensions a scenario value can carry, each with the UnitsNet type that parses it.</summary>
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
    /// <summary>Absorbed dose per time, written as a dose over one unit of duration ("5 Gy/d"); UnitsNet has no such quantity.</summary>
    AbsorbedDoseRate,
}

public static class QuantityKindInfo
{
    public static Type UnitsNetType(this QuantityKind kind) => kind switch
    {
        QuantityKind.Length => typeof(Length),
        QuantityKind.Power => typeof(Power),
        QuantityKind.Temperature => typeof(Temperature),
        QuantityKind.Duration => typeof(Duration),
        QuantityKind.Mass => typeof(Mass),
        QuantityKind.Speed => typeof(Speed),
        QuantityKind.Acceleration => typeof(Acceleration),
        QuantityKind.Energy => typeof(Energy),
        QuantityKind.MassFraction => typeof(MassFraction),
        QuantityKind.Pressure => typeof(Pressure),
        QuantityKind.Angle => typeof(Angle),
        QuantityKind.Frequency => typeof(Frequency),
        QuantityKind.AbsorbedDose => typeof(AbsorbedDoseOfIonizingRadiation),
        QuantityKind.Density => typeof(Density),
        QuantityKind.Ratio => typeof(Ratio),
        QuantityKind.AbsorbedDoseRate => throw new ArgumentException("A dose rate is parsed as a dose over a duration, not by UnitsNet.", nameof(kind)),
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
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
