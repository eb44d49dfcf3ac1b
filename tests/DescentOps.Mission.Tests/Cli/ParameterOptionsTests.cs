using System.CommandLine;
using DescentOps.Cli.Commands.Physics;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>
/// The physics subcommands' parameter-to-option maps: a model's refusal names the one option that feeds the parameter,
/// so a map that gives a parameter a second option is a mistake caught when the map is built.
/// </summary>
public sealed class ParameterOptionsTests
{
    [Fact]
    public void A_parameter_given_a_second_option_is_refused_naming_the_parameter_and_both_options()
    {
        var temperature = new Option<double>("--temperature");
        var iceTemperature = new Option<double>("--ice-temperature");
        var map = new ParameterOptions { { "temperatureK", temperature } };

        var refusal = Assert.Throws<ArgumentException>(() => map.Add("temperatureK", iceTemperature));

        Assert.Contains("'temperatureK'", refusal.Message, StringComparison.Ordinal);
        Assert.Contains("--temperature ", refusal.Message, StringComparison.Ordinal);
        Assert.Contains("--ice-temperature", refusal.Message, StringComparison.Ordinal);
        // The first mapping stands: a refusal still names the option the map was built with.
        Assert.True(map.TryGetOption("temperatureK", out var option));
        Assert.Equal("--temperature", option);
        Assert.Single(map);
    }

    [Fact]
    public void The_same_parameter_and_option_listed_twice_is_refused_too()
    {
        var depth = new Option<double>("--depth");
        var refusal = Assert.Throws<ArgumentException>(() => new ParameterOptions { { "depthM", depth }, { "depthM", depth } });
        Assert.Contains("'depthM' is fed by --depth already", refusal.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void One_option_may_feed_several_parameters_and_parameter_names_are_case_sensitive()
    {
        // The guard is per parameter: the seawater subcommand's salinity option feeds two models' parameter names.
        var salinity = new Option<double>("--salinity");
        var length = new Option<double>("--length");
        var lengthM = new Option<double>("--cable-length");
        var map = new ParameterOptions
        {
            { "practicalSalinity", salinity }, { "absolute salinity", salinity }, { "LengthM", length }, { "lengthM", lengthM },
        };

        Assert.True(map.TryGetOption("absolute salinity", out var fed));
        Assert.Equal("--salinity", fed);
        Assert.True(map.TryGetOption("lengthM", out var cable));
        Assert.Equal("--cable-length", cable);
        Assert.Equal(4, map.Count());
    }
}
