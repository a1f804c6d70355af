using System.IO;
using BenchmarkDotNet.Attributes;
using InternalStdCal.IO;
using InternalStdCal.Run;

namespace InternalStdCal.Benchmarks;

/// <summary>Group 6: run files in memory (no disk). Reading and writing a run of 10 000 injections × 10 analytes
/// (<see cref="RunData"/>, one row per injection) as CSV and JSON, and writing the results of a run of 1 150
/// injections × 10 analytes (one row per sample × analyte, ≈ 10 000 rows) as CSV and JSON and reading that JSON
/// back. The texts are made once in the global setup.</summary>
public class RunFileBenchmark
{
    private const int Analytes = 10;
    private AnalyticalRun run = null!;
    private RunResults results = null!;
    private string csv = null!;
    private string json = null!;
    private string resultsJson = null!;

    [GlobalSetup]
    public void Setup()
    {
        run = RunData.Run(10_000, Analytes);
        results = RunResults.From(RunProcessor.Process(RunData.Run(1_150, Analytes), RunData.Method(Analytes)));
        csv = WriteRunCsv();
        json = WriteRunJson();
        resultsJson = WriteResultsJson();
    }

    [Benchmark(Baseline = true)]
    public int ReadRunCsv() => RunCsv.ReadStrict(new StringReader(csv), "run").Injections.Count;

    [Benchmark]
    public string WriteRunCsv()
    {
        using var w = new StringWriter();
        RunCsv.Write(run, w);
        return w.ToString();
    }

    [Benchmark]
    public int ReadRunJson() => RunJson.ReadStrict(new StringReader(json)).Injections.Count;

    [Benchmark]
    public string WriteRunJson()
    {
        using var w = new StringWriter();
        RunJson.Write(run, w);
        return w.ToString();
    }

    [Benchmark]
    public string WriteResultsCsv()
    {
        using var w = new StringWriter();
        RunResultsCsv.Write(results, w);
        return w.ToString();
    }

    [Benchmark]
    public string WriteResultsJson()
    {
        using var w = new StringWriter();
        RunResultsJson.Write(results, w);
        return w.ToString();
    }

    [Benchmark]
    public RunResults ReadResultsJson() => RunResultsJson.Read(new StringReader(resultsJson));
}
