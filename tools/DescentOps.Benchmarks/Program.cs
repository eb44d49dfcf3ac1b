using DescentOps.Benchmarks.Campaign;
using DescentOps.Benchmarks.Onboard;
using DescentOps.Benchmarks.Phold;
using DescentOps.Benchmarks.Physics;
using DescentOps.Benchmarks.Rules;

return args.FirstOrDefault() switch
{
    "phold" => await PholdBenchmark.RunAsync(PholdOptions.Parse(args[1..]), Console.Out),
    "physics" => await PhysicsBenchmark.RunAsync(Console.Out),
    "rules" => await RulesBenchmark.RunAsync(Console.Out, args.Length > 2 && args[1] == "--repeats" ? int.Parse(args[2], System.Globalization.CultureInfo.InvariantCulture) : 3),
    "campaign" => await CampaignBenchmark.RunAsync(args[1..], Console.Out),
    "onboard" => await OnboardBenchmark.RunAsync(Console.Out, args.Length > 2 && args[1] == "--repeats" ? int.Parse(args[2], System.Globalization.CultureInfo.InvariantCulture) : 3),
    _ => Usage(),
};

static int Usage()
{
    Console.Error.WriteLine("usage: DescentOps.Benchmarks phold [--lps 8] [--tokens 64] [--events 400000] [--mean-delay-ms 1] [--delay poisson|exponential] [--repeats 5] [--seed 1]");
    Console.Error.WriteLine("       DescentOps.Benchmarks physics");
    Console.Error.WriteLine("       DescentOps.Benchmarks rules [--repeats 3]");
    Console.Error.WriteLine("       DescentOps.Benchmarks campaign [--runs 8] [--jobs K] [--scenario default.yaml]");
    Console.Error.WriteLine("       DescentOps.Benchmarks onboard [--repeats 3]");
    return 2;
}
