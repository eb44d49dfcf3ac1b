using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Tether;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>
/// No frame is dropped without a data-lost record: the link runs against a stand-in probe that sends frames while it
/// descends and a stand-in station that counts what arrives, under random buffers, relay plans, radios, batteries,
/// breaks, relay failures and commanded drops. At the end every frame the probe made is accounted for.
/// </summary>
public sealed class TetherLedgerPropertyTests
{
    private const double FrameS = 600.0;
    private const int Frames = 1500;

    [Fact]
    public void Every_frame_is_delivered_held_or_recorded_as_lost()
    {
        var random = new Random(4);
        var baseline = BuiltInScenarios.Default();
        for (var n = 0; n < 40; n++)
        {
            var carried = random.Next(9);
            var lifeS = 86400.0 * (0.5 + (random.NextDouble() * 8));
            var relays = new RelayPlanModel(carried, 50 + (random.NextDouble() * 600), [], -45 + (random.NextDouble() * 40), 0.0, 100e6, 10e3, 5.0, 10.0, 6.0, 3.0,
                "m07-std", lifeS * 1.0, 1.0, random.Next(30), random.NextDouble());
            var scenario = baseline with
            {
                Tether = baseline.Tether with { BufferFrames = random.Next(60) },
                Relays = carried == 0 && random.Next(2) == 0 ? null : relays,
            };
            var speed = 2490.0 / (Frames * FrameS) * (0.5 + random.NextDouble());
            var breakAtS = random.NextDouble() * Frames * FrameS * 0.8;
            var faults = new List<(double AtS, object Message)>
            {
                (breakAtS, new FaultStarted(Fault("cut", random.Next(2) == 0 ? new FaultEffect.TetherBreak() : new FaultEffect.SpoolJam()))),
            };
            for (var k = random.Next(4); k > 0; k--)
            {
                var fault = Fault($"quiet-{k}", new FaultEffect.RelayFailure(1 + random.Next(Math.Max(carried, 1))));
                var start = random.NextDouble() * Frames * FrameS;
                faults.Add((start, new FaultStarted(fault)));
                faults.Add((start + (random.NextDouble() * 86400 * 3), new FaultCleared(fault)));
            }

            for (var k = random.Next(3); k > 0; k--)
            {
                var at = random.NextDouble() * Frames * FrameS;
                faults.Add((at, new DropRelay(Math.Min(speed * at, 2490.0), "test")));
            }

            var sink = new CollectingSink();
            var station = new StationStandIn();
            var endS = (Frames + 10) * FrameS;
            faults.Add((endS, new FaultStarted(Fault("ledger-check", new FaultEffect.RelayFailure(1)))));
            var setup = new KernelSetup([new TetherComponent(scenario), new ProbeStandIn(speed, faults), station], n, SimTime.FromSecondsSinceEpoch(endS + 1), sink);
            SequentialKernel.Run(setup);

            var ledger = sink.OfKind("relay.failed").Last();
            long F(string name) => CollectingSink.IntegerField(ledger, name);
            var lost = sink.OfKind("data.lost").Count(r => r.Fields.Single(f => f.Name == "kind").Text == "telemetry");
            Assert.Equal(Frames, F("frames_produced"));
            Assert.Equal(lost, F("frames_lost"));
            Assert.Equal(station.Frames, F("frames_by_fibre") + F("frames_by_relays"));
            Assert.Equal(F("frames_produced"), F("frames_by_fibre") + F("frames_by_relays") + F("frames_held") + F("frames_lost"));
            Assert.Equal(station.Frames, station.Distinct);
        }
    }

    private static FaultModel Fault(string name, FaultEffect effect) => new(name, new FaultStart.AtTime(0.0), effect, null);

    /// <summary>Descends at a constant speed, sends a frame every 10 minutes, and delivers the scripted messages to the link.</summary>
    private sealed class ProbeStandIn(double speedMPerS, IReadOnlyList<(double AtS, object Message)> script) : SimComponent<int>(MissionIds.Probe)
    {
        private sealed record Tick;

        public override int InitialState => 0;

        public override int Handle(int state, object message, ComponentContext context)
        {
            switch (message)
            {
                case RunStarted:
                    foreach (var (at, payload) in script) context.Schedule(MissionIds.Tether, SimDuration.FromSeconds(at), payload, MissionPriority.Fault);
                    context.ScheduleSelf(SimDuration.FromSeconds(FrameS), new Tick(), MissionPriority.Telemetry);
                    return state;
                case Tick when state < Frames:
                    var depth = Math.Min(speedMPerS * context.Now.SecondsSinceEpoch, 2490.0);
                    context.Schedule(MissionIds.Tether, SimDuration.Zero, new TelemetryFrame(state + 1, context.Now, "Melting", [], depth, 0), MissionPriority.Telemetry);
                    context.ScheduleSelf(SimDuration.FromSeconds(FrameS), new Tick(), MissionPriority.Telemetry);
                    return state + 1;
                default:
                    return state;
            }
        }
    }

    /// <summary>Counts the frames that reach the surface, and how many of them are different frames.</summary>
    private sealed class StationStandIn() : SimComponent<int>(MissionIds.Station)
    {
        private readonly HashSet<long> _seen = [];

        public long Frames { get; private set; }

        public int Distinct => _seen.Count;

        public override int InitialState => 0;

        public override int Handle(int state, object message, ComponentContext context)
        {
            if (message is TelemetryFrame frame)
            {
                Frames++;
                _seen.Add(frame.Sequence);
            }

            return state;
        }
    }
}
