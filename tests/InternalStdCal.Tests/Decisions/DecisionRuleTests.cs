using System;
using InternalStdCal.Decisions;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Decisions;

public class DecisionRuleTests
{
    private static readonly SpecificationLimit UpperTen = SpecificationLimit.Upper(MgL(10));

    // Field-reference §8.2 table (COMPUTED): L = 10, u = 0.5, normal distribution.
    private static Measured<Concentration> At(double x) => Measured.WithStandardUncertainty(MgL(x), MgL(0.5));

    // EURACHEM/CITAC "Use of uncertainty information in compliance assessment", 2nd ed. 2021, g = k·u with
    // k = 1.64 (5 %) and 2.33 (1 %) (VERIFIED for the 2007 edition's rule, field-reference §8.2); k = z(1 − r) to
    // the digits of the §6 table's ∞ row (COMPUTED): 1.64485363, 2.32634787.
    [Theory]
    [InlineData(0.05, "1.64485363")]
    [InlineData(0.01, "2.32634787")]
    public void RiskGuardBand_NormalResult_UsesNormalQuantile(double risk, string k)
    {
        ComplianceDecision d = DecisionRule.RiskGuardBand(risk, DecisionMode.NonBinary).Assess(UpperTen, At(10));
        Printed.Equal(k, d.GuardBandFactor!.Value);
    }

    // Field-reference §8.2 table (COMPUTED): accept ≤ 9.1775 / reject > 10.8225 (5 %), ≤ 8.837 / > 11.163 (1 %).
    // The table's limits use k rounded to 3 decimals (1.645, 2.326); the rule uses the exact z(1 − r), so the limits
    // may differ by up to 0.0005·u = 2.5e-4.
    [Theory]
    [InlineData(0.05, 9.1775, 10.8225)]
    [InlineData(0.01, 8.837, 11.163)]
    public void RiskGuardBand_FieldReferenceTable_GivesDecisionLimits(double risk, double acceptance, double rejection)
    {
        ComplianceDecision d = DecisionRule.RiskGuardBand(risk, DecisionMode.NonBinary).Assess(UpperTen, At(10));
        Assert.Equal(acceptance, d.AcceptanceLimit.Value, 2.5e-4);
        Assert.Equal(rejection, d.RejectionLimit.Value, 2.5e-4);
        Assert.Equal(ConcentrationUnit.MilligramPerLitre, d.AcceptanceLimit.Unit);
    }

    // Field-reference §8.2 table (COMPUTED): PFA at the acceptance limit and PFR at the rejection limit are 5.00 % and
    // 1.00 %: the maximum risk the guard band was set for.
    [Theory]
    [InlineData(0.05, "5.00")]
    [InlineData(0.01, "1.00")]
    public void RiskGuardBand_ResultOnDecisionLimits_HasTheChosenRisk(double risk, string percent)
    {
        DecisionRule rule = DecisionRule.RiskGuardBand(risk, DecisionMode.NonBinary);
        ComplianceDecision probe = rule.Assess(UpperTen, At(10));

        ComplianceDecision atAcceptance = rule.Assess(UpperTen, At(probe.AcceptanceLimit.Value));
        Assert.Equal(ComplianceOutcome.Compliant, atAcceptance.Outcome);
        Printed.Equal(percent, 100 * atAcceptance.ProbabilityBeyondLimit);
        Printed.Equal(percent, 100 * atAcceptance.SpecificRisk!.Value);

        ComplianceDecision atRejection = rule.Assess(UpperTen, At(probe.RejectionLimit.Value));
        Printed.Equal(percent, 100 * atRejection.ProbabilityWithinLimit);
    }

    // ILAC G8:09/2019 (VERIFIED, field-reference §8.1): guard band w = U with k = 2 keeps PFA below 2.5 %;
    // field-reference §8.2 table (COMPUTED): acceptance limit 9.000, rejection limit 11.000, 2.275 % at the limit.
    [Fact]
    public void ExpandedUncertaintyGuardBand_WEqualsUWithK2_HasPfaBelowTwoAndAHalfPercent()
    {
        DecisionRule rule = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary);
        ComplianceDecision atAcceptance = rule.Assess(UpperTen, At(9.0), Coverage.WithFactor(2));

