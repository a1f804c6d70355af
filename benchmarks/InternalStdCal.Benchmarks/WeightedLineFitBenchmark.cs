using System;
using BenchmarkDotNet.Attributes;
using InternalStdCal.Calibration;
using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearRegression;

namespace InternalStdCal.Benchmarks;

/// <summary>
/// Group 1. 1/x-weighted straight-line fit of n standards: the library against a closed-form Σ loop (the floor:
/// weights precomputed, two passes, slope only, no validation, copies or statistics) and MathNet.Numerics
/// (WeightedRegression.Weighted; Fit.Line, which is unweighted). Invented, fixed-seed data. The library rows: the
/// class path <c>RegressionFit.Fit</c> and the span path <c>RegressionFit.FitLine</c> (struct result).
/// </summary>
public class WeightedLineFitBenchmark
{
    private double[] x = Array.Empty<double>();
    private double[] y = Array.Empty<double>();
    private double[] w = Array.Empty<double>();

    [Params(6, 8, 12, 50, 10_000)]
    public int Standards { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        (x, y) = FixedSeedData.Standards(Standards);
        w = new double[Standards];
        for (int i = 0; i < Standards; i++)
        {
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

    /// <summary>The fit (validation, copy, weights, a and b); statistics are computed on first use.</summary>
    [Benchmark]
    public double Library() => RegressionFit.Fit(x, y, CalibrationModel.Linear, Weighting.InverseX).Slope;

    /// <summary>The allocation-free span entry point: checks, a and b (the same numbers as <see cref="Library"/>).</summary>
    [Benchmark]
    public double LibrarySpan() => RegressionFit.FitLine(x, y, Weighting.InverseX).Slope;

    /// <summary>The span entry point plus the residual standard deviation on demand (one more pass).</summary>
    [Benchmark]
    public double LibrarySpanWithStatistics()
    {
        LineFit fit = RegressionFit.FitLine(x, y, Weighting.InverseX);
        return fit.Slope + fit.ResidualStandardDeviation(x, y);
    }

    /// <summary>The fit plus its first use of the residual statistics (s and SE(b)).</summary>
    [Benchmark]
    public double LibraryWithStatistics()
    {
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear, Weighting.InverseX);
        return fit.Slope + fit.ResidualStandardDeviation + fit.Covariance(1, 1);
    }

    [Benchmark]
    public double MathNetWeightedRegression()
    {
        Matrix<double> design = Matrix<double>.Build.Dense(x.Length, 2, (i, j) => j == 0 ? 1 : x[i]);
        return WeightedRegression.Weighted(design, Vector<double>.Build.Dense(y), Matrix<double>.Build.Diagonal(w))[1];
    }

    /// <summary>MathNet's Fit.Line: unweighted (it has no weights), shown because it is the obvious call.</summary>
    [Benchmark]
    public double MathNetFitLineUnweighted() => Fit.Line(x, y).B;
}
