using DescentOps.Physics.Ice;
using DescentOps.Physics.Water;

namespace DescentOps.Physics.Tests.Refreezing;

/// <summary>
/// An independent check of the cylindrical freeze-in model, written for the tests: a 1-D radial finite-volume
/// enthalpy method (explicit in time) for a water gap of width w between an insulated probe wall at r = R and ice at
/// T∞ beyond r = R + w. Ice has k = 651/T (Petrenko and Whitworth 1999) and the heat capacity of IAPWS R10-06 at
/// each cell's own temperature; the gap water holds ρ_w L per volume at T_m and turns into ice as it gives it up. The
/// gap is frozen when every gap cell has lost its latent heat. It shares no code with the model under test except
/// the ice property functions.
/// </summary>
internal static class RadialEnthalpySolver
{
    private const double ConductivityCoefficient = 651.0;

    public static double FreezeTimeS(double gapM, double radiusM, double iceTemperatureK, double meltingTemperatureK, double horizonS)
    {
        const int gapCells = 10;
        var dr0 = gapM / gapCells;
        var faces = new List<double> { radiusM };
        for (var i = 1; i <= gapCells; i++) faces.Add(radiusM + (i * dr0));
        var outer = radiusM + gapM + Math.Max(12.0 * Math.Sqrt(1e-5 * horizonS), 5.0 * radiusM);
        var dr = dr0;
        while (faces[^1] < outer)
        {
            dr *= 1.04;
            faces.Add(faces[^1] + dr);
        }

        var n = faces.Count - 1;
        var volume = new double[n];
        var centre = new double[n];
        for (var i = 0; i < n; i++)
        {
            volume[i] = Math.PI * ((faces[i + 1] * faces[i + 1]) - (faces[i] * faces[i]));
            centre[i] = 0.5 * (faces[i] + faces[i + 1]);
        }

        // Enthalpy per volume relative to ice at T_m: ice below, 0..ρ_w L for the water (ice/water mix) at T_m.
        const double p = TriplePoint.PressurePa;
        var latentPerVolume = LiquidWater.DensityKgPerM3 * FusionLatentHeat.AtMeltingTemperatureJPerKg(meltingTemperatureK);
        var rhoIce = IceIh.DensityKgPerM3(meltingTemperatureK - 1e-3, p);
        double IceEnthalpy(double t) => -rhoIce * IceIh.SensibleHeatJPerKg(t, meltingTemperatureK, p);

        // Temperature from enthalpy for ice: a monotone table inverted by interpolation.
        const int tableSize = 4000;
        var tTable = new double[tableSize];
        var eTable = new double[tableSize];
        for (var i = 0; i < tableSize; i++)
        {
            tTable[i] = iceTemperatureK + ((meltingTemperatureK - iceTemperatureK) * i / (tableSize - 1));
            eTable[i] = IceEnthalpy(tTable[i]);
        }

        double Temperature(double e)
        {
            if (e >= 0) return meltingTemperatureK;
            if (e <= eTable[0]) return iceTemperatureK;
            var j = Array.BinarySearch(eTable, e);
            if (j >= 0) return tTable[j];
            j = ~j;
            var f = (e - eTable[j - 1]) / (eTable[j] - eTable[j - 1]);
            return tTable[j - 1] + (f * (tTable[j] - tTable[j - 1]));
        }

        var energy = new double[n];
        for (var i = 0; i < n; i++) energy[i] = i < gapCells ? latentPerVolume : IceEnthalpy(iceTemperatureK);

        // Stability: the largest diffusivity is that of the coldest ice; the smallest cell is in the gap.
        var kappaMax = ConductivityCoefficient / iceTemperatureK / (rhoIce * IceIh.SpecificHeatJPerKgK(iceTemperatureK, p));
        var dt = 0.2 * dr0 * dr0 / kappaMax;
        var temperature = new double[n];
        var flux = new double[n + 1];
        var time = 0.0;
        while (time < horizonS)
        {
            for (var i = 0; i < n; i++) temperature[i] = Temperature(energy[i]);
            flux[0] = 0.0; // insulated probe wall
            for (var i = 1; i < n; i++)
            {
                var k = 2.0 * ConductivityCoefficient / (temperature[i - 1] + temperature[i]);
                flux[i] = -k * (temperature[i] - temperature[i - 1]) / (centre[i] - centre[i - 1]) * 2.0 * Math.PI * faces[i];
            }

            var kOut = ConductivityCoefficient / temperature[n - 1];
            flux[n] = -kOut * (iceTemperatureK - temperature[n - 1]) / (faces[n] - centre[n - 1]) * 2.0 * Math.PI * faces[n];
            for (var i = 0; i < n; i++) energy[i] += (flux[i] - flux[i + 1]) * dt / volume[i];
            time += dt;

            var frozen = true;
            for (var i = 0; i < gapCells && frozen; i++) frozen = energy[i] <= 0;
            if (frozen) return time;
        }

        return double.PositiveInfinity;
    }
}
