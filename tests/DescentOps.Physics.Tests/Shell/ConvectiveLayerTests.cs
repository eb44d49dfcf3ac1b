using DescentOps.Physics.Descent;
using DescentOps.Physics.Shell;
using Xunit;

namespace DescentOps.Physics.Tests.Shell;

/// <summary>A warm convecting layer under the conductive lid.</summary>
public class ConvectiveLayerTests
{
    // A 30 km shell whose lid is the reference's SHL-1 plane lid (T_s 100 K, base of the lid 270 K, D 20 km).
    private static readonly IceShell Shell = new(100, 30_000, 1.3, convection: new ConvectiveLayer(20_000, 270, 500));

    [Fact]
    public void The_lid_above_the_layer_is_the_conductive_profile()
    {
        // Computed (CALC) in the physics reference, check SHL-1: plane lid, a = 651 W/m, T_s 100 K, T_b 270 K, D 20 km:
        // T(10 km) = 164.3168 K and q = 32.3303 mW/m² (tolerances 1e-3 K and 1e-3 mW/m²).
        Assert.Equal(164.3168, Shell.TemperatureK(10_000), 3);
        Assert.Equal(32.3303, Shell.HeatFluxWPerM2 * 1e3, 3);
    }

    [Fact]
    public void The_layer_is_isothermal_then_warms_to_the_base_melting_point()
    {
        Assert.Equal(270, Shell.TemperatureK(20_000), 9);
        Assert.Equal(270, Shell.TemperatureK(25_000), 9);
        Assert.Equal(270, Shell.TemperatureK(29_500), 9);
        Assert.Equal(Shell.BaseTemperatureK, Shell.TemperatureK(30_000), 9);
        // Halfway through the basal boundary layer, halfway between the core and the base (linear by construction).
        Assert.Equal((270 + Shell.BaseTemperatureK) / 2, Shell.TemperatureK(29_750), 9);
        Assert.True(Shell.BaseTemperatureK > 270, "the base melts above the core temperature at this pressure");
    }

    [Fact]
    public void Warm_ice_under_the_lid_is_cut_faster_than_the_cold_lid_would_be()
    {
        var probe = new ProbeGeometry(0.12, 2.4, 210.0);
        var conductive = new ProbeDescentModel(new IceShell(100, 30_000, 1.3), probe);
        var convecting = new ProbeDescentModel(Shell, probe);
        Assert.True(convecting.Rate(22_000, 5000, 2000).VelocityMPerS > conductive.Rate(22_000, 5000, 2000).VelocityMPerS);
    }

    [Fact]
    public void A_layer_as_warm_as_the_base_is_refused()
    {
        var error = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => new IceShell(100, 30_000, 1.3, convection: new ConvectiveLayer(20_000, 273.0, 500)));
        Assert.Contains("convecting layer", error.Message, StringComparison.Ordinal);
    }
}
