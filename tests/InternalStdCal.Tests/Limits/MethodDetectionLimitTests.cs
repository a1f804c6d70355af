using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Limits;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class MethodDetectionLimitTests
{
    private static readonly Concentration Spike = LimitsData.Ug(0.5);

    [Fact]
    public void Compute_WorkedExample_MatchesFieldReference()
    {
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), LimitsData.WorkedBlanks(), Spike);

        // 40 CFR Part 136 Appendix B Rev. 2 (formulas from memory); worked example COMPUTED, field-reference §3.2:
        // S_s = 0.0450925, MDL_S = 0.141711; X̄_b = 0.04, S_b = 0.0264575, MDL_b = 0.123147; MDL = 0.141711.
        Printed.Equal("0.0450925", r.SpikedStandardDeviation.Value);
        Printed.Equal("0.141711", r.SpikedMdl.Value);
        Assert.Equal(MdlBlankCase.MeanPlusTTimesSd, r.BlankCase);
        Printed.Equal("0.04", r.BlankMean!.Value.Value);
        Printed.Equal("0.0264575", r.BlankStandardDeviation!.Value.Value);
        Printed.Equal("0.123147", r.BlankMdl!.Value.Value);
        Printed.Equal("0.141711", r.Mdl.Value);
        Assert.False(r.IsSetByBlanks);
        Assert.Equal(ConcentrationUnit.MicrogramPerLitre, r.Mdl.Unit);
        Assert.Empty(r.Warnings); // 7 blanks; spike 0.5 = 3.5 × MDL
        Assert.Contains("40 CFR Part 136 Appendix B", r.Source, StringComparison.Ordinal);
    }

    // One-sided 99 % t for MDL_S, 40 CFR Part 136 Appendix B table: VERIFIED for n = 7–11, 16, 21, 31, 61
    // (Wis. Admin. Code NR 252.0365, field-reference §3.2); n = 26 from field-reference §6 (COMPUTED, t(0.99, 25) = 2.48510718).
    [Theory]
    [InlineData(7, "3.143")]
    [InlineData(8, "2.998")]
    [InlineData(9, "2.896")]
    [InlineData(10, "2.821")]
    [InlineData(11, "2.764")]
    [InlineData(16, "2.602")]
    [InlineData(21, "2.528")]
    [InlineData(26, "2.485")]
    [InlineData(31, "2.457")]
    [InlineData(61, "2.390")]
    public void Compute_SpikedCount_UsesTheTableT(int n, string expected)
    {
        var spikes = Enumerable.Range(0, n).Select(i => LimitsData.Ug(0.5 + (0.01 * (i % 5)))).ToList();
        MdlResult r = MethodDetectionLimit.Compute(spikes, LimitsData.WorkedBlanks(), Spike);
        Printed.Equal(expected, r.SpikedT);
    }

    [Fact]
    public void Compute_NoNumericBlank_BlankPartNotApplicable()
    {
        // 40 CFR Part 136 Appendix B (from memory): no blank gives a numeric result → MDL_b does not apply, MDL = MDL_S.
        var blanks = Enumerable.Repeat(BlankResult.NoNumericResult, 7).ToList();
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), blanks, Spike);
        Assert.Equal(MdlBlankCase.NotApplicable, r.BlankCase);
        Assert.Null(r.BlankMdl);
        Assert.Equal(r.SpikedMdl, r.Mdl);
        Assert.Equal(0, r.NumericBlankCount);
    }

    [Fact]
    public void Compute_SomeNumericBlanks_HighestResult()
    {
        // 40 CFR Part 136 Appendix B (from memory): some but not all numeric → MDL_b = highest blank result.
        var blanks = new List<BlankResult>
        {
            BlankResult.NoNumericResult, N(0.03), N(0.19), BlankResult.NoNumericResult, N(0.02), N(-0.01), N(0.05),
        };
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), blanks, LimitsData.Ug(1.0));
        Assert.Equal(MdlBlankCase.HighestResult, r.BlankCase);
        Assert.Equal(LimitsData.Ug(0.19), r.BlankMdl);
        Assert.Equal(LimitsData.Ug(0.19), r.Mdl);
        Assert.True(r.IsSetByBlanks);
        Assert.Equal(5, r.NumericBlankCount);
    }

    [Fact]
    public void Compute_NegativeBlankMean_TakenAsZero()
    {
        // 40 CFR Part 136 Appendix B (from memory): X̄_b < 0 is taken as 0. Blanks = −(worked blanks of §3.2):
        // X̄_b = −0.04, same S_b, so MDL_b = 0.123147 − 0.04 = 0.083147 (COMPUTED from §3.2).
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), LimitsData.WorkedBlanks(-1), Spike);
        Printed.Equal("-0.04", r.BlankMean!.Value.Value);
        Printed.Equal("0.083147", r.BlankMdl!.Value.Value);
        Assert.Contains("taken as 0", r.Formula, StringComparison.Ordinal);
    }

    [Fact]
    public void Compute_MoreThan100Blanks_Rank99thPercentile()
    {
        // 40 CFR Part 136 Appendix B example (from memory): 164 blanks whose highest results are … 1.5, 1.7, 1.9, 5.0, 10;
        // 164 × 0.99 = 162.36 → the 162nd ranked result, 1.9.
        var blanks = Enumerable.Range(0, 159).Select(i => i < 20 ? BlankResult.NoNumericResult : N(i / 200.0)).ToList();
        blanks.AddRange(new[] { N(10), N(1.5), N(5.0), N(1.9), N(1.7) });
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), blanks, Spike);
        Assert.Equal(164, r.BlankCount);
        Assert.Equal(MdlBlankCase.Percentile99, r.BlankCase);
        Assert.Equal(LimitsData.Ug(1.9), r.BlankMdl);
        Assert.Contains("rank round(0.99·164) = 162", r.Formula, StringComparison.Ordinal);
    }

    [Fact]
    public void Compute_150Blanks_HalfRankRoundsUp()
    {
        // Rank round(0.99·n) to the nearest whole number (40 CFR Part 136 Appendix B, from memory): 0.99·150 = 148.5 → 149
        // (halves up).
        var blanks = Enumerable.Range(1, 150).Select(i => N(i / 100.0)).ToList();
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), blanks, LimitsData.Ug(5));
        Assert.Equal(LimitsData.Ug(1.49), r.BlankMdl);
    }

    [Fact]
    public void Compute_PercentileOnABlankWithoutNumber_NotApplicable()
    {
        // Blanks without a numeric result rank below every numeric one (this library's convention, stated in the docs).
        var blanks = Enumerable.Repeat(BlankResult.NoNumericResult, 120).Append(N(0.02)).ToList();
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), blanks, Spike);
        Assert.Equal(MdlBlankCase.NotApplicable, r.BlankCase);
        Assert.Contains(r.Warnings, w => w.Contains("99th percentile", StringComparison.Ordinal));
    }

    [Fact]
    public void Compute_FewBlanksAndSpikeFarAboveMdl_Warns()
    {
        // Appendix B asks for at least 7 blanks (VERIFIED in the draft text, field-reference §3.2) and a spike level of
        // 2–10 × the MDL (from memory): 3 blanks (MDL_b = 0.05 + t(0.99, 2)·0.03 ≈ 0.259) and a spike of 3.0 ≈ 11.6 × MDL give
        // two warnings, not an exception.
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), LimitsData.WorkedBlanks().Take(3).ToList(), LimitsData.Ug(3.0));
        Assert.Equal(2, r.Warnings.Count);
        Assert.Contains(r.Warnings, w => w.Contains("at least 7", StringComparison.Ordinal));
        Assert.Contains(r.Warnings, w => w.Contains("2–10", StringComparison.Ordinal));
    }

    [Fact]
    public void Compute_SpikeBelowTwiceMdl_Warns()
    {
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), LimitsData.WorkedBlanks(), LimitsData.Ug(0.2));
        Assert.Single(r.Warnings);
    }

    [Fact]
    public void Compute_NoBlanks_NotApplicableWithWarning()
    {
        MdlResult r = MethodDetectionLimit.Compute(LimitsData.WorkedSpikes(), Array.Empty<BlankResult>(), Spike);
        Assert.Equal(MdlBlankCase.NotApplicable, r.BlankCase);
        Assert.Single(r.Warnings);
    }

    [Fact]
    public void Compute_MixedUnits_ConvertsToTheSpikeUnit()
    {
        var spikes = LimitsData.WorkedSpikes().Select(c => c.ConvertTo(ConcentrationUnit.NanogramPerLitre)).ToList();
        MdlResult r = MethodDetectionLimit.Compute(spikes, LimitsData.WorkedBlanks(), Spike);
        Printed.Equal("0.141711", r.Mdl.Value);
    }

    [Fact]
    public void Compute_BadInput_Throws()
    {
        IReadOnlyList<Concentration> spikes = LimitsData.WorkedSpikes();
        IReadOnlyList<BlankResult> blanks = LimitsData.WorkedBlanks();
        Assert.Equal("spikedResults", Assert.Throws<ArgumentNullException>(() => MethodDetectionLimit.Compute(null!, blanks, Spike)).ParamName);
        Assert.Equal("blankResults", Assert.Throws<ArgumentNullException>(() => MethodDetectionLimit.Compute(spikes, null!, Spike)).ParamName);
        Assert.Equal("spikedResults", Assert.Throws<ArgumentException>(() => MethodDetectionLimit.Compute(spikes.Take(6).ToList(), blanks, Spike)).ParamName);
        Assert.Equal("spikedResults", Assert.Throws<ArgumentException>(() => MethodDetectionLimit.Compute(Enumerable.Repeat(Spike, 7).ToList(), blanks, Spike)).ParamName);
        Assert.Equal("spikeLevel", Assert.Throws<ArgumentOutOfRangeException>(() => MethodDetectionLimit.Compute(spikes, blanks, LimitsData.Ug(0))).ParamName);
        Assert.Equal("blankResults", Assert.Throws<ArgumentNullException>(() => MethodDetectionLimit.Compute(spikes, new BlankResult[] { null! }, Spike)).ParamName);
        Assert.Equal("blankResults", Assert.Throws<ArgumentException>(() => MethodDetectionLimit.Compute(spikes, new[] { N(0.1) }, Spike)).ParamName);

        var wrongKind = spikes.Take(6).Append(Concentration.FromMicromolesPerLitre(0.5)).ToList();
        ArgumentException e = Assert.Throws<ArgumentException>(() => MethodDetectionLimit.Compute(wrongKind, blanks, Spike));
        Assert.Equal("spikedResults", e.ParamName);
        Assert.Contains("index 6", e.Message, StringComparison.Ordinal);
        Assert.Equal("blankResults", Assert.Throws<ArgumentException>(() => MethodDetectionLimit.Compute(spikes, new[] { BlankResult.Numeric(Concentration.FromMilligramsPerKilogram(1)) }, Spike)).ParamName);
    }

    private static BlankResult N(double microgramsPerLitre) => BlankResult.Numeric(LimitsData.Ug(microgramsPerLitre));
}
