using System;
using InternalStdCal.Internal;
using InternalStdCal.Tests.TestSupport;
using MathNet.Numerics.Distributions;
using Xunit;

namespace InternalStdCal.Tests.Internal;

public class NoncentralTTests
{
    // Computed (field-reference §3.3, exact δ for α = β = 0.05 solving P(T'(ν, δ) ≤ t(0.95, ν)) = 0.05;
    // Currie, Pure Appl. Chem. 67 (1995) 1699 defines L_D = δ·s0 with this δ).
    [Theory]
    [InlineData(3, "4.45636")]
    [InlineData(5, "3.86994")]
    [InlineData(8, "3.61713")]
    [InlineData(10, "3.54304")]
    [InlineData(20, "3.40832")]
    [InlineData(50, "3.33536")]
    public void Noncentrality_CurrieAlphaBetaFivePercent_MatchesFieldReferenceTable(int df, string expected)
    {
        double t95 = StudentTQuantile.OneSided(0.95, df);
        Printed.Equal(expected, NoncentralT.Noncentrality(t95, df, 0.05));
    }

    // Computed (field-reference §8.2, exact non-central-t power of the one-sided one-sample t test at α = 0.05:
    // power = P(T'(n − 1, (δ/σ)·√n) > t(0.95, n − 1))).
    [Theory]
    [InlineData(2.0, 5, "0.97483")]
    [InlineData(2.0, 4, "0.90845")]
    [InlineData(1.0, 8, "0.81502")]
    [InlineData(1.0, 7, "0.75440")]
    [InlineData(1.0, 13, "0.95970")]
    [InlineData(1.0, 12, "0.94469")]
    [InlineData(0.5, 45, "0.95124")]
    [InlineData(0.5, 44, "0.94727")]
    public void UpperTail_OneSidedTestPower_MatchesFieldReferenceTable(double effect, int n, string expected)
    {
        double critical = StudentTQuantile.OneSided(0.95, n - 1);
        Printed.Equal(expected, NoncentralT.UpperTail(critical, n - 1, effect * Math.Sqrt(n)));
    }

    // Reference library: with δ = 0 the distribution is the central t (MathNet.Numerics StudentT.CDF).
    [Theory]
    [InlineData(-3.5, 2)]
    [InlineData(-0.4, 7)]
    [InlineData(1.2, 4)]
    [InlineData(2.9, 30)]
    public void Cdf_ZeroNoncentrality_EqualsCentralT(double t, double df)
    {
        Assert.Equal(StudentT.CDF(0, 1, df, t), NoncentralT.Cdf(t, df, 0), 12);
    }

    // As ν → ∞, T' → N(δ, 1) (definition of the non-central t); at ν = 10⁹ the difference (≈ φ·t²/(4ν)) is below 1e-7.
    [Theory]
    [InlineData(1.0, 3.0)]
    [InlineData(4.0, 2.5)]
    [InlineData(-1.0, 0.5)]
    [InlineData(10.0, 9.0)]
    public void Cdf_HugeDegreesOfFreedom_ApproachesNormal(double t, double delta)
    {
        Assert.Equal(Normal.CDF(delta, 1, t), NoncentralT.Cdf(t, 1e9, delta), 6);
    }

    [Fact]
    public void Cdf_LargeNoncentrality_StaysFiniteAndMonotone()
    {
        double previous = 1;
        for (double delta = 0; delta <= 60; delta += 5)
        {
            double p = NoncentralT.Cdf(40, 10, delta);
            Assert.InRange(p, 0, previous);
            previous = p;
        }
    }

    [Fact]
    public void Cdf_NonFiniteInput_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => NoncentralT.Cdf(double.NaN, 3, 1));
        Assert.Equal("t", ex.ParamName);
        Assert.Throws<ArgumentOutOfRangeException>(() => NoncentralT.Cdf(1, 0, 1));
        Assert.Throws<ArgumentOutOfRangeException>(() => NoncentralT.Noncentrality(1.8, 5, 1));
        var big = Assert.Throws<ArgumentOutOfRangeException>(() => NoncentralT.Cdf(2, 5, 1e5));
        Assert.Equal("delta", big.ParamName);
    }
}
