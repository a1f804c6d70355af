using System;
using BenchmarkDotNet.Attributes;
using InternalStdCal.Calibration;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearRegression;

namespace InternalStdCal.Benchmarks;

/// <summary>1/x-weighted straight-line fit of n standards: the library against a closed-form Σ loop (the floor)
/// and MathNet.Numerics' weighted regression. Invented, fixed-seed data.</summary>
public class WeightedLineFitBenchmark
{
    private double[] x = Array.Empty<double>();
    private double[] y = Array.Empty<double>();
    private double[] w = Array.Empty<double>();

    [Params(8, 50)]
    public int Standards { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        var random = new Random(20261202);
        x = new double[Standards];
        y = new double[Standards];
        w = new double[Standards];
        for (int i = 0; i < Standards; i++)
        {
            x[i] = 0.5 * (i + 1);
            y[i] = (0.002 + 0.0198 * x[i]) * (1 + 0.01 * (random.NextDouble() - 0.5));
            w[i] = 1 / x[i];
        }
    }

    [Benchmark(Baseline = true)]
    public double ClosedFormLoop()
    {
        double sw = 0, swx = 0, swy = 0;
        for (int i = 0; i < x.Length; i++)
        {
            sw += w[i];
            swx += w[i] * x[i];
            swy += w[i] * y[i];
        }

        double mx = swx / sw, my = swy / sw, sxx = 0, sxy = 0;
        for (int i = 0; i < x.Length; i++)
        {
            double dx = x[i] - mx;
            sxx += w[i] * dx * dx;
            sxy += w[i] * dx * (y[i] - my);
        }

        return sxy / sxx;
    }

    [Benchmark]
    public double Library() => RegressionFit.Fit(x, y, CalibrationModel.Linear, Weighting.InverseX).Slope;

    [Benchmark]
    public double MathNetWeightedRegression()
    {
        Matrix<double> design = Matrix<double>.Build.Dense(x.Length, 2, (i, j) => j == 0 ? 1 : x[i]);
        return WeightedRegression.Weighted(design, Vector<double>.Build.Dense(y), Matrix<double>.Build.Diagonal(w))[1];
    }
}
