using System;
using InternalStdCal.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

/// <summary>
/// Weighted fits: Miller &amp; Miller weighted absorbance example, data from memory; numbers computed
/// (field-reference §2.2).
/// </summary>
public partial class RegressionFitTests
{
    private static readonly double[] AbsorbanceX = { 0, 10, 20, 30, 40, 50 };
    private static readonly double[] AbsorbanceY = { 0.009, 0.158, 0.301, 0.472, 0.577, 0.739 };
    private static readonly double[] AbsorbanceSd = { 0.001, 0.004, 0.010, 0.013, 0.017, 0.022 };

    [Fact]
    public void Fit_AbsorbanceUnweighted_MatchesComputedExample()
    {
        RegressionFit fit = RegressionFit.Fit(AbsorbanceX, AbsorbanceY, CalibrationModel.Linear);

        // Computed (field-reference §2.2).
        Printed.Equal("0.014508571", fit.Slope);
        Printed.Equal("0.013285714", fit.Intercept);
        Printed.Equal("0.014589135", fit.ResidualStandardDeviation);
        Printed.Equal("0.000348747", fit.StandardErrors[1]);
        Printed.Equal("0.0105588", fit.StandardErrors[0]);
    }

    [Fact]
    public void Fit_AbsorbanceInverseVariance_MatchesComputedExample()
    {
        RegressionFit fit = RegressionFit.Fit(AbsorbanceX, AbsorbanceY, CalibrationModel.Linear, Weighting.InverseVariance(AbsorbanceSd));

        // Computed (field-reference §2.2), weights 1/s² normalised to Σw = n.
        Printed.Equal("0.014751993", fit.Slope);
        Printed.Equal("0.0090839078", fit.Intercept);
        Printed.Equal("0.0024954812", fit.ResidualStandardDeviation);
        Printed.Equal("0.000212779", fit.StandardErrors[1]);
        Printed.Equal("0.00104764", fit.StandardErrors[0]);
        Printed.Equal("1.1478725", fit.WeightedMeanX);
        Printed.Equal("0.026017315", fit.WeightedMeanY);
        Printed.Equal("137.54693", fit.WeightedSumOfSquaresX);
        string[] weights = { "5.5353", "0.34596", "0.055353", "0.032754", "0.019153", "0.011437" };
        for (int i = 0; i < weights.Length; i++)
        {
            Printed.Equal(weights[i], fit.Weights[i]);
        }
    }

    [Theory]
    [InlineData(0.100, "5.97676", "1.1785", "3.2719")]
    [InlineData(0.600, "40.4391", "1.1478", "3.1867")]
    public void InversePredict_AbsorbanceUnweighted_MatchesComputedExample(double y0, string x0, string se, string halfWidth)
    {
        RegressionFit fit = RegressionFit.Fit(AbsorbanceX, AbsorbanceY, CalibrationModel.Linear);

        // Computed (field-reference §2.2), m = 1, t(0.975, 4) = 2.776445.
        InversePrediction p = fit.InversePredict(y0);
        Printed.Equal(x0, p.Value);
        Printed.Equal(se, p.StandardError);
        Printed.Equal(halfWidth, p.Interval.HalfWidth);
    }

    [Theory]
    [InlineData(0.100, "6.16297", "0.0028489", "0.68201", "0.22795", "0.63288")]
    [InlineData(0.600, "40.0567", "0.017028", "0.01909", "1.3486", "3.7443")]
    public void InversePredict_AbsorbanceInverseVariance_MatchesComputedExampleWithStatedUnknownWeight(
        double y0, string x0, string sdAtX0, string normalisedW0, string se, string halfWidth)
    {
        RegressionFit fit = RegressionFit.Fit(AbsorbanceX, AbsorbanceY, CalibrationModel.Linear, Weighting.InverseVariance(AbsorbanceSd));
        double xHat = fit.InverseEvaluate(y0);

        // Computed (field-reference §2.2): w0 from linear interpolation of the s_i at x0, then 1/s0², normalised.
        double s0 = Interpolate(AbsorbanceX, AbsorbanceSd, xHat);
        InversePrediction p = fit.InversePredict(y0, 1, 0.95, 1 / (s0 * s0));

        Printed.Equal(x0, p.Value);
        Printed.Equal(sdAtX0, s0);
        Printed.Equal(normalisedW0, p.UnknownWeight);
        Printed.Equal(se, p.StandardError);
        Printed.Equal(halfWidth, p.Interval.HalfWidth);
        Assert.Contains("supplied by the caller", p.Method, StringComparison.Ordinal);
    }

    [Fact]
    public void InversePredict_InverseVarianceWithoutUnknownWeight_ThrowsNamingUnknownWeight()
    {
        RegressionFit fit = RegressionFit.Fit(AbsorbanceX, AbsorbanceY, CalibrationModel.Linear, Weighting.InverseVariance(AbsorbanceSd));

        var e = Assert.Throws<ArgumentException>(() => fit.InversePredict(0.1));
        Assert.Equal("unknownWeight", e.ParamName);
        Assert.Contains("1/s²", e.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => fit.PredictionInterval(10));
        Assert.Throws<ArgumentException>(() => fit.FiellerInterval(0.1));
    }

