using DescentOps.Physics.Vehicles;
using FsCheck.Xunit;
using Xunit;

namespace DescentOps.Physics.Tests.Vehicles;

public class VehicleTests
{
    private const double Deg = Math.PI / 180.0;
    private const double KWh = 3.6e6;
    private static readonly GliderCoefficients Glider = GliderCoefficients.Graver2005;
    private static readonly PropelledVehicle Auv = PropelledVehicle.Default;

    // VH-* are CALC values of the reference note from the Leonard & Graver 2001 (IEEE JOE 26(4)) steady-glide
    // equations and coefficients recalled from Graver 2005; they guard the implementation, not the coefficients.
    [Fact]
    public void Glide_check_values()
    {
        Approx.Abs(6.315, SteadyGlide.MinimumGlidePathAngleRad(Glider) / Deg, 1e-3, "VH-1");
        var g = SteadyGlide.AtAngleOfAttack(Glider, 2 * Deg, 0.1, 9.81);
        Approx.Abs(25.241, g.GlidePathAngleRad / Deg, 1e-3, "VH-2 xi");
        Approx.Abs(0.4380, g.SpeedMPerS, 1e-4, "VH-2 V");
        Approx.Abs(0.3962, g.HorizontalSpeedMPerS, 1e-4, "VH-2 u");
        Approx.Abs(0.1868, g.VerticalSpeedMPerS, 1e-4, "VH-2 w");
        Approx.Abs(0.6926, SteadyGlide.AtAngleOfAttack(Glider, 2 * Deg, 0.25, 9.81).SpeedMPerS, 1e-4, "VH-3 heavier");
        var three = SteadyGlide.AtAngleOfAttack(Glider, 3 * Deg, 0.1, 9.81);
        Approx.Abs(0.3670, three.SpeedMPerS, 1e-4, "VH-3 V");
        Approx.Abs(17.733, three.GlidePathAngleRad / Deg, 1e-3, "VH-3 xi");
        Approx.Abs(2.0227, SteadyGlide.AngleOfAttackRad(Glider, 25 * Deg) / Deg, 1e-4, "VH-4 25°");
        Approx.Abs(1.3362, SteadyGlide.AngleOfAttackRad(Glider, 35 * Deg) / Deg, 1e-4, "VH-4 35°");
    }

