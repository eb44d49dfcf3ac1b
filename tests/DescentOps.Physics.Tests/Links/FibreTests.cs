using DescentOps.Physics.Links;
using Xunit;

namespace DescentOps.Physics.Tests.Links;

public class FibreTests
{
    // FO-1 inputs (reference note): 1550 nm, 0.30 dB/km (the G.652.D cabled maximum there), 20 km, 10 splices of
    // 0.1 dB, 2 connectors of 0.5 dB, 1 dB of bends.
    private static FibreLink Fo1(TransceiverClass optics) =>
        new(optics.MinimumTransmitPowerDbm, optics.ReceiverSensitivityDbm, 0.0, FibreAttenuation.G652DCabledMaximumDbPerKm(1550e-9), 20e3,
            10, 0.1, 2, 0.5, 1.0, 0.0, 0.0, 0.0, 3.0);

    [Fact]
    public void Link_budget_check_values()
    {
        // FO-1..FO-3 CALC; transceiver figures from a vendor copy of IEEE 802.3 as listed in the note. Exact sums.
        var lx = FibreLinkBudget.Evaluate(Fo1(TransceiverClass.GigabitLx));
        Approx.Abs(9.0, lx.TotalLossDb, 1e-9, "FO-1 loss");
        Approx.Abs(-1.0, lx.MarginDb, 1e-9, "FO-2 margin");
        Assert.False(lx.LinkUp);
        var longReach = FibreLinkBudget.Evaluate(Fo1(TransceiverClass.GigabitLongReach));
        Approx.Abs(15.0, longReach.MarginDb, 1e-9, "FO-3 margin");
        Assert.True(longReach.LinkUp);
        Approx.Abs(-9.0, longReach.ReceivedPowerDbm, 1e-9, "P_rx");
    }

    [Fact]
    public void Margin_requirement_decides_the_verdict()
    {
        var link = Fo1(TransceiverClass.GigabitLongReach) with { RequiredMarginDb = 15.0 };
        Assert.True(FibreLinkBudget.Evaluate(link).LinkUp);
        Assert.False(FibreLinkBudget.Evaluate(link with { LengthM = 20.001e3 }).LinkUp);
    }

    [Theory]
    [InlineData(1550e-9, 0.30)]
    [InlineData(1310e-9, 0.40)]
    [InlineData(1625e-9, 0.40)]
    [InlineData(1529e-9, 0.40)]
    public void G652D_limits(double wavelengthM, double expected) =>
        // ITU-T G.652 Table (G.652.D cabled attributes), as quoted in the note (vendor copy).
        Assert.Equal(expected, FibreAttenuation.G652DCabledMaximumDbPerKm(wavelengthM));

    [Fact]
    public void Macro_bend_envelope_check_values()
    {
        var a1 = Physics.Links.MacroBendEnvelope.G657A1At1550Nm;
        // The note's fit: B = ln 30 / 5 mm = 0.6802 /mm, A = 675 dB (CALC), and FO-9: 0.1369 dB per turn at 12.5 mm.
        Approx.Rel(675.0, a1.CoefficientDbPerTurn, 1e-12, "A");
        Approx.Abs(0.6802e3, a1.DecayPerM, 0.05, "B");
        Approx.Abs(0.1369, a1.LossPerTurnDb(12.5e-3), 1e-4, "FO-9");
        // It passes through both G.657.A1 specification points.
        Approx.Rel(0.75, a1.LossPerTurnDb(10e-3), 1e-12, "10 mm");
        Approx.Rel(0.025, a1.LossPerTurnDb(15e-3), 1e-12, "15 mm");
        Approx.Rel(0.1369 / 4.0, a1.ArcLossDb(12.5e-3, Math.PI / 2), 1e-3, "quarter turn");
        Approx.Rel(0.025, a1.UpperBoundArcLossDb(0.1, 2 * Math.PI), 1e-12, "spool bound");
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => a1.LossPerTurnDb(20e-3));
        Assert.Equal("bendRadiusM", e.ParamName);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => a1.UpperBoundArcLossDb(5e-3, 1.0));
    }

    [Fact]
    public void Mechanical_check_values()
    {
        // FO-4, FO-5, FO-8 CALC (reference note); proof stress from G.652/G.657, E of silica from memory.
        Approx.Abs(8.468, FibreStrength.ProofLoadN(FibreStrength.StandardProofStressPa, 125e-6), 0.005, "FO-4");
        Approx.Abs(0.300e9, FibreStrength.BendingStressPa(72e9, 62.5e-6, 15e-3), 1e6, "FO-5 15 mm");
        Approx.Abs(0.150e9, FibreStrength.BendingStressPa(72e9, 62.5e-6, 30e-3), 1e6, "FO-5 30 mm");
        var life = FibreStrength.StaticFatigueLifeS(0.23e9, 0.69e9, 20.0, 1.0);
        Approx.Rel(3.487e9, life, 1e-3, "FO-8");
        Approx.Rel(110.5, life / (365.25 * 86400.0), 1e-3, "FO-8 years");
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => FibreStrength.StaticFatigueLifeS(0.7e9, 0.69e9, 20.0, 1.0));
    }

    [Fact]
    public void Tether_mass_check_values()
    {
        // FO-6, FO-7 CALC with the note's assumed densities.
        var glass = TetherMass.PerMetreKgPerM([TetherLayer.Glass]);
        var coated = TetherMass.PerMetreKgPerM([TetherLayer.Glass, TetherLayer.Acrylate]);
        const double kgPerMPerGPerKm = 1e-6;
        Approx.Abs(27.0, glass / kgPerMPerGPerKm, 0.1, "FO-6 glass");
        Approx.Abs(40.5, (coated - glass) / kgPerMPerGPerKm, 0.1, "FO-6 coating");
        Approx.Abs(67.5, coated / kgPerMPerGPerKm, 0.1, "FO-6");
        Approx.Abs(830.7, TetherMass.PerMetreKgPerM([TetherLayer.Glass, TetherLayer.Acrylate, TetherLayer.TightBuffer]) / kgPerMPerGPerKm, 0.5, "FO-7");
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => TetherMass.PerMetreKgPerM([TetherLayer.Acrylate, TetherLayer.Glass]));
    }

    [Fact]
    public void Fibre_latency_is_length_times_group_index_over_c()
    {
        // L·n_g/c: 10 km at n_g 1.4676 is 48.954 µs (computed here: 1e4 × 1.4676 / 299 792 458).
        Approx.Rel(1e4 * 1.4676 / 299_792_458.0, FibreLatency.OneWayDelayS(10e3, FibreLatency.GroupIndex1310Nm), 1e-15, "delay");
        Approx.Abs(48.954e-6, FibreLatency.OneWayDelayS(10e3, FibreLatency.GroupIndex1310Nm), 1e-9, "delay µs");
    }
}