    [Theory]
    [InlineData(WeightingScheme.None, "0.01438", "0.018", "0.016460053")]
    [InlineData(WeightingScheme.InverseX, "0.01449981982", "0.01440540541", "0.013608588")]
    [InlineData(WeightingScheme.InverseXSquared, "0.01459163147", "0.01239493136", "0.0094749969")]
    [InlineData(WeightingScheme.InverseY, "0.01448310761", "0.01457547179", "0.013632161")]
    [InlineData(WeightingScheme.InverseYSquared, "0.01455170782", "0.01282437105", "0.0096240851")]
    public void Fit_AbsorbanceWithoutBlankEmpiricalSchemes_MatchComputedTable(WeightingScheme scheme, string b, string a, string s)
    {
        // Computed (field-reference §2.2, "other weighting schemes ... without the x = 0 point").
        double[] x = AbsorbanceX[1..];
        double[] y = AbsorbanceY[1..];
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear, SchemeWeighting(scheme));

        Printed.Equal(b, fit.Slope);
        Printed.Equal(a, fit.Intercept);
        Printed.Equal(s, fit.ResidualStandardDeviation);
        Assert.Equal(scheme, fit.Weighting.Scheme);
    }

    [Fact]
    public void InversePredict_InverseXScheme_UsesSchemeAtPredictedX()
    {
        double[] x = AbsorbanceX[1..];
        double[] y = AbsorbanceY[1..];
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear, Weighting.InverseX);

        InversePrediction p = fit.InversePredict(0.3);
        double raw = 1 / p.Value;
        double sumRaw = 0;
        foreach (double xi in x)
        {
            sumRaw += 1 / xi;
        }

        // w0 = (1/x0) normalised with the standards' factor n/Σ(1/x) (field-reference §2.1).
        Assert.Equal(raw * x.Length / sumRaw, p.UnknownWeight, 13);
        Assert.Contains("1/x evaluated at x", p.Method, StringComparison.Ordinal);
        Assert.Equal(p.StandardError, fit.InversePredict(0.3, 1, 0.95, raw).StandardError, 14);
    }

    [Fact]
    public void InversePredict_InverseYScheme_UsesSchemeAtMeanResponse()
    {
        double[] x = AbsorbanceX[1..];
        double[] y = AbsorbanceY[1..];
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear, Weighting.InverseYSquared);

        InversePrediction p = fit.InversePredict(0.3);

        Assert.Equal(fit.InversePredict(0.3, 1, 0.95, 1 / (0.3 * 0.3)).StandardError, p.StandardError, 14);
        Assert.Contains("evaluated at the response", p.Method, StringComparison.Ordinal);
    }

    [Fact]
    public void InversePredict_InverseXSchemeNegativePrediction_ThrowsNamingUnknownWeight()
    {
        double[] x = AbsorbanceX[1..];
        double[] y = AbsorbanceY[1..];
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear, Weighting.InverseX);

        // Response below the intercept: x0 < 0, where 1/x is undefined.
        var e = Assert.Throws<ArgumentException>(() => fit.InversePredict(0.001));
        Assert.Equal("unknownWeight", e.ParamName);
        Assert.Contains("1/x needs x > 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_InverseXWithBlankStandard_ThrowsNamingPointAndValue()
    {
        var e = Assert.Throws<ArgumentException>(() => RegressionFit.Fit(AbsorbanceX, AbsorbanceY, CalibrationModel.Linear, Weighting.InverseX));
        Assert.Equal("x", e.ParamName);
        Assert.Contains("point 0", e.Message, StringComparison.Ordinal);
        Assert.Contains("x = 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_WeightedThroughOrigin_MatchesClosedForm()
    {
        // Weighted line through the origin (standard result): b = Σw·x·y/Σw·x², s² = Σw(y − bx)²/(n − 1),
        // s_b = s/√(Σw·x²) with normalised weights; R² = 1 − RSS/Σw·y² (NIST NoInt convention).
        double[] x = AbsorbanceX[1..];
        double[] y = AbsorbanceY[1..];
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.LinearThroughOrigin, Weighting.InverseX);
        double sumW = 0;
        foreach (double v in x)
        {
            sumW += 1 / v;
        }

        double sxy = 0, sxx = 0, syy = 0;
        for (int i = 0; i < x.Length; i++)
        {
            double w = x.Length / x[i] / sumW;
            sxy += w * x[i] * y[i];
            sxx += w * x[i] * x[i];
            syy += w * y[i] * y[i];
        }

        double b = sxy / sxx, rss = 0;
        for (int i = 0; i < x.Length; i++)
        {
            double r = y[i] - (b * x[i]);
            rss += x.Length / x[i] / sumW * r * r;
        }

        double s = Math.Sqrt(rss / (x.Length - 1));
        Assert.Equal(b, fit.Slope, 1e-14 * b);
        Assert.Equal(s, fit.ResidualStandardDeviation, 1e-12 * s);
        Assert.Equal(s / Math.Sqrt(sxx), fit.StandardErrors[0], 1e-12 * s);
        Assert.Equal(1 - (rss / syy), fit.RSquared, 1e-13);
    }

    private static Weighting SchemeWeighting(WeightingScheme scheme) => scheme switch
    {
        WeightingScheme.InverseX => Weighting.InverseX,
        WeightingScheme.InverseXSquared => Weighting.InverseXSquared,
        WeightingScheme.InverseY => Weighting.InverseY,
        WeightingScheme.InverseYSquared => Weighting.InverseYSquared,
        _ => Weighting.None,
    };

    private static double Interpolate(double[] xs, double[] ys, double x)
    {
        int k = 1;
        while (k < xs.Length - 1 && xs[k] < x)
        {
            k++;
        }

        return ys[k - 1] + ((ys[k] - ys[k - 1]) * (x - xs[k - 1]) / (xs[k] - xs[k - 1]));
    }
}
