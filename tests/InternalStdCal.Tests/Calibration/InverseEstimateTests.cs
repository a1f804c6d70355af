using InternalStdCal.Calibration;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class InverseEstimateTests
{
    [Fact]
    public void ToString_ShowsValueHalfWidthAndLevelInvariantly()
    {
        // Perfect line y = 2x: x0 = 2 exactly with zero width (same text as InversePrediction).
        RegressionFit fit = RegressionFit.Fit(new double[] { 1, 2, 3 }, new double[] { 2, 4, 6 }, CalibrationModel.Linear);
        InverseEstimate e = fit.EstimateInverse(4, 1, 0.99);

        Assert.Equal("2 ± 0 (99%)", e.ToString());
        Assert.Equal(fit.InversePredict(4, 1, 0.99).ToString(), e.ToString());
    }

    [Fact]
    public void Equality_IsExactOnEveryField()
    {
        RegressionFit fit = RegressionFit.Fit(new double[] { 1, 2, 3, 4 }, new double[] { 2.1, 3.9, 6.2, 7.8 }, CalibrationModel.Linear);
        InverseEstimate a = fit.EstimateInverse(5);

        Assert.True(a == fit.EstimateInverse(5));
        Assert.Equal(a.GetHashCode(), fit.EstimateInverse(5).GetHashCode());
        Assert.True(a != fit.EstimateInverse(5, 2));
        Assert.False(a.Equals(fit.EstimateInverse(5.000000001)));
        Assert.False(a.Equals((object)"5"));
    }

    [Fact]
    public void IsExtrapolated_AboveHighestStandard_IsTrue()
    {
        RegressionFit fit = RegressionFit.Fit(new double[] { 1, 2, 3, 4 }, new double[] { 2.1, 3.9, 6.2, 7.8 }, CalibrationModel.Linear);
        InverseEstimate e = fit.EstimateInverse(20);

        Assert.Equal(ExtrapolationStatus.AboveHighestStandard, e.Extrapolation);
        Assert.True(e.IsExtrapolated);
    }
}
