using System;
using InternalStdCal.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

/// <summary>
/// Straight-line fits against worked examples. Fluorescence data: Miller &amp; Miller, "Statistics and
/// Chemometrics for Analytical Chemistry", ch. 5 — data from memory; every expected number computed
/// (field-reference §1.2).
/// </summary>
public partial class RegressionFitTests
{
    private static readonly double[] FluorescenceX = { 0, 2, 4, 6, 8, 10, 12 };
    private static readonly double[] FluorescenceY = { 2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7 };

    private static RegressionFit Fluorescence(CalibrationModel model = CalibrationModel.Linear) =>
        RegressionFit.Fit(FluorescenceX, FluorescenceY, model);

    [Fact]
    public void Fit_FluorescenceExample_ReproducesCoefficientsAndStatistics()
    {
        RegressionFit fit = Fluorescence();

        // Computed (field-reference §1.2).
        Printed.Equal("1.930357143", fit.Slope);
        Printed.Equal("1.517857143", fit.Intercept);
        Printed.Equal("0.9988795653", fit.CorrelationCoefficient);
        Printed.Equal("0.9977603861", fit.RSquared);
        Printed.Equal("0.9367857143", fit.ResidualSumOfSquares);
        Printed.Equal("0.4328477132", fit.ResidualStandardDeviation);
        Printed.Equal("0.04090026446", fit.StandardErrors[1]);
        Printed.Equal("0.2949360014", fit.StandardErrors[0]);
        Printed.Equal("-0.01003699", fit.Covariance(0, 1));
        Assert.Equal(fit.Covariance(0, 1), fit.Covariance(1, 0));
        Printed.Equal("6", fit.WeightedMeanX);
        Printed.Equal("13.1", fit.WeightedMeanY);
        Assert.Equal(112, fit.WeightedSumOfSquaresX, 12);
        Assert.Equal(5, fit.DegreesOfFreedom);
        Assert.Equal(new[] { 1.517857143, 1.930357143 }, fit.Coefficients, (e, a) => Math.Abs(e - a) < 5e-10);
        Assert.Equal(0.0, fit.Curvature);
        Assert.Equal(0.0, fit.MinX);
        Assert.Equal(12.0, fit.MaxX);
        Assert.All(fit.Weights, w => Assert.Equal(1.0, w));
    }

    [Fact]
    public void Fit_FluorescenceExample_ReproducesResiduals()
    {
        RegressionFit fit = Fluorescence();

        // Computed (field-reference §1.2).
        string[] expected = { "0.58214", "-0.37857", "-0.23929", "-0.50000", "0.33929", "0.17857", "0.01786" };
        for (int i = 0; i < expected.Length; i++)
        {
            Printed.Equal(expected[i], fit.Residuals[i]);
            Assert.Equal(fit.Residuals[i], fit.WeightedResiduals[i]);
            Assert.Equal(FluorescenceY[i], fit.FittedValues[i] + fit.Residuals[i], 12);
        }
    }

    [Fact]
    public void Fit_FluorescenceExample_LeveragesAndStandardizedResidualsFollowTextbookFormulas()
    {
        RegressionFit fit = Fluorescence();

        // Standard results: h = 1/n + (x − x̄)²/Sxx; r_i = e_i/(s·√(1 − h)); Σh = p.
        double sum = 0;
        for (int i = 0; i < FluorescenceX.Length; i++)
        {
            double h = (1.0 / 7) + ((FluorescenceX[i] - 6) * (FluorescenceX[i] - 6) / 112);
            Assert.Equal(h, fit.Leverages[i], 14);
            Assert.Equal(fit.Residuals[i] / (fit.ResidualStandardDeviation * Math.Sqrt(1 - h)), fit.StandardizedResiduals[i], 13);
            sum += fit.Leverages[i];
        }

        Assert.Equal(2, sum, 13);
    }

    [Fact]
    public void CoefficientInterval_FluorescenceExample_MatchesTextbookHalfWidths()
    {
        RegressionFit fit = Fluorescence();

        // Computed (field-reference §1.2): b ± 0.105137, a ± 0.758157 with t(0.975, 5) = 2.5705818.
        ConfidenceInterval slope = fit.CoefficientInterval(1);
        Printed.Equal("0.105137", slope.HalfWidth);
        Printed.Equal("1.93036", slope.Midpoint);
        Printed.Equal("0.758157", fit.CoefficientInterval(0).HalfWidth);
        Assert.Equal(0.95, slope.ConfidenceLevel);
    }

