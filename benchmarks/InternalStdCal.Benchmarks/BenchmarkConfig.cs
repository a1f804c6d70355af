using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Diagnosers;

namespace InternalStdCal.Benchmarks;

/// <summary>Shared configuration: memory diagnoser on, ratios against the baseline of each class.</summary>
public sealed class BenchmarkConfig : ManualConfig
{
    public BenchmarkConfig()
    {
        AddDiagnoser(MemoryDiagnoser.Default);
        Add(DefaultConfig.Instance);
        WithOptions(ConfigOptions.JoinSummary);
    }
}
