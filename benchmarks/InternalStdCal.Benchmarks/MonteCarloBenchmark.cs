using System;
using BenchmarkDotNet.Attributes;
using InternalStdCal.Uncertainty;

namespace InternalStdCal.Benchmarks;

/// <summary>Monte Carlo propagation (JCGM 101:2008) of a 10-input model, 10⁶ trials: the product form and the same
/// model as a delegate. Target: &lt; 0.5 s per evaluation. Invented inputs of every distribution kind.</summary>
public class MonteCarloBenchmark
{
    private MeasurementModel product = null!;
    private MeasurementModel function = null!;

    [GlobalSetup]
    public void Setup()
    {
        var inputs = new UncertainInput[10];
        for (int i = 0; i < inputs.Length; i++)
        {
            double value = 1 + i;
            inputs[i] = (i % 4) switch
            {
                0 => UncertainInput.Normal("x" + i, value, 0.01 * value),
                1 => UncertainInput.Rectangular("x" + i, value, 0.02 * value),
                2 => UncertainInput.Triangular("x" + i, value, 0.02 * value),
                _ => UncertainInput.StudentT("x" + i, value, 0.01 * value, 5),
            };
        }

        double[] exponents = { 1, -1, 1, -1, 1, -1, 1, -1, 1, -1 };
        product = MeasurementModel.Product("y", null, 2.5, inputs, exponents);
        function = MeasurementModel.Create("y", null, inputs, x => 2.5 * x[0] / x[1] * x[2] / x[3] * x[4] / x[5] * x[6] / x[7] * x[8] / x[9]);
    }

    [Benchmark(Baseline = true)]
    public double ProductModel() => product.EvaluateMonteCarlo(1_000_000, 1).StandardUncertainty;

    [Benchmark]
    public double DelegateModel() => function.EvaluateMonteCarlo(1_000_000, 1).StandardUncertainty;
}