    [Theory]
    [InlineData(0, "0.758157", "1.34642")]
    [InlineData(6, "0.42055", "1.18949")]
    [InlineData(12, "0.758157", "1.34642")]
    public void Bands_FluorescenceExample_MatchTextbookHalfWidths(double x, string meanHalfWidth, string newYHalfWidth)
    {
        RegressionFit fit = Fluorescence();

        // Computed (field-reference §1.2), bands at x = 0 / 6 / 12.
        Printed.Equal(meanHalfWidth, fit.MeanResponseInterval(x).HalfWidth);
        Printed.Equal(newYHalfWidth, fit.PredictionInterval(x).HalfWidth);
        Assert.Equal(fit.Predict(x), fit.PredictionInterval(x).Midpoint, 12);
    }

    [Theory]
    [InlineData(2.9, "0.7160037", "0.26457", "0.680098", "0.19099", "0.179686")]
    [InlineData(13.5, "6.2072155", "0.239754", "0.616308", "0.154797", "0.140613")]
    [InlineData(23.0, "11.128585", "0.263193", "0.676560", "0.189079", "0.177653")]
    public void InversePredict_FluorescenceExample_MatchesTextbook(double y0, string x0, string se1, string half1, string se3, string se4)
    {
        RegressionFit fit = Fluorescence();

        // Computed (field-reference §1.2); s_x0 = (s/b)·√(1/m + 1/n + (ȳ0 − ȳ)²/(b²·Sxx)).
        InversePrediction one = fit.InversePredict(y0);
        Printed.Equal(x0, one.Value);
        Printed.Equal(se1, one.StandardError);
        Printed.Equal(half1, one.Interval.HalfWidth);
        Printed.Equal(se3, fit.InversePredict(y0, 3).StandardError);
        Printed.Equal(se4, fit.InversePredict(y0, 4).StandardError);
        Assert.Equal(5, one.DegreesOfFreedom);
        Assert.Equal(1, one.Replicates);
        Assert.Equal(1.0, one.UnknownWeight);
        Assert.Equal(y0, one.MeanResponse);
        Assert.Equal(ExtrapolationStatus.WithinRange, one.Extrapolation);
        Assert.False(one.IsExtrapolated);
        Assert.Contains("w0 = 1", one.Method, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(2.9, "0.018992", "1.381573")]
    [InlineData(13.5, "5.590608", "6.825056")]
    [InlineData(23.0, "10.46611", "11.82158")]
    public void FiellerInterval_FluorescenceExample_MatchesComputedLimits(double y0, string lower, string upper)
    {
        RegressionFit fit = Fluorescence();

        // Computed (field-reference §1.2), m = 1, g = 0.00296647.
        ConfidenceInterval? interval = fit.FiellerInterval(y0);
        Assert.NotNull(interval);
        Printed.Equal(lower, interval.Value.Lower);
        Printed.Equal(upper, interval.Value.Upper);
    }

    [Fact]
    public void FiellerInterval_SlopeNotSignificant_ReturnsNull()
    {
        // g = t²s²/(b²·Sxx) ≥ 1 when the slope is not significant: the Fieller set is unbounded.
        RegressionFit fit = RegressionFit.Fit(new double[] { 1, 2, 3, 4 }, new double[] { 1.0, 1.4, 0.8, 1.3 }, CalibrationModel.Linear);
        Assert.Null(fit.FiellerInterval(1.1));
    }

    [Fact]
    public void Fit_FluorescenceExample_MethodStandardDeviationMatchesIso8466Part1()
    {
        RegressionFit fit = Fluorescence();

        // Computed (field-reference §1.3, ISO 8466-1): s_x0 = s_y/b = 0.22423193 pg/mL; V_x0 = 3.7372 %.
        double sx0 = fit.ResidualStandardDeviation / fit.Slope;
        Printed.Equal("0.22423193", sx0);
        Printed.Equal("3.7372", 100 * sx0 / fit.WeightedMeanX);
    }

    [Fact]
    public void InversePredict_NoInt1ThroughOrigin_MatchesComputedValue()
    {
        // NIST StRD NoInt1 data (x = 60…70, y = 130…140; field-reference §10);
        // computed (field-reference §1.1): y0 = 135 → x0 = 65.07968127, s_x0 = 1.7962847 (m = 1).
        double[] x = new double[11], y = new double[11];
        for (int i = 0; i < 11; i++)
        {
            x[i] = 60 + i;
            y[i] = 130 + i;
        }

        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.LinearThroughOrigin);
        InversePrediction p = fit.InversePredict(135);

        Printed.Equal("65.07968127", p.Value);
        Printed.Equal("1.7962847", p.StandardError);
        Assert.Equal(0.0, fit.Intercept);
        Assert.Equal(10, p.DegreesOfFreedom);
        Assert.Contains("through origin", p.Method, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(CalibrationModel.LinearThroughOrigin, 135.0, 1)]
    [InlineData(CalibrationModel.LinearThroughOrigin, 131.5, 3)]
    [InlineData(CalibrationModel.Linear, 135.0, 1)]
    [InlineData(CalibrationModel.Linear, 139.0, 2)]
    public void FiellerInterval_StraightLines_LimitsSolveFiellerEquation(CalibrationModel model, double y0, int m)
    {
        // Fieller's limits are the x where (ȳ0 − ŷ(x))² = t²·(s²/m + Var(ŷ(x))) (Fieller 1954; field-reference §1.1).
        double[] x = new double[11], y = new double[11];
        for (int i = 0; i < 11; i++)
        {
            x[i] = 60 + i;
            y[i] = 130 + i + (0.3 * Math.Sin(i));
        }

        RegressionFit fit = RegressionFit.Fit(x, y, model);
        ConfidenceInterval fieller = fit.FiellerInterval(y0, m)!.Value;
        double t = fit.CoefficientInterval(0).HalfWidth / fit.StandardErrors[0];
        double s = fit.ResidualStandardDeviation;
        foreach (double limit in new[] { fieller.Lower, fieller.Upper })
        {
            double lhs = Math.Pow(y0 - fit.Predict(limit), 2);
            double rhs = t * t * ((s * s / m) + Math.Pow(fit.MeanResponseStandardError(limit), 2));
            Assert.Equal(rhs, lhs, 1e-9 * rhs);
        }

        Assert.True(fieller.Contains(fit.InverseEvaluate(y0)));
    }

    [Fact]
    public void Fit_RatioCalibrationOls_MatchesComputedExample()
    {
        // Constructed RF data set (field-reference §0, computed): y = A_x/A_is against C_x, C_is = 5.
        double[] cx = { 1, 2, 5, 10, 20 };
        double[] ratio = { 10250.0 / 50000, 20900.0 / 51200, 50100.0 / 49500, 103500.0 / 50800, 199000.0 / 49800 };

        RegressionFit fit = RegressionFit.Fit(cx, ratio, CalibrationModel.Linear);

        Printed.Equal("0.19970776", fit.Slope);
        Printed.Equal("0.013962987", fit.Intercept);
        Printed.Equal("0.99995093", fit.CorrelationCoefficient);
        Printed.Equal("0.99990185", fit.RSquared);
        Printed.Equal("0.0177412", fit.ResidualStandardDeviation);
        string[] percentError = { "-4.342", "-1.296", "-0.0381", "1.320", "-0.304" };
        for (int i = 0; i < cx.Length; i++)
        {
            Printed.Equal(percentError[i], 100 * (fit.InverseEvaluate(ratio[i]) - cx[i]) / cx[i]);
        }

        Printed.Equal("3.059656", fit.InverseEvaluate(30000.0 / 48000));
    }

    [Fact]
    public void Fit_RatioCalibrationInverseXSquared_MatchesComputedExample()
    {
        // Constructed RF data set (field-reference §0, computed): 1/x² weighted ratio fit.
        double[] cx = { 1, 2, 5, 10, 20 };
        double[] ratio = { 10250.0 / 50000, 20900.0 / 51200, 50100.0 / 49500, 103500.0 / 50800, 199000.0 / 49800 };

        RegressionFit fit = RegressionFit.Fit(cx, ratio, CalibrationModel.Linear, Weighting.InverseXSquared);

        Printed.Equal("0.20162074", fit.Slope);
        Printed.Equal("0.0037629392", fit.Intercept);
        string[] percentError = { "-0.190", "0.297", "0.025", "0.865", "-0.997" };
        for (int i = 0; i < cx.Length; i++)
        {
            Printed.Equal(percentError[i], 100 * (fit.InverseEvaluate(ratio[i]) - cx[i]) / cx[i]);
        }

        Assert.Equal(5, fit.Weights[0] + fit.Weights[1] + fit.Weights[2] + fit.Weights[3] + fit.Weights[4], 13);
    }
}
