using BenchmarkDotNet.Attributes;
using InternalStdCal.Run;

namespace InternalStdCal.Benchmarks;

/// <summary>Group 4: a whole run (<see cref="RunData"/>, 40 analytes) through <see cref="RunProcessor.Process"/>:
/// IS recoveries, 40 weighted calibrations with acceptance, quantitation with intervals, back-calculation, QC,
/// duplicates, spikes, flags and notes. Target: &lt; 2 ms for 96 injections; cost linear in injections.</summary>
public class RunProcessingBenchmark
{
    private AnalyticalRun run = null!;
    private RunMethod method = null!;

    /// <summary>Injections in the run.</summary>
    [Params(96, 960, 9600)]
    public int Injections { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        run = RunData.Run(Injections);
        method = RunData.Method();
    }

    [Benchmark(Baseline = true)]
    public RunReport Process() => RunProcessor.Process(run, method);
}
