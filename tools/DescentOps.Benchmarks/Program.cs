using DescentOps.Benchmarks.Phold;

if (args.Length == 0 || args[0] != "phold")
{
    Console.Error.WriteLine("usage: DescentOps.Benchmarks phold [--lps 8] [--tokens 64] [--events 400000] [--mean-delay-ms 1] [--delay poisson|exponential] [--repeats 5] [--seed 1]");
    return 2;
}

return await PholdBenchmark.RunAsync(PholdOptions.Parse(args[1..]), Console.Out);
