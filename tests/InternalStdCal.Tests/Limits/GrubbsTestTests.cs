using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Limits;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class GrubbsTestTests
{
    // Tietjen–Moore data as used in the NIST/SEMATECH e-Handbook of Statistical Methods (Grubbs' test section).
    private static readonly double[] TietjenMoore = [199.31, 199.53, 200.19, 200.82, 201.92, 201.95, 202.18, 245.57];

    // Masses of a coin in g, Harvey, Analytical Chemistry 2.1 (open textbook), ch. 4, problem 4.22.
    private static readonly double[] Coins = [3.067, 3.049, 3.039, 2.514, 3.048, 3.079, 3.094, 3.109, 3.102];

    // Field-reference §5.1 Grubbs table: COMPUTED (formula FROM MEMORY → "from memory"); its two-sided columns
    // VERIFIED (3 decimals) against LibreTexts "Appendix 07: Critical Values for Grubb's Test".
    [Theory]
    [InlineData(3, "1.1543", "1.1547", "1.1531", "1.1546")]
    [InlineData(4, "1.4812", "1.4962", "1.4625", "1.4925")]
    [InlineData(5, "1.7150", "1.7637", "1.6714", "1.7489")]
    [InlineData(6, "1.8871", "1.9728", "1.8221", "1.9442")]
    [InlineData(7, "2.0200", "2.1391", "1.9381", "2.0973")]
    [InlineData(8, "2.1266", "2.2744", "2.0317", "2.2208")]
    [InlineData(9, "2.2150", "2.3868", "2.1096", "2.3231")]
    [InlineData(10, "2.2900", "2.4821", "2.1761", "2.4097")]
    [InlineData(11, "2.3547", "2.5641", "2.2339", "2.4843")]
    [InlineData(12, "2.4116", "2.6357", "2.2850", "2.5494")]
    public void CriticalValue_FieldReferenceTable_MatchesToFourDecimals(int n, string twoSided05, string twoSided01, string oneSided05, string oneSided01)
    {
        Printed.Equal(twoSided05, GrubbsTest.CriticalValue(n, 0.05, OutlierSide.TwoSided));
        Printed.Equal(twoSided01, GrubbsTest.CriticalValue(n, 0.01, OutlierSide.TwoSided));
        Printed.Equal(oneSided05, GrubbsTest.CriticalValue(n, 0.05, OutlierSide.High));
        Printed.Equal(oneSided01, GrubbsTest.CriticalValue(n, 0.01, OutlierSide.High));
        Assert.Equal(GrubbsTest.CriticalValue(n, 0.05, OutlierSide.High), GrubbsTest.CriticalValue(n, 0.05, OutlierSide.Low));
    }

    // VERIFIED: LibreTexts "Appendix 07: Critical Values for Grubb's Test", α = 0.05 and 0.01 as printed (3 decimals);
    // its n = 7, α = 0.05 entry (2.202) is a typo for 2.020 (field-reference §5.1), and its n = 15 entries (2.549,
    // 2.755) disagree with the formula (2.5483, 2.8061; COMPUTED with mpmath here), so they are left out.
    [Theory]
    [InlineData(4, 0.05, "1.481")]
    [InlineData(6, 0.05, "1.887")]
    [InlineData(10, 0.05, "2.290")]
    [InlineData(13, 0.05, "2.462")]
    [InlineData(14, 0.05, "2.507")]
    [InlineData(7, 0.01, "2.139")]
    [InlineData(12, 0.01, "2.636")]
    [InlineData(13, 0.01, "2.699")]
    [InlineData(14, 0.01, "2.755")]
    public void CriticalValue_PrintedTwoSidedTable_Matches(int n, double alpha, string printed) =>
        Printed.Equal(printed, GrubbsTest.CriticalValue(n, alpha, OutlierSide.TwoSided));

    // Grubbs' G can never exceed (n − 1)/√n (Samuelson's inequality; field-reference §5.1 note on n = 3).
    [Theory]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(30)]
    public void CriticalValue_AnyN_StaysBelowLargestPossibleG(int n) =>
        Assert.True(GrubbsTest.CriticalValue(n, 0.001, OutlierSide.TwoSided) < (n - 1) / Math.Sqrt(n));

    // VERIFIED (secondary): G = 2.468765 for the Tietjen–Moore data, position 8 (R package climtrends documentation,
    // example output, citing the NIST/SEMATECH e-Handbook); critical value two-sided α = 0.05, n = 8: 2.1266 (§5.1).
    [Fact]
    public void Evaluate_TietjenMooreData_FlagsHighestValue()
    {
        OutlierTestResult r = GrubbsTest.Evaluate(TietjenMoore, 0.05, OutlierSide.TwoSided);

        Printed.Equal("2.468765", r.Statistic);
        Printed.Equal("2.1266", r.CriticalValue);
        Assert.Equal(7, r.SuspectIndex);
        Assert.Equal(245.57, r.SuspectValue);
        Assert.Equal(OutlierSide.High, r.SuspectEnd);
        Assert.True(r.IsOutlier);
        Assert.Empty(r.Notes);
        Assert.Equal(TietjenMoore, r.Values);
    }

    // One-sided high end: same G, critical value one-sided α = 0.05, n = 8: 2.0317 (field-reference §5.1, COMPUTED).
    [Fact]
    public void Evaluate_TietjenMooreHighEnd_UsesOneSidedCriticalValue()
    {
        OutlierTestResult r = GrubbsTest.Evaluate(TietjenMoore, 0.05, OutlierSide.High);

        Printed.Equal("2.468765", r.Statistic);
        Printed.Equal("2.0317", r.CriticalValue);
        Assert.True(r.IsOutlier);
        Assert.Equal(OutlierSide.High, r.Alternative);
    }

    // The low end of the same data holds no outlier: the suspect is the lowest value, G far below 2.0317.
    [Fact]
    public void Evaluate_TietjenMooreLowEnd_NotFlagged()
    {
        OutlierTestResult r = GrubbsTest.Evaluate(TietjenMoore, 0.05, OutlierSide.Low);

        Assert.Equal(0, r.SuspectIndex);
        Assert.Equal(OutlierSide.Low, r.SuspectEnd);
        Assert.False(r.IsOutlier);
    }

    // Harvey, Analytical Chemistry 2.1 (coin masses): G = 2.64 for 2.514 g against G(0.05, 9) = 2.215 (from memory);
    // the critical value VERIFIED against LibreTexts Appendix 07.
    [Fact]
    public void Evaluate_CoinMasses_FlagsLowestValue()
    {
        OutlierTestResult r = GrubbsTest.Evaluate(Coins, 0.05, OutlierSide.TwoSided);

        Printed.Equal("2.64", r.Statistic);
        Printed.Equal("2.215", r.CriticalValue);
        Assert.Equal(3, r.SuspectIndex);
        Assert.Equal(OutlierSide.Low, r.SuspectEnd);
        Assert.True(r.IsOutlier);
    }

    // Common practice: equal values have s = 0; the result is defined (G = 0, nothing flagged), never NaN.
    [Fact]
    public void Evaluate_AllValuesEqual_DefinedNoOutlier()
    {
        OutlierTestResult r = GrubbsTest.Evaluate([0.1, 0.1, 0.1, 0.1], 0.05, OutlierSide.TwoSided);

        Assert.Equal(0, r.Statistic);
        Assert.False(r.IsOutlier);
        Assert.Equal(0, r.SuspectIndex);
        Assert.Single(r.Notes);
    }

    // Symmetric data: both ends equally far from the mean; the first in input order is reported, with a note.
    [Fact]
    public void Evaluate_SymmetricData_ReportsFirstExtremeWithNote()
    {
        OutlierTestResult r = GrubbsTest.Evaluate([2, 3, 1], 0.05, OutlierSide.TwoSided);

        Assert.Equal(1, r.SuspectIndex);
        Assert.Equal(OutlierSide.High, r.SuspectEnd);
        Assert.Equal(1, r.Statistic, 1e-15);
        Assert.Single(r.Notes);
    }

    // Scale-free statistic: the same G for data near the ends of the double range (no overflow or underflow).
    [Theory]
    [InlineData(1e300)]
    [InlineData(1e-300)]
    public void Evaluate_ExtremeMagnitudes_SameStatistic(double factor)
    {
        OutlierTestResult r = GrubbsTest.Evaluate(TietjenMoore.Select(v => v * factor).ToArray(), 0.05, OutlierSide.TwoSided);

        Numeric.AssertRelative(GrubbsTest.Evaluate(TietjenMoore, 0.05, OutlierSide.TwoSided).Statistic, r.Statistic, 1e-12);
        Assert.Equal(7, r.SuspectIndex);
    }

    [Fact]
    public void Evaluate_InputArrayChangedAfterwards_ResultKeepsOriginalValues()
    {
        double[] x = (double[])TietjenMoore.Clone();
        OutlierTestResult r = GrubbsTest.Evaluate(x, 0.05, OutlierSide.TwoSided);
        x[7] = 0;

        Assert.Equal(245.57, r.Values[7]);
        Assert.Equal(TietjenMoore, x.Take(7).Concat([245.57]));
    }

    [Fact]
    public void ToString_Flagged_NamesTestSuspectAndSource()
    {
        string text = GrubbsTest.Evaluate(TietjenMoore, 0.05, OutlierSide.TwoSided).ToString();

        Assert.Contains("Grubbs (two-sided, α = 0.05)", text, StringComparison.Ordinal);
        Assert.Contains("245.57 at index 7 (high end) flagged as outlier (not removed)", text, StringComparison.Ordinal);
        Assert.Contains("Technometrics 11 (1969)", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_NullValues_Throws() =>
        Assert.Equal("values", Assert.Throws<ArgumentNullException>(() => GrubbsTest.Evaluate(null!, 0.05, OutlierSide.TwoSided)).ParamName);

    [Fact]
    public void Evaluate_TwoValues_ThrowsNamingCount()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => GrubbsTest.Evaluate([1, 2], 0.05, OutlierSide.TwoSided));
        Assert.Equal("values", e.ParamName);
        Assert.Contains("has 2 elements", e.Message, StringComparison.Ordinal);
        Assert.Contains("at least 3", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    [InlineData(double.NegativeInfinity, "-Infinity")]
    public void Evaluate_NonFiniteValue_ThrowsNamingIndexAndValue(double bad, string printed)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => GrubbsTest.Evaluate([1, 2, bad, 4], 0.05, OutlierSide.TwoSided));
        Assert.Equal("values", e.ParamName);
        Assert.Contains("has " + printed + " at index 2", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(0.5)]
    [InlineData(-0.05)]
    [InlineData(double.NaN)]
    public void Evaluate_AlphaOutsideRange_Throws(double alpha) =>
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => GrubbsTest.Evaluate(TietjenMoore, alpha, OutlierSide.TwoSided)).ParamName);

    [Fact]
    public void Evaluate_UndefinedSide_Throws() =>
        Assert.Equal("alternative", Assert.Throws<ArgumentOutOfRangeException>(() => GrubbsTest.Evaluate(TietjenMoore, 0.05, (OutlierSide)7)).ParamName);

    [Fact]
    public void CriticalValue_CountBelowThree_Throws() =>
        Assert.Equal("count", Assert.Throws<ArgumentOutOfRangeException>(() => GrubbsTest.CriticalValue(2, 0.05, OutlierSide.TwoSided)).ParamName);

    [Theory]
    [InlineData(0)]
    [InlineData(0.6)]
    [InlineData(double.NaN)]
    public void CriticalValue_AlphaOutsideRange_Throws(double alpha) =>
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => GrubbsTest.CriticalValue(5, alpha, OutlierSide.TwoSided)).ParamName);

    [Fact]
    public void CriticalValue_UndefinedSide_Throws() =>
        Assert.Equal("alternative", Assert.Throws<ArgumentOutOfRangeException>(() => GrubbsTest.CriticalValue(5, 0.05, (OutlierSide)(-1))).ParamName);

    // Invented data (property test): G is invariant under x → a + b·x, b > 0 (up to rounding).
    [Property(MaxTest = 200)]
    public Property Evaluate_AffineTransform_SameStatisticAndSuspect() =>
        Prop.ForAll(
            OutlierGenerators.Sample(3, 20).ToArbitrary(),
            OutlierGenerators.DecimalAffine.ToArbitrary(),
            Gen.Elements(OutlierSide.TwoSided, OutlierSide.High, OutlierSide.Low).ToArbitrary(),
            (x, ab, side) =>
            {
                OutlierTestResult r = GrubbsTest.Evaluate(x, 0.05, side);
                OutlierTestResult t = GrubbsTest.Evaluate(x.Select(v => ab.A + (ab.B * v)).ToArray(), 0.05, side);
                bool sameSuspect = EndsTie(x) || (x[t.SuspectIndex] == r.SuspectValue && t.SuspectEnd == r.SuspectEnd);
                return Math.Abs(r.Statistic - t.Statistic) <= 1e-9 * r.Statistic && sameSuspect;
            });

    // Invented data (property test): the order of the values does not matter.
    [Property(MaxTest = 200)]
    public Property Evaluate_Permutation_SameStatisticAndSuspectValue() =>
        Prop.ForAll(
            OutlierGenerators.Sample(3, 20).SelectMany(x => Gen.Shuffle(x).Select(p => (x, p))).ToArbitrary(),
            xp =>
            {
                OutlierTestResult r = GrubbsTest.Evaluate(xp.x, 0.05, OutlierSide.TwoSided);
                OutlierTestResult t = GrubbsTest.Evaluate(xp.p, 0.05, OutlierSide.TwoSided);
                return Math.Abs(r.Statistic - t.Statistic) <= 1e-12 * r.Statistic && (EndsTie(xp.x) || r.SuspectValue == t.SuspectValue);
            });

    // Invented data (property test): a value far above all others becomes the suspect and is flagged.
    [Property(MaxTest = 200)]
    public Property Evaluate_FarAwayValueAdded_BecomesFlaggedSuspect() =>
        Prop.ForAll(
            OutlierGenerators.Sample(3, 20).ToArbitrary(),
            x =>
            {
                double far = x.Max() + (1000 * (x.Max() - x.Min()));
                OutlierTestResult r = GrubbsTest.Evaluate([.. x, far], 0.05, OutlierSide.TwoSided);
                return r.SuspectIndex == x.Length && r.SuspectEnd == OutlierSide.High && r.IsOutlier;
            });

    // Property: a larger α gives a smaller (or, at the n = 3 plateau, equal) critical value.
    [Property(MaxTest = 300)]
    public Property CriticalValue_LargerAlpha_NotLarger() =>
        Prop.ForAll(
            Gen.Choose(3, 60).ToArbitrary(),
            Gen.Two(Gen.Choose(1, 499)).Where(p => p.Item1 != p.Item2).ToArbitrary(),
            Gen.Elements(OutlierSide.TwoSided, OutlierSide.High).ToArbitrary(),
            (n, pair, side) =>
            {
                double a1 = Math.Min(pair.Item1, pair.Item2) / 1000.0;
                double a2 = Math.Max(pair.Item1, pair.Item2) / 1000.0;
                return GrubbsTest.CriticalValue(n, a1, side) >= GrubbsTest.CriticalValue(n, a2, side);
            });

    [Fact]
    public void CriticalValue_TableAlphas_StrictlyDecreasing()
    {
        for (int n = 3; n <= 12; n++)
        {
            Assert.True(GrubbsTest.CriticalValue(n, 0.01, OutlierSide.TwoSided) > GrubbsTest.CriticalValue(n, 0.05, OutlierSide.TwoSided));
            Assert.True(GrubbsTest.CriticalValue(n, 0.05, OutlierSide.TwoSided) > GrubbsTest.CriticalValue(n, 0.10, OutlierSide.TwoSided));
        }
    }

    // Exact check on integer data: max and min equally far from the mean (n·max − Σ = Σ − n·min).
    private static bool EndsTie(double[] x)
    {
        long sum = x.Sum(v => (long)v);
        return (x.Length * (long)x.Max()) - sum == sum - (x.Length * (long)x.Min());
    }
}
