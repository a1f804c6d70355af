using System;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Decisions;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Decisions;

public class ReplicatesPlannerTests
{
    private static readonly SpecificationLimit UpperTen = SpecificationLimit.Upper(MgL(10));

    // Field-reference §8.2 replicates table (COMPUTED; exact non-central-t power of the one-sided one-sample t test,
    // α = 0.05): smallest n, power at n and at n − 1, normal approximation ((z_α + z_β)σ/δ)².
    [Theory]
    [InlineData(2.0, 0.95, 5, "0.97483", "0.90845", "2.71")]
    [InlineData(1.0, 0.80, 8, "0.81502", "0.75440", "6.18")]
    [InlineData(1.0, 0.95, 13, "0.95970", "0.94469", "10.82")]
    [InlineData(0.5, 0.95, 45, "0.95124", "0.94727", "43.29")]
    public void ForEffectSize_FieldReferenceTable_GivesSmallestN(double effect, double power, int n, string atN, string atFewer, string normal)
    {
        ReplicatePlan plan = ReplicatesPlanner.ForEffectSize(effect, 0.05, power);
        Assert.Equal(n, plan.Replicates);
        Printed.Equal(atN, plan.Power);
        Printed.Equal(atFewer, plan.PowerWithOneFewer!.Value);
        Printed.Equal(normal, plan.NormalApproximation);
    }

