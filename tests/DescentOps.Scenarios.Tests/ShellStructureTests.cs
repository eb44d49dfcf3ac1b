using DescentOps.Scenarios.Loading;

namespace DescentOps.Scenarios.Tests;

/// <summary>The shell's optional structure: salty layers, debris bands and a fractured zone, read in SI and checked for sense.</summary>
public sealed class ShellStructureTests
{
    [Fact]
    public void Layers_bands_and_the_fractured_zone_are_read_in_SI()
    {
        // The every-field fixture holds one salty layer, one debris band and a 30 m fractured zone.
        var shell = ScenarioLoader.LoadText(ScenarioText.Default, "s.yaml").Shell;

        Assert.Equal(30.0, shell.FracturedToM);
        var layer = Assert.Single(shell.Layers);
        Assert.Equal((300.0, 420.0, 0.008), (layer.TopM, layer.BottomM, layer.SalinityKgPerKg), new ToleranceComparer(1e-12));
        var band = Assert.Single(shell.DebrisBands);
        Assert.Equal((900.0, 905.0, 0.002), (band.TopM, band.BottomM, band.VolumeFraction), new ToleranceComparer(1e-12));
    }

    [Fact]
    public void A_convecting_layer_is_read_and_one_that_leaves_no_room_is_refused()
    {
        var convection = ScenarioLoader.LoadText(ScenarioText.Default, "s.yaml").Shell.Convection;
        Assert.Equal(new Model.ConvectionModel(1600, 255, 80), convection);

        var text = ScenarioText.DefaultWith("    basal_boundary: 80 m", "    basal_boundary: 900 m");
        var error = Assert.Single(Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, "s.yaml")).Errors);
        Assert.Equal("shell.convection.top", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "top: 1.6 km"), error.Location.Line);
    }

    [Fact]
    public void Overlapping_layers_are_refused_at_the_second_one()
    {
        var text = ScenarioText.DefaultWith("      salinity: 8 g/kg", "      salinity: 8 g/kg\n    - top: 400 m\n      bottom: 500 m\n      salinity: 3 g/kg");
        var error = Assert.Single(Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, "s.yaml")).Errors);
        Assert.Equal("shell.layers[1]", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "- top: 400 m"), error.Location.Line);
        Assert.Contains("overlaps shell.layers[0]", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("bottom: 905 m", "bottom: 890 m", "deeper than the top")]
    [InlineData("bottom: 905 m", "bottom: 2600 m", "below the shell's thickness")]
    public void A_band_whose_bottom_makes_no_sense_is_refused_at_its_bottom(string line, string replacement, string expected)
    {
        var text = ScenarioText.DefaultWith("      " + line, "      " + replacement);
        var error = Assert.Single(Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, "s.yaml")).Errors);
        Assert.Equal("shell.debris_bands[0].bottom", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, replacement), error.Location.Line);
        Assert.Contains(expected, error.Message, StringComparison.Ordinal);
    }

    private sealed class ToleranceComparer(double tolerance) : IEqualityComparer<(double, double, double)>
    {
        public bool Equals((double, double, double) x, (double, double, double) y) =>
            Math.Abs(x.Item1 - y.Item1) <= tolerance * Math.Max(1, Math.Abs(y.Item1))
            && Math.Abs(x.Item2 - y.Item2) <= tolerance * Math.Max(1, Math.Abs(y.Item2))
            && Math.Abs(x.Item3 - y.Item3) <= tolerance * Math.Max(1, Math.Abs(y.Item3));

        public int GetHashCode((double, double, double) obj) => 0;
    }
}
