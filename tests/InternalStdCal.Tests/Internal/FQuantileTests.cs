using System;
using InternalStdCal.Internal;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Internal;

public class FQuantileTests
{
    // Computed (field-reference §1.3): F(0.99; 1, f) for f = 1…20.
    [Theory]
    [InlineData(1, "4052.18")]
    [InlineData(2, "98.5025")]
    [InlineData(3, "34.1162")]
    [InlineData(4, "21.1977")]
    [InlineData(5, "16.2582")]
    [InlineData(6, "13.7450")]
    [InlineData(7, "12.2464")]
    [InlineData(8, "11.2586")]
    [InlineData(9, "10.5614")]
    [InlineData(10, "10.0443")]
    [InlineData(11, "9.64603")]
    [InlineData(12, "9.33021")]
    [InlineData(13, "9.07381")]
    [InlineData(14, "8.86159")]
    [InlineData(15, "8.68312")]
    [InlineData(16, "8.53097")]
    [InlineData(17, "8.39974")]
    [InlineData(18, "8.28542")]
    [InlineData(19, "8.18495")]
    [InlineData(20, "8.09596")]
    public void Quantile_NinetyNinePercentOneNumeratorDf_MatchesTable(int denominatorDf, string printed) =>
        Printed.Equal(printed, FQuantile.Quantile(0.99, 1, denominatorDf));

    // Computed (field-reference §1.3): F(0.99; 9, 9) = 5.35113, F(0.95; 9, 9) = 3.17889, F(0.95; 1, 4) = 7.70865.
    [Theory]
    [InlineData(0.99, 9, 9, "5.35113")]
    [InlineData(0.95, 9, 9, "3.17889")]
    [InlineData(0.95, 1, 4, "7.70865")]
    public void Quantile_OtherTabulatedValues_MatchTable(double p, int df1, int df2, string printed) =>
        Printed.Equal(printed, FQuantile.Quantile(p, df1, df2));

    // Identity F(p; 1, ν) = t((1 + p)/2, ν)² (standard result).
    [Theory]
    [InlineData(0.95, 3)]
    [InlineData(0.99, 12)]
    [InlineData(0.9, 40)]
    public void Quantile_OneNumeratorDf_EqualsSquaredTwoSidedT(double p, int df)
    {
        double t = StudentTQuantile.TwoSided(p, df);
        Assert.Equal(t * t, FQuantile.Quantile(p, 1, df), 1e-12 * t * t);
    }

    // Closed form for (2, 2) degrees of freedom: CDF = f/(1 + f), so F(p) = p/(1 − p).
    [Theory]
    [InlineData(0.1)]
    [InlineData(0.5)]
    [InlineData(0.99)]
    public void Quantile_TwoAndTwoDf_MatchesClosedForm(double p) =>
        Assert.Equal(p / (1 - p), FQuantile.Quantile(p, 2, 2), 1e-13 * p / (1 - p));

    [Fact]
    public void Quantile_ProbabilityOutOfRange_ThrowsNamingParameter()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => FQuantile.Quantile(1.5, 1, 4));
        Assert.Equal("p", e.ParamName);
        Assert.Contains("1.5", e.Message, StringComparison.Ordinal);
    }
}
