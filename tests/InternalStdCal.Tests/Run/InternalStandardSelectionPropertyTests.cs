using System;
using System.Collections.Generic;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Run;

namespace InternalStdCal.Tests.Run;

/// <summary>
/// Invented replicate series: analyte A = S·N·(1 + e), candidates C_j = k_j·N·(1 + f_j) with a common
/// multiplicative noise N (e.g. nebulisation or injection volume) and independent noises e, f_j of different size.
/// </summary>
public class InternalStandardSelectionPropertyTests
{
    private const int MaxN = 15;

    [Property(MaxTest = 100)]
    public Property Evaluate_ScalingACandidatesSignals_LeavesItsStatisticsAndTheRankingUnchanged() =>
        Prop.ForAll(Scenarios(), Gen.Choose(-3000, 3000).Select(e => Math.Pow(10, e / 1000.0)).ToArbitrary(), Gen.Choose(0, 2).ToArbitrary(), (sc, factor, which) =>
        {
            InternalStandardSelection a = sc.Evaluate();
            InternalStandardSelection b = sc.Evaluate(scaled: which, factor: factor);
            return SameStatistics(a, b) && SameRanking(a, b);
        });

    [Property(MaxTest = 100)]
    public Property Evaluate_PermutingTheInjections_LeavesTheSelectionUnchanged() =>
        Prop.ForAll(Scenarios(), Gen.Shuffle(Enumerable.Range(0, MaxN).ToArray()).ToArbitrary(), (sc, order) =>
        {
            int[] perm = order.Where(i => i < sc.N).ToArray();
            InternalStandardSelection a = sc.Evaluate();
            InternalStandardSelection b = sc.Evaluate(permutation: perm);
            return SameStatistics(a, b) && SameRanking(a, b)
                && a.Candidates.Zip(b.Candidates, (x, y) => x.Verdict == y.Verdict || NearBoundary(x, a.SignificanceLevel)).All(ok => ok);
        });

    [Property(MaxTest = 100)]
    public Property Evaluate_CandidateCarryingOnlyTheCommonNoise_RecoversTheNoiseFreeSignal() =>
        Prop.ForAll(Scenarios(), sc =>
        {
            // Analyte S·N without independent noise; candidate k·N: the ratio is S/k at every injection.
            double[] analyte = sc.Common.Select(nv => sc.Level * nv).ToArray();
            var ideal = new InternalStandardSelectionCandidate("ideal", sc.Common.Select(nv => sc.K[0] * nv).ToArray());
            var noisy = new InternalStandardSelectionCandidate("noisy", sc.Candidate(2));
            InternalStandardSelection sel = InternalStandardSelection.Evaluate("analyte", analyte, new[] { noisy, ideal });

            InternalStandardSelectionAssessment best = sel.Candidates[0];
            double expected = sc.Level / sc.K[0];
            return best.Name == "ideal"
                && best.Verdict == InternalStandardSelectionVerdict.Improves
                && best.Statistics!.Ratios.All(r => Math.Abs((r / expected) - 1) <= 1e-14)
                && best.Statistics.RatioRsdPercent <= 1e-11
                && sel.Best?.Name == "ideal";
        });

    private static bool SameStatistics(InternalStandardSelection a, InternalStandardSelection b)
    {
        if (!Close(a.AnalyteRsdPercent, b.AnalyteRsdPercent) || !Close(a.AnalyteLogSd, b.AnalyteLogSd))
        {
            return false;
        }

        foreach (InternalStandardSelectionAssessment x in a.Candidates)
        {
            InternalStandardSelectionStatistics s = x.Statistics!;
            InternalStandardSelectionStatistics t = b.Candidates.Single(c => c.Name == x.Name).Statistics!;
            if (!Close(s.RatioRsdPercent, t.RatioRsdPercent) || !Close(s.CandidateRsdPercent, t.CandidateRsdPercent)
                || !Close(s.RatioLogSd, t.RatioLogSd) || Math.Abs(s.LogCorrelation - t.LogCorrelation) > 1e-9
                || !Close(s.CorrelationThreshold, t.CorrelationThreshold) || !Close(s.PitmanMorganT!.Value, t.PitmanMorganT!.Value, 1e-7)
                || Math.Abs(s.ImprovementPValue - t.ImprovementPValue) > 1e-9)
            {
                return false;
            }
        }

        return true;
    }

