using InternalStdCal.Calibration;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class InversePredictionTests
{
    [Fact]
    public void ToString_ShowsValueHalfWidthAndLevelInvariantly()
    {
        // Perfect line y = 2x: x0 = 2 exactly with zero width.
        RegressionFit fit = RegressionFit.Fit(new double[] { 1, 2, 3 }, new double[] { 2, 4, 6 }, CalibrationModel.Linear);
        InversePrediction p = fit.InversePredict(4, 1, 0.99);

        Assert.Equal("2 ± 0 (99%)", p.ToString());
        Assert.Equal(0.99, p.Interval.ConfidenceLevel);
    }
}
