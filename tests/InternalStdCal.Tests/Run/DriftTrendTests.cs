using System;
using System.IO;
using System.Linq;
using InternalStdCal.Run;
using InternalStdCal.Tests.TestSupport;
using MathNet.Numerics.Distributions;
using Xunit;

namespace InternalStdCal.Tests.Run;

public class DriftTrendTests
{
    // Invented IS signal of five injections, falling by about 1.5 per injection.
    private static readonly double[] Falling = { 100, 98, 97, 95, 94 };

    [Fact]
    public void Fit_FiveInjections_MatchesOlsFormulasWorkedByHand()
    {
        DriftTrend trend = DriftTrend.Fit(Falling, DriftRule.Magnitude(5));

        // By hand with the OLS formulas of field reference §1.1 (FROM MEMORY / standard): x̄ = 3, Sxx = 10, ȳ = 96.8,
        // Sxy = −15 → b = −1.5, a = 101.3; residuals 0.2, −0.3, 0.2, −0.3, 0.2 → Σr² = 0.30, s_y/x = √0.1,
        // s_b = s_y/x/√Sxx = 0.1; t(0.975, 3) = 3.18244631 (field reference §6, COMPUTED).
        Assert.Equal(-1.5, trend.Slope, 12);
        Assert.Equal(101.3, trend.Intercept, 11);
        Assert.Equal(0.1, trend.SlopeStandardError, 12);
        Assert.Equal(96.8, trend.Mean, 12);
        Assert.Equal(3, trend.DegreesOfFreedom);
        Assert.Equal(-1.5 - (3.18244631 * 0.1), trend.SlopeInterval.Lower, 8);
        Assert.Equal(-1.5 + (3.18244631 * 0.1), trend.SlopeInterval.Upper, 8);
        Assert.Equal(0.95, trend.SlopeInterval.ConfidenceLevel);

        // Relative: 100·b/ȳ = −1.549587 % per injection; span 4 → −6.198347 % over the run (COMPUTED here).
        Numeric.AssertRelative(-150 / 96.8, trend.RelativeSlopePercent, 1e-12);
        Assert.Equal(4, trend.Span);
        Numeric.AssertRelative(-6.0, trend.DriftOverRun, 1e-12);
        Numeric.AssertRelative(-600 / 96.8, trend.DriftOverRunPercent, 1e-12);
        Numeric.AssertRelative(trend.SlopeInterval.Lower * 400 / 96.8, trend.DriftOverRunPercentInterval.Lower, 1e-12);
        Numeric.AssertRelative(trend.SlopeInterval.Upper * 400 / 96.8, trend.DriftOverRunPercentInterval.Upper, 1e-12);
        Assert.True(trend.IsSlopeSignificant);
        Assert.True(trend.IsFlagged);
    }

    [Theory]
    [InlineData(DriftCriterion.Magnitude, 5.0, true)]
    [InlineData(DriftCriterion.Magnitude, 10.0, false)]
    [InlineData(DriftCriterion.Significance, 0.0, true)]
    [InlineData(DriftCriterion.MagnitudeAndSignificance, 5.0, true)]
    [InlineData(DriftCriterion.MagnitudeAndSignificance, 10.0, false)]
    [InlineData(DriftCriterion.MagnitudeOrSignificance, 10.0, true)]
    public void Fit_EachCriterion_FlagsAsTheRuleSays(DriftCriterion criterion, double limit, bool flagged)
    {
        // Drift over the run −6.20 % of the mean and a significant slope (worked above).
        DriftRule rule = criterion switch
        {
            DriftCriterion.Magnitude => DriftRule.Magnitude(limit),
            DriftCriterion.Significance => DriftRule.Significance(),
            DriftCriterion.MagnitudeAndSignificance => DriftRule.MagnitudeAndSignificance(limit),
            _ => DriftRule.MagnitudeOrSignificance(limit),
        };

        DriftTrend trend = DriftTrend.Fit(Falling, rule);

        Assert.Equal(flagged, trend.IsFlagged);
        Assert.Equal(criterion, trend.Rule.Criterion);
    }

