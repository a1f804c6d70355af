using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Run;
using InternalStdCal.Tests.TestSupport;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.Statistics;
using Xunit;

namespace InternalStdCal.Tests.Run;

public class InternalStandardSelectionTests
{
    private const int N = 10;

    [Fact]
    public void Evaluate_FieldReferenceExample_ReproducesRatioCvsThresholdAndRanking()
    {
        InternalStandardSelection sel = Evaluate(Example());

        // Field reference §9 example (COMPUTED): CV_A = 5 %, CV_I = 4 % → ρ* = 0.40 and
        // CV_R = 6.403 % (ρ = 0), 5.000 % (ρ = 0.4), 3.000 % (ρ = 0.8), 1.732 % (ρ = 0.95). The data are built so that
        // the sample SDs of ln A, ln I and their correlation equal those population values exactly.
        Assert.Equal(0.05, sel.AnalyteLogSd, 12);
        Printed.Equal("6.403", 100 * Stats(sel, "IS-0.00").RatioLogSd);
        Printed.Equal("5.000", 100 * Stats(sel, "IS-0.40").RatioLogSd);
        Printed.Equal("3.000", 100 * Stats(sel, "IS-0.80").RatioLogSd);
        Printed.Equal("1.732", 100 * Stats(sel, "IS-0.95").RatioLogSd);
        foreach (InternalStandardSelectionAssessment c in sel.Candidates)
        {
            Printed.Equal("0.40", c.Statistics!.CorrelationThreshold);
            Assert.Equal(0.04, c.Statistics.CandidateLogSd, 12);
        }

        Assert.Equal(0.8, Stats(sel, "IS-0.80").LogCorrelation, 12);
        Assert.True(Stats(sel, "IS-0.80").MeetsCorrelationThreshold);
        Assert.False(Stats(sel, "IS-0.00").MeetsCorrelationThreshold);
        Assert.Equal(new[] { "IS-0.95", "IS-0.80", "IS-0.40", "IS-0.00" }, sel.Candidates.Select(c => c.Name));
        Assert.Equal(new int?[] { 1, 2, 3, 4 }, sel.Candidates.Select(c => c.Rank));
        Assert.Equal("IS-0.95", sel.Best!.Name);
    }

    [Fact]
    public void Evaluate_FieldReferenceExample_PitmanMorganTestRejectsWhereNaiveFDoesNot()
    {
        InternalStandardSelectionStatistics s = Stats(Evaluate(Example()), "IS-0.80");

        // Field reference §9 (COMPUTED; test form FROM MEMORY): n = 10, X = ln A, Y = ln R → F = 2.77778,
        // r(ln A, ln R) = 0.6, t_PM = 1.88562 > t(0.95, 8) = 1.85955 (field reference §6), whereas the naive F test
        // does not reject: 2.778 < F(0.95; 9, 9) = 3.17889.
        Printed.Equal("2.77778", s.VarianceRatio!.Value);
        Printed.Equal("0.6", s.PitmanMorganCorrelation!.Value);
        Printed.Equal("1.88562", s.PitmanMorganT!.Value);
        Assert.Equal(8, s.DegreesOfFreedom);
        Assert.True(s.PitmanMorganT > 1.85955);
        Assert.True(s.VarianceRatio < 3.17889);

        // One-sided p value P(T₈ ≥ t) against MathNet.Numerics StudentT.CDF (general-purpose reference).
        Numeric.AssertRelative(1 - StudentT.CDF(0, 1, 8, s.PitmanMorganT.Value), s.ImprovementPValue, 1e-9);
        Assert.True(s.ImprovementPValue < 0.05);
        Assert.Equal(1, s.ImprovementPValue + s.WorseningPValue, 14);
    }

    [Fact]
    public void PitmanMorganT_FieldReferenceValues_Gives188562()
    {
        // Field reference §9 (COMPUTED): F = 25/9 = 2.77778, r = 0.6, n = 10 → t = 1.88562; exactly (16/9)·√8/(2·(5/3)·0.8).
        Printed.Equal("1.88562", InternalStandardSelection.PitmanMorganT(25.0 / 9, 0.6, 10));
        Numeric.AssertRelative(16.0 / 9 * Math.Sqrt(8) / (2 * 5.0 / 3 * 0.8), InternalStandardSelection.PitmanMorganT(25.0 / 9, 0.6, 10), 1e-14);
    }

