namespace DescentOps.Physics.Ice;

/// <summary>
/// Thermophysical properties of ice Ih for the simulator: the thermodynamic ones from IAPWS R10-06
/// (<see cref="IceGibbsFunction"/>), conductivity from a named fit (<see cref="IceConductivity"/>).
/// </summary>
public static class IceIh
{
    public static double DensityKgPerM3(double temperatureK, double pressurePa) =>
        IceGibbsFunction.Evaluate(temperatureK, pressurePa).DensityKgPerM3;

    public static double SpecificHeatJPerKgK(double temperatureK, double pressurePa) =>
        IceGibbsFunction.Evaluate(temperatureK, pressurePa).SpecificHeatJPerKgK;

    /// <summary>Specific enthalpy on the IAPWS-95 reference state (liquid at the triple point has u = s = 0).</summary>
    public static double EnthalpyJPerKg(double temperatureK, double pressurePa) =>
        IceGibbsFunction.Evaluate(temperatureK, pressurePa).EnthalpyJPerKg;

    public static double ExpansionPerK(double temperatureK, double pressurePa) =>
        IceGibbsFunction.Evaluate(temperatureK, pressurePa).ExpansionPerK;

    /// <summary>
    /// Heat to warm a kilogram of ice at constant pressure from the far-field temperature to the melting
    /// temperature, h(T_m) − h(T∞): exact for the temperature-dependent heat capacity, unlike a linear c_p fit.
    /// </summary>
    public static double SensibleHeatJPerKg(double farFieldTemperatureK, double meltingTemperatureK, double pressurePa)
    {
        if (farFieldTemperatureK >= meltingTemperatureK)
        {
            IceGibbsFunction.Evaluate(meltingTemperatureK, pressurePa);
            return 0.0;
        }

        return EnthalpyJPerKg(meltingTemperatureK, pressurePa) - EnthalpyJPerKg(farFieldTemperatureK, pressurePa);
    }

    /// <summary>Thermal diffusivity κ = k/(ρ c_p) with R10-06 density and heat capacity.</summary>
    public static double ThermalDiffusivityM2PerS(double temperatureK, double pressurePa, IceConductivityFit fit = IceConductivityFit.AnderssonInaba2005)
    {
        var k = IceConductivity.ConductivityWPerMK(temperatureK, fit);
        var state = IceGibbsFunction.Evaluate(temperatureK, pressurePa);
        return k / (state.DensityKgPerM3 * state.SpecificHeatJPerKgK);
    }
}
