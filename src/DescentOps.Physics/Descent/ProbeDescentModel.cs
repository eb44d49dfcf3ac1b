using DescentOps.Physics.Ice;
using DescentOps.Physics.Shell;
using DescentOps.Physics.Vacuum;

namespace DescentOps.Physics.Descent;

/// <summary>
/// The descent of one probe through one shell, as the simulator asks for it: "how fast at this depth with this
/// power?". Near an airless surface the head sublimates (<see cref="VacuumSublimation"/>) until the hole is sealed
/// (<see cref="LiquidOnset"/>); below, the full steady model (<see cref="SteadyDescent"/>) applies.
/// </summary>
/// <remarks>
/// One steady solution costs about half a millisecond (quadratures and root finding), too much to repeat every
/// telemetry step. Solutions are therefore computed at depth nodes <see cref="NodeSpacingM"/> apart, once per power
/// setting, and interpolated linearly in between (MODEL: at 5 m the ice temperature changes by well under 1 K in a
/// kilometre-scale shell, and the speed by a fraction of a percent). The cache makes an instance single-threaded;
/// each probe owns one. Results depend only on the arguments, so runs stay deterministic.
/// </remarks>
public sealed class ProbeDescentModel
{
    public const double DefaultNodeSpacingM = 5.0;

    private readonly Dictionary<(int Node, double HeadW, double WallW), DescentRate> _nodes = [];

    public ProbeDescentModel(IceShell shell, ProbeGeometry geometry, double nodeSpacingM = DefaultNodeSpacingM, double sealDiameters = LiquidOnset.DefaultSealDiameters, double designGapM = SteadyDescent.DefaultDesignGapM)
    {
        DesignGapM = ValidRange.RequireNonNegative(designGapM, nameof(designGapM), "m", "the probe descent model");
        SealDiameters = ValidRange.RequirePositive(sealDiameters, nameof(sealDiameters), "hole diameters", "the probe descent model");
        Shell = shell;
        Geometry = geometry;
        NodeSpacingM = ValidRange.RequirePositive(nodeSpacingM, nameof(nodeSpacingM), "m", "the probe descent model");
        var airless = shell.SurfacePressurePa < TriplePoint.PressurePa;
        LiquidOnsetDepthM = airless ? FindLiquidOnsetDepthM() : 0.0;
    }

    public IceShell Shell { get; }

    public ProbeGeometry Geometry { get; }

    /// <summary>Water gap around the body where nothing froze or melted (the side balance's w0).</summary>
    public double DesignGapM { get; }

    public double NodeSpacingM { get; }

    /// <summary>Hole diameters above the probe that must be re-sealed before liquid can form (MODEL, see <see cref="LiquidOnset"/>).</summary>
    public double SealDiameters { get; }

    /// <summary>Depth of the head below which melting can happen; 0 where the surface pressure already allows liquid.</summary>
    public double LiquidOnsetDepthM { get; }

    /// <summary>Number of steady solutions computed so far (for the benchmark's share-of-time figure).</summary>
    public int SolutionsComputed => _nodes.Count;

    public DescentRate Rate(double depthM, double headPowerW, double wallPowerW)
    {
        var depth = Math.Clamp(depthM, 0.0, Shell.ThicknessM);
        if (depth < LiquidOnsetDepthM) return Sublimation(depth, headPowerW);

        var position = depth / NodeSpacingM;
        var lower = (int)Math.Floor(position);
        var a = Node(lower, headPowerW, wallPowerW);
        var fraction = position - lower;
        if (fraction == 0) return a;
        var b = Node(lower + 1, headPowerW, wallPowerW);
        if (a.Regime != b.Regime) return fraction < 0.5 ? a : b;
        return new DescentRate(
            a.Regime,
            Lerp(a.VelocityMPerS, b.VelocityMPerS, fraction),
            Shell.TemperatureK(depth),
            Lerp(a.MeltingTemperatureK, b.MeltingTemperatureK, fraction),
            Shell.PressurePa(depth),
            Lerp(a.SensibleW, b.SensibleW, fraction),
            Lerp(a.LatentW, b.LatentW, fraction),
            Lerp(a.LateralLossW, b.LateralLossW, fraction),
            Lerp(a.WallSurplusW, b.WallSurplusW, fraction),
            a.WallPowerSufficient && b.WallPowerSufficient)
        {
            RequiredSideHeatW = Lerp(a.RequiredSideHeatW, b.RequiredSideHeatW, fraction),
            SideHeatSuppliedW = Lerp(a.SideHeatSuppliedW, b.SideHeatSuppliedW, fraction),
            // The closure and the verdict are not interpolated: the nearer node's hold.
            RefreezeClosureM = fraction < 0.5 ? a.RefreezeClosureM : b.RefreezeClosureM,
            Held = fraction < 0.5 ? a.Held : b.Held,
            ClearanceM = Lerp(a.ClearanceM, b.ClearanceM, fraction),
        };
    }

