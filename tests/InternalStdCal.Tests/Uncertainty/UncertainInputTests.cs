using System;
using InternalStdCal.Quantities;
using InternalStdCal.Uncertainty;
using Xunit;

namespace InternalStdCal.Tests.Uncertainty;

public class UncertainInputTests
{
    [Fact]
    public void Rectangular_HalfWidth_GivesADividedByRootThree()
    {
        // JCGM 100:2008 §4.3.7; NIST/SEMATECH e-Handbook §2.5.4.1 (VERIFIED, field reference §7.1): u = a/√3.
        var x = UncertainInput.Rectangular("T", 20, 1.5, "°C");
        Assert.Equal(1.5 / Math.Sqrt(3), x.StandardUncertainty, 15);
        Assert.Equal(0.87, Math.Round(x.StandardUncertainty, 2)); // QUAM Appendix E: range 7–10, a = 1.5 → 0.87 (VERIFIED)
        Assert.Equal(1.5, x.HalfWidth!.Value, 14);
        Assert.True(double.IsPositiveInfinity(x.DegreesOfFreedom));
        Assert.Equal(InputDistribution.Rectangular, x.Distribution);
    }

    [Fact]
    public void Triangular_HalfWidth_GivesADividedByRootSix()
    {
        // JCGM 100:2008 §4.3.9 (VERIFIED, field reference §7.1): u = a/√6; 100 mL flask ±0.1 mL → 0.04082 (§7.4).
        var x = UncertainInput.Triangular("V", 100, 0.1, "mL");
        Assert.Equal(0.04082, x.StandardUncertainty, 5);
        Assert.Equal(0.1, x.HalfWidth!.Value, 14);
    }

    [Fact]
    public void From_MeasuredTypeA_BecomesStudentT()
    {
        var x = UncertainInput.From("c", Measured.TypeA(Concentration.FromMilligramsPerLitre(2), Concentration.FromMilligramsPerLitre(0.1), 5));
        Assert.Equal(InputDistribution.StudentT, x.Distribution);
        Assert.Equal(5, x.DegreesOfFreedom);
        Assert.Equal("mg/L", x.Unit);
        Assert.Null(x.HalfWidth);
    }

    [Fact]
    public void From_MeasuredTolerance_KeepsItsDistribution()
    {
        var x = UncertainInput.From("V", Measured.FromTolerance(Volume.FromMillilitres(10), Volume.FromMillilitres(0.02), ToleranceDistribution.Rectangular));
        Assert.Equal(InputDistribution.Rectangular, x.Distribution);
        Assert.Equal(0.02, x.HalfWidth!.Value, 15);
        var m = UncertainInput.From("m", Measured.FromExpandedUncertainty(Mass.FromGrams(1), Mass.FromGrams(0.0002), 2));
        Assert.Equal(InputDistribution.Normal, m.Distribution);
        Assert.Equal("g", m.Unit);
    }

    [Fact]
    public void ToString_ShowsNameValueUncertaintyAndDistribution()
    {
        Assert.Equal("V = 100 mL, u = 0.07 mL, ν = ∞, Normal", UncertainInput.Normal("V", 100, 0.07, unit: "mL").ToString());
    }

    [Fact]
    public void Create_BadArguments_ThrowNamingTheParameter()
    {
        Assert.Equal("name", Assert.Throws<ArgumentException>(() => UncertainInput.Normal(" ", 1, 0.1)).ParamName);
        Assert.Equal("name", Assert.Throws<ArgumentNullException>(() => UncertainInput.Normal(null!, 1, 0.1)).ParamName);
        Assert.Equal("value", Assert.Throws<ArgumentOutOfRangeException>(() => UncertainInput.Normal("x", double.NaN, 0.1)).ParamName);
        Assert.Equal("standardUncertainty", Assert.Throws<ArgumentOutOfRangeException>(() => UncertainInput.Normal("x", 1, -0.1)).ParamName);
        Assert.Equal("degreesOfFreedom", Assert.Throws<ArgumentOutOfRangeException>(() => UncertainInput.Normal("x", 1, 0.1, 0.5)).ParamName);
        Assert.Equal("degreesOfFreedom", Assert.Throws<ArgumentOutOfRangeException>(() => UncertainInput.StudentT("x", 1, 0.1, double.PositiveInfinity)).ParamName);
        Assert.Equal("halfWidth", Assert.Throws<ArgumentOutOfRangeException>(() => UncertainInput.Rectangular("x", 1, double.PositiveInfinity)).ParamName);
        ArgumentOutOfRangeException e = Assert.Throws<ArgumentOutOfRangeException>(() => UncertainInput.Triangular("x", 1, -2));
        Assert.Contains("-2", e.Message, StringComparison.Ordinal);
        Assert.Contains(">= 0", e.Message, StringComparison.Ordinal);
    }
}
