using DescentOps.Physics.Power;
using FsCheck.Xunit;
using Xunit;

namespace DescentOps.Physics.Tests.Power;

/// <summary>The probe's bus: decay of its source, shedding by priority, and the energy bookkeeping, computed by hand.</summary>
public class PowerBusTests
{
    private const double Year = RadioisotopeHeatSource.SecondsPerYear;
    private const double KilowattHour = 3.6e6;

    /// <summary>A 2 kWh pack at 25 °C, where the placeholder cold curve gives its full capacity (factor 1.00).</summary>
    private static BusBattery Pack(double chargeEfficiency = 0.95, double dischargeEfficiency = 0.9) => new(
        BatteryParameters.LithiumIon(2 * KilowattHour / 28.0) with { CoulombicEfficiency = chargeEfficiency },
        28.0,
        dischargeEfficiency,
        MaxDischargePowerW: 1000,
        MaxChargePowerW: 1500,
        CellTemperatureK: 298.15);

    private static readonly PoweredLoad[] Loads =
    [
        new("wall", 1, 1500),
        new("sampling-pump", 3, 300),
        new("head", 0, 2500),
        new("electronics", 0, 100),
    ];

    [Fact]
    public void The_source_halves_over_the_published_half_life_of_Plutonium238()
    {
        // Pu-238 half-life 87.7 years: the ENSDF evaluation as listed in the NNDC NuDat database (value from memory).
        // With no converter degradation the electric output follows the heat: half after one half-life, a quarter
        // after two, for any efficiency.
        var start = RadioisotopeHeatSource.Output(40_000, 0.25, 0.0, 0.0);
        var oneHalfLife = RadioisotopeHeatSource.Output(40_000, 0.25, 0.0, 87.7 * Year);
        var twoHalfLives = RadioisotopeHeatSource.Output(40_000, 0.25, 0.0, 2 * 87.7 * Year);
        Approx.Rel(10_000, start.ElectricPowerW, 1e-15, "start: 0.25 × 40 kW");
        Approx.Rel(5_000, oneHalfLife.ElectricPowerW, 1e-12, "one half-life");
        Approx.Rel(10_000, oneHalfLife.ThermalPowerW / 2, 1e-12, "heat after one half-life");
        Approx.Rel(2_500, twoHalfLives.ElectricPowerW, 1e-12, "two half-lives");
    }

    [Fact]
    public void The_bus_sheds_the_least_important_load_that_does_not_fit()
    {
        // Computed: available = 2000 W source + 1000 W battery limit = 3000 W. In priority order (ties by name):
        // electronics 100 W (used 100), head 2500 W (2600), wall 1500 W would make 4100 > 3000, shed; the pump
        // 300 W still fits (2900). The battery covers 2900 − 2000 = 900 W; nothing is left to charge or curtail.
        var a = PowerBus.Allocate(2000, 0, 0.75, Pack(), Loads);
        Assert.Equal(["electronics", "head", "sampling-pump"], a.Loads.Running.Select(l => l.Name));
        Assert.Equal(["wall"], a.Loads.Shed.Select(l => l.Name));
        Assert.Equal(3000, a.AvailablePowerW, 12);
        Assert.Equal(2900, a.Loads.SuppliedPowerW, 12);
        Assert.Equal(900, a.BatteryDischargeW, 12);
        Assert.Equal(0, a.BatteryChargeW);
        Assert.Equal(0, a.CurtailedW);

        // An empty battery offers nothing: of 2000 W, electronics take 100; the head's 2500 W does not fit and is
        // shed; the wall's 1500 W fits (1600) and so does the pump (1900). The 100 W left charges the pack.
        var empty = PowerBus.Allocate(2000, 0, 0.0, Pack(), Loads);
        Assert.Equal(["head"], empty.Loads.Shed.Select(l => l.Name));
        Assert.Equal(2000, empty.AvailablePowerW, 12);
        Assert.Equal(1900, empty.Loads.SuppliedPowerW, 12);
        Assert.Equal(100, empty.BatteryChargeW, 12);
        Assert.Equal(0, empty.CurtailedW, 12);

        // At 7000 W every load runs (4400 W); the 2600 W surplus is over the 1500 W charge limit: 1100 W is curtailed.
        var plenty = PowerBus.Allocate(7000, 0, 0.5, Pack(), Loads);
        Assert.Empty(plenty.Loads.Shed);
        Assert.Equal(1500, plenty.BatteryChargeW, 12);
        Assert.Equal(1100, plenty.CurtailedW, 12);
    }

