namespace DescentOps.Physics.Power;

/// <summary>
/// Battery state of charge by coulomb counting against a temperature-derated capacity:
/// SOC = SOC0 − ∫I_dis dt/Q_eff(T) + η_c ∫I_ch dt/Q_eff(T), clamped to [0, 1], Q_eff = Q_nom·f_T(T)·f_age.
/// </summary>
public static class Battery
{
    private const string Model = "the battery charge model";

    // Capacity factor f_T against °C, a placeholder curve (RULE) until a cell is chosen; linear between points.
    private static readonly (double Celsius, double Factor)[] ColdCurve =
    [
        (-60.0, 0.10), (-40.0, 0.45), (-20.0, 0.75), (0.0, 0.90), (25.0, 1.00), (60.0, 1.00),
    ];

    /// <summary>Usable fraction of rated capacity at a cell temperature, −60 to +60 °C.</summary>
    public static double ColdCapacityFactor(double temperatureK)
    {
        var c = ValidRange.Require(temperatureK, 273.15 + ColdCurve[0].Celsius, 273.15 + ColdCurve[^1].Celsius, nameof(temperatureK), "K", Model) - 273.15;
        for (var i = 1; i < ColdCurve.Length; i++)
        {
            if (c <= ColdCurve[i].Celsius)
            {
                var (c0, f0) = ColdCurve[i - 1];
                var (c1, f1) = ColdCurve[i];
                return f0 + ((f1 - f0) * (c - c0) / (c1 - c0));
            }
        }

        return ColdCurve[^1].Factor;
    }

    /// <summary>
    /// Advances the state by a step at constant current, positive discharging and negative charging. Self-discharge
    /// is taken first (exponential over the step), then the current, limited so SOC stays in [0, 1].
    /// </summary>
    public static BatteryStep Step(double stateOfCharge, double currentA, double durationS, double temperatureK, BatteryParameters parameters)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        ValidRange.Require(stateOfCharge, 0.0, 1.0, nameof(stateOfCharge), "(fraction)", Model);
        ValidRange.RequireNonNegative(durationS, nameof(durationS), "s", Model);
        ValidRange.RequirePositive(parameters.NominalCapacityC, nameof(parameters.NominalCapacityC), "C", Model);
        ValidRange.Require(parameters.AgeFactor, 1e-6, 1.0, nameof(parameters.AgeFactor), "(fraction)", Model);
        ValidRange.Require(parameters.CoulombicEfficiency, 1e-6, 1.0, nameof(parameters.CoulombicEfficiency), "(fraction)", Model);
        ValidRange.RequireNonNegative(parameters.SelfDischargePerS, nameof(parameters.SelfDischargePerS), "1/s", Model);
        if (!double.IsFinite(currentA)) throw new ArgumentOutOfRangeException(nameof(currentA), currentA, "currentA must be finite.");

        var capacity = parameters.NominalCapacityC * ColdCapacityFactor(temperatureK) * parameters.AgeFactor;
        var stored = stateOfCharge * capacity;
        var selfDischarge = stored * (1.0 - Math.Exp(-parameters.SelfDischargePerS * durationS));
        stored -= selfDischarge;

        double delivered = 0.0, accepted = 0.0, shortfall = 0.0, rejected = 0.0;
        var blocked = false;
        if (currentA > 0.0)
        {
            var requested = currentA * durationS;
            delivered = Math.Min(requested, stored);
            shortfall = requested - delivered;
            stored -= delivered;
        }
        else if (currentA < 0.0)
        {
            var offered = -currentA * durationS;
            if (temperatureK < parameters.MinimumChargingTemperatureK)
            {
                blocked = true;
                rejected = offered;
            }
            else
            {
                accepted = Math.Min(offered, (capacity - stored) / parameters.CoulombicEfficiency);
                rejected = offered - accepted;
                stored += parameters.CoulombicEfficiency * accepted;
            }
        }

        var soc = Math.Clamp(stored / capacity, 0.0, 1.0);
        return new BatteryStep(soc, capacity, delivered, accepted, (1.0 - parameters.CoulombicEfficiency) * accepted, selfDischarge, shortfall, rejected, blocked);
    }

    /// <summary>
    /// Peukert's law for time to empty at constant current, t = H·(C/(I·H))^k, with C the capacity rated at the
    /// H-hour rate; k about 1.05 for Li-ion (RULE).
    /// </summary>
    public static double PeukertDischargeTimeS(double ratedCapacityC, double ratedDischargeTimeS, double currentA, double peukertExponent)
    {
        ValidRange.RequirePositive(ratedCapacityC, nameof(ratedCapacityC), "C", Model);
        ValidRange.RequirePositive(ratedDischargeTimeS, nameof(ratedDischargeTimeS), "s", Model);
        ValidRange.RequirePositive(currentA, nameof(currentA), "A", Model);
        ValidRange.Require(peukertExponent, 1.0, 2.0, nameof(peukertExponent), "(Peukert exponent)", Model);
        return ratedDischargeTimeS * Math.Pow(ratedCapacityC / (currentA * ratedDischargeTimeS), peukertExponent);
    }
}