    // Identical order unless two ratio RSDs are too close to be ordered reliably after rounding.
    private static bool SameRanking(InternalStandardSelection a, InternalStandardSelection b)
    {
        double[] rsd = a.Candidates.Select(c => c.Statistics!.RatioRsdPercent).ToArray();
        bool separated = rsd.Zip(rsd.Skip(1), (x, y) => y - x > 1e-9 * y).All(ok => ok);
        return !separated || a.Candidates.Select(c => c.Name).SequenceEqual(b.Candidates.Select(c => c.Name));
    }

    private static bool NearBoundary(InternalStandardSelectionAssessment c, double alpha) =>
        Math.Abs(c.Statistics!.ImprovementPValue - alpha) < 1e-9 || Math.Abs(c.Statistics.WorseningPValue - alpha) < 1e-9;

    private static bool Close(double x, double y, double relative = 1e-9) =>
        Math.Abs(x - y) <= (relative * Math.Max(Math.Abs(x), Math.Abs(y))) + 1e-12;

    private static Arbitrary<Scenario> Scenarios() =>
        (from n in Gen.Choose(4, MaxN)
         from level in Gen.Choose(1000, 1_000_000)
         from common in Gen.ArrayOf(Gen.Choose(-50, 50), MaxN)
         from own in Gen.ArrayOf(Gen.Choose(-1000, 1000), 4 * MaxN)
         from k in Gen.ArrayOf(Gen.Choose(1, 100), 3)
         select new Scenario(n, level, common, own, k)).ToArbitrary();

    /// <summary>One invented replicate series; noises in per mille, common noise ±5 %.</summary>
    internal sealed class Scenario
    {
        // Independent noise sizes: analyte 0.5 %, candidates 0.2 %, 1 %, 5 %.
        private static readonly double[] Sizes = { 0.005, 0.002, 0.01, 0.05 };
        private readonly int[] _own;

        internal Scenario(int n, int level, int[] common, int[] own, int[] k)
        {
            N = n;
            Level = level;
            // The first two injections differ, so the common noise always varies.
            Common = common.Take(n).Select((g, i) => 1 + ((i == 0 ? -30 : i == 1 ? 30 : g) / 1000.0)).ToArray();
            _own = own;
            K = k.Select(v => v / 10.0).ToArray();
        }

        internal int N { get; }

        internal double Level { get; }

        internal double[] Common { get; }

        internal double[] K { get; }

        internal double[] Analyte() => Series(0, Level);

        internal double[] Candidate(int j) => Series(j + 1, K[j]);

        internal InternalStandardSelection Evaluate(int scaled = -1, double factor = 1, int[]? permutation = null)
        {
            int[] p = permutation ?? Enumerable.Range(0, N).ToArray();
            var candidates = new List<InternalStandardSelectionCandidate>();
            for (int j = 0; j < 3; j++)
            {
                double[] c = Candidate(j).Select(v => j == scaled ? v * factor : v).ToArray();
                candidates.Add(new InternalStandardSelectionCandidate("IS-" + j.ToString(System.Globalization.CultureInfo.InvariantCulture), p.Select(i => c[i]).ToArray()));
            }

            double[] a = Analyte();
            return InternalStandardSelection.Evaluate("analyte", p.Select(i => a[i]).ToArray(), candidates);
        }

        private double[] Series(int which, double scale) =>
            Enumerable.Range(0, N).Select(i => scale * Common[i] * (1 + (Sizes[which] * _own[(which * MaxN) + i] / 1000.0))).ToArray();

        public override string ToString() => FormattableString.Invariant($"n = {N}, S = {Level}, N = [{string.Join(", ", Common)}]");
    }
}
