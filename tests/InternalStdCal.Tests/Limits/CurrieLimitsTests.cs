using System;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Limits;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class CurrieLimitsTests
{
    // Currie, IUPAC Recommendations 1995, Pure Appl. Chem. 67 (1995) 1699 (VERIFIED framework; formulas from memory);
    // factors COMPUTED from normal quantiles, field-reference §3.3.
    [Theory]
    [InlineData(0.05, "1.644854", "3.289707")]
    [InlineData(0.01, "2.326348", "4.652696")]
    public void ForKnownSigma_AlphaEqualsBeta_MatchesFieldReferenceFactors(double alpha, string lc, string ld)
    {
        CurrieLimitResult r = CurrieLimits.ForKnownSigma(1.0, alpha, alpha);
        Printed.Equal(lc, r.CriticalLevel);
        Printed.Equal(ld, r.DetectionLimit);
        Printed.Equal(lc, r.CriticalFactor);
        Printed.Equal(ld, r.DetectionFactor);
        Assert.True(r.SigmaIsKnown);
        Assert.Null(r.DetectionLimitApproximation);
        Assert.Equal(10.0, r.QuantificationLimit); // L_Q = 10·σ (k_Q = 10 default)
    }

    [Fact]
    public void ForKnownSigma_PairedBlank_MatchesFieldReference()
    {
        // Paired blank subtraction σ0 = √2·σ_B: L_C = 2.33·σ_B, L_D = 4.65·σ_B (α = β = 0.05); L_Q with σ_Q = √2·σ_B = 14.1·σ_B
        // (Currie 1995; field-reference §3.3, formulas from memory, numbers computed).
        double root2 = Math.Sqrt(2);
        CurrieLimitResult r = CurrieLimits.ForKnownSigma(root2);
        Printed.Equal("2.33", r.CriticalLevel);
        Printed.Equal("4.65", r.DetectionLimit);
        Printed.Equal("14.1", r.QuantificationLimit);
    }

    // Exact δ for α = β = 0.05 and the 2t approximation (COMPUTED, field-reference §3.3 table).
    [Theory]
    [InlineData(3, "2.35336", "4.45636", "4.70673")]
    [InlineData(5, "2.01505", "3.86994", "4.03010")]
    [InlineData(8, "1.85955", "3.61713", "3.71910")]
    [InlineData(10, "1.81246", "3.54304", "3.62492")]
    [InlineData(20, "1.72472", "3.40832", "3.44944")]
    [InlineData(50, "1.67591", "3.33536", "3.35181")]
    public void ForEstimatedSigma_DeltaTable_MatchesFieldReference(int df, string t, string delta, string twoT)
    {
        CurrieLimitResult r = CurrieLimits.ForEstimatedSigma(1.0, df);
        Printed.Equal(t, r.CriticalLevel);
        Printed.Equal(delta, r.DetectionLimit);
        Printed.Equal(twoT, r.DetectionLimitApproximation!.Value);
        Assert.Equal(df, r.DegreesOfFreedom);
        Assert.False(r.SigmaIsKnown);
    }

    [Fact]
    public void ForEstimatedSigma_QuantificationOptions_AreUsed()
    {
        CurrieLimitResult r = CurrieLimits.ForEstimatedSigma(0.2, 6, quantificationFactor: 5, quantificationSigma: 0.3);
        Assert.Equal(1.5, r.QuantificationLimit, 14);
        Assert.Contains("Pure Appl. Chem. 67", r.Source, StringComparison.Ordinal);
    }

    [Fact]
    public void Entries_BadInput_Throw()
    {
        Assert.Equal("sigma0", Assert.Throws<ArgumentOutOfRangeException>(() => CurrieLimits.ForKnownSigma(0)).ParamName);
        Assert.Equal("sigma0", Assert.Throws<ArgumentOutOfRangeException>(() => CurrieLimits.ForKnownSigma(double.NaN)).ParamName);
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => CurrieLimits.ForKnownSigma(1, 0.5)).ParamName);
        Assert.Equal("beta", Assert.Throws<ArgumentOutOfRangeException>(() => CurrieLimits.ForKnownSigma(1, 0.05, 0)).ParamName);
        Assert.Equal("quantificationFactor", Assert.Throws<ArgumentOutOfRangeException>(() => CurrieLimits.ForKnownSigma(1, quantificationFactor: -1)).ParamName);
        Assert.Equal("quantificationSigma", Assert.Throws<ArgumentOutOfRangeException>(() => CurrieLimits.ForKnownSigma(1, quantificationSigma: 0)).ParamName);
        Assert.Equal("s0", Assert.Throws<ArgumentOutOfRangeException>(() => CurrieLimits.ForEstimatedSigma(-1, 5)).ParamName);
        Assert.Equal("degreesOfFreedom", Assert.Throws<ArgumentOutOfRangeException>(() => CurrieLimits.ForEstimatedSigma(1, 0)).ParamName);
    }

    // Property (definitions L_C = k·σ): every limit is proportional to σ.
    [Property(MaxTest = 100)]
    public Property ForEstimatedSigma_ScalingSigma_ScalesEveryLimit() =>
        Prop.ForAll(
            Gen.Choose(1, 10_000).Select(i => i / 1000.0).ToArbitrary(),
            Gen.Choose(1, 60).ToArbitrary(),
            (s, df) =>
            {
                CurrieLimitResult one = CurrieLimits.ForEstimatedSigma(1, df);
                CurrieLimitResult r = CurrieLimits.ForEstimatedSigma(s, df);
                return Math.Abs(r.DetectionLimit - (s * one.DetectionLimit)) <= 1e-12 * r.DetectionLimit
                    && Math.Abs(r.CriticalLevel - (s * one.CriticalLevel)) <= 1e-12 * r.CriticalLevel
                    && Math.Abs(r.QuantificationLimit - (s * one.QuantificationLimit)) <= 1e-12 * r.QuantificationLimit;
            });
}
