using System.CommandLine;
using DescentOps.Physics.Station;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary><c>physics light-time --distance D</c>: the signal delay between the station and the team.</summary>
internal static class LightTimeSubcommand
{
    public static Command Create()
    {
        var distance = QuantityOption.Required("--distance", QuantityKind.Length, "Distance between station and ground (au is accepted).");
        var json = PhysicsAction.JsonOption();
        var command = new Command("light-time", "One-way light time d/c (c = 299 792 458 m/s) and the round trip 2d/c, the floor under every command loop.")
        {
            distance.Option, json,
        };
        var map = new ParameterOptions { { "distanceM", distance } };
        command.SetAction(parse => PhysicsAction.Run("light-time", parse, json, p =>
        {
            var d = distance.Value(p);
            var oneWay = LightTime.OneWayS(d);
            return new PhysicsReport("light time")
                .Number("distance_m", "distance", d, "m")
                .Number("one_way_s", "one way", oneWay, "s")
                .Number("round_trip_s", "round trip", 2.0 * oneWay, "s");
        }, map));
        return command;
    }
}
