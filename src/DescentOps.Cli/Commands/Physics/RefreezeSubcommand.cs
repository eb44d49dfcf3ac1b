using System.CommandLine;
using DescentOps.Physics.Ice;
using DescentOps.Physics.Refreezing;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// <c>physics refreeze</c>: how fast a water gap against a cold wall freezes shut, planar (Neumann solution) or around a
/// cylindrical probe of radius R (the model the simulated probe uses, <see cref="Refreeze.FreezeInAroundProbe"/>).
/// </summary>
internal static class RefreezeSubcommand
{
    public static Command Create()
    {
        var gap = QuantityOption.Required("--gap", QuantityKind.Length, "Width of the water gap.");
        var temperature = QuantityOption.Required("--temperature", QuantityKind.Temperature, "Temperature of the ice behind the wall, 50 K up to the melting temperature.");
        var melting = QuantityOption.WithDefault("--melting-temperature", QuantityKind.Temperature, "Melting temperature of the gap water, 269 K to 273.16 K.", TriplePoint.TemperatureK, "273.16 K (pure ice at the triple point)");
        var geometry = new Option<RefreezeGeometry>("--geometry")
        {
            Description = "planar (a flat wall, the default) or cylinder (around a probe of --radius, as the runs use).",
            DefaultValueFactory = _ => RefreezeGeometry.Planar,
        };
        var radius = QuantityOption.NotRequired("--radius", QuantityKind.Length, "Probe radius; required with --geometry cylinder.");
        var exposure = QuantityOption.WithDefault("--exposure", QuantityKind.Duration, "Cylinder only: how long the wall had been at the melting point before the probe stopped (z/v for a moving probe).", 0.0, "0 s");
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "refreeze",
            "Freeze-in of a water gap at the melting point against ice at T: Stefan number Δh_s/L, Neumann front constant λ of "
            + "λ√π·exp(λ²)·(1 + erf λ) = Ste, and the time to freeze the gap: planar, s = 2λ√(κt) reaching the gap width; cylinder, "
            + "the heat a probe wall of radius R held at the melting point loses, (ΦR/κ)[H(τ_e + τ) − H(τ_e)], reaching the gap's latent heat.")
        {
            gap.Option, temperature.Option, melting.Option, geometry, radius.Option, exposure.Option, json,
        };
        var map = new ParameterOptions { { "gapM", gap }, { "iceTemperatureK", temperature }, { "meltingTemperatureK", melting }, { "radiusM", radius }, { "exposureTimeS", exposure } };
        command.SetAction(parse => PhysicsAction.Run("refreeze", parse, json, p =>
        {
            var chosen = p.GetValue(geometry);
            var s = chosen == RefreezeGeometry.Cylinder
                ? Refreeze.FreezeInAroundProbe(gap.Value(p), radius.Optional(p) ?? throw new UsageException("--radius is required with --geometry cylinder."), exposure.Value(p), temperature.Value(p), melting.Value(p))
                : Refreeze.FreezeIn(gap.Value(p), temperature.Value(p), melting.Value(p));
            var report = new PhysicsReport("refreezing gap")
                .Text("geometry", "geometry", chosen == RefreezeGeometry.Cylinder ? "cylinder" : "planar")
                .Number("stefan_number", "Stefan number", s.StefanNumber, "")
                .Number("front_constant", chosen == RefreezeGeometry.Cylinder ? "Neumann front constant λ (constant properties, for comparison)" : "front constant λ", s.FrontConstant, "");
            if (s.VariablePropertyFrontMPerRootS is { } front)
            {
                // The cylinder's time takes its planar limit from the front with the ice's properties at each temperature.
                report = report.Number("variable_property_front_m_per_root_s", "planar front s = 2λ′√t with temperature-dependent ice, λ′", front, "m/√s");
            }

            return report.Number("freeze_time_s", "time to freeze the gap shut", s.FreezeTimeS, "s");
        }, map));
        return command;
    }
}
