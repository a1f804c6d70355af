using System;
using InternalStdCal.Internal;
using Xunit;

namespace InternalStdCal.Tests.Internal;

public class SampleStatisticsTests
{
    [Fact]
    public void StandardDeviation_SmallValues_IsTheTextbookValue()
    {
        // Computed: 2, 4, 4, 4, 5, 5, 7, 9 about 5 → Σd² = 32, s = √(32/7).
        double[] x = { 2, 4, 4, 4, 5, 5, 7, 9 };
        Assert.Equal(5, SampleStatistics.Mean(x));
        Assert.Equal(Math.Sqrt(32.0 / 7), SampleStatistics.StandardDeviation(x, 5), 15);
    }

    [Fact]
    public void StandardDeviation_SquaresOverflow_ScalesAndStaysFinite()
    {
        // Computed: ±1e300 about 0 → s = √2 · 1e300 (the squares 1e600 overflow a double; the deviations are scaled first).
        double s = SampleStatistics.StandardDeviation(new[] { 1e300, -1e300 }, 0);
        Assert.Equal(Math.Sqrt(2), s / 1e300, 14);

        // Computed: 3e300, 0, −3e300 about 0 → s = √(18e600 / 2) = 3e300.
        Assert.Equal(3, SampleStatistics.StandardDeviation(new[] { 3e300, 0, -3e300 }, 0) / 1e300, 14);
    }

    [Fact]
    public void StandardDeviation_InfiniteDeviation_IsInfinite()
    {
        Assert.True(double.IsPositiveInfinity(SampleStatistics.StandardDeviation(new[] { double.PositiveInfinity, 0 }, 1)));
    }
}
