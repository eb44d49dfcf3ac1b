using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Tether;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>
/// Commands down take the path frames take up: while no path is up a ground command waits at the surface end (or is
/// recorded as lost when there is no buffer), and goes down the relay chain when a relay closes the gap.
/// </summary>
public sealed class TetherCommandPathTests
{
    private static readonly Telecommand Command = new(new CommandAction(MissionIds.Probe, "pause_descent", []), "test-rule", "ground", SimTime.Epoch);

    /// <summary>
    /// A radio so weak that it reaches about 133 m in the cold ice near the surface (computed: allowed loss
    /// −50 dBm − 3 dB + 174 − 40 − 5 − 10 − 6 = 60 dB, and free-space loss in ice 20·log10(4π·d·√3.2·f/c) = 60 dB at
    /// d ≈ 133 m for 100 MHz; absorption there is negligible): the probe at 200 m cannot reach the surface alone, but
    /// with a relay at 100 m both hops close.
    /// </summary>
    private static Scenario WeakRadio(int bufferFrames)
    {
        var scenario = BuiltInScenarios.Default();
        return scenario with
        {
            Tether = scenario.Tether with { BufferFrames = bufferFrames },
            Relays = new RelayPlanModel(1, null, [], -50.0, 0.0, 100e6, 10e3, 5.0, 10.0, 6.0, 3.0, "m07-std", 3.6e6, 1.0, 0, 0.25),
        };
    }

    private static (CollectingSink Sink, List<(SimTime At, object Message)> AtProbe, List<(SimTime At, object Message)> AtStation) Run(Scenario scenario)
    {
        var atProbe = new List<(SimTime, object)>();
        var atStation = new List<(SimTime, object)>();
        (double AtS, ComponentId To, object Message)[] script =
        [
            (600, MissionIds.Tether, new TelemetryFrame(1, SimTime.FromSecondsSinceEpoch(600), "Melting", [], 50.0, 0)),
            (1000, MissionIds.Tether, new FaultStarted(new FaultModel("cut", new FaultStart.AtTime(1000), new FaultEffect.TetherBreak(), null))),
            (1200, MissionIds.Tether, new TelemetryFrame(2, SimTime.FromSecondsSinceEpoch(1200), "Melting", [], 200.0, 0)),
            (1300, MissionIds.Tether, Command),
            (1500, MissionIds.Tether, new DropRelay(100.0, "test")),
        ];
        var sink = new CollectingSink();
        var setup = new KernelSetup(
            [new TetherComponent(scenario), new Script(MissionIds.Probe, script, atProbe), new Script(MissionIds.Station, [], atStation)],
            1, SimTime.FromSecondsSinceEpoch(2000), sink);
        SequentialKernel.Run(setup);
        return (sink, atProbe, atStation);
    }

    [Fact]
    public void A_ground_command_waits_at_the_surface_and_goes_down_the_relay_chain_with_the_held_frame()
    {
        var scenario = WeakRadio(bufferFrames: 5);
        var radio = new RelayRadio(scenario.Relays!, ShellTemperature(scenario));
        Assert.InRange(radio.RangeM(100), 100, 200);

        var (sink, atProbe, atStation) = Run(scenario);
        // At the break the probe is at 50 m, within its own radio's reach of the surface; at 200 m it is not, until the
        // relay goes in at 100 m.
        Assert.Equal([1000.0, 1500.0], sink.OfKind("relay.path_up").Select(r => r.Time.SecondsSinceEpoch));
        Assert.Equal(1200.0, sink.OfKind("relay.path_down").Single().Time.SecondsSinceEpoch);
        Assert.Empty(sink.OfKind("data.lost"));

        // Computed: from the probe at 200 m, radio at c/√3.2 over 200 m plus 0.25 s in the one relay.
        var delayS = (200.0 * Math.Sqrt(3.2) / 299_792_458.0) + 0.25;
        var command = Assert.Single(atProbe, m => m.Message is Telecommand);
        Assert.Equal(1500.0 + delayS, command.At.SecondsSinceEpoch, 6);
        var frames = atStation.Where(m => m.Message is TelemetryFrame).ToList();
        Assert.Equal(2, frames.Count);
        Assert.Equal(600.0 + (50.0 / scenario.Tether.SignalSpeedMPerS), frames[0].At.SecondsSinceEpoch, 6);
        Assert.Equal(1500.0 + delayS, frames[1].At.SecondsSinceEpoch, 6);
        // The probe was told its buffer held one frame of five, then none.
        Assert.Equal([0.2, 0.0], atProbe.Select(m => m.Message).OfType<LinkBufferFill>().Select(f => f.Fraction));
    }

    [Fact]
    public void Without_buffers_the_same_frame_and_command_are_recorded_as_lost()
    {
        var (sink, atProbe, atStation) = Run(WeakRadio(bufferFrames: 0));
        var lost = sink.OfKind("data.lost").ToList();
        Assert.Equal(["telemetry", "telecommand"], lost.Select(r => r.Fields.Single(f => f.Name == "kind").Text));
        Assert.DoesNotContain(atProbe, m => m.Message is Telecommand);
        Assert.Single(atStation, m => m.Message is TelemetryFrame);
    }

    private static Func<double, double> ShellTemperature(Scenario scenario) => Probe.ProbeDescentFactory.Shell(scenario).TemperatureK;

    /// <summary>Sends its scripted messages and keeps what it is sent, with the time.</summary>
    private sealed class Script(ComponentId id, IReadOnlyList<(double AtS, ComponentId To, object Message)> script, List<(SimTime At, object Message)> received) : SimComponent<int>(id)
    {
        public override int InitialState => 0;

        public override int Handle(int state, object message, ComponentContext context)
        {
            if (message is RunStarted)
            {
                foreach (var (at, to, payload) in script) context.Schedule(to, SimDuration.FromSeconds(at), payload, MissionPriority.Telemetry);
            }
            else
            {
                received.Add((context.Now, message));
            }

            return state + 1;
        }
    }
}
