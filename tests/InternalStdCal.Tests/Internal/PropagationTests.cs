using System;
using InternalStdCal.Internal;
using Xunit;

namespace InternalStdCal.Tests.Internal;

public class PropagationTests
{
    [Fact]
    public void WelchSatterthwaite_Section71Example()
    {
        // Field reference §7.1 (COMPUTED; JCGM 100:2008 eq. G.2b VERIFIED): 0.5 (ν 4), 0.3 (∞), 0.2 (ν 9) → 0.616441, 9.13763.
        double[] c = { 0.5, 0.3, 0.2 };
        double uc = Propagation.RootSumSquares(c);
        Assert.Equal(0.616441, uc, 6);
        Assert.Equal(9.13763, Propagation.WelchSatterthwaite(c, new[] { 4, double.PositiveInfinity, 9 }, uc), 5);
    }

    [Fact]
    public void WelchSatterthwaite_NoFiniteTerm_IsInfinite()
    {
        Assert.True(double.IsPositiveInfinity(Propagation.WelchSatterthwaite(new[] { 1.0, 2.0 }, new[] { double.PositiveInfinity, double.PositiveInfinity }, Math.Sqrt(5))));
        Assert.True(double.IsPositiveInfinity(Propagation.WelchSatterthwaite(new[] { 0.0 }, new[] { 3.0 }, 0)));
    }

    [Fact]
    public void RootSumSquares_HugeAndTinyValues_NeitherOverflowNorUnderflow()
    {
        Assert.Equal(5, Propagation.RootSumSquares(new[] { 3e200, 4e200 }) / 1e200, 14);
        Assert.Equal(5, Propagation.RootSumSquares(new[] { 3e-200, 4e-200 }) * 1e200, 14);
        Assert.Equal(0, Propagation.RootSumSquares(Array.Empty<double>()));
    }

    [Theory]
    [InlineData(9.13763, 2.26215716)] // field reference §6 (COMPUTED), ν truncated to 9 (JCGM 100:2008 §G.6.4)
    [InlineData(1.9, 12.7062047)] // ν → 1
    [InlineData(30, 2.04227246)]
    [InlineData(double.PositiveInfinity, 1.95996398)]
    [InlineData(2e6, 1.95996398)] // above the normal limit
    public void CoverageFactor_TruncatesAndUsesTable(double nu, double expected)
    {
        Assert.Equal(expected, Propagation.CoverageFactor(0.95, nu, "p"), 7);
    }

    [Fact]
    public void CoverageFactor_BadArguments_Throw()
    {
        Assert.Equal("p", Assert.Throws<ArgumentOutOfRangeException>(() => Propagation.CoverageFactor(1.5, 3, "p")).ParamName);
        Assert.Equal("degreesOfFreedom", Assert.Throws<ArgumentOutOfRangeException>(() => Propagation.CoverageFactor(0.95, 0.5, "p")).ParamName);
        Assert.Equal("degreesOfFreedom", Assert.Throws<ArgumentOutOfRangeException>(() => Propagation.CoverageFactor(0.95, double.NaN, "p")).ParamName);
    }

    [Fact]
    public void CoverageFactor_DegreesOfFreedomBelowOne_MessageStatesTheRange()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => Propagation.CoverageFactor(0.95, 0.5, "p"));
        Assert.StartsWith("Parameter 'degreesOfFreedom' was 0.5; it must be a number >= 1 or +infinity.", e.Message, StringComparison.Ordinal);
    }
}
