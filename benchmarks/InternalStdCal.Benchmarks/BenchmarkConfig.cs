using System;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Diagnosers;

namespace InternalStdCal.Benchmarks;

/// <summary>
/// Shared configuration: memory diagnoser on, ratios against the baseline of each class (one summary table per
/// class), and a 10-minute limit for building the generated project (the default 2 minutes is too short on a loaded
/// 2-core machine).
/// </summary>
public sealed class BenchmarkConfig : ManualConfig
{
    public BenchmarkConfig()
    {
        AddDiagnoser(MemoryDiagnoser.Default);
        Add(DefaultConfig.Instance);
        WithBuildTimeout(TimeSpan.FromMinutes(10));
    }
}
