namespace DescentOps.Physics.Power;

/// <summary>
/// A battery pack. The defaults are placeholders until a cell datasheet is chosen (RULE): Li-ion coulombic efficiency
/// 0.995, self-discharge 2 % per month, no charging below 0 °C because lithium plates onto the anode.
/// </summary>
/// <param name="NominalCapacityC">Rated charge at 25 °C, coulombs (1 Ah = 3600 C).</param>
/// <param name="AgeFactor">Fraction of rated capacity left with age.</param>
/// <param name="CoulombicEfficiency">Fraction of charging charge that is stored.</param>
/// <param name="SelfDischargePerS">Fractional loss of stored charge per second.</param>
/// <param name="MinimumChargingTemperatureK">Below this the pack refuses charge.</param>
public sealed record BatteryParameters(double NominalCapacityC, double AgeFactor, double CoulombicEfficiency, double SelfDischargePerS, double MinimumChargingTemperatureK)
{
    /// <summary>2 % per 30-day month as a rate.</summary>
    public const double TypicalLithiumIonSelfDischargePerS = 0.02 / (30.0 * 86400.0);

    /// <summary>A Li-ion pack of a given capacity with the placeholder defaults.</summary>
    public static BatteryParameters LithiumIon(double nominalCapacityC) => new(nominalCapacityC, 1.0, 0.995, TypicalLithiumIonSelfDischargePerS, 273.15);
}
