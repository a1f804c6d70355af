using System;
using System.Linq;
using InternalStdCal.Calibration;
using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearRegression;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

/// <summary>
/// Cross-checks on random calibration-like data against MathNet.Numerics 5.0 as an independent reference
/// (Fit.Line, Fit.LineThroughOrigin, Fit.Polynomial, Fit.PolynomialWeighted, WeightedRegression.Weighted,
/// and s²·(XᵀWX)⁻¹ from its dense matrices).
/// </summary>
public partial class RegressionFitTests
{
    private const double ReferenceTolerance = 1e-9;

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    public void Fit_RandomLine_MatchesMathNetFitLine(int seed)
    {
        (double[] x, double[] y) = RandomCalibration(seed, curvature: 0);
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear);

        (double a, double b) = Fit.Line(x, y);
        AssertRelative(a, fit.Intercept);
        AssertRelative(b, fit.Slope);
        AssertRelative(GoodnessOfFit.RSquared(x.Select(v => a + (b * v)), y), fit.RSquared);
        AssertCovarianceMatchesMathNet(fit, x, Enumerable.Repeat(1.0, x.Length).ToArray(), 2);
    }

    [Theory]
    [InlineData(11)]
    [InlineData(12)]
    [InlineData(13)]
    public void Fit_RandomLineThroughOrigin_MatchesMathNetFitLineThroughOrigin(int seed)
    {
        (double[] x, double[] y) = RandomCalibration(seed, curvature: 0);
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.LinearThroughOrigin);

        AssertRelative(Fit.LineThroughOrigin(x, y), fit.Slope);
        AssertCovarianceMatchesMathNet(fit, x, Enumerable.Repeat(1.0, x.Length).ToArray(), 1);
    }

    [Theory]
    [InlineData(21)]
    [InlineData(22)]
    [InlineData(23)]
    public void Fit_RandomWeightedLine_MatchesMathNetWeightedRegression(int seed)
    {
        (double[] x, double[] y) = RandomCalibration(seed, curvature: 0);
        double[] w = x.Select(v => 1 / (v * v)).ToArray();
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear, Weighting.InverseXSquared);

        double[] reference = WeightedRegression.Weighted(x.Select(v => new[] { v }).ToArray(), y, w, intercept: true);
        AssertRelative(reference[0], fit.Intercept);
        AssertRelative(reference[1], fit.Slope);
        AssertCovarianceMatchesMathNet(fit, x, w, 2);
    }

    [Theory]
    [InlineData(31)]
    [InlineData(32)]
    [InlineData(33)]
    public void Fit_RandomQuadratic_MatchesMathNetFitPolynomial(int seed)
    {
        (double[] x, double[] y) = RandomCalibration(seed, curvature: -0.002);
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Quadratic);

        double[] reference = Fit.Polynomial(x, y, 2);
        for (int i = 0; i < 3; i++)
        {
            AssertRelative(reference[i], fit.Coefficients[i]);
        }

        AssertCovarianceMatchesMathNet(fit, x, Enumerable.Repeat(1.0, x.Length).ToArray(), 3);
    }

    [Theory]
    [InlineData(41)]
    [InlineData(42)]
    public void Fit_RandomWeightedQuadratic_MatchesMathNetPolynomialWeighted(int seed)
    {
        (double[] x, double[] y) = RandomCalibration(seed, curvature: 0.001);
        double[] w = x.Select(v => 1 / v).ToArray();
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Quadratic, Weighting.Custom(w));

        double[] reference = Fit.PolynomialWeighted(x, y, w, 2);
        for (int i = 0; i < 3; i++)
        {
            AssertRelative(reference[i], fit.Coefficients[i]);
        }

        AssertCovarianceMatchesMathNet(fit, x, w, 3);
    }

    /// <summary>Checks Covariance, StandardErrors, s and leverages against s²·(XᵀWX)⁻¹ built with MathNet matrices.</summary>
    private static void AssertCovarianceMatchesMathNet(RegressionFit fit, double[] x, double[] rawWeights, int p)
    {
        int n = x.Length;
        double scale = n / rawWeights.Sum();
        int offset = p == 1 ? 1 : 0; // through origin: column x only
        Matrix<double> design = Matrix<double>.Build.Dense(n, p, (i, j) => Math.Pow(x[i], j + offset));
        Matrix<double> weights = Matrix<double>.Build.Diagonal(rawWeights.Select(w => w * scale).ToArray());
        Vector<double> yv = Vector<double>.Build.DenseOfEnumerable(fit.Y);
        Matrix<double> xtwxInverse = (design.Transpose() * weights * design).Inverse();
        Vector<double> beta = xtwxInverse * design.Transpose() * weights * yv;
        Vector<double> residuals = yv - (design * beta);
        double s2 = (residuals * weights * residuals) / (n - p);

        AssertRelative(Math.Sqrt(s2), fit.ResidualStandardDeviation);
        for (int i = 0; i < p; i++)
        {
            AssertRelative(Math.Sqrt(s2 * xtwxInverse[i, i]), fit.StandardErrors[i]);
            for (int j = 0; j < p; j++)
            {
                Assert.Equal(s2 * xtwxInverse[i, j], fit.Covariance(i, j), ReferenceTolerance * s2 * Math.Sqrt(xtwxInverse[i, i] * xtwxInverse[j, j]));
            }
        }

        Matrix<double> hat = weights.PointwiseSqrt() * design * xtwxInverse * design.Transpose() * weights.PointwiseSqrt();
        for (int i = 0; i < n; i++)
        {
            Assert.Equal(hat[i, i], fit.Leverages[i], 1e-10);
        }
    }

    private static void AssertRelative(double expected, double actual) =>
        Assert.True(
            Math.Abs(expected - actual) <= ReferenceTolerance * Math.Abs(expected),
            FormattableString.Invariant($"expected {expected:R}, got {actual:R}"));

    /// <summary>Random standards: 5–15 points, x in (0.5, 100], response 0.3 + 0.8·x + c·x² with 1 % noise.</summary>
    private static (double[] X, double[] Y) RandomCalibration(int seed, double curvature)
    {
        var random = new Random(seed);
        int n = random.Next(5, 16);
        double[] x = Enumerable.Range(0, n).Select(_ => 0.5 + (99.5 * random.NextDouble())).ToArray();
        double[] y = x.Select(v => (0.3 + (0.8 * v) + (curvature * v * v)) * (1 + (0.01 * (random.NextDouble() - 0.5)))).ToArray();
        return (x, y);
    }
}