    private DescentRate Node(int node, double headPowerW, double wallPowerW)
    {
        var key = (node, headPowerW, wallPowerW);
        if (_nodes.TryGetValue(key, out var cached)) return cached;
        var depth = Math.Clamp(Math.Max(node * NodeSpacingM, LiquidOnsetDepthM), 0.0, Shell.ThicknessM);
        var rate = Melting(depth, headPowerW, wallPowerW);
        _nodes[key] = rate;
        return rate;
    }

    private DescentRate Melting(double depthM, double headPowerW, double wallPowerW)
    {
        var pressure = Math.Max(Shell.PressurePa(depthM), TriplePoint.PressurePa);
        // Salt in the layer lowers the melting point the head must reach (the basal layer carries the ocean's salt).
        var meltingK = SalineIce.MeltingTemperatureK(Shell.SalinityGPerKg(depthM), pressure);
        // The far field must be colder than the melting point for the steady model; at the base the ice is at it.
        var farFieldK = Math.Min(Shell.TemperatureK(depthM), meltingK - 1e-3);
        if (headPowerW <= 0)
        {
            return new DescentRate(DescentRegimeKind.Stalled, 0.0, farFieldK, meltingK, pressure, 0, 0, wallPowerW, 0, false);
        }

        var solution = SteadyDescent.Solve(Geometry, headPowerW, wallPowerW, farFieldK, pressure, Shell.GravityMPerS2, meltingK, DesignGapM);
        return new DescentRate(
            solution.Stalled ? DescentRegimeKind.Stalled : DescentRegimeKind.Melting,
            solution.VelocityMPerS,
            farFieldK,
            meltingK,
            pressure,
            solution.SensibleW,
            solution.LatentW,
            solution.LateralLossW,
            solution.WallSurplusW,
            solution.WallPowerSufficient)
        {
            RequiredSideHeatW = solution.Side?.RequiredSideHeatW ?? 0.0,
            SideHeatSuppliedW = solution.Side?.SideHeatSuppliedW ?? 0.0,
            RefreezeClosureM = solution.Side?.RefreezeClosureM ?? double.PositiveInfinity,
            Held = solution.Side?.Held ?? false,
            ClearanceM = solution.Side?.ClearanceM ?? 0.0,
        };
    }

    private DescentRate Sublimation(double depthM, double headPowerW)
    {
        var farFieldK = Shell.TemperatureK(depthM);
        var area = Math.PI * Geometry.RadiusM * Geometry.RadiusM;
        if (headPowerW <= 0)
        {
            return new DescentRate(DescentRegimeKind.Stalled, 0.0, farFieldK, TriplePoint.TemperatureK, Shell.PressurePa(depthM), 0, 0, 0, 0, false);
        }

        var head = VacuumSublimation.SolveHead(headPowerW / area, farFieldK);
        // All head power leaves with the vapour: no liquid, no film. The sensible part warms the ice to T_s;
        // sublimation takes the rest (the "latent" column here is the enthalpy of sublimation).
        var massRate = head.MassFluxKgPerM2S * area;
        var sensible = massRate * (IceIh.EnthalpyJPerKg(head.SurfaceTemperatureK, 0) - IceIh.EnthalpyJPerKg(farFieldK, 0));
        return new DescentRate(DescentRegimeKind.Sublimating, head.VelocityMPerS, farFieldK, TriplePoint.TemperatureK, Shell.PressurePa(depthM), sensible, headPowerW - sensible, 0, 0, false);
    }

    private double FindLiquidOnsetDepthM()
    {
        // Both conditions of LiquidOnset grow monotonically true with depth: step down to the first depth that meets them.
        var density = IceIh.DensityKgPerM3(Shell.SurfaceTemperatureK, 0);
        var seal = LiquidOnset.SealDepthM(Geometry.LengthM, Geometry.RadiusM, SealDiameters);
        var overburden = LiquidOnset.MinimumLiquidDepthM(density, Shell.GravityMPerS2);
        // Open fractures near the surface let vapour and melt escape, so no pocket can hold liquid above their bottom (MODEL).
        return Math.Min(Math.Max(Math.Max(seal, overburden), Shell.FracturedToDepthM), Shell.ThicknessM);
    }

    private static double Lerp(double a, double b, double fraction) => a + ((b - a) * fraction);
}
