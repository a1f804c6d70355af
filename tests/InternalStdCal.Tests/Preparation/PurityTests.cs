using System;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class PurityTests
{
    [Fact]
    public void FromTolerance_QuamA1_0_000058()
    {
        // QUAM A1: purity 0.9999 ± 0.0001, rectangular → u = 0.000058 (VERIFIED, field-reference §7.4; a/√3, JCGM 100:2008 §4.3.7).
        Purity p = Purity.FromTolerance(0.9999, 0.0001, ToleranceDistribution.Rectangular);
        Assert.Equal(0.000058, p.StandardUncertainty, 6);
        Assert.Equal(UncertaintyEvaluation.TypeBRectangular, p.Evaluation);
        Assert.Equal(0.0001 / Math.Sqrt(3) / 0.9999, p.RelativeStandardUncertainty, 15);
    }

    [Theory]
    [InlineData(0.0, "0")]
    [InlineData(-0.5, "-0.5")]
    [InlineData(1.2, "1.2")]
    [InlineData(double.NaN, "NaN")]
    public void FromMassFraction_OutsideZeroOne_ThrowsNamingValueAndRange(double value, string printed)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Purity.FromMassFraction(value, 0));
        Assert.Equal("massFraction", ex.ParamName);
        Assert.StartsWith($"Parameter 'massFraction' was {printed}; it must be a number in the interval (0, 1].", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => Purity.FromTolerance(value, 0, ToleranceDistribution.Rectangular));
    }

    [Fact]
    public void FromMassFraction_OneIsAllowed_NegativeUncertaintyIsNot()
    {
        Assert.Equal(1, Purity.FromMassFraction(1, 0).MassFraction);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Purity.FromMassFraction(0.99, -0.001));
        Assert.Equal("standardUncertainty", ex.ParamName);
        Assert.StartsWith("Parameter 'standardUncertainty' was -0.001; it must be a finite number >= 0.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Equality_ExactAndZeroSigns()
    {
        Assert.Equal(Purity.FromMassFraction(0.99, 0), Purity.FromMassFraction(0.99, -0.0));
        Assert.Equal(Purity.FromMassFraction(0.99, 0).GetHashCode(), Purity.FromMassFraction(0.99, -0.0).GetHashCode());
        Assert.True(Purity.FromMassFraction(0.99, 0.001) != Purity.FromTolerance(0.99, 0.001 * Math.Sqrt(3), ToleranceDistribution.Rectangular));
        Assert.Equal("0.9999 g/g, u = 5.8E-05 g/g", Purity.FromMassFraction(0.9999, 0.000058).ToString());
    }

    [Fact]
    public void Default_RelativeUncertaintyThrows() =>
        Assert.Throws<InvalidOperationException>(() => default(Purity).RelativeStandardUncertainty);

    [Fact]
    public void Equals_SameFractionDifferentUncertainty_NotEqual()
    {
        Purity a = Purity.FromMassFraction(0.99, 0.001);
        Purity b = Purity.FromMassFraction(0.99, 0.002);
        Assert.False(a.Equals(b));
        Assert.False(a == b);
        Assert.True(a != b);
        Assert.NotEqual<object>(a, b);
    }

    [Fact]
    public void Default_RelativeUncertainty_ThrowsWithExactMessage()
    {
        var ex = Assert.Throws<InvalidOperationException>(() => default(Purity).RelativeStandardUncertainty);
        Assert.Equal("A default(Purity) has mass fraction 0; create purities with Purity.FromMassFraction or Purity.FromTolerance.", ex.Message);
    }
}
