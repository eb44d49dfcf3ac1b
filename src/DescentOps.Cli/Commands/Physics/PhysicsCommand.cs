using System.CommandLine;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// <c>descentops physics ...</c>: engineering answers from the same models the simulator runs, one subcommand per
/// question, each as a table or (with <c>--json</c>) one JSON object.
/// </summary>
public static class PhysicsCommand
{
    public static Command Create() =>
        new("physics", "Engineering answers from the simulator's own physics models: ice, descent, refreezing, hot-water jets, shell crossing, seawater, acoustics, fibre, radio in ice, station, light time, vehicles.")
        {
            IceSubcommand.Create(),
            DescentSubcommand.Create(),
            RefreezeSubcommand.Create(),
            JetsSubcommand.Create(),
            CrossingSubcommand.Create(),
            SeawaterSubcommand.Create(),
            AcousticSubcommand.Create(),
            FibreSubcommand.Create(),
            RadioIceSubcommand.Create(),
            StationSubcommand.Create(),
            LightTimeSubcommand.Create(),
            VehicleSubcommand.Create(),
            GliderSubcommand.Create(),
        };
}
