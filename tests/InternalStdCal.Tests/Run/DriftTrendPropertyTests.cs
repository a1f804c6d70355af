using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Run;

namespace InternalStdCal.Tests.Run;

/// <summary>Invented series; the expected values follow from the definition of the least-squares line.</summary>
public class DriftTrendPropertyTests
{
    private static Arbitrary<(int N, double Level, double Slope)> Lines() =>
        (from n in Gen.Choose(3, 40)
         from level in Gen.Choose(1, 1_000_000)
         from slope in Gen.Choose(-1000, 1000)
         select (n, (double)level, slope * level / 1e5)).ToArbitrary();

    [Property(MaxTest = 200)]
    public Property Fit_ConstantSeries_HasZeroDrift() =>
        Prop.ForAll(Lines(), p =>
        {
            DriftTrend trend = DriftTrend.Fit(Enumerable.Repeat(p.Level, p.N).ToArray(), DriftRule.MagnitudeOrSignificance(1));
            return Math.Abs(trend.Slope) <= 1e-12 * p.Level
                && Math.Abs(trend.DriftOverRunPercent) <= 1e-9
                && !trend.IsFlagged;
        });

    [Property(MaxTest = 200)]
    public Property Fit_ExactLine_RecoversItsSlope() =>
        Prop.ForAll(Lines(), p =>
        {
            // Values stay > 0 over the run: level ≥ 1 and |slope|·n ≤ 0.01·40·level.
            double[] y = Enumerable.Range(1, p.N).Select(i => p.Level + (p.Slope * i)).ToArray();
            DriftTrend trend = DriftTrend.Fit(y, DriftRule.Significance());
            return Math.Abs(trend.Slope - p.Slope) <= 1e-10 * p.Level
                && Math.Abs(trend.DriftOverRun - (p.Slope * (p.N - 1))) <= 1e-9 * p.Level;
        });

    [Property(MaxTest = 100)]
    public Property Fit_PermutingThePairs_LeavesTheTrendUnchanged() =>
        Prop.ForAll(
            Lines(),
            Gen.ArrayOf(Gen.Choose(-1000, 1000), 40).ToArbitrary(),
            Gen.Shuffle(Enumerable.Range(0, 40).ToArray()).ToArbitrary(),
            (p, noise, order) =>
            {
                double[] x = Enumerable.Range(1, p.N).Select(i => (double)i).ToArray();
                double[] y = x.Select((xi, i) => p.Level + (p.Slope * xi) + (noise[i] * p.Level / 1e5)).ToArray();
                int[] perm = order.Where(i => i < p.N).ToArray();
                DriftTrend a = DriftTrend.Fit(x, y, DriftRule.Significance());
                DriftTrend b = DriftTrend.Fit(perm.Select(i => x[i]).ToArray(), perm.Select(i => y[i]).ToArray(), DriftRule.Significance());
                double scale = p.Level * 1e-12;
                return Math.Abs(a.Slope - b.Slope) <= scale
                    && Math.Abs(a.SlopeInterval.Lower - b.SlopeInterval.Lower) <= scale
                    && Math.Abs(a.SlopeInterval.Upper - b.SlopeInterval.Upper) <= scale
                    && Math.Abs(a.Mean - b.Mean) <= scale;
            });
}
