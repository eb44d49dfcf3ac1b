using DescentOps.Physics.Power;
using FsCheck.Xunit;
using Xunit;

namespace DescentOps.Physics.Tests.Power;

public class PowerTests
{
    private const double Year = RadioisotopeHeatSource.SecondsPerYear;
    private const double AmpHour = 3600.0;

    [Fact]
    public void Plutonium238_specific_power()
    {
        // PW-1 CALC (reference note), 0.5 % rel; the commonly quoted ≈ 0.57 W/g (from memory) agrees.
        var q = RadioisotopeHeatSource.SpecificThermalPowerWPerKg(RadioisotopeHeatSource.Plutonium238HalfLifeS, RadioisotopeHeatSource.Plutonium238DecayEnergyJ, RadioisotopeHeatSource.Plutonium238MolarMassKgPerMol);
        Approx.Rel(0.5678e3, q, 5e-3, "W/kg");
        var a = RadioisotopeHeatSource.SpecificActivityBqPerKg(RadioisotopeHeatSource.Plutonium238HalfLifeS, RadioisotopeHeatSource.Plutonium238MolarMassKgPerMol);
        Approx.Rel(17.12, a / 1e3 / 3.7e10, 5e-3, "Ci/g");
    }

    [Fact]
    public void Decay_and_degradation()
    {
        // PW-2..PW-4 CALC (reference note).
        var halfLife = RadioisotopeHeatSource.Plutonium238HalfLifeS;
        Approx.Abs(0.007872, 1.0 - RadioisotopeHeatSource.ThermalFraction(Year, halfLife), 1e-6, "PW-2");
        Approx.Abs(0.9613, RadioisotopeHeatSource.ThermalFraction(5 * Year, halfLife), 1e-4, "PW-3 5 yr");
        Approx.Abs(0.9240, RadioisotopeHeatSource.ThermalFraction(10 * Year, halfLife), 1e-4, "PW-3 10 yr");
        Approx.Abs(0.8953, RadioisotopeHeatSource.ThermalFraction(14 * Year, halfLife), 1e-4, "PW-3 14 yr");
        var output = RadioisotopeHeatSource.Output(2000.0, 0.055, 0.015, 14 * Year);
        Approx.Abs(0.7245, output.ElectricPowerW / 110.0, 1e-4, "PW-4");
        Approx.Rel(output.ThermalPowerW, output.ElectricPowerW + output.WasteHeatW, 1e-15, "heat balance");
    }

    [Fact]
    public void Published_unit_efficiencies()
    {
        // PW-5: a flown thermoelectric unit's published 110 W_e from 2000 W_th (space agency fact sheet, as quoted in the
        // reference note), i.e. η 5.50 % (CALC): at t = 0 the source must return exactly the beginning-of-life output.
        var start = RadioisotopeHeatSource.Output(2000.0, 0.0550, 0.015, 0.0);
        Approx.Abs(110.0, start.ElectricPowerW, 1e-9, "P_e at t = 0");
        Approx.Abs(2000.0, start.ThermalPowerW, 1e-9, "P_th at t = 0");
    }

    [Fact]
    public void Fission_source_check_values()
    {
        // 1 kW_e at 25 % Stirling conversion (from memory) needs 4 kW_th; the note's "3–4 kW_th per kW_e".
        var f = Physics.Power.FissionSource.AtElectricOutput(1000.0, 0.25);
        Approx.Rel(4000.0, f.ThermalPowerW, 1e-15, "thermal");
        Approx.Rel(3000.0, f.WasteHeatW, 1e-15, "waste");
        // First-order following: after one time constant 1 − 1/e of the step is made up; two half-steps equal one step.
        Approx.Rel(1000.0 - (500.0 / Math.E), Physics.Power.FissionSource.FollowSetpointW(500.0, 1000.0, 600.0, 600.0), 1e-14, "tau");
        var half = Physics.Power.FissionSource.FollowSetpointW(500.0, 1000.0, 600.0, 300.0);
        Approx.Rel(Physics.Power.FissionSource.FollowSetpointW(500.0, 1000.0, 600.0, 600.0), Physics.Power.FissionSource.FollowSetpointW(half, 1000.0, 600.0, 300.0), 1e-14, "step size");
    }

