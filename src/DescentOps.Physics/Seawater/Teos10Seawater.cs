namespace DescentOps.Physics.Seawater;

/// <summary>
/// Seawater by TEOS-10 over the whole ocean under a shell: Absolute Salinity 0 to 42 g/kg (fresh water included), sea
/// pressure 0 to 100 MPa, in-situ temperature from the freezing point to 40 °C. These are the ranges of the Gibbs
/// function of seawater (IAPWS-08 with IAPWS-09) that TEOS-10 adopts; they are declared as data, and a state outside
/// them, colder than its freezing point included, is refused with the range it left.
/// </summary>
public static class Teos10Seawater
{
    /// <summary>Name used in refusals.</summary>
    public const string Model = "TEOS-10 (IAPWS-08 seawater Gibbs function)";

    /// <summary>Warmest in-situ temperature, 40 °C.</summary>
    public const double MaximumTemperatureK = 313.15;

    /// <summary>A state this close below the computed freezing point counts as at it (the solver's own tolerance is far finer).</summary>
    private const double FreezingSlackK = 1e-9;

    public static readonly ModelRange Salinity = new(Model, "absolute salinity", "g/kg", 0.0, 42.0);

    public static readonly ModelRange Pressure = new(Model, "sea pressure", "Pa", 0.0, 100e6);

    /// <summary>The temperature range at one salinity and pressure: from the freezing point to 40 °C.</summary>
    public static ModelRange Temperature(double absoluteSalinityGPerKg, double seaPressurePa) =>
        new(Model, "temperature", "K", FreezingTemperatureK(absoluteSalinityGPerKg, seaPressurePa), MaximumTemperatureK);

    /// <summary>Air-free freezing temperature (in situ), K, after the salinity and pressure checks.</summary>
    public static double FreezingTemperatureK(double absoluteSalinityGPerKg, double seaPressurePa)
    {
        Salinity.Require(absoluteSalinityGPerKg);
        Pressure.Require(seaPressurePa);
        return FreezingTemperature.InSituK(absoluteSalinityGPerKg, seaPressurePa);
    }

    /// <summary>The state at an in-situ temperature; refused below the freezing point or above 40 °C.</summary>
    public static SeawaterState At(double absoluteSalinityGPerKg, double seaPressurePa, double temperatureK)
    {
        var freezing = FreezingTemperatureK(absoluteSalinityGPerKg, seaPressurePa);
        var range = new ModelRange(Model, "temperature", "K", freezing, MaximumTemperatureK);
        if (temperatureK < freezing && temperatureK >= freezing - FreezingSlackK) temperatureK = freezing;
        range.Require(temperatureK);
        return Evaluate(absoluteSalinityGPerKg, seaPressurePa, temperatureK, freezing);
    }

    /// <summary>The state at the freezing point: the water at the underside of a shell unless something warms it.</summary>
    public static SeawaterState AtFreezing(double absoluteSalinityGPerKg, double seaPressurePa)
    {
        var freezing = FreezingTemperatureK(absoluteSalinityGPerKg, seaPressurePa);
        return Evaluate(absoluteSalinityGPerKg, seaPressurePa, freezing, freezing);
    }

    /// <summary>In-situ density from the Gibbs function, after the range checks.</summary>
    public static double DensityKgPerM3(double absoluteSalinityGPerKg, double seaPressurePa, double temperatureK) =>
        At(absoluteSalinityGPerKg, seaPressurePa, temperatureK).DensityKgPerM3;

    private static SeawaterState Evaluate(double sa, double p, double t, double freezing)
    {
        var gibbs = SeawaterGibbsFunction.Evaluate(sa, t, p);
        var theta = ConservativeTemperature.PotentialTemperatureK(sa, t, p);
        var ct = ConservativeTemperature.FromPotentialK(sa, theta);
        return new SeawaterState(sa, p, t, theta, ct, freezing,
            gibbs.DensityKgPerM3,
            gibbs.SoundSpeedMPerS,
            SpecificVolumePolynomial.DensityKgPerM3(sa, ct, p),
            SpecificVolumePolynomial.SoundSpeedMPerS(sa, ct, p),
            gibbs.SpecificHeatJPerKgK);
    }
}
