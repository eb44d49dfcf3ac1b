using System.CommandLine;
using DescentOps.Physics.Ice;
using DescentOps.Physics.Refreezing;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary><c>physics refreeze</c>: how fast a water gap against a cold wall freezes shut (planar Neumann solution).</summary>
internal static class RefreezeSubcommand
{
    public static Command Create()
    {
        var gap = QuantityOption.Required("--gap", QuantityKind.Length, "Width of the water gap.");
        var temperature = QuantityOption.Required("--temperature", QuantityKind.Temperature, "Temperature of the ice behind the wall, 50 K up to the melting temperature.");
        var melting = QuantityOption.WithDefault("--melting-temperature", QuantityKind.Temperature, "Melting temperature of the gap water, 269 K to 273.16 K.", TriplePoint.TemperatureK, "273.16 K (pure ice at the triple point)");
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "refreeze",
            "Freeze-in of a water gap at the melting point against ice at T: Stefan number Δh_s/L, Neumann front constant λ of "
            + "λ√π·exp(λ²)·(1 + erf λ) = Ste, and the time s = 2λ√(κt) takes to reach the gap width.")
        {
            gap.Option, temperature.Option, melting.Option, json,
        };
        var map = new Dictionary<string, string> { ["gapM"] = gap.Name, ["iceTemperatureK"] = temperature.Name, ["meltingTemperatureK"] = melting.Name };
        command.SetAction(parse => PhysicsAction.Run("refreeze", parse, json, p =>
        {
            var s = Refreeze.FreezeIn(gap.Value(p), temperature.Value(p), melting.Value(p));
            return new PhysicsReport("refreezing gap")
                .Number("stefan_number", "Stefan number", s.StefanNumber, "")
                .Number("front_constant", "front constant λ", s.FrontConstant, "")
                .Number("freeze_time_s", "time to freeze the gap shut", s.FreezeTimeS, "s");
        }, map));
        return command;
    }
}
