using DescentOps.Rules.Catalogue;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The state of each bus load as the probe's power controller knows it, one discrete point per load named in the
/// scenario (<c>probe.load.NAME</c>): <c>on</c> (supplied), <c>shed</c> (the bus had too little power for it) or
/// <c>off</c> (switched off by telecommand). Only a probe with a power system has them.
/// </summary>
public static class ProbeLoadStates
{
    public const string Prefix = "probe.load.";
    public const string On = "on";
    public const string Shed = "shed";
    public const string Off = "off";

    public static IReadOnlyList<string> States { get; } = [On, Shed, Off];

    public static string PointOf(string load) => Prefix + load;

    /// <summary>Whether <paramref name="point"/> is a load's state point.</summary>
    public static bool IsLoadPoint(string point) => point.StartsWith(Prefix, StringComparison.Ordinal);

    /// <summary>The catalogue's points for the loads of <paramref name="power"/>.</summary>
    public static IEnumerable<TelemetryPointSpec> Points(ProbePowerSystem power) =>
        power.LoadModels.Select(l => (TelemetryPointSpec)new DiscretePointSpec(PointOf(l.Name), States));

    /// <summary>The readings of the frame: each load's state under the allocation in force (none without a power system).</summary>
    public static IEnumerable<(string Point, string State)> Readings(ProbeDesign design, ProbeState state)
    {
        if (design.Power is not { } power || state.Bus is not { } bus) yield break;
        foreach (var load in power.LoadModels)
        {
            yield return (PointOf(load.Name), ProbeBusControl.OffCause(bus.Allocation, load.Name) switch
            {
                null => On,
                "bus" => Shed,
                _ => Off,
            });
        }
    }
}
