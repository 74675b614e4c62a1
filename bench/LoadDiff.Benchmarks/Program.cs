using BenchmarkDotNet.Running;

// dotnet run -c Release --project bench/LoadDiff.Benchmarks -- --filter '*'
BenchmarkSwitcher.FromAssembly(typeof(LoadDiff.Benchmarks.ReductionBenchmarks).Assembly).Run(args);
