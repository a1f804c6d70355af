using InternalStdCal.Internal;
using Xunit;

namespace InternalStdCal.Tests.Internal;

public class CompensatedSumTests
{
    [Fact]
    public void Value_HeavyCancellation_IsTheExactSum()
    {
        // Computed: 1e16 + 1 − 1e16 = 1 exactly; a plain double sum gives 0 (1e16 + 1 rounds to 1e16).
        var sum = default(CompensatedSum);
        sum.Add(1e16);
        sum.Add(1);
        sum.Add(-1e16);
        Assert.Equal(1, sum.Value);
    }

    [Fact]
    public void Value_ExactProducts_KeepTheRoundingErrors()
    {
        // Computed: (1 + 2^-30)² − 1 − 2^-29 = 2^-60, lost by a plain product (the square rounds).
        double x = 1 + System.Math.Pow(2, -30);
        var sum = default(CompensatedSum);
        sum.AddProductOfSquare(1, x);
        sum.Add(-1);
        sum.Add(-System.Math.Pow(2, -29));
        Assert.Equal(System.Math.Pow(2, -60), sum.Value);
    }

    [Theory]
    [InlineData(1.5e308, double.PositiveInfinity)]
    [InlineData(-1.5e308, double.NegativeInfinity)]
    public void Value_OverflowingSum_IsInfiniteNotNaN(double value, double expected)
    {
        var sum = default(CompensatedSum);
        sum.Add(value);
        sum.Add(value);
        Assert.Equal(expected, sum.Value);

        var squares = default(CompensatedSum);
        squares.AddProductOfSquare(1, 1e200);
        Assert.Equal(double.PositiveInfinity, squares.Value);
        Assert.Equal(expected, SampleStatistics.Mean(new[] { value, value }));
    }
}