    [Fact]
    public void Evaluate_FieldReferenceExample_VerdictsFollowTheOneSidedTests()
    {
        // CV_I = 15 %, ρ = 0 (COMPUTED here with the §9 formulas): CV_R = √(0.05² + 0.15²) = 15.81 %, F = 0.1,
        // r = 0.05/0.1581 = 0.316, t = −0.9·√8/(2·√(0.1·0.9)) = −4.243 → a significant increase.
        var candidates = Example().Append(Candidate("IS-noisy", 0.15, 0.0)).ToList();
        InternalStandardSelection sel = Evaluate(candidates);

        Assert.Equal(InternalStandardSelectionVerdict.Improves, Verdict(sel, "IS-0.95"));
        Assert.Equal(InternalStandardSelectionVerdict.Improves, Verdict(sel, "IS-0.80"));
        Assert.Equal(InternalStandardSelectionVerdict.NoSignificantImprovement, Verdict(sel, "IS-0.40"));
        Assert.Equal(InternalStandardSelectionVerdict.NoSignificantImprovement, Verdict(sel, "IS-0.00"));
        Assert.Equal(InternalStandardSelectionVerdict.Worsens, Verdict(sel, "IS-noisy"));
        Assert.Equal(0, Stats(sel, "IS-0.40").PitmanMorganT!.Value, 10);
        Printed.Equal("-4.243", Stats(sel, "IS-noisy").PitmanMorganT!.Value);
        Assert.True(Stats(sel, "IS-noisy").WorseningPValue < 0.05);
        Assert.Equal(5, sel.Candidates[^1].Rank);
    }

    [Fact]
    public void Evaluate_InventedReplicates_RsdAndCorrelationMatchMathNet()
    {
        // Invented replicate data (ten injections of one solution); cross-checked with MathNet.Numerics Statistics.
        double[] analyte = { 15230, 15410, 14980, 15620, 15100, 14870, 15550, 15300, 15020, 15480 };
        double[] rh = { 40120, 40710, 39300, 41250, 39980, 39150, 40900, 40330, 39600, 40820 };
        InternalStandardSelection sel = InternalStandardSelection.Evaluate("Cd", analyte, new[] { new InternalStandardSelectionCandidate("Rh", rh) });

        InternalStandardSelectionStatistics s = sel.Candidates.Single().Statistics!;
        double[] ratio = analyte.Zip(rh, (a, i) => a / i).ToArray();
        Numeric.AssertRelative(100 * Statistics.StandardDeviation(analyte) / Statistics.Mean(analyte), sel.AnalyteRsdPercent, 1e-12);
        Numeric.AssertRelative(100 * Statistics.StandardDeviation(rh) / Statistics.Mean(rh), s.CandidateRsdPercent, 1e-12);
        Numeric.AssertRelative(100 * Statistics.StandardDeviation(ratio) / Statistics.Mean(ratio), s.RatioRsdPercent, 1e-10);
        Numeric.AssertRelative(Correlation.Pearson(analyte.Select(v => Math.Log(v)), rh.Select(v => Math.Log(v))), s.LogCorrelation, 1e-12);
        Numeric.AssertRelative(100 * ((s.RatioRsdPercent / sel.AnalyteRsdPercent) - 1), s.RsdChangePercent, 1e-12);
        Assert.Equal(ratio, s.Ratios);
        Assert.Null(s.MethodBlankPercent);
    }

