using System.Diagnostics;
using System.Globalization;
using Akka.Actor;
using Akka.Configuration;
using DescentOps.Records;
using DescentOps.Engine.Running;

namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// Runs PHOLD through the plain loop and both kernels in one process, interleaved repeat by repeat so that
/// a noisy neighbour on the machine slows all of them alike, and prints medians and the ratios between them.
/// </summary>
public static class PholdBenchmark
{
    private static readonly Config Quiet = ConfigurationFactory.ParseString("akka { loglevel = WARNING, stdout-loglevel = WARNING }");

    public static async Task<int> RunAsync(PholdOptions options, TextWriter output)
    {
        using var system = ActorSystem.Create("phold", Quiet);
        using var file = new FileJournal();
        Func<KernelSetup, Task<RunResult>> sequential = setup => Task.FromResult(SequentialKernel.Run(setup));
        Func<KernelSetup, Task<RunResult>> actor = setup => ActorKernel.RunAsync(system, setup);
        EngineCase[] cases =
        [
            new("plain PriorityQueue", (o, law) => Task.FromResult(PlainPholdEngine.Run(o, law))),
            new("SequentialKernel", (o, law) => KernelAsync(sequential, o, law, JournalMode.None, file)),
            new("ActorKernel", (o, law) => KernelAsync(actor, o, law, JournalMode.None, file)),
            new("SequentialKernel + counting sink", (o, law) => KernelAsync(sequential, o, law, JournalMode.Counting, file)),
            new("ActorKernel + counting sink", (o, law) => KernelAsync(actor, o, law, JournalMode.Counting, file)),
            new("SequentialKernel + file journal", (o, law) => KernelAsync(sequential, o, law, JournalMode.File, file)),
            new("ActorKernel + file journal", (o, law) => KernelAsync(actor, o, law, JournalMode.File, file)),
        ];

        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"PHOLD: {options.Processes} LPs, {options.Tokens} tokens, mean delay {options.MeanDelayMs} ms, ~{options.TargetEvents} events (until {options.Until}), seed {options.Seed}, median of {options.Repeats} after one warm-up, {Environment.ProcessorCount} cores"));
        output.WriteLine("Journal cases: each LP journals every token it handles; 'counting sink' only counts the records, 'file journal' writes them with JournalWriter to a temporary file.");
        var ok = true;
        foreach (var law in options.Laws)
        {
            ok &= await MeasureAsync(options, law, cases, output);
            output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"file journal: {file.LastBytes:N0} bytes for {file.LastRecords:N0} records ({file.LastBytes / (double)Math.Max(1, file.LastRecords):F0} B/record)"));
        }

        await system.Terminate();
        return ok ? 0 : 1;
    }

    private static async Task<bool> MeasureAsync(PholdOptions options, DelayLaw law, EngineCase[] cases, TextWriter output)
    {
        // Warm-up at a tenth of the size: JIT tiers, actor system threads and heap growth settle first.
        var warmUp = options with { TargetEvents = Math.Max(1, options.TargetEvents / 10) };
        foreach (var c in cases) await c.RunOnce(warmUp, law);

        var timings = cases.Select(c => new CaseTiming(c)).ToArray();
        using var process = Process.GetCurrentProcess();
        for (var repeat = 0; repeat < options.Repeats; repeat++)
        {
            foreach (var timing in timings)
            {
                var allocatedBefore = GC.GetTotalAllocatedBytes(precise: true);
                var cpuBefore = process.TotalProcessorTime;
                var clock = Stopwatch.StartNew();
                var run = await timing.Engine.RunOnce(options, law);
                var seconds = clock.Elapsed.TotalSeconds;
                process.Refresh();
                var cpuSeconds = (process.TotalProcessorTime - cpuBefore).TotalSeconds;
                timing.Add(run, seconds, cpuSeconds, GC.GetTotalAllocatedBytes(precise: true) - allocatedBefore);
            }
        }

        var plain = timings[0];
        var sequential = timings[1];
        var actor = timings[2];
        output.WriteLine();
        output.WriteLine($"delay law: {law}");
        output.WriteLine($"| {"engine",-34} | {"events",9} | {"median s",8} | {"events/s",11} | {"/ plain",7} | {"/ seq-kernel",12} | {"events/CPU-s",12} | {"order checksum",-18} | {"events/round",12} | {"alloc B/event",13} |");
        output.WriteLine($"|{new string('-', 36)}|{new string('-', 11)}|{new string('-', 10)}|{new string('-', 13)}|{new string('-', 9)}|{new string('-', 14)}|{new string('-', 14)}|{new string('-', 20)}|{new string('-', 14)}|{new string('-', 15)}|");
        foreach (var t in timings)
        {
            var run = t.Run!.Value;
            output.WriteLine(string.Create(
                CultureInfo.InvariantCulture,
                $"| {t.Engine.Label,-34} | {run.TokenEvents,9} | {t.MedianSeconds,8:F3} | {t.EventsPerSecond,11:N0} | {t.EventsPerSecond / plain.EventsPerSecond,7:F3} | {t.EventsPerSecond / sequential.EventsPerSecond,12:F3} | {t.EventsPerCpuSecond,12:N0} | {run.Checksum,18:x16} | {run.TokenEvents / (double)run.Rounds,12:F2} | {t.AllocatedBytesPerEvent,13:F0} |"));
        }

        output.WriteLine(string.Create(
            CultureInfo.InvariantCulture,
            $"ratios (wall): actor/plain = {actor.EventsPerSecond / plain.EventsPerSecond:F3}, actor/sequential-kernel = {actor.EventsPerSecond / sequential.EventsPerSecond:F3}; (CPU): actor/plain = {actor.EventsPerCpuSecond / plain.EventsPerCpuSecond:F3}, actor/sequential-kernel = {actor.EventsPerCpuSecond / sequential.EventsPerCpuSecond:F3}"));

        var structure = plain.Run!.Value;
        output.WriteLine(string.Create(
            CultureInfo.InvariantCulture,
            $"actor kernel traffic: {structure.Batches:N0} batches in {structure.Rounds:N0} rounds, {structure.Batches / (double)structure.Rounds:F2} LPs per barrier, {2.0 * structure.Batches / structure.TokenEvents:F2} messages per event (one out, one back per batch)"));

        var same = timings.Select(t => (t.Run!.Value.TokenEvents, t.Run!.Value.Checksum, t.Run!.Value.Rounds)).Distinct().Count() == 1;
        output.WriteLine(same
            ? "check: all engines delivered the same number of events in the same rounds with the same order checksum"
            : "CHECK FAILED: the engines disagree on the event count, the rounds or the order checksum");
        return same;
    }

    private static async Task<PholdRun> KernelAsync(Func<KernelSetup, Task<RunResult>> kernel, PholdOptions options, DelayLaw law, JournalMode mode, FileJournal file)
    {
        var components = PholdModel.Components(options, law, journalEvents: mode != JournalMode.None);
        KernelSetup Setup(IJournalSink sink) => new(components, options.Seed, options.Until, sink);
        ChecksumSink sink;
        RunResult result;
        if (mode == JournalMode.File)
        {
            sink = null!;
            result = await file.WriteAsync(options, law, writer => kernel(Setup(sink = new ChecksumSink(writer))));
        }
        else
        {
            sink = new ChecksumSink();
            result = await kernel(Setup(sink));
        }

        return PholdModel.Summarise(options, result, sink);
    }
}