    [Fact]
    public void An_hour_of_discharge_is_booked_on_both_sides_of_the_battery()
    {
        var pack = Pack();
        var a = PowerBus.Allocate(2000, 0, 0.75, pack, Loads);
        var step = PowerBus.Advance(a, 0.75, pack, 3600);

        // Computed: the cells give 900 W / 0.9 = 1000 W for an hour, 1 kWh; self-discharge first takes
        // 1.5 kWh · (1 − exp(−r · 3600 s)), r = 2 %/30 d; the bus gets 0.9 kWh, the converter loses 0.1 kWh.
        var r = BatteryParameters.TypicalLithiumIonSelfDischargePerS;
        var selfJ = 1.5 * KilowattHour * (1 - Math.Exp(-r * 3600));
        Approx.Rel(selfJ, step.Energy.SelfDischargeJ, 1e-9, "self-discharge");
        Approx.Rel(0.9 * KilowattHour, step.Energy.BatteryOutJ, 1e-12, "battery to bus");
        Approx.Rel(0.1 * KilowattHour, step.Energy.BatteryLossJ, 1e-12, "converter loss");
        Approx.Rel((0.5 * KilowattHour - selfJ) / (2 * KilowattHour), step.StateOfCharge, 1e-12, "state of charge");
        Approx.Rel(2900 * 3600.0, step.Energy.LoadsJ, 1e-12, "loads");
        Assert.Equal(0, step.Energy.UnservedJ);

        // Bus side: source + battery out = loads + battery in + curtailed. Cell side: stored change = in − out − losses.
        var e = step.Energy;
        Approx.Rel(e.SourceJ + e.HarvestJ + e.BatteryOutJ, e.LoadsJ + e.BatteryInJ + e.CurtailedJ, 1e-12, "bus balance");
        Approx.Rel(pack.EffectiveCapacityJ * (step.StateOfCharge - 0.75), e.BatteryInJ - e.BatteryOutJ - e.BatteryLossJ - e.SelfDischargeJ, 1e-9, "cell balance");
    }

    [Fact]
    public void A_battery_that_runs_dry_mid_step_leaves_the_rest_unserved()
    {
        var pack = Pack();
        var a = PowerBus.Allocate(2000, 0, 0.1, pack, Loads);
        // Computed: 0.1 · 2 kWh = 720 kJ in the cells, 648 kJ at the bus after the 0.9 converter: 720 s at 900 W.
        var emptyS = PowerBus.TimeToEmptyS(a, 0.1, pack);
        Assert.Equal(720, emptyS, 9);

        var step = PowerBus.Advance(a, 0.1, pack, 3600);
        Assert.Equal(0, step.StateOfCharge);
        Assert.True(step.Energy.UnservedJ > 0);
        // The loads got the source for the whole hour and the battery's whole content, less what self-discharge took.
        var e = step.Energy;
        Approx.Rel(e.SourceJ + e.BatteryOutJ, e.LoadsJ, 1e-12, "served");
        Approx.Rel(2900 * 3600.0, e.LoadsJ + e.UnservedJ, 1e-12, "allocated");
        Approx.Rel(0.2 * KilowattHour, e.BatteryOutJ + e.BatteryLossJ + e.SelfDischargeJ, 1e-12, "the cells' content");
    }

    [Fact]
    public void Surplus_charges_up_to_the_limit_and_the_rest_is_curtailed()
    {
        var pack = Pack(chargeEfficiency: 0.95);
        var a = PowerBus.Allocate(5000, 0, 0.5, pack, Loads);
        // Computed: all loads run, 4400 W; 600 W spare, under the 1500 W charge limit; none curtailed.
        Assert.Empty(a.Loads.Shed);
        Assert.Equal(600, a.BatteryChargeW, 12);
        var step = PowerBus.Advance(a, 0.5, pack, 3600);
        // 600 W · 1 h = 0.6 kWh offered, 0.95 of it stored: 0.57 kWh; 5 % lost.
        Approx.Rel(0.6 * KilowattHour, step.Energy.BatteryInJ, 1e-12, "battery in");
        Approx.Rel(0.03 * KilowattHour, step.Energy.BatteryLossJ, 1e-9, "charging loss");
        var selfJ = KilowattHour * (1 - Math.Exp(-BatteryParameters.TypicalLithiumIonSelfDischargePerS * 3600));
        Approx.Rel((1.0 * KilowattHour - selfJ + (0.57 * KilowattHour)) / (2 * KilowattHour), step.StateOfCharge, 1e-12, "state of charge");
    }

