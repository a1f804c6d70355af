using BenchmarkDotNet.Attributes;
using InternalStdCal.Calibration;

namespace InternalStdCal.Benchmarks;

/// <summary>
/// Group 3. Inverse prediction with interval for one unknown (mean of 3 replicate response ratios) off a fitted
/// 1/x-weighted line of 8 standards: the allocation-free struct path (baseline; target 0 B) against the class
/// result with its method text, at P = 0.95 (t cached in the fit) and P = 0.99 (t computed per call), and the
/// struct path on a quadratic. Invented, fixed-seed data.
/// </summary>
public class InversePredictionBenchmark
{
    private RegressionFit line = null!;
    private RegressionFit quadratic = null!;
    private double response;

    [GlobalSetup]
    public void Setup()
    {
        (double[] x, double[] y) = FixedSeedData.Standards(8);
        line = RegressionFit.Fit(x, y, CalibrationModel.Linear, Weighting.InverseX);
        (double[] qx, double[] qy) = FixedSeedData.Standards(8, curvature: -0.0004);
        quadratic = RegressionFit.Fit(qx, qy, CalibrationModel.Quadratic);
        response = 0.0437;
    }

    [Benchmark(Baseline = true)]
    public InverseEstimate EstimateInverse() => line.EstimateInverse(response, 3);

    [Benchmark]
    public InverseEstimate EstimateInverseP99() => line.EstimateInverse(response, 3, 0.99);

    [Benchmark]
    public InverseEstimate EstimateInverseQuadratic() => quadratic.EstimateInverse(response, 3);

    /// <summary>The class result (allocates the object and its method text).</summary>
    [Benchmark]
    public InversePrediction InversePredict() => line.InversePredict(response, 3);
}
