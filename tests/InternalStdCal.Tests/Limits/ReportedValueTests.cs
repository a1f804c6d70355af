using System;
using InternalStdCal.Limits;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class ReportedValueTests
{
    private static readonly ReportingLimits Limits = new(LimitsData.Ug(0.15), LimitsData.Ug(0.5));

    [Fact]
    public void ToString_Censored_ShowsTheLimitAndWhichOne()
    {
        Assert.Equal("< 0.50 µg/L (LOQ)", Limits.Apply(LimitsData.Ug(0.3)).ToString());
        Assert.Equal("< 0.15 µg/L (LOD)", Limits.Apply(LimitsData.Ug(0.01)).ToString());
        Assert.Equal("< 0.500 µg/L (LOQ)", Limits.Apply(LimitsData.Ug(0.3)).ToString(3));
    }

    [Fact]
    public void ToString_Quantified_ShowsTheEstimate()
    {
        Assert.Equal("0.732 µg/L", Limits.Apply(LimitsData.Ug(0.73215)).ToString());
        Assert.Equal("12.3 µg/L", Limits.Apply(LimitsData.Ug(12.345)).ToString());
        Assert.Equal("1234.6 µg/L", Limits.Apply(LimitsData.Ug(1234.56)).ToString(5));
        Assert.Equal("1235 µg/L", Limits.Apply(LimitsData.Ug(1234.56)).ToString(2));
    }

    [Fact]
    public void ToString_BadDigits_Throws()
    {
        ReportedValue r = Limits.Apply(LimitsData.Ug(1));
        Assert.Equal("significantDigits", Assert.Throws<ArgumentOutOfRangeException>(() => r.ToString(0)).ParamName);
        Assert.Equal("significantDigits", Assert.Throws<ArgumentOutOfRangeException>(() => r.ToString(16)).ParamName);
    }

    [Fact]
    public void Equals_IsExact()
    {
        Assert.Equal(Limits.Apply(LimitsData.Ug(0.3)), Limits.Apply(LimitsData.Ug(0.3)));
        Assert.Equal(Limits.Apply(LimitsData.Ug(0.3)).GetHashCode(), Limits.Apply(LimitsData.Ug(0.3)).GetHashCode());
        Assert.NotEqual(Limits.Apply(LimitsData.Ug(0.3)), Limits.Apply(LimitsData.Ug(0.30000000000000004)));
        Assert.NotEqual(Limits.Apply(LimitsData.Ug(0.3)), new ReportingLimits(LimitsData.Ug(0.15), LimitsData.Ug(0.6)).Apply(LimitsData.Ug(0.3)));
    }
}
