using System;
using InternalStdCal.Calibration;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class ConfidenceIntervalTests
{
    [Fact]
    public void Members_DescribeTheInterval()
    {
        var ci = new ConfidenceInterval(1.5, 2.5, 0.95);
        Assert.Equal(0.5, ci.HalfWidth);
        Assert.Equal(1.0, ci.Width);
        Assert.Equal(2.0, ci.Midpoint);
        Assert.True(ci.Contains(1.5));
        Assert.True(ci.Contains(2.5));
        Assert.False(ci.Contains(2.5000000000000004));
        Assert.False(ci.Contains(double.NaN));
    }

    [Fact]
    public void Equality_IsExact()
    {
        var a = new ConfidenceInterval(1, 2, 0.95);
        Assert.True(a == new ConfidenceInterval(1, 2, 0.95));
        Assert.True(a != new ConfidenceInterval(1, 2, 0.99));
        Assert.False(a.Equals(new ConfidenceInterval(1, 2.0000000000000004, 0.95)));
        Assert.Equal(a.GetHashCode(), new ConfidenceInterval(1, 2, 0.95).GetHashCode());
        Assert.False(a.Equals("[1, 2]"));
    }

    [Fact]
    public void ToString_IsInvariant() =>
        Assert.Equal("[1.25, 2.5] (95%)", new ConfidenceInterval(1.25, 2.5, 0.95).ToString());

    [Fact]
    public void Constructor_UpperBelowLower_ThrowsNamingUpper()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => new ConfidenceInterval(2, 1, 0.95));
        Assert.Equal("upper", e.ParamName);
        Assert.Contains(">= lower (2)", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(double.NaN, 1, 0.95, "lower")]
    [InlineData(0, double.PositiveInfinity, 0.95, "upper")]
    [InlineData(0, 1, 1.0, "confidenceLevel")]
    [InlineData(0, 1, 0.0, "confidenceLevel")]
    public void Constructor_BadArgument_ThrowsNamingParameter(double lower, double upper, double level, string name) =>
        Assert.Equal(name, Assert.Throws<ArgumentOutOfRangeException>(() => new ConfidenceInterval(lower, upper, level)).ParamName);
}