    [Fact]
    public void Fit_NoisyFlatSeries_SignificanceRuleDoesNotFlag()
    {
        // Invented QC recoveries (%) without trend: x̄ = 3, Sxy = 0 → b = 0 exactly; the interval includes 0.
        DriftTrend trend = DriftTrend.Fit(new[] { 101.0, 97.0, 99.0, 97.0, 101.0 }, DriftRule.MagnitudeOrSignificance(10));

        Assert.Equal(0, trend.Slope, 12);
        Assert.False(trend.IsSlopeSignificant);
        Assert.False(trend.IsFlagged);
    }

    [SkippableFact]
    public void Fit_NorrisDataset_SlopeAndItsStandardErrorMatchCertifiedValues()
    {
        string folder = RepositoryPaths.NistStrdFolder;
        Skip.IfNot(Directory.Exists(folder), $"NIST StRD folder not found: {folder}");
        NistStrdDataset norris = NistStrdDataset.Load(folder, "Norris");

        DriftTrend trend = DriftTrend.Fit(norris.X, norris.Y, DriftRule.Significance(0.95));

        // NIST StRD Norris certified B1 = 1.00211681802045, SD(B1) = 0.429796848199937E−03 (read from Norris.dat;
        // also field reference §10, VERIFIED).
        Assert.True(Lre.Of(trend.Slope, norris.Estimates[1]) >= 12);
        Assert.True(Lre.Of(trend.SlopeStandardError, norris.StandardDeviations[1]) >= 12);
        Assert.Equal(34, trend.DegreesOfFreedom);

        // Interval b ± t(0.975, 34)·SD(B1) with t from MathNet.Numerics StudentT.InvCDF (general-purpose reference;
        // accurate to ~1e-10 relative).
        double t = StudentT.InvCDF(0, 1, 34, 0.975);
        Numeric.AssertRelative(norris.Estimates[1] - (t * norris.StandardDeviations[1]), trend.SlopeInterval.Lower, 1e-9);
        Numeric.AssertRelative(norris.Estimates[1] + (t * norris.StandardDeviations[1]), trend.SlopeInterval.Upper, 1e-9);
        Numeric.AssertRelative(norris.Y.Average(), trend.Mean, 1e-13);
        Assert.True(trend.IsSlopeSignificant);
    }

    [Fact]
    public void Fit_ExplicitPositions_UsesThemAsX()
    {
        // Injection times in minutes (invented); the line y = 200 − 0.5·t is exact.
        double[] minutes = { 0, 6, 12, 30, 42 };
        double[] signal = minutes.Select(m => 200 - (0.5 * m)).ToArray();

        DriftTrend trend = DriftTrend.Fit(minutes, signal, DriftRule.Magnitude(10));

        // ȳ = 200 − 0.5·18 = 191; drift over the run −0.5·42 = −21, i.e. −2100/191 = −10.99 % (by hand).
        Assert.Equal(-0.5, trend.Slope, 12);
        Assert.Equal(42, trend.Span);
        Assert.Equal(-21, trend.DriftOverRun, 10);
        Numeric.AssertRelative(-2100 / 191.0, trend.DriftOverRunPercent, 1e-12);
        Assert.True(trend.IsFlagged);
        Assert.False(DriftTrend.Fit(minutes, signal, DriftRule.Magnitude(11)).IsFlagged);
    }

