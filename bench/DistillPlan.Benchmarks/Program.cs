using BenchmarkDotNet.Running;

// `--job short` is enough for the table in docs/performance.md; the default job is more exact.
BenchmarkSwitcher.FromAssembly(typeof(DistillPlan.Benchmarks.PlanBenchmarks).Assembly).Run(args);
