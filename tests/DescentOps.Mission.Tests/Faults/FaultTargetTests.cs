using DescentOps.Mission.Faults;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests.Faults;

/// <summary>Every effect of the closed set strikes a component: the one whose state it changes.</summary>
public sealed class FaultTargetTests
{
    public static TheoryData<FaultEffect, string> Effects => new()
    {
        { new FaultEffect.PowerDip(0.5), "probe" },
        { new FaultEffect.HeaterSegmentFailure(0.5), "probe" },
        { new FaultEffect.CloggedNozzle(0.5), "probe" },
        { new FaultEffect.TiltKick(0.01), "probe" },
        { new FaultEffect.SensorStuck("probe.depth", null), "probe" },
        { new FaultEffect.SensorBias("probe.depth", 1), "probe" },
        { new FaultEffect.SensorNoise("probe.depth", 1), "probe" },
        { new FaultEffect.SensorDropout("probe.depth"), "probe" },
        { new FaultEffect.TetherBreak(), "tether" },
        { new FaultEffect.SpoolJam(), "tether" },
        { new FaultEffect.RelayFailure(2), "tether" },
        { new FaultEffect.StationFailure(), "station" },
        { new FaultEffect.StationUpset(), "station" },
        { new FaultEffect.VehicleLoss("wisp-1", VehicleLossCause.Entrapment, 0), "vehicle-wisp-1" },
    };

    [Theory]
    [MemberData(nameof(Effects))]
    public void A_fault_effect_strikes_the_component_it_acts_in(FaultEffect effect, string target) =>
        Assert.Equal(target, FaultInjectorComponent.TargetOf(new FaultModel("f", new FaultStart.AtTime(0), effect, null)).Name);

    [Fact]
    public void The_target_table_covers_every_effect_of_the_closed_set()
    {
        var covered = Effects.Select(row => ((FaultEffect)row[0]).GetType()).Distinct().Count();
        Assert.Equal(Enum.GetValues<FaultKind>().Length, covered);
    }
}
