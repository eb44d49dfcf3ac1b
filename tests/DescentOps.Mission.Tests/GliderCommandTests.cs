using System.Text.Json;

namespace DescentOps.Mission.Tests;

/// <summary><c>descentops physics glider</c> against the glide and pump relations worked by hand.</summary>
public sealed class GliderCommandTests
{
    [Fact]
    public async Task Glider_speed_stroke_and_endurance_follow_the_steady_glide()
    {
        var (exit, stdout, stderr) = await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(),
            ["physics", "glider", "--net-buoyancy", "0.3 kg", "--glide-angle", "25 deg", "--gravity", "1.0 m/s^2", "--hotel-power", "2 W", "--battery", "0.1 kWh", "--pressure", "33 kPa", "--water-density", "1028 kg/m³", "--json"]);
        Assert.True(exit == 0, stderr);
        using var document = JsonDocument.Parse(stdout);
        var json = document.RootElement;
        double N(string name) => json.GetProperty(name).GetDouble();

        // By hand (Leonard and Graver 2001 form, K_L 132.5, K_D0 2.15, K_D 25): tan ξ = D/L fixes α from
        // 25·α² − 132.5·tan ξ·α + 2.15 = 0 (small root), then V = √(m0·g/√(L² + D²)) with L = K_L·α, D = K_D0 + K_D·α².
        var tan = Math.Tan(25 * Math.PI / 180);
        var alpha = ((132.5 * tan) - Math.Sqrt((132.5 * 132.5 * tan * tan) - (4 * 25 * 2.15))) / (2 * 25);
        var lift = 132.5 * alpha;
        var drag = 2.15 + (25 * alpha * alpha);
        var speed = Math.Sqrt(0.3 * 1.0 / Math.Sqrt((lift * lift) + (drag * drag)));
        Assert.Equal(alpha, N("angle_of_attack_rad"), 9);
        Assert.Equal(speed, N("speed_m_s"), 9);
        Assert.Equal(speed * Math.Sin(25 * Math.PI / 180), N("vertical_speed_m_s"), 9);

        // Stroke at mid-band (25 m): 2·m0/ρ · (p0 + ρ·g·25 m) / η.
        var stroke = 2 * 0.3 / 1028.0 * (33e3 + (1028.0 * 1.0 * 25)) / 0.5;
        Assert.Equal(stroke, N("pump_stroke_j"), 6);
        // Two strokes per dive and climb of the 50 m band, 2·50/tan ξ of ground: tan ξ/50 strokes per metre.
        var perMetre = (2.0 / (speed * Math.Cos(25 * Math.PI / 180))) + (stroke * tan / 50.0);
        Assert.Equal(perMetre * 1000, N("energy_per_km_j"), 6);
        Assert.Equal(3.6e5 / (perMetre * speed * Math.Cos(25 * Math.PI / 180)), N("endurance_s"), 3);
    }

    [Fact]
    public async Task A_glide_shallower_than_the_wing_can_fly_is_refused_naming_the_option()
    {
        var (exit, _, stderr) = await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(), ["physics", "glider", "--net-buoyancy", "0.3 kg", "--glide-angle", "3 deg"]);
        Assert.Equal(3, exit); // ExitCode.InvalidInput
        Assert.Contains("--glide-angle", stderr);
    }
}
