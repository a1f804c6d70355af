using System;
using System.Linq;
using InternalStdCal.Calibration;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class WeightingComparisonTests
{
    [Fact]
    public void Compare_ConstructedDataSet_ScoresMatchFieldReferenceErrors()
    {
        WeightingComparison cmp = WeightingComparison.Compare(FieldReferenceStandards.ConstructedRf(), CalibrationModel.Linear);

        // Σ|%RE|: OLS 4.342 + 1.296 + 0.0381 + 1.320 + 0.304 = 7.300; 1/x²: 0.190 + 0.297 + 0.025 + 0.865 + 0.997 = 2.374
        // (per-standard errors computed, field-reference §0).
        Assert.Equal(7.300, cmp.Candidates.Single(c => c.Name == "none").SumAbsRelativeErrorPercent!.Value, 2);
        Assert.Equal(2.374, cmp.Candidates.Single(c => c.Name == "1/x²").SumAbsRelativeErrorPercent!.Value, 2);
        Assert.True(cmp.Candidates.Single(c => c.Name == "1/x²").Rank < cmp.Candidates.Single(c => c.Name == "none").Rank);
        double best = cmp.Candidates.Where(c => !c.IsRefused).Min(c => c.SumAbsRelativeErrorPercent!.Value);
        Assert.Equal(best, cmp.Best!.SumAbsRelativeErrorPercent);
        Assert.Equal(1, cmp.Best.Rank);
    }

    [Fact]
    public void Compare_NoReplicates_RefusesInverseVarianceWithReason()
    {
        WeightingComparison cmp = WeightingComparison.Compare(FieldReferenceStandards.ConstructedRf(), CalibrationModel.Linear);

        WeightingCandidate s2 = cmp.Candidates.Single(c => c.Name == "1/s² (replicates)");
        Assert.True(s2.IsRefused);
        Assert.Null(s2.Rank);
        Assert.Contains("'CAL-1' has 1 injection(s)", s2.Refusal, StringComparison.Ordinal);
        Assert.Null(cmp.VarianceHomogeneity);
    }

    [Fact]
    public void Compare_WithBlank_RefusesInverseXSchemesAndSaysWhy()
    {
        WeightingComparison cmp = WeightingComparison.Compare(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear);

        // 1/x and 1/x² are undefined at x = 0 (field-reference §2.1); 1/y is defined since the blank reads 2.1 (§1.2).
        Assert.Contains("1/x needs x > 0", cmp.Candidates.Single(c => c.Name == "1/x").Refusal, StringComparison.Ordinal);
        Assert.Contains("1/x² needs x ≠ 0", cmp.Candidates.Single(c => c.Name == "1/x²").Refusal, StringComparison.Ordinal);
        Assert.False(cmp.Candidates.Single(c => c.Name == "1/y").IsRefused);
        string text = cmp.ToString();
        Assert.Contains("refused: 1/x — ", text, StringComparison.Ordinal);
        Assert.Contains("choice: ", text, StringComparison.Ordinal);
        Assert.Contains("variance homogeneity not checked", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Compare_GivenList_TriesOnlyThose()
    {
        WeightingComparison cmp = WeightingComparison.Compare(
            FieldReferenceStandards.ConstructedRf(), CalibrationModel.Linear, null, new[] { Weighting.None, Weighting.InverseXSquared });

        Assert.Equal(new[] { "1/x²", "none" }, cmp.Candidates.Select(c => c.Name));
        Assert.Throws<ArgumentNullException>(() => WeightingComparison.Compare(FieldReferenceStandards.ConstructedRf(), CalibrationModel.Linear, null, new Weighting[] { null! }));
        Assert.Throws<ArgumentOutOfRangeException>(() => WeightingComparison.Compare(FieldReferenceStandards.ConstructedRf(), (CalibrationModel)9));
    }
}