        Printed.Equal("9.000", atAcceptance.AcceptanceLimit.Value);
        Printed.Equal("11.000", atAcceptance.RejectionLimit.Value);
        Printed.Equal("1.0", atAcceptance.ExpandedUncertainty!.Value.Value);
        Assert.Equal(ComplianceOutcome.Compliant, atAcceptance.Outcome);
        Printed.Equal("2.275", 100 * atAcceptance.ProbabilityBeyondLimit);
        Assert.True(atAcceptance.SpecificRisk < 0.025);

        foreach (double x in new[] { 5.0, 8.0, 8.9, 8.999 })
        {
            Assert.True(rule.Assess(UpperTen, At(x), Coverage.WithFactor(2)).SpecificRisk < 0.025);
        }
    }

    // Other guard bands (FROM MEMORY, ISO 14253-1:2017 as quoted in field-reference §8.1, not ILAC G8 itself):
    // w = 0.83·U → PFA < 5 %; w = 1.5·U → PFA < 0.16 % (k = 2, normal).
    [Theory]
    [InlineData(0.83, 0.05)]
    [InlineData(1.5, 0.0016)]
    public void ExpandedUncertaintyGuardBand_Multiples_KeepPfaBelowTheQuotedBound(double multiple, double bound)
    {
        DecisionRule rule = DecisionRule.ExpandedUncertaintyGuardBand(multiple, DecisionMode.BinaryGuardedAcceptance);
        ComplianceDecision probe = rule.Assess(UpperTen, At(10), Coverage.WithFactor(2));
        ComplianceDecision atLimit = rule.Assess(UpperTen, At(probe.AcceptanceLimit.Value), Coverage.WithFactor(2));
        Assert.Equal(ComplianceOutcome.Compliant, atLimit.Outcome);
        Assert.InRange(atLimit.ProbabilityBeyondLimit, 0, bound);
    }

    // ILAC G8:09/2019 (VERIFIED, field-reference §8.1): simple acceptance, the PFA reaches 50 % for a result at the limit;
    // field-reference §8.2 table (COMPUTED): decision limit 10.000, 50 %.
    [Fact]
    public void SimpleAcceptance_ResultOnTheLimit_IsCompliantWithFiftyPercentRisk()
    {
        ComplianceDecision d = DecisionRule.SimpleAcceptance.Assess(UpperTen, At(10));
        Assert.Equal(ComplianceOutcome.Compliant, d.Outcome);
        Assert.Null(d.Zone);
        Printed.Equal("10.000", d.AcceptanceLimit.Value);
        Assert.Equal(d.AcceptanceLimit, d.RejectionLimit);
        Printed.Equal("50", 100 * d.ProbabilityBeyondLimit);
        Assert.Equal(ProbabilityModel.Normal, d.Model);
    }

    [Fact]
    public void SimpleAcceptance_ResultJustAboveTheLimit_IsNonCompliant()
    {
        ComplianceDecision d = DecisionRule.SimpleAcceptance.Assess(UpperTen, At(Math.BitIncrement(10)));
        Assert.Equal(ComplianceOutcome.NonCompliant, d.Outcome);
        Assert.Equal(d.ProbabilityWithinLimit, d.SpecificRisk);
    }

    // Field-reference §8.2 (COMPUTED): results 10.5, 10.9, 10.3, 10.7 against L = 10 → mean 10.6, s = 0.258199,
    // t = 4.64758 > t(0.95, 3) = 2.35336, one-sided p = 0.0093914.
    [Fact]
    public void OneSidedTTest_FieldReferenceExample_IsNonCompliant()
    {
        Concentration[] replicates = { MgL(10.5), MgL(10.9), MgL(10.3), MgL(10.7) };
        ComplianceDecision d = DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary).Assess(UpperTen, replicates);

        Assert.Equal(ComplianceOutcome.NonCompliant, d.Outcome);
        Assert.Equal(DecisionZone.Fail, d.Zone);
        Assert.Equal(4, d.Replicates);
        Assert.Equal(3, d.DegreesOfFreedom);
        Printed.Equal("10.6", d.Result.Value);
        Printed.Equal("0.258199", d.ReplicateStandardDeviation!.Value.Value);
        Printed.Equal("4.64758", d.StandardizedDistance!.Value);
        Printed.Equal("2.35336", d.GuardBandFactor!.Value);
        Printed.Equal("0.0093914", d.ProbabilityWithinLimit);
        Printed.Equal("0.0093914", d.SpecificRisk!.Value);
        Assert.Equal(ProbabilityModel.StudentT, d.Model);
    }

    // Same data as a single Type A result (u = s/√n, ν = 3): the probabilities use Student t with ν = 3
    // (field-reference §8.2, COMPUTED p = 0.0093914).
    [Fact]
    public void Assess_TypeAResultWithDegreesOfFreedom_UsesStudentT()
    {
        Measured<Concentration> result = Measured.TypeA(MgL(10.6), MgL(0.258198889747161 / 2), 3);
        ComplianceDecision d = DecisionRule.SimpleAcceptance.Assess(UpperTen, result);
        Assert.Equal(ProbabilityModel.StudentT, d.Model);
        Printed.Equal("0.0093914", d.ProbabilityWithinLimit);
    }

    // The t test in a binary mode keeps one of its two tests (common practice: which side carries the burden of proof).
    [Fact]
    public void OneSidedTTest_BinaryModes_PutTheBurdenOfProofOnOneSide()
    {
        Concentration[] slightlyAbove = { MgL(10.1), MgL(9.9), MgL(10.3), MgL(10.1) };
        Assert.Equal(ComplianceOutcome.Compliant, DecisionRule.OneSidedTTest(0.05, DecisionMode.BinaryGuardedRejection).Assess(UpperTen, slightlyAbove).Outcome);
        Assert.Equal(ComplianceOutcome.NonCompliant, DecisionRule.OneSidedTTest(0.05, DecisionMode.BinaryGuardedAcceptance).Assess(UpperTen, slightlyAbove).Outcome);
        Assert.Equal(ComplianceOutcome.Inconclusive, DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary).Assess(UpperTen, slightlyAbove).Outcome);
    }

    // ILAC G8:09/2019 non-binary zones (VERIFIED, field-reference §8.1), w = U = 2u = 1 around L = 10.
    [Theory]
    [InlineData(8.5, DecisionZone.Pass, ComplianceOutcome.Compliant)]
    [InlineData(9.0, DecisionZone.Pass, ComplianceOutcome.Compliant)]
    [InlineData(9.5, DecisionZone.ConditionalPass, ComplianceOutcome.Inconclusive)]
    [InlineData(10.0, DecisionZone.ConditionalPass, ComplianceOutcome.Inconclusive)]
    [InlineData(10.5, DecisionZone.ConditionalFail, ComplianceOutcome.Inconclusive)]
    [InlineData(11.0, DecisionZone.ConditionalFail, ComplianceOutcome.Inconclusive)]
    [InlineData(11.5, DecisionZone.Fail, ComplianceOutcome.NonCompliant)]
    public void ExpandedUncertaintyGuardBand_NonBinary_GivesIlacZones(double x, DecisionZone zone, ComplianceOutcome outcome)
    {
        ComplianceDecision d = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary).Assess(UpperTen, At(x), Coverage.WithFactor(2));
        Assert.Equal(zone, d.Zone);
        Assert.Equal(outcome, d.Outcome);
    }

    // Mirror image of the ILAC G8 zones for a lower limit L = 10 (field-reference §8.1 describes an upper limit).
    [Theory]
    [InlineData(11.5, DecisionZone.Pass, ComplianceOutcome.Compliant)]
    [InlineData(10.5, DecisionZone.ConditionalPass, ComplianceOutcome.Inconclusive)]
    [InlineData(9.5, DecisionZone.ConditionalFail, ComplianceOutcome.Inconclusive)]
    [InlineData(8.5, DecisionZone.Fail, ComplianceOutcome.NonCompliant)]
    public void ExpandedUncertaintyGuardBand_LowerLimit_GivesMirroredZones(double x, DecisionZone zone, ComplianceOutcome outcome)
    {
        var lower = SpecificationLimit.Lower(MgL(10));
        ComplianceDecision d = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary).Assess(lower, At(x), Coverage.WithFactor(2));
        Assert.Equal(zone, d.Zone);
        Assert.Equal(outcome, d.Outcome);
        Printed.Equal("11", d.AcceptanceLimit.Value);
        Printed.Equal("9", d.RejectionLimit.Value);
    }

    // ILAC G8 binary guarded acceptance (pass below AL = TL − w) and EURACHEM/CITAC guarded rejection (decision limit L + g).
    [Theory]
    [InlineData(DecisionMode.BinaryGuardedAcceptance, 9.5, ComplianceOutcome.NonCompliant)]
    [InlineData(DecisionMode.BinaryGuardedAcceptance, 8.9, ComplianceOutcome.Compliant)]
    [InlineData(DecisionMode.BinaryGuardedRejection, 10.5, ComplianceOutcome.Compliant)]
    [InlineData(DecisionMode.BinaryGuardedRejection, 11.1, ComplianceOutcome.NonCompliant)]
    public void ExpandedUncertaintyGuardBand_BinaryModes_DecideAtOneLimit(DecisionMode mode, double x, ComplianceOutcome outcome)
    {
        ComplianceDecision d = DecisionRule.ExpandedUncertaintyGuardBand(mode).Assess(UpperTen, At(x), Coverage.WithFactor(2));
        Assert.Equal(outcome, d.Outcome);
        Assert.Null(d.Zone);
        Assert.Equal(d.AcceptanceLimit, d.RejectionLimit);
    }

    // Coverage probability → k: z(0.975) = 1.95996398 (normal) and t(0.975, 9) = 2.26215716 (field-reference §6,
    // COMPUTED); ν_eff = 9.13763 is truncated to 9 (field-reference §7.1 Welch–Satterthwaite example, COMPUTED k = 2.26216).
    [Theory]
    [InlineData(null, "1.95996398")]
    [InlineData(9.0, "2.26215716")]
    [InlineData(9.13763, "2.26216")]
    public void Assess_CoverageProbability_DerivesCoverageFactor(double? dof, string k)
    {
        Measured<Concentration> result = Measured.WithStandardUncertainty(MgL(9), MgL(0.5), dof);
        ComplianceDecision d = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary).Assess(UpperTen, result, Coverage.WithProbability(0.95));
        Printed.Equal(k, d.CoverageFactor!.Value);
        Numeric.AssertRelative(d.CoverageFactor!.Value * 0.5, d.GuardBand.Value, 1e-15);
    }

    [Fact]
    public void Assess_ResultInAnotherUnitOfTheSameKind_IsConverted()
    {
        Measured<Concentration> result = Measured.WithStandardUncertainty(Concentration.FromMicrogramsPerLitre(9500), Concentration.FromMicrogramsPerLitre(500));
        ComplianceDecision d = DecisionRule.SimpleAcceptance.Assess(UpperTen, result);
        Assert.Equal(ConcentrationUnit.MilligramPerLitre, d.Result.Unit);
        Assert.Equal(9.5, d.Result.Value, 12);
        Assert.Equal(0.5, d.StandardUncertainty.Value, 12);
        Assert.Equal(ComplianceOutcome.Compliant, d.Outcome);
    }

    [Fact]
    public void Assess_ExactResult_GivesZeroOrOneProbability()
    {
        ComplianceDecision above = DecisionRule.SimpleAcceptance.Assess(UpperTen, Measured.Exact(MgL(10.2)));
        Assert.Equal(ProbabilityModel.Exact, above.Model);
        Assert.Equal(1, above.ProbabilityBeyondLimit);
        Assert.Equal(0, above.ProbabilityWithinLimit);
        Assert.Null(above.StandardizedDistance);
    }

    [Fact]
    public void Named_NewName_KeepsTheRuleAndChangesEquality()
    {
        DecisionRule rule = DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary);
        DecisionRule named = rule.Named("Procedure QP-7 decision rule");
        Assert.Equal("Procedure QP-7 decision rule", named.Name);
        Assert.Equal(rule.Source, named.Source);
        Assert.NotEqual(rule, named);
        Assert.Equal(rule, DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary));
        Assert.Equal(rule.GetHashCode(), DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary).GetHashCode());
    }

    [Fact]
    public void Rules_EachHasNameSourceAndDescription()
    {
        DecisionRule[] rules =
        {
            DecisionRule.SimpleAcceptance,
            DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedAcceptance),
            DecisionRule.ExpandedUncertaintyGuardBand(1.5, DecisionMode.NonBinary),
            DecisionRule.RiskGuardBand(0.01, DecisionMode.BinaryGuardedRejection),
            DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary),
        };
        foreach (DecisionRule rule in rules)
        {
            Assert.False(string.IsNullOrWhiteSpace(rule.Name));
            Assert.False(string.IsNullOrWhiteSpace(rule.Source));
            Assert.False(string.IsNullOrWhiteSpace(rule.Description));
            Assert.Contains(rule.Name, rule.ToString(), StringComparison.Ordinal);
        }

        Assert.Contains("ILAC G8", rules[1].Source, StringComparison.Ordinal);
        Assert.Contains("EURACHEM/CITAC", rules[3].Source, StringComparison.Ordinal);
        Assert.True(rules[2].HasZones);
        Assert.False(rules[0].HasZones);
    }

    // Bad input.
    [Fact]
    public void Assess_ResultOfAnotherKind_ThrowsNamingResult()
    {
        Measured<Concentration> result = Measured.WithStandardUncertainty(Concentration.FromMilligramsPerKilogram(9), Concentration.FromMilligramsPerKilogram(0.5));
        var ex = Assert.Throws<ArgumentException>(() => DecisionRule.SimpleAcceptance.Assess(UpperTen, result));
        Assert.Equal("result", ex.ParamName);
        Assert.Contains("mg/kg", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Assess_ReplicateOfAnotherKind_ThrowsNamingReplicates()
    {
        Concentration[] replicates = { MgL(9), Concentration.FromMilligramsPerKilogram(9.2) };
        var ex = Assert.Throws<ArgumentException>(() => DecisionRule.SimpleAcceptance.Assess(UpperTen, replicates));
        Assert.Equal("replicates", ex.ParamName);
        Assert.Contains("element 1", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Assess_GuardBandWithZeroUncertainty_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary).Assess(UpperTen, Measured.Exact(MgL(9))));
        Assert.Equal("result", ex.ParamName);
        Assert.Contains("u > 0", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Assess_TTestWithEqualReplicates_Throws()
    {
        Concentration[] replicates = { MgL(9), MgL(9), MgL(9) };
        var ex = Assert.Throws<ArgumentException>(() => DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary).Assess(UpperTen, replicates));
        Assert.Equal("replicates", ex.ParamName);
        Assert.Contains("s = 0", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Assess_OneReplicate_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary).Assess(UpperTen, new[] { MgL(9) }));
        Assert.Equal("replicates", ex.ParamName);
        Assert.Contains("at least 2", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Assess_TTestWithoutDegreesOfFreedom_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary).Assess(UpperTen, At(9)));
        Assert.Equal("result", ex.ParamName);
    }

    [Fact]
    public void Assess_ExpandedUncertaintyRuleWithoutCoverage_Throws()
    {
        var ex = Assert.Throws<ArgumentNullException>(() => DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary).Assess(UpperTen, At(9)));
        Assert.Equal("coverage", ex.ParamName);
    }

    [Fact]
    public void Assess_NullArguments_Throw()
    {
        Assert.Equal("limit", Assert.Throws<ArgumentNullException>(() => DecisionRule.SimpleAcceptance.Assess(null!, At(9))).ParamName);
        Assert.Equal("replicates", Assert.Throws<ArgumentNullException>(() => DecisionRule.SimpleAcceptance.Assess(UpperTen, (Concentration[])null!)).ParamName);
        Assert.Equal("coverage", Assert.Throws<ArgumentNullException>(() => DecisionRule.SimpleAcceptance.Assess(UpperTen, At(9), null!)).ParamName);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.5)]
    [InlineData(-0.1)]
    [InlineData(double.NaN)]
    public void RiskGuardBand_RiskOutOfRange_Throws(double risk)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => DecisionRule.RiskGuardBand(risk, DecisionMode.NonBinary));
        Assert.Equal("maximumRisk", ex.ParamName);
        Assert.Contains("(0, 0.5)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Factories_OtherBadArguments_Throw()
    {
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => DecisionRule.OneSidedTTest(0.7, DecisionMode.NonBinary)).ParamName);
        Assert.Equal("multiple", Assert.Throws<ArgumentOutOfRangeException>(() => DecisionRule.ExpandedUncertaintyGuardBand(0, DecisionMode.NonBinary)).ParamName);
        Assert.Equal("mode", Assert.Throws<ArgumentOutOfRangeException>(() => DecisionRule.RiskGuardBand(0.05, (DecisionMode)7)).ParamName);
        Assert.Equal("name", Assert.Throws<ArgumentException>(() => DecisionRule.SimpleAcceptance.Named(" ")).ParamName);
    }

    // A t test needs ν (one-sided Student t, ISO 3534-1): a type B u has none, and the message says what to do.
    [Fact]
    public void OneSidedTTest_ResultWithoutDegreesOfFreedom_ThrowsNamingTheRuleAndTheRemedy()
    {
        DecisionRule rule = DecisionRule.OneSidedTTest(0.05, DecisionMode.BinaryGuardedAcceptance);

        var ex = Assert.Throws<ArgumentException>(() => rule.Assess(UpperTen, At(9)));

        Assert.Equal("result", ex.ParamName);
        Assert.Equal(
            "Parameter 'result' has no degrees of freedom (u taken as exactly known); the rule '" + rule.Name
            + "' needs a Student t. Give ν (e.g. Measured.TypeA) or use RiskGuardBand for a known σ. (Parameter 'result')",
            ex.Message);
    }

    // A coverage stated with a rule whose guard band is not a multiple of U still reports U = k·u (JCGM 100:2008 §6.2).
    [Fact]
    public void Assess_CoverageWithSimpleAcceptance_ReportsTheExpandedUncertainty()
    {
        ComplianceDecision d = DecisionRule.SimpleAcceptance.Assess(UpperTen, At(9), Coverage.WithFactor(2));

        Assert.Equal(2, d.CoverageFactor);
        Assert.Equal(MgL(1), d.ExpandedUncertainty);
        Assert.Contains("; u = 0.5 mg/L, U = 1 mg/L (k = 2)", d.ToString(), StringComparison.Ordinal);
        Assert.Null(DecisionRule.SimpleAcceptance.Assess(UpperTen, At(9)).CoverageFactor);
    }

    // Replicates whose mean overflows a double cannot be assessed (bad input is refused, never NaN; common practice).
    [Fact]
    public void Assess_ReplicatesOverflowingADouble_Throws()
    {
        Concentration[] replicates = { MgL(1.7e308), MgL(1.7e308) };

        var ex = Assert.Throws<ArgumentException>(() => DecisionRule.SimpleAcceptance.Assess(UpperTen, replicates));

        Assert.Equal("replicates", ex.ParamName);
        Assert.StartsWith("Parameter 'replicates': the mean or standard deviation of the replicates overflows a double.", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => ReplicatesPlanner.ForReplicates(UpperTen, replicates, 0.05, 0.95));
    }

    private static Concentration MgL(double value) => Concentration.FromMilligramsPerLitre(value);
}