    [Fact]
    public void ToString_FlaggedTrend_StatesSlopeIntervalDriftAndRule()
    {
        string text = DriftTrend.Fit(Falling, DriftRule.MagnitudeAndSignificance(5)).ToString();

        Assert.Contains("slope = -1.5 per unit of x (SE 0.1, 95 % CI [-1.81824, -1.18176], 3 df)", text, StringComparison.Ordinal);
        Assert.Contains("drift over run = -6.19835 % of mean", text, StringComparison.Ordinal);
        Assert.Contains("FLAGGED as drift — rule: |drift over run| > 5 % of mean and 95 % slope interval excludes 0", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_BadInput_ThrowsNamingTheParameter()
    {
        DriftRule rule = DriftRule.Significance();
        Assert.Equal("values", Assert.Throws<ArgumentNullException>(() => DriftTrend.Fit(null!, rule)).ParamName);
        Assert.Equal("rule", Assert.Throws<ArgumentNullException>(() => DriftTrend.Fit(Falling, null!)).ParamName);
        Assert.Equal("positions", Assert.Throws<ArgumentNullException>(() => DriftTrend.Fit(null!, Falling, rule)).ParamName);

        ArgumentException few = Assert.Throws<ArgumentException>(() => DriftTrend.Fit(new[] { 1.0, 2.0 }, rule));
        Assert.Equal("values", few.ParamName);
        Assert.Contains("at least 3", few.Message, StringComparison.Ordinal);

        ArgumentException nan = Assert.Throws<ArgumentException>(() => DriftTrend.Fit(new[] { 1.0, 2.0, double.NaN, 4.0 }, rule));
        Assert.Contains("NaN at index 2", nan.Message, StringComparison.Ordinal);

        ArgumentException inf = Assert.Throws<ArgumentException>(() => DriftTrend.Fit(new[] { 1.0, double.PositiveInfinity, 3.0, 4.0 }, new[] { 1.0, 2.0, 3.0, 4.0 }, rule));
        Assert.Equal("positions", inf.ParamName);
        Assert.Contains("index 1", inf.Message, StringComparison.Ordinal);

        Assert.Equal("positions", Assert.Throws<ArgumentException>(() => DriftTrend.Fit(new[] { 1.0, 2.0 }, Falling, rule)).ParamName);
        ArgumentException same = Assert.Throws<ArgumentException>(() => DriftTrend.Fit(new[] { 7.0, 7.0, 7.0 }, new[] { 1.0, 2.0, 3.0 }, rule));
        Assert.Contains("2 distinct positions", same.Message, StringComparison.Ordinal);

        ArgumentException mean = Assert.Throws<ArgumentException>(() => DriftTrend.Fit(new[] { -1.0, 0.0, 1.0 }, rule));
        Assert.Equal("values", mean.ParamName);
        Assert.Contains("mean 0", mean.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DriftRule_BadParameters_ThrowNamingThem()
    {
        Assert.Equal("limitPercentOverRun", Assert.Throws<ArgumentOutOfRangeException>(() => DriftRule.Magnitude(0)).ParamName);
        Assert.Equal("limitPercentOverRun", Assert.Throws<ArgumentOutOfRangeException>(() => DriftRule.MagnitudeOrSignificance(double.NaN)).ParamName);
        Assert.Equal("confidenceLevel", Assert.Throws<ArgumentOutOfRangeException>(() => DriftRule.Significance(1)).ParamName);
        Assert.Equal("confidenceLevel", Assert.Throws<ArgumentOutOfRangeException>(() => DriftRule.MagnitudeAndSignificance(5, 0)).ParamName);
    }

    [Fact]
    public void DriftRule_Equality_IsExactOnAllFields()
    {
        Assert.Equal(DriftRule.Magnitude(10), DriftRule.Magnitude(10));
        Assert.Equal(DriftRule.Magnitude(10).GetHashCode(), DriftRule.Magnitude(10).GetHashCode());
        Assert.NotEqual(DriftRule.Magnitude(10), DriftRule.MagnitudeOrSignificance(10));
        Assert.NotEqual(DriftRule.Magnitude(10), DriftRule.Magnitude(10, 0.99));
        Assert.Null(DriftRule.Significance().LimitPercentOverRun);
        Assert.Equal("99 % slope interval excludes 0", DriftRule.Significance(0.99).ToString());
    }
}
