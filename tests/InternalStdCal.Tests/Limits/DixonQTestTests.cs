using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Limits;
using InternalStdCal.Tests.TestSupport;
using MathNet.Numerics.Distributions;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class DixonQTestTests
{
    // Masses of a coin in g, Harvey, Analytical Chemistry 2.1 (open textbook), ch. 4, problem 4.22.
    private static readonly double[] Coins = [3.067, 3.049, 3.039, 2.514, 3.048, 3.079, 3.094, 3.109, 3.102];

    // VERIFIED: field-reference §5.2, LibreTexts "Appendix 06: Critical Values for Dixon's Q-Test" after Rorabacher,
    // Anal. Chem. 63 (1991) 139–146; columns α = 0.10, 0.05, 0.04, 0.02, 0.01.
    [Theory]
    [InlineData(3, 0.941, 0.970, 0.976, 0.988, 0.994)]
    [InlineData(4, 0.765, 0.829, 0.846, 0.889, 0.926)]
    [InlineData(5, 0.642, 0.710, 0.729, 0.780, 0.821)]
    [InlineData(6, 0.560, 0.625, 0.644, 0.698, 0.740)]
    [InlineData(7, 0.507, 0.568, 0.586, 0.637, 0.680)]
    [InlineData(8, 0.468, 0.526, 0.543, 0.590, 0.634)]
    [InlineData(9, 0.437, 0.493, 0.510, 0.555, 0.598)]
    [InlineData(10, 0.412, 0.466, 0.483, 0.527, 0.568)]
    public void CriticalValue_RorabacherTable_MatchesPrinted(int n, double q10, double q05, double q04, double q02, double q01)
    {
        Assert.Equal(q10, DixonQTest.CriticalValue(n, 0.10));
        Assert.Equal(q05, DixonQTest.CriticalValue(n, 0.05));
        Assert.Equal(q04, DixonQTest.CriticalValue(n, 0.04));
        Assert.Equal(q02, DixonQTest.CriticalValue(n, 0.02));
        Assert.Equal(q01, DixonQTest.CriticalValue(n, 0.01));
    }

    [Fact]
    public void SignificanceLevels_ListsTheTableColumns() =>
        Assert.Equal([0.10, 0.05, 0.04, 0.02, 0.01], DixonQTest.SignificanceLevels);

    // VERIFIED (worked solution to Harvey's problem 4.22, holooly.com): Q = (3.039 − 2.514)/(3.109 − 2.514) = 0.882
    // against Q(0.05, 9) = 0.493, so 2.514 g is an outlier.
    [Fact]
    public void Evaluate_CoinMasses_FlagsLowestValue()
    {
        OutlierTestResult r = DixonQTest.Evaluate(Coins, 0.05);

        Printed.Equal("0.882", r.Statistic);
        Assert.Equal(0.493, r.CriticalValue);
        Assert.Equal(3, r.SuspectIndex);
        Assert.Equal(2.514, r.SuspectValue);
        Assert.Equal(OutlierSide.Low, r.SuspectEnd);
        Assert.Equal(OutlierSide.TwoSided, r.Alternative);
        Assert.True(r.IsOutlier);
        Assert.Equal(Coins, r.Values);
    }

    // VERIFIED (secondary: Wikipedia "Dixon's Q test" example, mirrored at tickerdossier.com): Q = 0.455 for 0.167;
    // above 0.412 (α = 0.10) but below 0.466 (α = 0.05).
    [Fact]
    public void Evaluate_TenValuesExample_FlaggedAtTenButNotFivePercent()
    {
        double[] x = [0.189, 0.167, 0.187, 0.183, 0.186, 0.182, 0.181, 0.184, 0.181, 0.177];

        OutlierTestResult at10 = DixonQTest.Evaluate(x, 0.10);
        OutlierTestResult at05 = DixonQTest.Evaluate(x, 0.05);

        Printed.Equal("0.455", at10.Statistic);
        Assert.Equal(1, at10.SuspectIndex);
        Assert.True(at10.IsOutlier);
        Assert.False(at05.IsOutlier);
    }

    // Worked example with an obvious high outlier (invented data; Q by hand: (9.8 − 5.3)/(9.8 − 5.0) = 0.9375 > 0.710).
    [Fact]
    public void Evaluate_ObviousHighOutlier_ReportsHighEnd()
    {
        OutlierTestResult r = DixonQTest.Evaluate([5.1, 9.8, 5.0, 5.3, 5.2], 0.05);

        Assert.Equal(0.9375, r.Statistic, 1e-12);
        Assert.Equal(1, r.SuspectIndex);
        Assert.Equal(OutlierSide.High, r.SuspectEnd);
        Assert.True(r.IsOutlier);
    }

    // α convention check (COMPUTED here, Monte Carlo, 20 000 normal samples of 5, fixed seed): with the more extreme
    // end tested, the printed 0.10 column gives a false-flag rate near 0.10, and a pre-chosen end near 0.05.
    [Fact]
    public void CriticalValue_NormalSamples_RejectionRateMatchesTwoSidedAlpha()
    {
        var random = new Random(20261202);
        const int Trials = 20_000;
        int either = 0;
        int high = 0;
        for (int k = 0; k < Trials; k++)
        {
            double[] x = Enumerable.Range(0, 5).Select(_ => Normal.Sample(random, 0, 1)).ToArray();
            OutlierTestResult r = DixonQTest.Evaluate(x, 0.10);
            either += r.IsOutlier ? 1 : 0;
            high += r.IsOutlier && r.SuspectEnd == OutlierSide.High ? 1 : 0;
        }

        Assert.InRange(either / (double)Trials, 0.09, 0.11);
        Assert.InRange(high / (double)Trials, 0.043, 0.057);
    }

    // Common practice: zero range gives a defined result (Q = 0, nothing flagged), never NaN.
    [Fact]
    public void Evaluate_AllValuesEqual_DefinedNoOutlier()
    {
        OutlierTestResult r = DixonQTest.Evaluate([2.5, 2.5, 2.5, 2.5], 0.05);

        Assert.Equal(0, r.Statistic);
        Assert.False(r.IsOutlier);
        Assert.Equal(0, r.SuspectIndex);
        Assert.Single(r.Notes);
    }

    [Fact]
    public void Evaluate_EqualQAtBothEnds_ReportsHighestWithNote()
    {
        OutlierTestResult r = DixonQTest.Evaluate([2, 3, 1], 0.05);

        Assert.Equal(0.5, r.Statistic);
        Assert.Equal(1, r.SuspectIndex);
        Assert.Equal(OutlierSide.High, r.SuspectEnd);
        Assert.Single(r.Notes);
    }

    // A tie at the suspect end (two equal highest values) gives gap 0 there; the other end is then the suspect.
    [Fact]
    public void Evaluate_TiedHighestValues_TestsLowEnd()
    {
        OutlierTestResult r = DixonQTest.Evaluate([7, 7, 6, 1], 0.10);

        Assert.Equal(5.0 / 6.0, r.Statistic, 1e-15);
        Assert.Equal(3, r.SuspectIndex);
        Assert.Equal(OutlierSide.Low, r.SuspectEnd);
        Assert.True(r.IsOutlier);
    }

    // The range max − min of ±1.5e308 overflows a double; Q is still defined: low end (0 + 1.5e308)/3e308 = 0.5
    // beats high end (1.5e308 − 1e307)/3e308.
    [Fact]
    public void Evaluate_RangeBeyondDouble_StillDefined()
    {
        OutlierTestResult r = DixonQTest.Evaluate([-1.5e308, 0, 1e307, 1.5e308], 0.05);

        Assert.Equal(0.5, r.Statistic, 1e-14);
        Assert.Equal(OutlierSide.Low, r.SuspectEnd);
    }

    [Fact]
    public void ToString_StatesConventionAndSource()
    {
        string text = DixonQTest.Evaluate(Coins, 0.05).ToString();

        Assert.Contains("Dixon Q (r10) (two-sided, α = 0.05)", text, StringComparison.Ordinal);
        Assert.Contains("2.514 at index 3 (low end) flagged as outlier (not removed)", text, StringComparison.Ordinal);
        Assert.Contains("Rorabacher", text, StringComparison.Ordinal);
        Assert.Contains("either end", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_NullValues_Throws() =>
        Assert.Equal("values", Assert.Throws<ArgumentNullException>(() => DixonQTest.Evaluate(null!, 0.05)).ParamName);

    [Theory]
    [InlineData(2)]
    [InlineData(11)]
    public void Evaluate_CountOutsideTable_ThrowsNamingRange(int n)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => DixonQTest.Evaluate(Enumerable.Range(0, n).Select(i => (double)i).ToArray(), 0.05));
        Assert.Equal("values", e.ParamName);
        Assert.Contains("from 3 to 10", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void Evaluate_NonFiniteValue_ThrowsNamingIndexAndValue(double bad, string printed)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => DixonQTest.Evaluate([1, 2, 3, bad], 0.05));
        Assert.Equal("values", e.ParamName);
        Assert.Contains("has " + printed + " at index 3", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.03)]
    [InlineData(0.2)]
    [InlineData(0.025)]
    [InlineData(double.NaN)]
    public void Evaluate_AlphaNotTabulated_ThrowsListingAllowedValues(double alpha)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => DixonQTest.Evaluate(Coins, alpha));
        Assert.Equal("alpha", e.ParamName);
        Assert.Contains("one of 0.10, 0.05, 0.04, 0.02, 0.01", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(2)]
    [InlineData(11)]
    public void CriticalValue_CountOutsideTable_Throws(int n)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => DixonQTest.CriticalValue(n, 0.05));
        Assert.Equal("count", e.ParamName);
        Assert.Contains("n = 3 to 10", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void CriticalValue_AlphaNotTabulated_Throws() =>
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => DixonQTest.CriticalValue(5, 0.005)).ParamName);

    // Invented data (property test): Q is invariant under x → a + b·x, b > 0 (exact here: integer data, dyadic b).
    [Property(MaxTest = 200)]
    public Property Evaluate_AffineTransform_SameStatisticAndSuspect() =>
        Prop.ForAll(
            OutlierGenerators.Sample(3, 10).ToArbitrary(),
            OutlierGenerators.ExactAffine.ToArbitrary(),
            (x, ab) =>
            {
                OutlierTestResult r = DixonQTest.Evaluate(x, 0.05);
                OutlierTestResult t = DixonQTest.Evaluate(x.Select(v => ab.A + (ab.B * v)).ToArray(), 0.05);
                return r.Statistic == t.Statistic && r.SuspectIndex == t.SuspectIndex && r.SuspectEnd == t.SuspectEnd;
            });

    // Invented data (property test): the order of the values does not matter.
    [Property(MaxTest = 200)]
    public Property Evaluate_Permutation_SameStatisticAndSuspectValue() =>
        Prop.ForAll(
            OutlierGenerators.Sample(3, 10).SelectMany(x => Gen.Shuffle(x).Select(p => (x, p))).ToArbitrary(),
            xp =>
            {
                OutlierTestResult r = DixonQTest.Evaluate(xp.x, 0.05);
                OutlierTestResult t = DixonQTest.Evaluate(xp.p, 0.05);
                return r.Statistic == t.Statistic && r.SuspectValue == t.SuspectValue && r.SuspectEnd == t.SuspectEnd;
            });

    // Invented data (property test): a value far below all others becomes the suspect and is flagged.
    [Property(MaxTest = 200)]
    public Property Evaluate_FarAwayValueAdded_BecomesFlaggedSuspect() =>
        Prop.ForAll(
            OutlierGenerators.Sample(2, 9).ToArbitrary(),
            x =>
            {
                double far = x.Min() - (1000 * (x.Max() - x.Min()));
                OutlierTestResult r = DixonQTest.Evaluate([.. x, far], 0.01);
                return r.SuspectIndex == x.Length && r.SuspectEnd == OutlierSide.Low && r.IsOutlier;
            });
}
