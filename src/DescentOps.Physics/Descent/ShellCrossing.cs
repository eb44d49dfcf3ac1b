namespace DescentOps.Physics.Descent;

/// <summary>
/// Crossing time t = ∫ dz / v(z) from the surface to the base with the very <see cref="ProbeDescentModel"/> a
/// simulated probe runs on, at one power setting held throughout (no faults, no stops).
/// </summary>
/// <remarks>
/// Below the liquid-onset depth the model interpolates the speed linearly between its depth nodes, so on each piece
/// between nodes ∫dz/v is exact: Δz·ln(v₁/v₀)/(v₁ − v₀). In the sublimation zone the speed follows the ice
/// temperature smoothly, and composite Simpson's rule on 1/v with <see cref="SublimationIntervals"/> intervals is
/// far finer than that zone's few metres need.
/// </remarks>
public static class ShellCrossing
{
    /// <summary>Simpson intervals across the sublimation zone (even).</summary>
    public const int SublimationIntervals = 64;

    public static ShellCrossingResult Integrate(ProbeDescentModel model, double headPowerW, double wallPowerW)
    {
        ArgumentNullException.ThrowIfNull(model);
        var times = new Dictionary<DescentRegimeKind, double>
        {
            [DescentRegimeKind.Sublimating] = 0.0,
            [DescentRegimeKind.Melting] = 0.0,
        };
        var onset = model.LiquidOnsetDepthM;
        var thickness = model.Shell.ThicknessM;

        if (onset > 0)
        {
            var h = onset / SublimationIntervals;
            var sum = 0.0;
            for (var i = 0; i <= SublimationIntervals; i++)
            {
                // The end point at the onset depth belongs to the melting regime; the sublimating speed just above it is the limit.
                var depth = i == SublimationIntervals ? Math.BitDecrement(onset) : i * h;
                var rate = model.Rate(depth, headPowerW, wallPowerW);
                if (rate.VelocityMPerS <= 0) return Stalled(times, depth);
                var weight = i == 0 || i == SublimationIntervals ? 1.0 : (i % 2 == 1 ? 4.0 : 2.0);
                sum += weight / rate.VelocityMPerS;
            }

            times[DescentRegimeKind.Sublimating] = sum * h / 3.0;
        }

        var top = onset;
        while (top < thickness)
        {
            // The next node boundary strictly below the top: the speed is linear in depth up to it.
            var next = Math.Min(thickness, (Math.Floor(top / model.NodeSpacingM) + 1.0) * model.NodeSpacingM);
            var upper = model.Rate(top, headPowerW, wallPowerW);
            var lower = model.Rate(next, headPowerW, wallPowerW);
            if (upper.Regime == DescentRegimeKind.Stalled || upper.VelocityMPerS <= 0) return Stalled(times, top);
            if (lower.Regime == DescentRegimeKind.Stalled || lower.VelocityMPerS <= 0) return Stalled(times, next);
            times[DescentRegimeKind.Melting] += PieceTimeS(next - top, upper.VelocityMPerS, lower.VelocityMPerS);
            top = next;
        }

        return new ShellCrossingResult(times.Values.Sum(), times, null);
    }

    /// <summary>∫dz/v over a piece where v goes linearly from v₀ to v₁; the ratio form keeps it exact as v₁ → v₀.</summary>
    private static double PieceTimeS(double lengthM, double v0, double v1)
    {
        var change = (v1 - v0) / v0;
        if (Math.Abs(change) < 1e-8) return lengthM / (0.5 * (v0 + v1));
        return lengthM * Math.Log(v1 / v0) / (v1 - v0);
    }

    private static ShellCrossingResult Stalled(Dictionary<DescentRegimeKind, double> times, double depthM) =>
        new(double.PositiveInfinity, times, depthM);
}