    [Fact]
    public void Evaluate_AnalyteItself_IsRefusedWithReasonAndListedLast()
    {
        List<InternalStandardSelectionCandidate> candidates = Example().ToList();
        double[] analyte = AnalyteSignals();
        candidates.Insert(0, new InternalStandardSelectionCandidate(" analyte ", candidates[0].Signals));
        candidates.Insert(1, new InternalStandardSelectionCandidate("copy", analyte));
        candidates.Insert(2, new InternalStandardSelectionCandidate("flat", Enumerable.Repeat(20000.0, N).ToArray()));

        InternalStandardSelection sel = Evaluate(candidates);

        Assert.Equal(new[] { " analyte ", "copy", "flat" }, sel.Candidates.Skip(4).Select(c => c.Name));
        Assert.All(sel.Candidates.Skip(4), c =>
        {
            Assert.Equal(InternalStandardSelectionVerdict.Refused, c.Verdict);
            Assert.True(c.IsRefused);
            Assert.Null(c.Rank);
            Assert.Null(c.Statistics);
        });
        Assert.Contains("the analyte itself (same name)", sel.Candidates[4].Refusal, StringComparison.Ordinal);
        Assert.Contains("identical to the analyte's at every injection", sel.Candidates[5].Refusal, StringComparison.Ordinal);
        Assert.Contains("20000 at every injection", sel.Candidates[6].Refusal, StringComparison.Ordinal);
        Assert.Contains("refused: copy — its signals are identical", sel.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_SignalsVaryingOnlyInTheLastDigit_AreTreatedAsConstant()
    {
        // 1e6 and its neighbouring doubles: relative differences ~1e-16, below the documented 1e-12 rounding level.
        double[] ulps = { 1e6, Math.BitIncrement(1e6), 1e6, Math.BitDecrement(1e6) };
        double[] analyte = { 1000, 1010, 990, 1005 };

        InternalStandardSelectionAssessment c = InternalStandardSelection.Evaluate("analyte", analyte, new[] { new InternalStandardSelectionCandidate("IS", ulps) }).Candidates.Single();
        ArgumentException e = Assert.Throws<ArgumentException>(() => InternalStandardSelection.Evaluate("analyte", ulps, new[] { new InternalStandardSelectionCandidate("IS", analyte) }));

        Assert.Equal(InternalStandardSelectionVerdict.Refused, c.Verdict);
        Assert.Contains("varies only at the rounding level", c.Refusal, StringComparison.Ordinal);
        Assert.Equal("analyteSignals", e.ParamName);
        Assert.Contains("varies only at the rounding level", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_SignalInMethodBlanks_WarnsAboveTheLevelOnly()
    {
        InternalStandardSelectionCandidate basis = Candidate("IS-0.80", 0.04, 0.8);
        double mean = basis.Signals.Average();
        var dirty = new InternalStandardSelectionCandidate("IS-dirty", basis.Signals, new[] { 0.02 * mean, 0.04 * mean });
        var clean = new InternalStandardSelectionCandidate("IS-clean", basis.Signals.Select(v => v * 1.01).ToArray(), new[] { 0.004 * mean, 0.006 * mean });

        InternalStandardSelection sel = Evaluate(new[] { dirty, clean });

        // Mean blank 3 % of the mean signal (> 1 %) vs 0.5 %/1.01 (< 1 %); the verdict is unaffected.
        InternalStandardSelectionAssessment d = sel.Candidates.Single(c => c.Name == "IS-dirty");
        Assert.Equal(3, d.Statistics!.MethodBlankPercent!.Value, 10);
        Assert.Contains("signal in method blanks: mean blank signal is 3 % of its mean signal (warning level 1 %)", Assert.Single(d.Warnings), StringComparison.Ordinal);
        Assert.Equal(InternalStandardSelectionVerdict.Improves, d.Verdict);
        Assert.Empty(sel.Candidates.Single(c => c.Name == "IS-clean").Warnings);
        Assert.Single(InternalStandardSelection.Evaluate("analyte", AnalyteSignals(), new[] { clean }, blankWarningPercent: 0.4).Candidates[0].Warnings);
        Assert.Contains("warning: IS-dirty — signal in method blanks", sel.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_CandidateProportionalToAnalyte_ImprovesWithUnboundedStatisticAndWarning()
    {
        double[] analyte = AnalyteSignals();
        var half = new InternalStandardSelectionCandidate("half", analyte.Select(v => v / 2).ToArray());

        InternalStandardSelectionAssessment c = Evaluate(new[] { half }).Candidates.Single();

        // A/(A/2) = 2 exactly (division by 2 is exact), so s(ln R) = 0: complete removal, t unbounded (by definition).
        Assert.Equal(InternalStandardSelectionVerdict.Improves, c.Verdict);
        Assert.All(c.Statistics!.Ratios, r => Assert.Equal(2.0, r));
        Assert.Equal(0, c.Statistics.RatioRsdPercent);
        Assert.Null(c.Statistics.PitmanMorganT);
        Assert.Equal(0, c.Statistics.ImprovementPValue);
        Assert.Contains("another isotope", Assert.Single(c.Warnings), StringComparison.Ordinal);
    }

    [Fact]
    public void ToString_Example_PrintsRankedTableWithVerdicts()
    {
        string text = Evaluate(Example()).ToString();

        Assert.StartsWith("Internal-standard selection for 'analyte' (n = 10 injections; analyte RSD ", text, StringComparison.Ordinal);
        Assert.Contains("rank  candidate       RSD IS %  RSD ratio %  change %  rho(ln)  rho*    t(PM)      p(less)   verdict", text, StringComparison.Ordinal);
        Assert.Matches(@"\n  2     IS-0\.80 +\d+\.\d{3} +\d+\.\d{3} +-\d+\.\d +0\.800 +0\.400 +1\.886 +0\.0\d{3} +improves", text);
        Assert.Contains("no significant improvement", text, StringComparison.Ordinal);
        Assert.EndsWith("best: IS-0.95 (least scatter of the ratio, significant reduction)", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Best_NoCandidateImproves_IsNull()
    {
        InternalStandardSelection sel = Evaluate(new[] { Candidate("IS-0.40", 0.04, 0.4), Candidate("IS-0.00", 0.04, 0) });

        Assert.Null(sel.Best);
        Assert.EndsWith("no candidate reduces the scatter significantly", sel.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Candidate_BadSignal_ThrowsNamingCandidateAndIndex()
    {
        ArgumentException nan = Assert.Throws<ArgumentException>(() => new InternalStandardSelectionCandidate("Rh", new[] { 1.0, 2.0, double.NaN }));
        Assert.Equal("signals", nan.ParamName);
        Assert.Contains("of 'Rh' at index 2 was missing (NaN)", nan.Message, StringComparison.Ordinal);
        Assert.Contains("'In' at index 0 was 0", Assert.Throws<ArgumentException>(() => new InternalStandardSelectionCandidate("In", new[] { 0.0, 2.0, 3.0 })).Message, StringComparison.Ordinal);
        Assert.Contains("'In' at index 1 was -5", Assert.Throws<ArgumentException>(() => new InternalStandardSelectionCandidate("In", new[] { 1.0, -5.0, 3.0 })).Message, StringComparison.Ordinal);
        Assert.Contains("at index 1 was Infinity", Assert.Throws<ArgumentException>(() => new InternalStandardSelectionCandidate("In", new[] { 1.0, double.PositiveInfinity })).Message, StringComparison.Ordinal);
        ArgumentException blank = Assert.Throws<ArgumentException>(() => new InternalStandardSelectionCandidate("Ge", new[] { 1.0, 2.0, 3.0 }, new[] { 0.0, -1.0 }));
        Assert.Equal("methodBlankSignals", blank.ParamName);
        Assert.Contains("'Ge' at index 1 was -1", blank.Message, StringComparison.Ordinal);
        Assert.Equal("name", Assert.Throws<ArgumentException>(() => new InternalStandardSelectionCandidate("  ", new[] { 1.0 })).ParamName);
        Assert.Equal("signals", Assert.Throws<ArgumentException>(() => new InternalStandardSelectionCandidate("Rh", Array.Empty<double>())).ParamName);
        Assert.Equal("signals", Assert.Throws<ArgumentNullException>(() => new InternalStandardSelectionCandidate("Rh", null!)).ParamName);
    }

    [Fact]
    public void Evaluate_BadInput_ThrowsNamingTheParameter()
    {
        double[] a = AnalyteSignals();
        InternalStandardSelectionCandidate[] ok = Example().ToArray();

        ArgumentException nan = Assert.Throws<ArgumentException>(() => InternalStandardSelection.Evaluate("Pb", a.Select((v, i) => i == 4 ? double.NaN : v).ToArray(), ok));
        Assert.Equal("analyteSignals", nan.ParamName);
        Assert.Contains("of 'Pb' at index 4 was missing (NaN)", nan.Message, StringComparison.Ordinal);
        Assert.Contains("at least 3 injections", Assert.Throws<ArgumentException>(() => InternalStandardSelection.Evaluate("Pb", new[] { 1.0, 2.0 }, new[] { new InternalStandardSelectionCandidate("Tl", new[] { 1.0, 2.0 }) })).Message, StringComparison.Ordinal);
        Assert.Contains("same value 5 at all 3 injections", Assert.Throws<ArgumentException>(() => InternalStandardSelection.Evaluate("Pb", new[] { 5.0, 5.0, 5.0 }, new[] { new InternalStandardSelectionCandidate("Tl", new[] { 1.0, 2.0, 3.0 }) })).Message, StringComparison.Ordinal);
        ArgumentException length = Assert.Throws<ArgumentException>(() => InternalStandardSelection.Evaluate("Pb", a, new[] { new InternalStandardSelectionCandidate("Tl", new[] { 1.0, 2.0, 3.0 }) }));
        Assert.Equal("candidates", length.ParamName);
        Assert.Contains("Candidate 'Tl' in 'candidates' has 3 signals", length.Message, StringComparison.Ordinal);
        Assert.Contains("names 'is-0.00' more than once", Assert.Throws<ArgumentException>(() => InternalStandardSelection.Evaluate("Pb", a, ok.Append(new InternalStandardSelectionCandidate("is-0.00", a.Reverse().ToArray())).ToArray())).Message, StringComparison.Ordinal);
        Assert.Equal("candidates", Assert.Throws<ArgumentException>(() => InternalStandardSelection.Evaluate("Pb", a, Array.Empty<InternalStandardSelectionCandidate>())).ParamName);
        Assert.Equal("candidates", Assert.Throws<ArgumentNullException>(() => InternalStandardSelection.Evaluate("Pb", a, new InternalStandardSelectionCandidate[] { null! })).ParamName);
        Assert.Equal("analyteSignals", Assert.Throws<ArgumentNullException>(() => InternalStandardSelection.Evaluate("Pb", null!, ok)).ParamName);
        Assert.Equal("analyteName", Assert.Throws<ArgumentException>(() => InternalStandardSelection.Evaluate(" ", a, ok)).ParamName);
        Assert.Equal("significanceLevel", Assert.Throws<ArgumentOutOfRangeException>(() => InternalStandardSelection.Evaluate("Pb", a, ok, significanceLevel: 0.5)).ParamName);
        Assert.Equal("blankWarningPercent", Assert.Throws<ArgumentOutOfRangeException>(() => InternalStandardSelection.Evaluate("Pb", a, ok, blankWarningPercent: -1)).ParamName);
    }

    internal static InternalStandardSelection Evaluate(IEnumerable<InternalStandardSelectionCandidate> candidates) =>
        InternalStandardSelection.Evaluate("analyte", AnalyteSignals(), candidates.ToList());

    /// <summary>
    /// Field reference §9 population values as exact sample statistics: ln A = ln 50000 + 0.05·3·u,
    /// ln I = ln 20000 + σ_I·3·(ρ·u + √(1 − ρ²)·v), with u, v centred, orthogonal, of unit norm (n = 10, √(n − 1) = 3).
    /// </summary>
    internal static InternalStandardSelectionCandidate[] Example() =>
        new[] { 0.0, 0.4, 0.8, 0.95 }.Select(rho => Candidate(FormattableString.Invariant($"IS-{rho:0.00}"), 0.04, rho)).ToArray();

    internal static double[] AnalyteSignals() => U().Select(u => Math.Exp(Math.Log(50000) + (0.05 * 3 * u))).ToArray();

    internal static InternalStandardSelectionCandidate Candidate(string name, double logSd, double rho)
    {
        double[] u = U(), v = V();
        return new InternalStandardSelectionCandidate(
            name,
            u.Select((ui, i) => Math.Exp(Math.Log(20000) + (logSd * 3 * ((rho * ui) + (Math.Sqrt(1 - (rho * rho)) * v[i]))))).ToArray());
    }

    private static double[] U() => Normalised(Enumerable.Range(1, N).Select(i => i - 5.5));

    // (i − 5.5)² is even about the centre, so orthogonal to the odd u once centred.
    private static double[] V()
    {
        double[] sq = Enumerable.Range(1, N).Select(i => (i - 5.5) * (i - 5.5)).ToArray();
        return Normalised(sq.Select(s => s - sq.Average()));
    }

    private static double[] Normalised(IEnumerable<double> values)
    {
        double[] v = values.ToArray();
        double norm = Math.Sqrt(v.Sum(x => x * x));
        return v.Select(x => x / norm).ToArray();
    }

    private static InternalStandardSelectionStatistics Stats(InternalStandardSelection sel, string name) =>
        sel.Candidates.Single(c => c.Name == name).Statistics!;

    private static InternalStandardSelectionVerdict Verdict(InternalStandardSelection sel, string name) =>
        sel.Candidates.Single(c => c.Name == name).Verdict;
}
