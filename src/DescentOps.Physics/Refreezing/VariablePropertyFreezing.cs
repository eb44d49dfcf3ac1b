using System.Collections.Concurrent;
using DescentOps.Physics.Ice;
using MathNet.Numerics.RootFinding;

namespace DescentOps.Physics.Refreezing;

/// <summary>
/// Planar freezing of water at T_m onto semi-infinite ice at T∞ with the ice's properties at each temperature
/// (k = 651/T, Petrenko and Whitworth 1999; ρ and c of IAPWS R10-06): the similarity solution of Carslaw and Jaeger's
/// case (b) without the constant-property assumption. With η = x/√t, the ice (old and newly frozen alike) obeys
/// (k T′)′ = −(η/2) ρ c T′ on η &lt; η_f, T(η_f) = T_m, T(−∞) = T∞, and the front η_f = 2λ′ moves with
/// k(T_m) T′(η_f) = ρ_w L λ′ (the latent heat of the water consumed). λ′ (m/√s) is found by shooting from the front
/// (fourth-order Runge-Kutta, 800 steps over the front's offset plus twelve diffusion lengths of the coldest ice)
/// with Brent's method on T(−∞) − T∞, to 1e-10 relative. Heat capacity times density is tabulated at 257 points
/// between T∞ and T_m and interpolated linearly (c is smooth there; the table's error is below 1e-5).
/// </summary>
/// <remarks>
/// Why it matters: the diffusivity of ice rises about sixfold from 270 K to 100 K, and one effective diffusivity
/// Φ/(ρΔh_s) for the whole range, as the constant-property solution needs, moves heat out of the freshly frozen (warm)
/// layer too easily: at 100 K it freezes a gap about a quarter too fast. The result is cached per (T∞, T_m, ρ_w L):
/// runs ask for the same few pairs again and again. It holds at most 4,096 entries and starts afresh when full.
/// </remarks>
public static class VariablePropertyFreezing
{
    private const string Model = "the variable-property freezing front";
    private const int Steps = 800;
    private const int TablePoints = 257;
    private const int CacheCapacity = 4096;

    private static readonly ConcurrentDictionary<(double IceK, double MeltingK, double LatentPerVolume), double> Cache = new();

    /// <summary>
    /// The front constant λ′ in m/√s of s(t) = 2λ′√t for water at <paramref name="meltingTemperatureK"/> freezing onto
    /// ice at <paramref name="iceTemperatureK"/>; <paramref name="latentJPerM3"/> is the latent heat per volume of the
    /// water consumed (ρ_w L).
    /// </summary>
    public static double FrontConstantMPerRootS(double iceTemperatureK, double meltingTemperatureK, double latentJPerM3)
    {
        ValidRange.Require(iceTemperatureK, IceConductivity.MinimumTemperatureK(IceConductivityFit.PetrenkoWhitworth1999), meltingTemperatureK, nameof(iceTemperatureK), "K", Model);
        ValidRange.RequirePositive(latentJPerM3, nameof(latentJPerM3), "J/m³", Model);
        if (iceTemperatureK >= meltingTemperatureK) return 0.0;
        var key = (iceTemperatureK, meltingTemperatureK, latentJPerM3);
        if (Cache.TryGetValue(key, out var known)) return known;

        // Bounded: a sweep over many temperatures must not grow the cache without end. Emptying it only costs solving
        // again; the value is a pure function of the key, so results do not depend on what the cache holds.
        if (Cache.Count >= CacheCapacity) Cache.Clear();
        return Cache.GetOrAdd(key, k => Solve(k.IceK, k.MeltingK, k.LatentPerVolume));
    }

    private static double Solve(double iceK, double meltingK, double latentJPerM3)
    {
        const double p = TriplePoint.PressurePa;
        var rhoC = new double[TablePoints];
        var span = meltingK - iceK;
        for (var i = 0; i < TablePoints; i++)
        {
            var t = iceK + (span * i / (TablePoints - 1));
            rhoC[i] = IceIh.DensityKgPerM3(t, p) * IceIh.SpecificHeatJPerKgK(t, p);
        }

        double HeatCapacityPerVolume(double t)
        {
            var x = Math.Clamp((t - iceK) / span, 0.0, 1.0) * (TablePoints - 1);
            var j = Math.Min((int)x, TablePoints - 2);
            return rhoC[j] + ((x - j) * (rhoC[j + 1] - rhoC[j]));
        }

        static double K(double t) => IceConductivity.ReciprocalCoefficientWPerM / t;

        // The coldest ice diffuses fastest: its diffusion length sets how far the profile reaches.
        var kappaCold = K(iceK) / HeatCapacityPerVolume(iceK);

        // T at the far end of the profile for a trial front constant (T(−∞) falls as λ′ grows).
        double FarTemperature(double lambda)
        {
            var etaFront = 2.0 * lambda;
            var length = etaFront + (12.0 * Math.Sqrt(kappaCold));
            var h = length / Steps;
            double t = meltingK, w = latentJPerM3 * lambda; // w = k dT/dη at the front
            (double Dt, double Dw) Slope(double y, double tt, double ww)
            {
                var tc = Math.Max(tt, 1.0);
                var eta = etaFront - y;
                return (-ww / K(tc), 0.5 * eta * HeatCapacityPerVolume(tc) * ww / K(tc));
            }

            for (var i = 0; i < Steps; i++)
            {
                var y = i * h;
                var (a1, b1) = Slope(y, t, w);
                var (a2, b2) = Slope(y + (0.5 * h), t + (0.5 * h * a1), w + (0.5 * h * b1));
                var (a3, b3) = Slope(y + (0.5 * h), t + (0.5 * h * a2), w + (0.5 * h * b2));
                var (a4, b4) = Slope(y + h, t + (h * a3), w + (h * b3));
                t += h * (a1 + (2 * a2) + (2 * a3) + a4) / 6.0;
                w += h * (b1 + (2 * b2) + (2 * b3) + b4) / 6.0;
                if (t < 0.5 * iceK) return t; // far too much heat drawn: λ′ is too large
            }

            return t;
        }

        // Bracket around the constant-property estimate, widened until it holds the root.
        var guess = Math.Sqrt(kappaCold) * 0.5;
        double lower = guess, upper = guess;
        while (FarTemperature(lower) - iceK < 0) lower *= 0.5;
        while (FarTemperature(upper) - iceK > 0) upper *= 2.0;
        return Brent.FindRoot(l => FarTemperature(l) - iceK, lower, upper, 1e-10 * upper, 200);
    }
}