    private static BatteryParameters Pack(double efficiency) => new(10 * AmpHour, 1.0, efficiency, 0.0, 273.15);

    [Fact]
    public void State_of_charge_check_values()
    {
        // PW-11, PW-12 CALC (reference note): 10 Ah; 2 A for 2 h from full; then 2 A charging for 1 h at η_c 0.99.
        var discharged = Battery.Step(1.0, 2.0, 2 * 3600.0, 298.15, Pack(0.99));
        Approx.Abs(0.600, discharged.StateOfCharge, 1e-9, "PW-11");
        var charged = Battery.Step(discharged.StateOfCharge, -2.0, 3600.0, 298.15, Pack(0.99));
        Approx.Abs(0.798, charged.StateOfCharge, 1e-9, "PW-12");
        Approx.Rel(0.01 * 7200.0, charged.ChargingLossC, 1e-12, "loss");
    }

    [Fact]
    public void Cold_packs()
    {
        // The note's placeholder curve (RULE): 0.90 at 0 °C, 0.75 at −20 °C, halfway between at −10 °C.
        Approx.Abs(0.90, Battery.ColdCapacityFactor(273.15), 1e-12, "0 °C");
        Approx.Abs(0.825, Battery.ColdCapacityFactor(263.15), 1e-12, "−10 °C");
        Approx.Abs(0.10, Battery.ColdCapacityFactor(213.15), 1e-12, "−60 °C");
        // The same 2 A × 2 h drains a −20 °C pack further, and it refuses charge below 0 °C.
        Approx.Abs(1.0 - (4.0 / 7.5), Battery.Step(1.0, 2.0, 7200.0, 253.15, Pack(0.99)).StateOfCharge, 1e-12, "cold drain");
        var refused = Battery.Step(0.5, -2.0, 3600.0, 263.15, Pack(0.99));
        Assert.True(refused.ChargingBlockedByCold);
        Assert.Equal(0.5, refused.StateOfCharge);
        Approx.Rel(7200.0, refused.RejectedChargeC, 1e-15, "rejected");
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => Battery.ColdCapacityFactor(200.0));
    }

    [Theory]
    [InlineData(0.5, 20.000)]
    [InlineData(2.0, 4.665)]
    [InlineData(5.0, 1.783)]
    public void Peukert_discharge_time_check_values(double currentA, double expectedH) =>
        // PW-13 CALC: H 20 h, C 10 Ah, k 1.05.
        Approx.Abs(expectedH, Battery.PeukertDischargeTimeS(10 * AmpHour, 20 * 3600.0, currentA, 1.05) / 3600.0, 1e-3, "t");

    [Property(MaxTest = 300)]
    public void Battery_charge_bookkeeping_balances(ushort soc, short current, ushort hours, ushort temperature, ushort efficiency)
    {
        var p = new BatteryParameters(10 * AmpHour, 0.8, 0.9 + (0.1 * efficiency / ushort.MaxValue), 1e-7, 273.15);
        var start = soc / (double)ushort.MaxValue;
        var step = Battery.Step(start, current / 1000.0, 3600.0 * hours / 1000.0, 213.15 + (100.0 * temperature / ushort.MaxValue), p);
        var change = step.EffectiveCapacityC * (step.StateOfCharge - start);
        var flows = (p.CoulombicEfficiency * step.AcceptedChargeC) - step.DeliveredChargeC - step.SelfDischargeC;
        Assert.True(Math.Abs(change - flows) <= 1e-9 * step.EffectiveCapacityC, FormattableString.Invariant($"ΔQ {change} vs flows {flows}"));
        Assert.InRange(step.StateOfCharge, 0.0, 1.0);
        var requested = Math.Abs(current / 1000.0) * 3600.0 * hours / 1000.0;
        Assert.True(Math.Abs(step.DeliveredChargeC + step.ShortfallC + step.AcceptedChargeC + step.RejectedChargeC - requested) <= 1e-9 * Math.Max(1.0, requested));
        Assert.True(step.ShortfallC == 0.0 || step.StateOfCharge == 0.0, "a shortfall only when empty");
    }

    [Fact]
    public void Load_shedding_by_priority()
    {
        var loads = new[]
        {
            new PoweredLoad("head heater", 3, 2000.0), new PoweredLoad("electronics", 0, 30.0),
            new PoweredLoad("comms", 1, 25.0), new PoweredLoad("wall heaters", 2, 300.0), new PoweredLoad("beacon", 4, 5.0),
        };
        var a = LoadShedding.Allocate(400.0, loads);
        Assert.Equal(["electronics", "comms", "wall heaters", "beacon"], a.Running.Select(l => l.Name));
        Assert.Equal(["head heater"], a.Shed.Select(l => l.Name));
        Approx.Abs(360.0, a.SuppliedPowerW, 1e-12, "supplied");
        Approx.Abs(40.0, a.SparePowerW, 1e-12, "spare");
        Assert.Equal(["electronics"], LoadShedding.Allocate(40.0, loads).Running.Select(l => l.Name).Take(1));
        Assert.DoesNotContain(LoadShedding.Allocate(0.0, loads).Running, l => l.PowerW > 0);
    }

    [Fact]
    public void Load_shedding_holds_to_the_last_bit()
    {
        // The case the property below once shrank to: 0.1 + 0.1 + 0.4 rounds to 0.6000000000000001 > 0.6, so the
        // 0.4 W load must be shed even though 0.6 − 0.1 − 0.1 − 0.4 leaves a tiny positive remainder.
        var a = LoadShedding.Allocate(0.6, [new PoweredLoad("L0", 1, 0.1), new PoweredLoad("L1", 4, 0.4), new PoweredLoad("L2", 1, 0.1)]);
        Assert.Equal(["L0", "L2"], a.Running.Select(l => l.Name));
        Assert.True(a.Running.Sum(l => l.PowerW) <= 0.6);
    }

    [Property(MaxTest = 300)]
    public void Load_shedding_never_exceeds_available_power(ushort available, ushort[] powers)
    {
        var loads = (powers ?? []).Select((p, i) => new PoweredLoad(FormattableString.Invariant($"L{i}"), p % 5, p / 10.0)).ToArray();
        var a = LoadShedding.Allocate(available / 5.0, loads);
        Assert.True(a.Running.Sum(l => l.PowerW) <= available / 5.0);
        Assert.True(a.SparePowerW >= 0.0);
        Approx.Abs(a.Running.Sum(l => l.PowerW), a.SuppliedPowerW, 1e-9, "supplied");
        Assert.Equal(loads.Length, a.Running.Count + a.Shed.Count);
        Assert.All(a.Shed, l => Assert.True(a.SuppliedPowerW + l.PowerW > available / 5.0, "a shed load must not fit in what is left"));
    }

    [Fact]
    public void Current_turbine_power()
    {
        // ½ρAC_pηv³ computed here: 1027 kg/m³, 1 m², C_p 0.4, η 0.9, 0.5 m/s → 0.5·1027·0.4·0.9·0.125 = 23.1075 W.
        Approx.Rel(23.1075, CurrentTurbine.ElectricPowerW(0.5, 1027.0, 1.0, 0.4, 0.9, 0.1, 1.0), 1e-12, "P");
        Approx.Rel(8.0 * 23.1075, CurrentTurbine.ElectricPowerW(1.0, 1027.0, 1.0, 0.4, 0.9, 0.1, 1.0), 1e-12, "cube law");
        Assert.Equal(CurrentTurbine.ElectricPowerW(1.0, 1027.0, 1.0, 0.4, 0.9, 0.1, 1.0), CurrentTurbine.ElectricPowerW(2.0, 1027.0, 1.0, 0.4, 0.9, 0.1, 1.0));
        Assert.Equal(0.0, CurrentTurbine.ElectricPowerW(0.05, 1027.0, 1.0, 0.4, 0.9, 0.1, 1.0));
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => CurrentTurbine.ElectricPowerW(0.5, 1027.0, 1.0, 0.6, 0.9, 0.1, 1.0));
        Assert.Equal("powerCoefficient", e.ParamName);
    }
}
