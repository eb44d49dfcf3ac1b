namespace DescentOps.Physics.Power;

/// <summary>
/// A small fission reactor with a heat engine (kilowatt-class, Stirling conversion about 25 %, from memory), run as a
/// setpoint: the reactor follows load changes over minutes, not instantly.
/// </summary>
public static class FissionSource
{
    private const string Model = "the fission power source";

    /// <summary>Heat the core must produce for an electric output, and the heat to reject or use.</summary>
    public static FissionOutput AtElectricOutput(double electricPowerW, double conversionEfficiency)
    {
        ValidRange.RequireNonNegative(electricPowerW, nameof(electricPowerW), "W", Model);
        // Above the Carnot-limited reach of space heat engines the number would be a typo, not a design.
        ValidRange.Require(conversionEfficiency, 1e-3, 0.5, nameof(conversionEfficiency), "(fraction)", Model);
        var thermal = electricPowerW / conversionEfficiency;
        return new FissionOutput(thermal, electricPowerW, thermal - electricPowerW);
    }

    /// <summary>
    /// Electric output after a step of first-order load following toward a setpoint, solved exactly so the answer does
    /// not depend on the step size.
    /// </summary>
    public static double FollowSetpointW(double currentPowerW, double setpointPowerW, double timeConstantS, double stepS)
    {
        ValidRange.RequireNonNegative(currentPowerW, nameof(currentPowerW), "W", Model);
        ValidRange.RequireNonNegative(setpointPowerW, nameof(setpointPowerW), "W", Model);
        ValidRange.RequirePositive(timeConstantS, nameof(timeConstantS), "s", Model);
        ValidRange.RequireNonNegative(stepS, nameof(stepS), "s", Model);
        return setpointPowerW + ((currentPowerW - setpointPowerW) * Math.Exp(-stepS / timeConstantS));
    }
}
