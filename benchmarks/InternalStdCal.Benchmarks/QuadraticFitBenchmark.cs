using System;
using BenchmarkDotNet.Attributes;
using InternalStdCal.Calibration;
using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearRegression;

namespace InternalStdCal.Benchmarks;

/// <summary>
/// Group 2. Unweighted quadratic fit of 8 standards: the library (Householder QR in a centred basis, refinement
/// step) against MathNet.Numerics Fit.Polynomial (the baseline) and MathNet's explicit QR regression on a
/// Vandermonde design. Invented, fixed-seed data.
/// </summary>
public class QuadraticFitBenchmark
{
    private double[] x = Array.Empty<double>();
    private double[] y = Array.Empty<double>();

    [GlobalSetup]
    public void Setup() => (x, y) = FixedSeedData.Standards(8, curvature: -0.0004);

    [Benchmark(Baseline = true)]
    public double MathNetFitPolynomial() => Fit.Polynomial(x, y, 2)[2];

    [Benchmark]
    public double MathNetQr()
    {
        Matrix<double> design = Matrix<double>.Build.Dense(x.Length, 3, (i, j) => Math.Pow(x[i], j));
        return MultipleRegression.QR(design, Vector<double>.Build.Dense(y))[2];
    }

    [Benchmark]
    public double Library() => RegressionFit.Fit(x, y, CalibrationModel.Quadratic).Curvature;
}
