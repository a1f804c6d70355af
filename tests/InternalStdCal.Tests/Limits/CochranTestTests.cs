using System;
using System.Collections.Generic;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Limits;
using InternalStdCal.Tests.TestSupport;
using MathNet.Numerics.Statistics;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class CochranTestTests
{
    // Invented data (worked example): three tight groups and one scattered group of n = 3.
    // By hand: s² = 0.01, 0.01, 0.01, 1; C = 1/1.03 = 0.970874.
    private static readonly double[][] Groups =
    [
        [10.0, 10.2, 10.1],
        [10.1, 10.3, 10.2],
        [9.9, 10.1, 10.0],
        [9.0, 11.0, 10.0],
    ];

    // Field-reference §5.3 (formula FROM MEMORY → "from memory"; values COMPUTED): C_crit for p groups of n, 5 % / 1 %.
    [Theory]
    [InlineData(3, 2, "0.9669", "0.9933")]
    [InlineData(3, 3, "0.8709", "0.9423")]
    [InlineData(3, 4, "0.7977", "0.8832")]
    [InlineData(3, 5, "0.7457", "0.8335")]
    [InlineData(4, 2, "0.9065", "0.9676")]
    [InlineData(4, 3, "0.7679", "0.8643")]
    [InlineData(4, 4, "0.6839", "0.7814")]
    [InlineData(4, 5, "0.6287", "0.7212")]
    [InlineData(5, 2, "0.8413", "0.9279")]
    [InlineData(5, 3, "0.6838", "0.7885")]
    [InlineData(5, 4, "0.5981", "0.6957")]
    [InlineData(5, 5, "0.5440", "0.6329")]
    [InlineData(6, 2, "0.7807", "0.8828")]
    [InlineData(6, 3, "0.6161", "0.7218")]
    [InlineData(6, 4, "0.5321", "0.6258")]
    [InlineData(6, 5, "0.4803", "0.5635")]
    [InlineData(8, 2, "0.6798", "0.7945")]
    [InlineData(8, 3, "0.5157", "0.6152")]
    [InlineData(8, 4, "0.4377", "0.5210")]
    [InlineData(8, 5, "0.3910", "0.4627")]
    [InlineData(10, 2, "0.6020", "0.7175")]
    [InlineData(10, 3, "0.4450", "0.5358")]
    [InlineData(10, 4, "0.3733", "0.4469")]
    [InlineData(10, 5, "0.3311", "0.3934")]
    public void CriticalValue_FieldReferenceTable_MatchesToFourDecimals(int p, int n, string fivePercent, string onePercent)
    {
        Printed.Equal(fivePercent, CochranTest.CriticalValue(p, n, 0.05));
        Printed.Equal(onePercent, CochranTest.CriticalValue(p, n, 0.01));
    }

    // VERIFIED (secondary): "Cochran test" page of the UK National Measurement System chemical and biological
    // metrology website (nmschembio.org.uk, 2009), critical values at 95 % confidence, printed to 3 decimals.
    [Theory]
    [InlineData(2, "0.998", "0.975", "0.939", "0.906")]
    [InlineData(7, "0.727", "0.561", "0.480", "0.431")]
    [InlineData(9, "0.638", "0.477", "0.403", "0.358")]
    [InlineData(15, "0.471", "0.335", "0.276", "0.242")]
    [InlineData(20, "0.389", "0.270", "0.221", "0.192")]
    public void CriticalValue_PrintedFivePercentTable_Matches(int p, string n2, string n3, string n4, string n5)
    {
        Printed.Equal(n2, CochranTest.CriticalValue(p, 2, 0.05));
        Printed.Equal(n3, CochranTest.CriticalValue(p, 3, 0.05));
        Printed.Equal(n4, CochranTest.CriticalValue(p, 4, 0.05));
        Printed.Equal(n5, CochranTest.CriticalValue(p, 5, 0.05));
    }

    [Fact]
    public void Evaluate_ScatteredGroup_FlaggedAtOnePercent()
    {
        CochranTestResult r = CochranTest.Evaluate(Groups, 0.01);

        Numeric.AssertRelative(1 / 1.03, r.Statistic, 1e-12);
        Printed.Equal("0.8643", r.CriticalValue); // field-reference §5.3, p = 4, n = 3, 1 %
        Assert.Equal(3, r.SuspectIndex);
        Assert.True(r.IsOutlier);
        Assert.Equal(4, r.GroupCount);
        Assert.Equal(3, r.ReplicatesPerGroup);
        Assert.Equal(Groups, r.Groups!.Select(g => g.ToArray()));
    }

    // Reference library: group variances equal MathNet.Numerics Statistics.Variance (n − 1 denominator).
    [Fact]
    public void Evaluate_Groups_VariancesMatchMathNet()
    {
        CochranTestResult r = CochranTest.Evaluate(Groups, 0.05);

        for (int g = 0; g < Groups.Length; g++)
        {
            Numeric.AssertRelative(Groups[g].Variance(), r.Variances[g], 1e-13);
        }
    }

    [Fact]
    public void Evaluate_VariancesGiven_SameAsFromGroups()
    {
        CochranTestResult fromGroups = CochranTest.Evaluate(Groups, 0.05);
        CochranTestResult fromVariances = CochranTest.Evaluate(fromGroups.Variances.ToArray(), 3, 0.05);

        Assert.Equal(fromGroups.Statistic, fromVariances.Statistic);
        Assert.Equal(fromGroups.CriticalValue, fromVariances.CriticalValue);
        Assert.Equal(fromGroups.SuspectIndex, fromVariances.SuspectIndex);
        Assert.Null(fromVariances.Groups);
    }

    // ISO 5725-2 classification (from memory): p = 5, n = 2, critical values 0.8413 (5 %) and 0.9279 (1 %) (§5.3).
    [Theory]
    [InlineData(new[] { 1.0, 1.0, 1.0, 1.0, 2.0 }, OutlierCategory.Correct)]
    [InlineData(new[] { 0.03, 0.88, 0.03, 0.03, 0.03 }, OutlierCategory.Straggler)]
    [InlineData(new[] { 0.01, 0.01, 0.96, 0.01, 0.01 }, OutlierCategory.StatisticalOutlier)]
    public void Classify_Variances_GivesIso5725Category(double[] variances, OutlierCategory expected)
    {
        CochranClassification c = CochranTest.Classify(variances, 2);

        Assert.Equal(expected, c.Category);
        Assert.Equal(Array.IndexOf(variances, variances.Max()), c.SuspectIndex);
        Assert.Equal(0.05, c.AtFivePercent.SignificanceLevel);
        Assert.Equal(0.01, c.AtOnePercent.SignificanceLevel);
    }

    [Fact]
    public void Classify_Groups_ScatteredGroupIsStatisticalOutlier()
    {
        CochranClassification c = CochranTest.Classify(Groups);

        Assert.Equal(OutlierCategory.StatisticalOutlier, c.Category);
        Assert.Contains("statistical outlier", c.ToString(), StringComparison.Ordinal);
    }

    // Common practice: all variances 0 gives a defined result (C = 1/p, as for equal variances), never NaN.
    [Fact]
    public void Evaluate_AllVariancesZero_DefinedNoOutlier()
    {
        CochranTestResult r = CochranTest.Evaluate([[1.0, 1.0], [2.0, 2.0], [3.0, 3.0]], 0.05);

        Assert.Equal(1.0 / 3, r.Statistic);
        Assert.False(r.IsOutlier);
        Assert.Single(r.Notes);
    }

    // Scale-free statistic: tiny data whose variances are far below 1e-300 give the same C.
    [Fact]
    public void Evaluate_TinyData_SameStatistic()
    {
        CochranTestResult r = CochranTest.Evaluate(Groups.Select(g => g.Select(v => v * 1e-200).ToArray()).ToArray(), 0.01);

        Numeric.AssertRelative(1 / 1.03, r.Statistic, 1e-9);
        Assert.Equal(3, r.SuspectIndex);
    }

    [Fact]
    public void Evaluate_VarianceBeyondDouble_ThrowsNamingGroup()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Evaluate(Groups.Select(g => g.Select(v => v * 1e200).ToArray()).ToArray(), 0.05));
        Assert.Equal("groups[0]", e.ParamName);
    }

    // Variances near double.MaxValue: their sum would overflow; C is still defined.
    [Fact]
    public void Evaluate_HugeVariances_StillDefined()
    {
        CochranTestResult r = CochranTest.Evaluate([1e308, 1e308, 1e308], 2, 0.05);

        Assert.Equal(1.0 / 3, r.Statistic, 1e-15);
        Assert.False(r.IsOutlier);
    }

    [Fact]
    public void ToString_Flagged_NamesGroupAndSource()
    {
        string text = CochranTest.Evaluate(Groups, 0.01).ToString();

        Assert.Contains("group 3", text, StringComparison.Ordinal);
        Assert.Contains("flagged (not removed)", text, StringComparison.Ordinal);
        Assert.Contains("ISO 5725-2", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_NullGroups_Throws() =>
        Assert.Equal("groups", Assert.Throws<ArgumentNullException>(() => CochranTest.Evaluate((IReadOnlyList<IReadOnlyList<double>>)null!, 0.05)).ParamName);

    [Fact]
    public void Evaluate_NullGroup_ThrowsNamingIndex() =>
        Assert.Equal("groups[1]", Assert.Throws<ArgumentNullException>(() => CochranTest.Evaluate([[1.0, 2.0], null!], 0.05)).ParamName);

    [Fact]
    public void Evaluate_OneGroup_Throws() =>
        Assert.Equal("groups", Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Evaluate([[1.0, 2.0]], 0.05)).ParamName);

    [Fact]
    public void Evaluate_GroupOfOne_Throws() =>
        Assert.Equal("groups[0]", Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Evaluate([[1.0], [2.0]], 0.05)).ParamName);

    [Fact]
    public void Evaluate_UnequalGroupSizes_ThrowsNamingSizes()
    {
        var e = Assert.Throws<ArgumentException>(() => CochranTest.Evaluate([[1.0, 2.0, 3.0], [1.0, 2.0]], 0.05));
        Assert.Equal("groups", e.ParamName);
        Assert.Contains("'groups[1]' has 2 values but group 0 has 3", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_NaNInGroup_ThrowsNamingGroupIndexAndValue()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Evaluate([[1.0, 2.0], [3.0, double.NaN]], 0.05));
        Assert.Equal("groups[1]", e.ParamName);
        Assert.Contains("has NaN at index 1", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(0.5)]
    [InlineData(double.NaN)]
    public void Evaluate_AlphaOutsideRange_Throws(double alpha)
    {
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Evaluate(Groups, alpha)).ParamName);
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Evaluate([1.0, 2.0], 3, alpha)).ParamName);
    }

    [Fact]
    public void Evaluate_NullVariances_Throws() =>
        Assert.Equal("variances", Assert.Throws<ArgumentNullException>(() => CochranTest.Evaluate(null!, 3, 0.05)).ParamName);

    [Theory]
    [InlineData(-0.1, "-0.1 at index 1")]
    [InlineData(double.PositiveInfinity, "Infinity at index 1")]
    public void Evaluate_BadVariance_ThrowsNamingIndexAndValue(double bad, string expected)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Evaluate([1.0, bad, 2.0], 3, 0.05));
        Assert.Equal("variances", e.ParamName);
        Assert.Contains(expected, e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_OneVariance_Throws() =>
        Assert.Equal("variances", Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Evaluate([1.0], 3, 0.05)).ParamName);

    [Fact]
    public void Evaluate_OneReplicate_Throws() =>
        Assert.Equal("replicatesPerGroup", Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Evaluate([1.0, 2.0], 1, 0.05)).ParamName);

    [Fact]
    public void Classify_BadInput_Throws()
    {
        Assert.Throws<ArgumentNullException>(() => CochranTest.Classify((IReadOnlyList<IReadOnlyList<double>>)null!));
        Assert.Equal("replicatesPerGroup", Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Classify([1.0, 2.0], 1)).ParamName);
        Assert.Equal("variances", Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.Classify([1.0, double.NaN], 2)).ParamName);
    }

    [Theory]
    [InlineData(1, 3, 0.05, "groupCount")]
    [InlineData(3, 1, 0.05, "replicatesPerGroup")]
    [InlineData(3, 3, 0.0, "alpha")]
    [InlineData(3, 3, 0.7, "alpha")]
    public void CriticalValue_BadInput_Throws(int p, int n, double alpha, string paramName) =>
        Assert.Equal(paramName, Assert.Throws<ArgumentOutOfRangeException>(() => CochranTest.CriticalValue(p, n, alpha)).ParamName);

    // Invented data (property test): C is invariant under x → a + b·x (b > 0) applied to all groups.
    [Property(MaxTest = 200)]
    public Property Evaluate_AffineTransform_SameStatisticAndSuspect() =>
        Prop.ForAll(
            GroupSets().ToArbitrary(),
            OutlierGenerators.DecimalAffine.ToArbitrary(),
            (groups, ab) =>
            {
                CochranTestResult r = CochranTest.Evaluate(groups, 0.05);
                CochranTestResult t = CochranTest.Evaluate(groups.Select(g => g.Select(v => ab.A + (ab.B * v)).ToArray()).ToArray(), 0.05);
                bool uniqueMax = r.Variances.Count(v => v == r.LargestVariance) == 1;
                return Math.Abs(r.Statistic - t.Statistic) <= 1e-9 * r.Statistic && (!uniqueMax || r.SuspectIndex == t.SuspectIndex);
            });

    // Invented data (property test): the order of the groups does not matter; C lies in [1/p, 1].
    [Property(MaxTest = 200)]
    public Property Evaluate_GroupPermutation_SameStatistic() =>
        Prop.ForAll(
            GroupSets().SelectMany(g => Gen.Shuffle(g).Select(p => (g, p))).ToArbitrary(),
            gp =>
            {
                CochranTestResult r = CochranTest.Evaluate(gp.g, 0.05);
                CochranTestResult t = CochranTest.Evaluate(gp.p, 0.05);
                return Math.Abs(r.Statistic - t.Statistic) <= 1e-13 && r.LargestVariance == t.LargestVariance
                    && r.Statistic >= (1.0 / r.GroupCount) - 1e-15 && r.Statistic <= 1;
            });

    // Invented data (property test): one group with values far apart becomes the suspect and is flagged.
    [Property(MaxTest = 200)]
    public Property Evaluate_FarScatteredGroupAdded_BecomesFlaggedSuspect() =>
        Prop.ForAll(
            GroupSets().ToArbitrary(),
            groups =>
            {
                int n = groups[0].Length;
                double span = 1000 * (groups.SelectMany(g => g).Max() - groups.SelectMany(g => g).Min() + 1);
                double[] far = Enumerable.Range(0, n).Select(i => i * span).ToArray();
                CochranTestResult r = CochranTest.Evaluate([.. groups, far], 0.01);
                return r.SuspectIndex == groups.Length && r.IsOutlier;
            });

    // Property: a larger α gives a smaller critical value.
    [Property(MaxTest = 200)]
    public Property CriticalValue_LargerAlpha_Smaller() =>
        Prop.ForAll(
            Gen.Choose(2, 30).ToArbitrary(),
            Gen.Choose(2, 10).ToArbitrary(),
            Gen.Two(Gen.Choose(1, 499)).Where(p => p.Item1 != p.Item2).ToArbitrary(),
            (p, n, pair) => CochranTest.CriticalValue(p, n, Math.Min(pair.Item1, pair.Item2) / 1000.0)
                > CochranTest.CriticalValue(p, n, Math.Max(pair.Item1, pair.Item2) / 1000.0));

    // 2–8 groups of 2–6 integer replicates each, at least one group not constant.
    private static Gen<double[][]> GroupSets() =>
        from p in Gen.Choose(2, 8)
        from n in Gen.Choose(2, 6)
        from g in Gen.ArrayOf(Gen.ArrayOf(Gen.Choose(-1000, 1000).Select(v => (double)v), n), p)
        where g.Any(x => x.Distinct().Count() > 1)
        select g;
}
