using System;
using InternalStdCal.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

/// <summary>Second-order fits: ISO 8466-2 on the fluorescence data (field-reference §1.3, §1.4).</summary>
public partial class RegressionFitTests
{
    [Fact]
    public void Fit_QuadraticFluorescence_MatchesComputedCoefficients()
    {
        RegressionFit fit = Fluorescence(CalibrationModel.Quadratic);

        // Computed (field-reference §1.3 Mandel check values and §1.4).
        Printed.Equal("1.797619048", fit.Intercept);
        Printed.Equal("1.7625", fit.Slope);
        Printed.Equal("0.01398809524", fit.Curvature);
        Printed.Equal("0.6738095238", fit.ResidualSumOfSquares);
        Printed.Equal("0.41042951", fit.ResidualStandardDeviation);
        Printed.Equal("0.358252", fit.StandardErrors[0]);
        Printed.Equal("0.13983", fit.StandardErrors[1]);
        Printed.Equal("0.0111954", fit.StandardErrors[2]);
        Printed.Equal("1.9303571", fit.Sensitivity(fit.WeightedMeanX));
        Printed.Equal("0.21261843", fit.ResidualStandardDeviation / fit.Sensitivity(fit.WeightedMeanX));
        Assert.Equal(4, fit.DegreesOfFreedom);
        Assert.Equal(Math.Sqrt(fit.RSquared), fit.CorrelationCoefficient);
    }

    [Theory]
    [InlineData(2.9, "0.62239001", "1.779912", "0.790674")]
    [InlineData(13.5, "6.3224043", "1.939377", "0.678085")]
    [InlineData(23.0, "11.059062", "2.071890", "0.659966")]
    public void InversePredict_QuadraticFluorescence_MatchesIso8466Part2Table(double y0, string x0, string sensitivity, string halfWidth)
    {
        RegressionFit fit = Fluorescence(CalibrationModel.Quadratic);

        // Computed (field-reference §1.4), N̂ = 1, t(0.975, 4) = 2.77645.
        InversePrediction p = fit.InversePredict(y0);
        Printed.Equal(x0, p.Value);
        Printed.Equal(sensitivity, fit.Sensitivity(p.Value));
        Printed.Equal(halfWidth, p.Interval.HalfWidth);
        Assert.Contains("delta method", p.Method, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(2.9, 1)]
    [InlineData(13.5, 2)]
    [InlineData(23.0, 5)]
    [InlineData(25.5, 1)]
    public void InversePredict_QuadraticFluorescence_AgreesWithIso8466Part2ClosedForm(double y0, int replicates)
    {
        RegressionFit fit = Fluorescence(CalibrationModel.Quadratic);
        double[] x = FluorescenceX;
        int n = x.Length;
        double sx = 0, sx2 = 0, sx3 = 0, sx4 = 0;
        foreach (double v in x)
        {
            sx += v;
            sx2 += v * v;
            sx3 += v * v * v;
            sx4 += v * v * v * v;
        }

        // ISO 8466-2 closed form (field-reference §1.4, from memory; verified there against the delta method).
        double qxx = sx2 - (sx * sx / n), qx3 = sx3 - (sx * sx2 / n), qx4 = sx4 - (sx2 * sx2 / n);
        double xHat = fit.InverseEvaluate(y0), xBar = sx / n;
        double e = fit.Slope + (2 * fit.Curvature * xHat);
        double d1 = xHat - xBar, d2 = (xHat * xHat) - (sx2 / n);
        double bracket = ((d1 * d1 * qx4) + (d2 * d2 * qxx) - (2 * d1 * d2 * qx3)) / ((qxx * qx4) - (qx3 * qx3));
        double se = fit.ResidualStandardDeviation / e * Math.Sqrt((1.0 / n) + (1.0 / replicates) + bracket);

        Assert.Equal(se, fit.InversePredict(y0, replicates).StandardError, 1e-12 * se);
    }

    [Fact]
    public void InverseEvaluate_QuadraticResponseBeyondVertex_ThrowsNamingResponse()
    {
        // Concave parabola y = 10x − x² (maximum 25 at x = 5): a response of 30 has no real root.
        double[] x = { 0, 1, 2, 3, 4, 5 };
        double[] y = { 0, 9, 16, 21, 24, 25 };
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Quadratic);

        var e = Assert.Throws<ArgumentOutOfRangeException>(() => fit.InverseEvaluate(30));
        Assert.Equal("response", e.ParamName);
        Assert.Contains("30", e.Message, StringComparison.Ordinal);
        Assert.Contains("no real root", e.Message, StringComparison.Ordinal);
        Assert.Equal(3, fit.InverseEvaluate(21), 12);
    }

    [Fact]
    public void InverseEvaluate_QuadraticOutsideRange_PicksRootClosestToStandards()
    {
        // y = 10x − x² fitted on x = 0…5; y = −11 has roots −1 and 11: −1 is closer to [0, 5].
        double[] x = { 0, 1, 2, 3, 4, 5 };
        double[] y = { 0, 9, 16, 21, 24, 25 };
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Quadratic);

        Assert.Equal(-1, fit.InverseEvaluate(-11), 12);
        Assert.Equal(ExtrapolationStatus.BelowLowestStandard, fit.InversePredict(-11).Extrapolation);
        Assert.True(fit.InversePredict(-11).IsExtrapolated);
    }

    [Fact]
    public void InversePredict_QuadraticAtVertex_ThrowsInvalidOperation()
    {
        // y = 10x − x² on x = 0…10: the vertex (x = 5, y = 25) lies inside; the sensitivity there is 0.
        double[] x = { 0, 2, 4, 5, 6, 8, 10 };
        double[] y = new double[x.Length];
        for (int i = 0; i < x.Length; i++)
        {
            y[i] = (10 * x[i]) - (x[i] * x[i]);
        }

        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Quadratic);
        double top = fit.Predict(5);

        var e = Assert.Throws<InvalidOperationException>(() => fit.InversePredict(top));
        Assert.Contains("sensitivity", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FiellerInterval_Quadratic_ThrowsInvalidOperation()
    {
        RegressionFit fit = Fluorescence(CalibrationModel.Quadratic);
        Assert.Throws<InvalidOperationException>(() => fit.FiellerInterval(13.5));
    }
}
