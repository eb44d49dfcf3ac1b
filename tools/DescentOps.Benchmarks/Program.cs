using DescentOps.Benchmarks.Phold;
using DescentOps.Benchmarks.Physics;

return args.FirstOrDefault() switch
{
    "phold" => await PholdBenchmark.RunAsync(PholdOptions.Parse(args[1..]), Console.Out),
    "physics" => await PhysicsBenchmark.RunAsync(Console.Out),
    _ => Usage(),
};

static int Usage()
{
    Console.Error.WriteLine("usage: DescentOps.Benchmarks phold [--lps 8] [--tokens 64] [--events 400000] [--mean-delay-ms 1] [--delay poisson|exponential] [--repeats 5] [--seed 1]");
    Console.Error.WriteLine("       DescentOps.Benchmarks physics");
    return 2;
}