    // Field-reference §8.2 (COMPUTED): δ/σ = 2 → 5 replicates; the same through a limit, a mean and an SD or RSD,
    // on either side of an upper limit and for a lower limit.
    [Fact]
    public void ForExpectedMean_SdOrRsd_GiveTheSamePlanAsTheEffectSize()
    {
        Assert.Equal(5, ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(11), MgL(0.5), 0.05, 0.95).Replicates);
        Assert.Equal(5, ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(9), MgL(0.5), 0.05, 0.95).Replicates);
        Assert.Equal(5, ReplicatesPlanner.ForExpectedMean(SpecificationLimit.Lower(MgL(10)), MgL(9), MgL(0.5), 0.05, 0.95).Replicates);
        Assert.Equal(8, ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(8), 25, 0.05, 0.80).Replicates); // σ = 2, δ = 2
        Assert.Equal(13, ReplicatesPlanner.ForDistance(Concentration.FromMicrogramsPerLitre(300), MgL(0.3), 0.05, 0.95).Replicates);
    }

    [Fact]
    public void ForExpectedMean_MeanBeyondOrWithin_SaysWhatTheTestShows()
    {
        ReplicatePlan above = ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(11), MgL(0.5), 0.05, 0.95);
        Assert.Equal(ComplianceOutcome.NonCompliant, above.ExpectedOutcome);
        Assert.Contains("to show non-compliance with the upper limit 10 mg/L", above.ToString(), StringComparison.Ordinal);
        Assert.Equal(ComplianceOutcome.Compliant, ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(9), MgL(0.5), 0.05, 0.95).ExpectedOutcome);
        Assert.Null(ReplicatesPlanner.ForEffectSize(1, 0.05, 0.95).ExpectedOutcome);
    }

    // Field-reference §8.2 (COMPUTED): δ/σ = 1, power 0.80 → n = 8 (0.81502; 7 give 0.75440; normal approx. 6.18).
    [Fact]
    public void ToString_EffectSizePlan_PrintsTheTableRow()
    {
        Assert.Equal(
            "8 replicates give power 0.815 (7 give 0.7544) to decide in a one-sided t test at α = 0.05 (δ/σ = 1; target power 0.8; normal approximation n = 6.18).",
            ReplicatesPlanner.ForEffectSize(1, 0.05, 0.80).ToString());
    }

    // "How many more": the planner on the replicates measured so far (invented data; mean 10.6, s ≈ 0.3162).
    [Fact]
    public void ForReplicates_ThreeMeasured_ReportsHowManyMore()
    {
        Concentration[] sofar = { MgL(10.3), MgL(10.6), MgL(10.9) };
        ReplicatePlan plan = ReplicatesPlanner.ForReplicates(UpperTen, sofar, 0.05, 0.95);
        ReplicatePlan expected = ReplicatesPlanner.ForEffectSize(0.6 / 0.3, 0.05, 0.95);
        Assert.Equal(3, plan.AlreadyMeasured);
        Assert.Equal(expected.Replicates, plan.Replicates);
        Assert.Equal(plan.Replicates - 3, plan.AdditionalReplicates);
        Assert.Contains("3 measured so far", plan.ToString(), StringComparison.Ordinal);
        Assert.Equal(0, plan.WithAlreadyMeasured(20).AdditionalReplicates);
    }

    // Field-reference §8.2 (COMPUTED) read backwards: n = 13 at power 0.95970 and n = 5 at 0.97483 decide δ/σ = 1 and 2
    // (the printed powers have 5 digits, hence 1e-3).
    [Theory]
    [InlineData(13, 0.95970, 1.0)]
    [InlineData(5, 0.97483, 2.0)]
    [InlineData(45, 0.95124, 0.5)]
    public void MinimumEffectSize_FieldReferencePowers_GiveTheTableEffect(int n, double power, double effect)
    {
        Assert.Equal(effect, ReplicatesPlanner.MinimumEffectSize(n, 0.05, power), 3);
    }

    [Fact]
    public void MaximumStandardDeviation_MeanOneAboveTheLimit_GivesSigma()
    {
        // δ = 1, n = 13, power 0.95970 → σ ≈ 1 (field-reference §8.2, COMPUTED); RSD = 100·σ/11.
        Concentration sd = ReplicatesPlanner.MaximumStandardDeviation(UpperTen, MgL(11), 13, 0.05, 0.95970);
        Assert.Equal(1.0, sd.Value, 3);
        Assert.Equal(ConcentrationUnit.MilligramPerLitre, sd.Unit);
        Assert.Equal(100 * sd.Value / 11, ReplicatesPlanner.MaximumRsdPercent(UpperTen, MgL(11), 13, 0.05, 0.95970), 12);
    }

    // Definition: at the largest σ (smallest effect) the power equals the target.
    [Property(MaxTest = 60)]
    public Property MinimumEffectSize_PowerAtTheResult_EqualsTheTarget() =>
        Prop.ForAll(Gen.Choose(2, 200).ToArbitrary(), Gen.Elements(0.01, 0.05, 0.1).ToArbitrary(), Gen.Elements(0.5, 0.8, 0.9, 0.95, 0.99).ToArbitrary(), (n, alpha, power) =>
            Math.Abs(ReplicatesPlanner.Power(ReplicatesPlanner.MinimumEffectSize(n, alpha, power), n, alpha) - power) < 1e-9);

    // The planner's n is minimal: power(n) ≥ target > power(n − 1).
    [Property(MaxTest = 100)]
    public Property ForEffectSize_Result_IsTheSmallestNReachingTheTarget() =>
        Prop.ForAll(Gen.Choose(5, 400).Select(i => i / 100.0).ToArbitrary(), Gen.Elements(0.01, 0.05, 0.1).ToArbitrary(), Gen.Elements(0.5, 0.8, 0.9, 0.95, 0.99).ToArbitrary(), (effect, alpha, power) =>
        {
            ReplicatePlan plan = ReplicatesPlanner.ForEffectSize(effect, alpha, power);
            bool reaches = ReplicatesPlanner.Power(effect, plan.Replicates, alpha) >= power && plan.Power >= power;
            bool minimal = plan.Replicates == 2 || ReplicatesPlanner.Power(effect, plan.Replicates - 1, alpha) < power;
            return reaches && minimal && plan.Replicates >= plan.NormalApproximation - 1;
        });

    // T′ = (Z + δ)/S: for δ far beyond the critical value the power is 1 to double precision (definition of the
    // non-central t); the planner's shortcut above δ = 40(c + 1) agrees with the series just below it.
    [Fact]
    public void Power_HugeEffect_IsOneAndContinuousAtTheShortcut()
    {
        Assert.Equal(1, ReplicatesPlanner.Power(1e6, 2, 0.05));
        Assert.Equal(1, ReplicatesPlanner.Power(200, 2, 0.05), 15);
        Assert.Equal(2, ReplicatesPlanner.ForEffectSize(1e4, 0.05, 0.99).Replicates);
        Assert.Null(ReplicatesPlanner.ForEffectSize(1e4, 0.05, 0.99).PowerWithOneFewer);
    }

    // Bad input.
    [Fact]
    public void ForExpectedMean_MeanOnTheLimit_ThrowsBecauseNothingDecides()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(10), MgL(0.5), 0.05, 0.95));
        Assert.Equal("expectedMean", ex.ParamName);
        Assert.Contains("never decided", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ForEffectSize_TooSmallForTheCap_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.ForEffectSize(0.01, 0.05, 0.95));
        Assert.Equal("effectSize", ex.ParamName);
        Assert.Contains("10000", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Planner_OtherBadArguments_Throw()
    {
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.ForEffectSize(1, 0.5, 0.9)).ParamName);
        Assert.Equal("power", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.ForEffectSize(1, 0.05, 1)).ParamName);
        Assert.Equal("effectSize", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.ForEffectSize(-1, 0.05, 0.9)).ParamName);
        Assert.Equal("standardDeviation", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(11), MgL(0), 0.05, 0.9)).ParamName);
        Assert.Equal("standardDeviation", Assert.Throws<ArgumentException>(() => ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(11), Concentration.FromMilligramsPerKilogram(1), 0.05, 0.9)).ParamName);
        Assert.Equal("expectedMean", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(0), 10, 0.05, 0.9)).ParamName);
        Assert.Equal("rsdPercent", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(11), 0, 0.05, 0.9)).ParamName);
        Assert.Equal("replicates", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.Power(1, 1, 0.05)).ParamName);
        Assert.Equal("replicates", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.MinimumEffectSize(1, 0.05, 0.9)).ParamName);
        Assert.Equal("power", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.MinimumEffectSize(5, 0.05, 0.01)).ParamName);
        Assert.Equal("replicates", Assert.Throws<ArgumentException>(() => ReplicatesPlanner.ForReplicates(UpperTen, new[] { MgL(10.5), MgL(10.5) }, 0.05, 0.9)).ParamName);
        Assert.Equal("alreadyMeasured", Assert.Throws<ArgumentOutOfRangeException>(() => ReplicatesPlanner.ForEffectSize(1, 0.05, 0.9).WithAlreadyMeasured(-1)).ParamName);
    }

    // A wanted power below α: a one-sided t test with δ > 0 has power above α at every n, so n = 2; the normal
    // approximation ((z(0.95) + z(0.01))/0.1)² = ((1.64485 − 2.32635)/0.1)² = 46.4 overshoots (computed) and the
    // planner steps down from it.
    [Fact]
    public void ForEffectSize_PowerBelowAlpha_StepsDownToTwoReplicates()
    {
        ReplicatePlan plan = ReplicatesPlanner.ForEffectSize(0.1, 0.05, 0.01);

        Assert.Equal(2, plan.Replicates);
        Assert.Equal(46.44, plan.NormalApproximation, 2);
        Assert.True(plan.Power > 0.05);
    }

    // Expected mean and σ are printed with six significant digits.
    [Fact]
    public void ToString_ManyDigits_PrintsMeanAndSigmaWithSixSignificantDigits()
    {
        string text = ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(9.1234567), MgL(0.51234567), 0.05, 0.95).ToString();

        Assert.Contains(", expected mean 9.12346 mg/L, σ = 0.512346 mg/L; target power 0.95;", text, StringComparison.Ordinal);
    }

    private static Concentration MgL(double value) => Concentration.FromMilligramsPerLitre(value);

    // Field-reference §8.2 (COMPUTED): δ/σ = 2, power 0.95 → normal approximation n = 2.71; the plan names the limit,
    // the expected mean and σ, and which way the test is expected to decide (lower limit: a mean below it is beyond).
    [Fact]
    public void ToString_ExpectedMeanPlan_NamesLimitMeanAndSigma()
    {
        string compliant = ReplicatesPlanner.ForExpectedMean(UpperTen, MgL(9), MgL(0.5), 0.05, 0.95).ToString();
        Assert.StartsWith("5 replicates give power ", compliant, StringComparison.Ordinal);
        Assert.Contains(" (4 give ", compliant, StringComparison.Ordinal);
        Assert.EndsWith(
            " to show compliance with the upper limit 10 mg/L in a one-sided t test at α = 0.05 (δ/σ = 2, expected mean 9 mg/L, σ = 0.5 mg/L; target power 0.95; normal approximation n = 2.71).",
            compliant,
            StringComparison.Ordinal);

        ReplicatePlan lower = ReplicatesPlanner.ForExpectedMean(SpecificationLimit.Lower(MgL(10)), MgL(9), MgL(0.5), 0.05, 0.95);
        Assert.Equal(ComplianceOutcome.NonCompliant, lower.ExpectedOutcome);
        Assert.Contains(" to show non-compliance with the lower limit 10 mg/L in", lower.ToString(), StringComparison.Ordinal);
        Assert.Equal(ComplianceOutcome.Compliant, ReplicatesPlanner.ForExpectedMean(SpecificationLimit.Lower(MgL(10)), MgL(11), MgL(0.5), 0.05, 0.95).ExpectedOutcome);
        Assert.Equal(0, lower.AlreadyMeasured);
        Assert.DoesNotContain("measured so far", lower.ToString(), StringComparison.Ordinal);
        Assert.EndsWith(" 2 measured so far: 3 more.", lower.WithAlreadyMeasured(2).ToString(), StringComparison.Ordinal);
    }
}
