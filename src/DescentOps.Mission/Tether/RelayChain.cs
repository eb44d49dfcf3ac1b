using DescentOps.Mission.Messages;

namespace DescentOps.Mission.Tether;

/// <summary>
/// The relay chain at one instant, bottom up: the probe end, then every working relay from the deepest up, each node's
/// depth, buffer and whether its hop to the node above (the surface for the last) closes, with its margin.
/// </summary>
public sealed record RelayChain(IReadOnlyList<RelayState> Working, IReadOnlyList<double> Depths, bool[] HopCloses, double[] Margins, IReadOnlyList<FrameHold<TelemetryFrame>> Holds)
{
    public bool PathUp => HopCloses.All(c => c);

    public static RelayChain Of(TetherDesign design, TetherState state)
    {
        var working = state.Relays.Where(r => !r.Dead && !state.FailedRelays.Contains(r.Number)).Reverse().ToList();
        var depths = new List<double>(working.Count + 1) { state.ProbeDepthM };
        depths.AddRange(working.Select(r => r.DepthM));
        var closes = new bool[depths.Count];
        var margins = new double[depths.Count];
        for (var i = 0; i < depths.Count; i++)
        {
            margins[i] = design.Radio is null ? double.NegativeInfinity : design.Radio.HopMarginDb(i + 1 < depths.Count ? depths[i + 1] : 0.0, depths[i]);
            closes[i] = margins[i] >= 0.0;
        }

        List<FrameHold<TelemetryFrame>> holds = [state.ProbeHold, .. working.Select(r => r.Hold)];
        return new RelayChain(working, depths, closes, margins, holds);
    }

    /// <summary>
    /// From node <paramref name="from"/> to the surface: the depths fall monotonically up the chain, so the hops add up to
    /// the node's depth; each relay passed adds its forwarding delay.
    /// </summary>
    public Primitives.Time.SimDuration DelayFrom(TetherDesign design, int from) =>
        Primitives.Time.SimDuration.FromSeconds(design.Radio!.PropagationS(Depths[from]) + ((Depths.Count - Math.Max(from, 1)) * design.Plan!.ForwardingDelayS));
}