    [Fact]
    public void Glide_on_another_body()
    {
        // Speed scales with √(m0·g): the note's √(g_body/g_Earth) rule, here at g = 1.315 m/s².
        var earth = SteadyGlide.AtAngleOfAttack(Glider, 2 * Deg, 0.1, 9.81);
        var moon = SteadyGlide.AtAngleOfAttack(Glider, 2 * Deg, 0.1, 1.315);
        Approx.Rel(Math.Sqrt(1.315 / 9.81), moon.SpeedMPerS / earth.SpeedMPerS, 1e-12, "scaling");
        Assert.Equal(earth.GlidePathAngleRad, moon.GlidePathAngleRad);
        // Inverting the trim gives back the angle of attack.
        Approx.Abs(2 * Deg, SteadyGlide.AngleOfAttackRad(Glider, earth.GlidePathAngleRad), 1e-12, "round trip");
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SteadyGlide.AngleOfAttackRad(Glider, 5 * Deg));
    }

    [Fact]
    public void Pump_and_cycle()
    {
        // VH-5, VH-6 CALC.
        Approx.Abs(5.0e3, SteadyGlide.PumpStrokeEnergyJ(250e-6, 10e6, 0.5), 1e-9, "10 MPa");
        Approx.Abs(12.0e3, SteadyGlide.PumpStrokeEnergyJ(250e-6, 24e6, 0.5), 1e-9, "24 MPa");
        Approx.Abs(4289.0, SteadyGlide.HorizontalDistancePerCycleM(1000.0, 25 * Deg), 0.1, "VH-6");
    }

    [Fact]
    public void Propelled_check_values()
    {
        // VH-7..VH-9 CALC at ρ 1027 kg/m³, 1 kWh battery; 1e-3 relative.
        var p = PropelledVehicleModel.AtSpeed(Auv, 1.5, 1027.0, KWh);
        Approx.Rel(7.259, p.DragN, 1e-3, "D");
        Approx.Rel(21.78, p.PropulsivePowerW, 1e-3, "P_prop");
        Approx.Rel(41.78, p.TotalPowerW, 1e-3, "P");
        Approx.Rel(7.737, p.EnergyPerMetreJPerM * 1e3 / 3600.0, 1e-3, "Wh/km");
        Approx.Rel(23.94, p.EnduranceS / 3600.0, 1e-3, "endurance");
        Approx.Rel(129.25, p.RangeM / 1e3, 1e-3, "range");
        var vOpt = PropelledVehicleModel.MaximumRangeSpeedMPerS(Auv, 1027.0);
        Approx.Rel(1.1572, vOpt, 1e-3, "V_opt");
        var o = PropelledVehicleModel.AtSpeed(Auv, vOpt, 1027.0, KWh);
        Approx.Rel(7.201, o.EnergyPerMetreJPerM * 1e3 / 3600.0, 1e-3, "Wh/km at V_opt");
        Approx.Rel(10.00, o.PropulsivePowerW, 1e-3, "P_prop = hotel/2");
        Approx.Rel(33.33, o.EnduranceS / 3600.0, 1e-3, "endurance at V_opt");
        Approx.Rel(138.87, o.RangeM / 1e3, 1e-3, "range at V_opt");
        // Speed for a propulsive power inverts the power law.
        Approx.Rel(1.5, PropelledVehicleModel.SpeedForPropulsivePowerMPerS(Auv, p.PropulsivePowerW, 1027.0), 1e-12, "speed from power");
    }

    [Property(MaxTest = 300)]
    public void Above_the_optimum_faster_means_shorter_endurance_and_range(ushort a, ushort b)
    {
        var vOpt = PropelledVehicleModel.MaximumRangeSpeedMPerS(Auv, 1027.0);
        var slow = vOpt * (1.0 + (2.0 * a / ushort.MaxValue));
        var fast = slow * (1.001 + (b / (double)ushort.MaxValue));
        var s = PropelledVehicleModel.AtSpeed(Auv, slow, 1027.0, KWh);
        var f = PropelledVehicleModel.AtSpeed(Auv, fast, 1027.0, KWh);
        Assert.True(f.EnduranceS < s.EnduranceS);
        Assert.True(f.RangeM < s.RangeM, FormattableString.Invariant($"{slow} m/s: {s.RangeM} m; {fast} m/s: {f.RangeM} m"));
        // Below the optimum the range does the opposite, so the optimum is a true maximum of range.
        var below = PropelledVehicleModel.AtSpeed(Auv, vOpt / (1.001 + (b / (double)ushort.MaxValue)), 1027.0, KWh);
        Assert.True(below.RangeM < PropelledVehicleModel.AtSpeed(Auv, vOpt, 1027.0, KWh).RangeM);
    }

    [Fact]
    public void Dead_reckoning_check_values()
    {
        // VH-10, VH-11 CALC; g0 = 9.80665 m/s² exact.
        Approx.Abs(17.452, DeadReckoning.HeadingCrossTrackErrorM(1000.0, 1 * Deg), 1e-3, "VH-10");
        Approx.Abs(6354.7, DeadReckoning.AccelerometerBiasErrorM(100e-6 * 9.80665, 3600.0), 0.1, "VH-11");
        Assert.Equal(360.0, DeadReckoning.UnmodelledCurrentErrorM(0.1, 3600.0));
        // Random walk: 3-4-5 triangle of the first two terms, then only q·t.
        Approx.Abs(5.0, DeadReckoning.PositionSigmaM(3.0, 0.004, 1000.0, 0.0, 0.0), 1e-12, "sigma");
        Approx.Abs(Math.Sqrt(36.0), DeadReckoning.PositionSigmaM(0.0, 0.0, 0.0, 0.01, 3600.0), 1e-12, "walk");
    }
}
