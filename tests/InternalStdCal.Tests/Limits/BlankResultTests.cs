using InternalStdCal.Limits;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class BlankResultTests
{
    [Fact]
    public void NoNumericResult_IsExplicitAndNotNumeric()
    {
        Assert.False(BlankResult.NoNumericResult.IsNumeric);
        Assert.Null(BlankResult.NoNumericResult.Value);
        Assert.Equal("no numeric result", BlankResult.NoNumericResult.ToString());
    }

    [Fact]
    public void Equals_SameConcentration_EqualExactly()
    {
        Assert.Equal(BlankResult.Numeric(LimitsData.Ug(0.02)), BlankResult.Numeric(LimitsData.Ug(0.02)));
        Assert.Equal(BlankResult.Numeric(LimitsData.Ug(0.02)).GetHashCode(), BlankResult.Numeric(LimitsData.Ug(0.02)).GetHashCode());
        Assert.NotEqual(BlankResult.Numeric(LimitsData.Ug(0.02)), BlankResult.Numeric(LimitsData.Ug(0.020000000000000004)));
        Assert.NotEqual(BlankResult.NoNumericResult, BlankResult.Numeric(LimitsData.Ug(0)));
        Assert.Equal("0.02 µg/L", BlankResult.Numeric(LimitsData.Ug(0.02)).ToString());
    }
}