    [Fact]
    public void A_current_turbine_alone_recharges_a_flat_battery()
    {
        // Computed: P = ½ · 1030 kg/m³ · π(0.4 m)²/4 · 0.35 · 0.7 · (0.5 m/s)³ = 1.9817 W; with no source and every
        // load too big for it, all of it goes to the pack, which stores 0.95 of it.
        var harvestW = CurrentTurbine.ElectricPowerW(0.5, 1030, Math.PI * 0.4 * 0.4 / 4, 0.35, 0.7, 0.05, 0.6);
        Approx.Rel(0.5 * 1030 * (Math.PI * 0.04) * 0.35 * 0.7 * 0.125, harvestW, 1e-12, "turbine");
        var pack = Pack(chargeEfficiency: 0.95);
        var a = PowerBus.Allocate(0, harvestW, 0.0, pack, Loads);
        Assert.Equal(4, a.Loads.Shed.Count);
        Assert.Equal(harvestW, a.BatteryChargeW, 12);
        var step = PowerBus.Advance(a, 0.0, pack, 86400);
        Approx.Rel(0.95 * harvestW * 86400 / pack.EffectiveCapacityJ, step.StateOfCharge, 1e-12, "a day of harvest");
        Approx.Rel(step.Energy.HarvestJ, step.Energy.BatteryInJ, 1e-12, "all harvest to the pack");
    }

    private static double Map(ushort draw, double low, double high) => low + ((high - low) * draw / ushort.MaxValue);

    [Property(MaxTest = 500)]
    public void Delivered_power_never_exceeds_what_the_sources_and_the_battery_can_give(ushort source, ushort harvest, ushort soc, ushort head, ushort wall, ushort pump, ushort minutes)
    {
        var pack = Pack();
        var state = Map(soc, 0, 1);
        PoweredLoad[] loads = [new("electronics", 0, 60), new("head", 0, Map(head, 0, 8000)), new("wall", 1, Map(wall, 0, 4000)), new("pump", 3, Map(pump, 0, 800))];
        var a = PowerBus.Allocate(Map(source, 0, 10_000), Map(harvest, 0, 50), state, pack, loads);
        var battery = state > 0 ? pack.MaxDischargePowerW : 0.0;

        Assert.True(a.Loads.SuppliedPowerW <= a.SourcePowerW + a.HarvestPowerW + battery);
        Assert.True(a.BatteryDischargeW <= battery && a.BatteryChargeW <= pack.MaxChargePowerW);
        Assert.True(a.BatteryDischargeW == 0 || a.BatteryChargeW == 0);
        Assert.Equal(a.SourcePowerW + a.HarvestPowerW + a.BatteryDischargeW, a.Loads.SuppliedPowerW + a.BatteryChargeW + a.CurtailedW, 9);

        // A load is never shed while a less important one of no smaller power runs.
        foreach (var shed in a.Loads.Shed)
        {
            Assert.DoesNotContain(a.Loads.Running, r => r.Priority > shed.Priority && r.PowerW >= shed.PowerW && r.PowerW > 0);
        }

        var seconds = Map(minutes, 0, 600) * 60;
        var step = PowerBus.Advance(a, state, pack, seconds);
        var e = step.Energy;
        Assert.True(e.LoadsJ <= e.SourceJ + e.HarvestJ + e.BatteryOutJ + 1e-6);
        Assert.True(e.BatteryOutJ <= (state * pack.EffectiveCapacityJ * pack.DischargeEfficiency) + 1e-6);
        Approx.Abs(e.SourceJ + e.HarvestJ + e.BatteryOutJ, e.LoadsJ + e.BatteryInJ + e.CurtailedJ, 1e-9 * Math.Max(1, e.SourceJ + e.BatteryOutJ), "bus balance");
        Approx.Abs(pack.EffectiveCapacityJ * (step.StateOfCharge - state), e.BatteryInJ - e.BatteryOutJ - e.BatteryLossJ - e.SelfDischargeJ, 1e-6, "cell balance");
    }
}
