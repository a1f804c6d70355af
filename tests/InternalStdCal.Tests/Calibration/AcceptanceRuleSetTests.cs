using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class AcceptanceRuleSetTests
{
    [Fact]
    public void UsEpa8000D_AverageRfWithSmallRsd_IsAccepted()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        AcceptanceVerdict verdict = AcceptanceRuleSet.UsEpa8000D.Evaluate(cal);

        // RSD = RSE = 0.99548 % (field-reference §0, computed) ≤ 20 % (US EPA 8000D, field-reference §4.1: FROM MEMORY, RSD ≤ 20 % VERIFIED secondary).
        Assert.True(verdict.Accepted);
        CriterionOutcome rsd = verdict.Criteria.Single(c => c.Criterion == "MaxResponseFactorRsdPercent");
        Assert.Equal(CriterionStatus.Passed, rsd.Status);
        Assert.Equal(0.99548, rsd.Observed!.Value, 5);
        Assert.Equal(20, rsd.Limit);
        Assert.Equal(CriterionStatus.NotApplicable, verdict.Criteria.Single(c => c.Criterion == "MinCorrelationCoefficientLinear").Status);
    }

    [Fact]
    public void IchM10_FiveLevels_IsRejectedForTooFewLevels()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        AcceptanceVerdict verdict = AcceptanceRuleSet.IchM10Chromatographic.Evaluate(cal);

        // ICH M10: at least 6 non-zero levels (VERIFIED secondary, field-reference §4.2); all 5 within ±15 %.
        Assert.False(verdict.Accepted);
        CriterionOutcome levels = verdict.Criteria.Single(c => c.Criterion == "MinLevels");
        Assert.Equal(CriterionStatus.Failed, levels.Status);
        Assert.Equal(5, levels.Observed);
        Assert.Equal(CriterionStatus.Passed, verdict.Criteria.Single(c => c.Criterion == "MinFractionOfCalibratorsPassing").Status);
        Assert.Contains("MinLevels", verdict.Failures.Select(f => f.Criterion));
        Assert.Contains("REJECTED", verdict.ToString(), StringComparison.Ordinal);
        Assert.Contains("5 non-blank levels fitted, required ≥ 6", verdict.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void IchM10Preset_HoldsThePublishedNumbers()
    {
        AcceptanceRuleSet r = AcceptanceRuleSet.IchM10Chromatographic;

        // ICH M10 Step 4 (2022): ±15 %, ±20 % at LLOQ, ≥ 75 %, ≥ 6 levels — VERIFIED (secondary), field-reference §4.2.
        Assert.Equal(15, r.MaxAbsRelativeErrorPercent);
        Assert.Equal(20, r.MaxAbsRelativeErrorAtLowestLevelPercent);
        Assert.Null(r.MaxAbsRelativeErrorAtHighestLevelPercent);
        Assert.Equal(0.75, r.MinFractionOfCalibratorsPassing);
        Assert.Equal(6, r.MinLevels);
        Assert.Equal(6, r.MinPassingLevels);
        Assert.Contains("VERIFIED (secondary", r.Source, StringComparison.Ordinal);
    }

    [Fact]
    public void UsEpa8000DPreset_HoldsTheRecalledNumbersAndSaysSo()
    {
        AcceptanceRuleSet r = AcceptanceRuleSet.UsEpa8000D;

        // US EPA 8000D: RF RSD ≤ 20 %, r ≥ 0.995, R² ≥ 0.99, RSE ≤ 20 % — FROM MEMORY (field-reference §4.1).
        Assert.Equal(20, r.MaxResponseFactorRsdPercent);
        Assert.Equal(0.995, r.MinCorrelationCoefficientLinear);
        Assert.Equal(0.99, r.MinCoefficientOfDeterminationNonLinear);
        Assert.Equal(20, r.MaxRelativeStandardErrorPercent);
        Assert.Contains("FROM MEMORY", r.Source, StringComparison.Ordinal);
    }

    [Fact]
    public void CustomRules_TightLimit_ListsTheFailingCalibratorWithItsError()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());
        var rules = new AcceptanceRuleSet("Lab SOP (test)", "invented for this test") { MaxAbsRelativeErrorPercent = 1 };

        AcceptanceVerdict verdict = rules.Evaluate(cal);

        // Back-calculated 19.6834 for nominal 20 → −1.583 % (field-reference §0, computed); the others are within ±1 %.
        Assert.False(verdict.Accepted);
        CalibratorOutcome failing = Assert.Single(verdict.Calibrators, c => !c.Passed);
        Assert.Equal("CAL-5", failing.Id);
        Assert.Equal(-1.583, failing.RelativeErrorPercent!.Value, 3);
        Assert.Contains("failing calibrator CAL-5: nominal 20 µg/L, back-calculated 19.6834 µg/L, %RE -1.58 % (limit ±1 %)", verdict.ToString(), StringComparison.Ordinal);
        Assert.Equal(CriterionStatus.Failed, Assert.Single(verdict.Criteria).Status);
    }

    [Fact]
    public void CustomRules_LowestLevelLimit_AppliesOnlyToTheLowestLevel()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());
        var rules = new AcceptanceRuleSet("Low end only", "invented for this test") { MaxAbsRelativeErrorAtLowestLevelPercent = 0.5 };

        AcceptanceVerdict verdict = rules.Evaluate(cal);

        // Lowest level: back-calculated 1.00979 → +0.979 % > 0.5 % (field-reference §0, computed); no limit elsewhere.
        Assert.False(verdict.Accepted);
        Assert.Equal(0.5, verdict.Calibrators[0].LimitPercent);
        Assert.All(verdict.Calibrators.Skip(1), c => Assert.Null(c.LimitPercent));
        Assert.Equal(new[] { "CAL-1" }, verdict.Calibrators.Where(c => !c.Passed).Select(c => c.Id));
    }

    [Fact]
    public void Evaluate_SinglePointUnderEpa_FailsBecauseRsdCannotBeEvaluated()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.FitSinglePoint(FieldReferenceStandards.ConstructedRf()[0]);

        AcceptanceVerdict verdict = AcceptanceRuleSet.UsEpa8000D.Evaluate(cal);

        // A criterion that applies but cannot be evaluated fails (library rule, documented on AcceptanceRuleSet).
        Assert.False(verdict.Accepted);
        CriterionOutcome rsd = verdict.Criteria.Single(c => c.Criterion == "MaxResponseFactorRsdPercent");
        Assert.Equal(CriterionStatus.Failed, rsd.Status);
        Assert.Null(rsd.Observed);
        Assert.Contains("could not be evaluated", rsd.Explanation, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_DuplicatingAPassingCalibrator_CanTurnAcceptanceIntoRejection()
    {
        // Not a monotone property: RFs 0.87, 1.00, 1.13 have mean 1.00 and %RE −13, 0, +13 (all within ±15 %).
        // Duplicating the passing 1.13 moves the mean RF to 1.0325, so 0.87 back-calculates at −15.7 % (arithmetic).
        var rules = new AcceptanceRuleSet("All within ±15 %", "invented for this test") { MaxAbsRelativeErrorPercent = 15 };
        List<CalibrationStandard> three = RfStandards(0.87, 1.00, 1.13);
        var four = new List<CalibrationStandard>(three)
        {
            new("S3 (repeat)", three[2].AnalyteConcentration, three[2].InternalStandardConcentration, three[2].Injections),
        };

        Assert.True(rules.Evaluate(ResponseFactorCalibration.Fit(three)).Accepted);
        AcceptanceVerdict after = rules.Evaluate(ResponseFactorCalibration.Fit(four));
        Assert.False(after.Accepted);
        Assert.Equal(-15.7, after.Calibrators[0].RelativeErrorPercent!.Value, 1);
    }

    [Fact]
    public void Evaluate_TwoStandardsAtOneConcentration_CountAsOneLevel()
    {
        // A level is a concentration (ICH M10 "concentration levels", field-reference §4.2): a repeat standard adds no level.
        List<CalibrationStandard> three = RfStandards(1.0, 1.0, 1.0);
        var four = new List<CalibrationStandard>(three)
        {
            new("S3 (repeat)", three[2].AnalyteConcentration, three[2].InternalStandardConcentration, three[2].Injections),
        };
        var rules = new AcceptanceRuleSet("Four levels", "invented for this test") { MinLevels = 4 };

        AcceptanceVerdict verdict = rules.Evaluate(ResponseFactorCalibration.Fit(four));

        Assert.Equal(3, ResponseFactorCalibration.Fit(four).LevelCount);
        Assert.False(verdict.Accepted);
        Assert.Equal(3, verdict.Criteria.Single().Observed);
    }

    [Fact]
    public void Constructor_BadArguments_AreRefusedWithNameAndRange()
    {
        var ex1 = Assert.Throws<ArgumentException>(() => new AcceptanceRuleSet(" ", "x"));
        Assert.Equal("name", ex1.ParamName);
        var ex2 = Assert.Throws<ArgumentOutOfRangeException>(() => new AcceptanceRuleSet("a", "b") { MaxAbsRelativeErrorPercent = -5 });
        Assert.Equal("MaxAbsRelativeErrorPercent", ex2.ParamName);
        Assert.Contains("was -5; it must be a finite number > 0", ex2.Message, StringComparison.Ordinal);
        var ex3 = Assert.Throws<ArgumentOutOfRangeException>(() => new AcceptanceRuleSet("a", "b") { MinFractionOfCalibratorsPassing = 1.5 });
        Assert.Contains("(0, 1]", ex3.Message, StringComparison.Ordinal);
        var ex4 = Assert.Throws<ArgumentOutOfRangeException>(() => new AcceptanceRuleSet("a", "b") { MinLevels = 0 });
        Assert.Contains("was 0; it must be >= 1", ex4.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentNullException>(() => AcceptanceRuleSet.UsEpa8000D.Evaluate(null!));
    }

    // Standards at 1, 2, 3, … µg/L with IS 1 µg/L whose single injection gives exactly the given RF.
    private static List<CalibrationStandard> RfStandards(params double[] rf) =>
        rf.Select((f, i) => CalibrationStandard.Create(
            "S" + (i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture),
            Concentration.FromMicrogramsPerLitre(i + 1),
            Concentration.FromMicrogramsPerLitre(1),
            new Injection(f * (i + 1), 1))).ToList();
}
