using System;
using InternalStdCal.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

/// <summary>Bad input and degenerate data: the exception names the parameter and the value (project rule).</summary>
public partial class RegressionFitTests
{
    [Fact]
    public void Fit_NullX_ThrowsArgumentNull()
    {
        var e = Assert.Throws<ArgumentNullException>(() => RegressionFit.Fit(null!, new double[] { 1, 2, 3 }, CalibrationModel.Linear));
        Assert.Equal("x", e.ParamName);
    }

    [Fact]
    public void Fit_LengthsDiffer_ThrowsNamingBothLengths()
    {
        var e = Assert.Throws<ArgumentException>(() => RegressionFit.Fit(new double[] { 1, 2, 3 }, new double[] { 1, 2 }, CalibrationModel.Linear));
        Assert.Equal("y", e.ParamName);
        Assert.Contains("2 elements", e.Message, StringComparison.Ordinal);
        Assert.Contains("(3)", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void Fit_NonFiniteY_ThrowsNamingIndexAndValue(double bad, string shown)
    {
        var e = Assert.Throws<ArgumentException>(() => RegressionFit.Fit(new double[] { 1, 2, 3 }, new[] { 1, bad, 3 }, CalibrationModel.Linear));
        Assert.Equal("y", e.ParamName);
        Assert.Contains("index 1", e.Message, StringComparison.Ordinal);
        Assert.Contains(shown, e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(CalibrationModel.Linear, 2, "at least 3")]
    [InlineData(CalibrationModel.LinearThroughOrigin, 1, "at least 2")]
    [InlineData(CalibrationModel.Quadratic, 3, "at least 4")]
    public void Fit_TooFewPoints_ThrowsNamingCountAndMinimum(CalibrationModel model, int count, string minimum)
    {
        double[] x = new double[count], y = new double[count];
        for (int i = 0; i < count; i++)
        {
            x[i] = i + 1;
            y[i] = 2 * (i + 1);
        }

        var e = Assert.Throws<ArgumentException>(() => RegressionFit.Fit(x, y, model));
        Assert.Equal("x", e.ParamName);
        Assert.Contains($"{count} points", e.Message, StringComparison.Ordinal);
        Assert.Contains(minimum, e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(CalibrationModel.Linear, new double[] { 5, 5, 5, 5 }, "1 distinct")]
    [InlineData(CalibrationModel.LinearThroughOrigin, new double[] { 5, 5, 5 }, "1 distinct")]
    [InlineData(CalibrationModel.Quadratic, new double[] { 1, 1, 2, 2, 2 }, "2 distinct")]
    public void Fit_TooFewDistinctX_Throws(CalibrationModel model, double[] x, string distinct)
    {
        double[] y = new double[x.Length];
        for (int i = 0; i < y.Length; i++)
        {
            y[i] = i;
        }

        var e = Assert.Throws<ArgumentException>(() => RegressionFit.Fit(x, y, model));
        Assert.Equal("x", e.ParamName);
        Assert.Contains(distinct, e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_UndefinedModel_ThrowsNamingModel()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => RegressionFit.Fit(FluorescenceX, FluorescenceY, (CalibrationModel)42));
        Assert.Equal("model", e.ParamName);
        Assert.Contains("42", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_PerPointWeightingWrongCount_ThrowsNamingWeighting()
    {
        var e = Assert.Throws<ArgumentException>(() => RegressionFit.Fit(FluorescenceX, FluorescenceY, CalibrationModel.Linear, Weighting.Custom(new double[] { 1, 2, 3 })));
        Assert.Equal("weighting", e.ParamName);
        Assert.Contains("3 values", e.Message, StringComparison.Ordinal);
        Assert.Contains("7 points", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(1.0)]
    [InlineData(-0.5)]
    [InlineData(double.NaN)]
    public void Intervals_ConfidenceLevelOutsideOpenUnitInterval_ThrowNamingConfidence(double level)
    {
        RegressionFit fit = Fluorescence();
        Assert.Throws<ArgumentOutOfRangeException>(() => fit.CoefficientInterval(0, level));
        Assert.Throws<ArgumentOutOfRangeException>(() => fit.MeanResponseInterval(1, level));
        Assert.Throws<ArgumentOutOfRangeException>(() => fit.PredictionInterval(1, 1, level));
        Assert.Throws<ArgumentOutOfRangeException>(() => fit.FiellerInterval(10, 1, level));
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => fit.InversePredict(10, 1, level));
        Assert.Contains("(0, 1)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void InversePredict_ZeroReplicates_ThrowsNamingReplicates()
    {
        RegressionFit fit = Fluorescence();
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => fit.InversePredict(10, 0));
        Assert.Equal("replicates", e.ParamName);
        Assert.Contains("was 0", e.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => fit.PredictionInterval(1, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => fit.FiellerInterval(10, 0));
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-1.0)]
    [InlineData(double.PositiveInfinity)]
    public void InversePredict_BadUnknownWeight_ThrowsNamingUnknownWeight(double w0)
    {
        RegressionFit fit = Fluorescence();
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => fit.InversePredict(10, 1, 0.95, w0));
        Assert.Equal("unknownWeight", e.ParamName);
        Assert.Contains("> 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void InversePredict_NonFiniteResponse_ThrowsNamingResponse()
    {
        RegressionFit fit = Fluorescence();
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => fit.InversePredict(double.NaN));
        Assert.Equal("response", e.ParamName);
        Assert.Contains("NaN", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(-1)]
    [InlineData(2)]
    public void CoefficientAccess_IndexOutOfRange_ThrowsNamingIndex(int index)
    {
        RegressionFit fit = Fluorescence();
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => fit.CoefficientInterval(index));
        Assert.Equal("index", e.ParamName);
        Assert.Contains("[0, 2)", e.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => fit.Covariance(0, index));
    }

    [Fact]
    public void InversePredict_ZeroSlope_ThrowsInvalidOperation()
    {
        // Constant response: the fitted slope is exactly 0, no x corresponds to a response.
        RegressionFit fit = RegressionFit.Fit(new double[] { 1, 2, 3, 4 }, new double[] { 5, 5, 5, 5 }, CalibrationModel.Linear);

        var e = Assert.Throws<InvalidOperationException>(() => fit.InversePredict(5));
        Assert.Contains("slope is 0", e.Message, StringComparison.Ordinal);
        Assert.Equal(0.0, fit.RSquared);
        Assert.Equal(0.0, fit.CorrelationCoefficient);
    }

    [Fact]
    public void Fit_PerfectLine_GivesZeroWidthIntervalsAndNoNaN()
    {
        RegressionFit fit = RegressionFit.Fit(new double[] { 1, 2, 3, 4 }, new double[] { 3, 5, 7, 9 }, CalibrationModel.Linear);
        InversePrediction p = fit.InversePredict(6, 2);

        Assert.Equal(0.0, fit.ResidualStandardDeviation);
        Assert.Equal(1.0, fit.RSquared);
        Assert.Equal(2.5, p.Value, 14);
        Assert.Equal(0.0, p.StandardError);
        Assert.Equal(0.0, p.Interval.Width);
        Assert.Equal(0.0, fit.PredictionInterval(2).Width);
        Assert.Equal(0.0, fit.FiellerInterval(6)!.Value.Width);
        Assert.All(fit.StandardizedResiduals, r => Assert.Equal(0.0, r));
        Assert.All(fit.StandardErrors, se => Assert.Equal(0.0, se));
    }

    [Fact]
    public void InversePredict_OutsideStandards_ReportsExtrapolation()
    {
        RegressionFit fit = Fluorescence();
        Assert.Equal(ExtrapolationStatus.BelowLowestStandard, fit.InversePredict(0.5).Extrapolation);
        Assert.Equal(ExtrapolationStatus.AboveHighestStandard, fit.InversePredict(30).Extrapolation);
        Assert.Equal(ExtrapolationStatus.WithinRange, fit.InversePredict(fit.Predict(12)).Extrapolation);
    }

    [Fact]
    public void Fit_InputArraysChangedAfterFit_FitUnaffected()
    {
        double[] x = (double[])FluorescenceX.Clone();
        double[] y = (double[])FluorescenceY.Clone();
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear);
        x[0] = 100;
        y[0] = -100;

        Assert.Equal(0.0, fit.X[0]);
        Assert.Equal(2.1, fit.Y[0]);
        Printed.Equal("1.930357143", fit.Slope);
        Assert.False(fit.Coefficients is double[]);
        Assert.False(fit.Residuals is double[]);
    }
}
