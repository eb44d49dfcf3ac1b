using DescentOps.Physics.Attitude;
using DescentOps.Physics.Ice;
using Xunit;

namespace DescentOps.Physics.Tests.Attitude;

public class TiltTests
{
    [Fact]
    public void Steering_rates_of_the_worked_example()
    {
        // Computed (CALC), reference note §7.2 (ATT-2): R 0.1 m, P_h 5 kW, ΔP 500 W, T∞ 250 K, η_st 1, ℓ 2.5 m;
        // tolerance 1e-3 rel.
        var rho = IceIh.DensityKgPerM3(250.0, 101325.0);
        var omega = TiltDynamics.HeadTurnRateRadPerS(500.0, 0.1, rho, 379_999.0, 1.0);
        Approx.Rel(1.0727e-3, omega, 1e-3, "ω_head");
        Approx.Rel(221.25, omega * 3600 * 180 / Math.PI, 1e-3, "ω_head °/h");
        Approx.Rel(0.4244, TiltDynamics.HeadPathRadiusM(0.1, 5000.0, 500.0), 1e-3, "r_head");
        Approx.Rel(1562.5, TiltDynamics.KinematicMinimumRadiusM(2.5, 0.5e-3), 1e-3, "r_kin 0.5 mm");
        Approx.Rel(78.125, TiltDynamics.KinematicMinimumRadiusM(2.5, 10e-3), 1e-3, "r_kin 10 mm");
        Approx.Rel(15.625, TiltDynamics.KinematicMinimumRadiusM(2.5, 50e-3), 1e-3, "r_kin 50 mm");
        const double v0 = 4.55252e-4; // PRB-2
        double DegPerHour(double w) => TiltDynamics.KinematicTurnRateLimitRadPerS(v0, w, 2.5) * 3600 * 180 / Math.PI;
        Approx.Rel(0.0601, DegPerHour(0.5e-3), 2e-3, "ω_kin 0.5 mm");
        Approx.Rel(1.2020, DegPerHour(10e-3), 1e-3, "ω_kin 10 mm");
        Approx.Rel(6.0098, DegPerHour(50e-3), 1e-3, "ω_kin 50 mm");
    }

    [Fact]
    public void Tilt_rate_is_clipped_and_restored()
    {
        Assert.Equal(1e-6, TiltDynamics.TiltRateRadPerS(0, 0, 1e-3, 0, double.PositiveInfinity, 1e-6));
        Assert.Equal(-1e-6, TiltDynamics.TiltRateRadPerS(0, 0, -1e-3, 0, double.PositiveInfinity, 1e-6));
        // A pendulum-stabilised probe tilted by 0.01 rad with τ_r = 100 s turns back at 1e-4 rad/s if allowed.
        Approx.Rel(-1e-4, TiltDynamics.TiltRateRadPerS(0.01, 0, 0, 0, 100.0, 1.0), 1e-12, "restoring");
    }
}
