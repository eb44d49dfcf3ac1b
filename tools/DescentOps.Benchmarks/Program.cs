Console.WriteLine("benchmarks: see tools/README.md");
