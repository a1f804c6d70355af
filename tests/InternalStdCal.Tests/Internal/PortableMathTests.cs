using System;
using InternalStdCal.Internal;
using Xunit;

namespace InternalStdCal.Tests.Internal;

public class PortableMathTests
{
    // Reference: the platform's System.Math (correctly rounded or within 1 ulp on .NET) and MathNet.Numerics
    // Normal.InvCDF (general-purpose reference library). Tolerances: a few ulp.
    public static TheoryData<double> Arguments => new()
    {
        1e-300, 4.9e-324, 2.2250738585072014e-308, 1e-20, 0.001, 0.1, 0.5, 0.7071067811865476, 0.9999999, 1, 1.0000001, 1.4142135623730951, 2, Math.E, 10, 12345.678, 1e20, 1e300,
    };

    [Theory]
    [MemberData(nameof(Arguments))]
    public void Log_AgreesWithSystemMath(double x)
    {
        double expected = Math.Log(x);
        double actual = PortableMath.Log(x);
        Assert.True(Math.Abs(actual - expected) <= 4e-16 * Math.Max(Math.Abs(expected), 1e-300) || actual == expected, $"{x:R}: {actual:R} vs {expected:R}");
    }

    [Theory]
    [InlineData(-700.0)]
    [InlineData(-100.0)]
    [InlineData(-1.0)]
    [InlineData(-1e-10)]
    [InlineData(0.0)]
    [InlineData(0.3465)]
    [InlineData(1.0)]
    [InlineData(2.5)]
    [InlineData(100.0)]
    [InlineData(700.0)]
    public void Exp_AgreesWithSystemMath(double x)
    {
        double expected = Math.Exp(x);
        Assert.True(Math.Abs(PortableMath.Exp(x) - expected) <= 4e-16 * expected, $"{x:R}: {PortableMath.Exp(x):R} vs {expected:R}");
    }

    [Theory]
    [InlineData(1e-300)]
    [InlineData(1e-20)]
    [InlineData(1e-10)]
    [InlineData(1e-5)]
    [InlineData(0.001)]
    [InlineData(0.025)]
    [InlineData(0.075)]
    [InlineData(0.0751)]
    [InlineData(0.2)]
    [InlineData(0.5)]
    [InlineData(0.7)]
    [InlineData(0.925)]
    [InlineData(0.975)]
    [InlineData(0.999999)]
    public void NormalQuantile_AgreesWithMathNet(double p)
    {
        double expected = MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, p);
        double actual = PortableMath.NormalQuantile(p);
        Assert.True(Math.Abs(actual - expected) <= 1e-14 * Math.Max(Math.Abs(expected), 1e-3), $"{p:R}: {actual:R} vs {expected:R}");
    }

    [Fact]
    public void NormalQuantile_975_IsTableValue()
    {
        // Field reference §6, ∞ row: z(0.975) = 1.95996398 (COMPUTED).
        Assert.Equal(1.95996398, PortableMath.NormalQuantile(0.975), 8);
    }
}
