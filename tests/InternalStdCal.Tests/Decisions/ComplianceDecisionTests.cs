using System;
using InternalStdCal.Decisions;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Decisions;

public class ComplianceDecisionTests
{
    private static readonly SpecificationLimit UpperTen = SpecificationLimit.Upper(Concentration.FromMilligramsPerLitre(10));

    // Field-reference §8.2 t-test example (COMPUTED): mean 10.6, t = 4.64758, P(μ > 10) = 1 − 0.0093914 = 99.06 %.
    [Fact]
    public void ToString_TTest_JustifiesTheDecision()
    {
        Concentration[] replicates = { Mg(10.5), Mg(10.9), Mg(10.3), Mg(10.7) };
        string text = DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary).Assess(UpperTen, replicates).ToString();

        Assert.StartsWith("Non-compliant (zone: fail): mean of 4 replicates 10.6 mg/L is above the rejection limit 10.3038 mg/L", text, StringComparison.Ordinal);
        Assert.Contains("upper limit 10 mg/L", text, StringComparison.Ordinal);
        Assert.Contains("t = 4.64758", text, StringComparison.Ordinal);
        Assert.Contains("P(true value > limit) = 99.06 % (Student t, ν = 3)", text, StringComparison.Ordinal);
    }

    // Same example with a named limit: the limit's name is printed once, inside one pair of parentheses. Values
    // from field-reference §8.2 (COMPUTED): s = 0.258199, u = s/√4, w = t(0.95, 3)·u = 2.35336·u, t = 0.6/u.
    [Fact]
    public void ToString_NamedLimit_ExactTextWithoutNestedParentheses()
    {
        var limit = SpecificationLimit.Upper(Mg(10), "maximum permitted value");
        Concentration[] replicates = { Mg(10.5), Mg(10.9), Mg(10.3), Mg(10.7) };
        string text = DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary).Assess(limit, replicates).ToString();

        Assert.Equal(
            "Non-compliant (zone: fail): mean of 4 replicates 10.6 mg/L is above the rejection limit 10.3038 mg/L of the upper limit 10 mg/L (maximum permitted value). "
            + "Rule: One-sided t test at α = 0.05, non-binary (ILAC G8 zones); u = 0.129099 mg/L (s = 0.258199 mg/L), w = 2.35336·u = 0.303818 mg/L, t = 4.64758. "
            + "P(true value > limit) = 99.06 % (Student t, ν = 3).",
            text);
    }

    // ILAC G8:09/2019 (VERIFIED, field-reference §8.1): binary guarded acceptance with w = U, k = 2.
    [Fact]
    public void ToString_BinaryRule_NamesTheDecisionLimit()
    {
        Measured<Concentration> result = Measured.WithStandardUncertainty(Mg(8.8), Mg(0.5));
        string text = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedAcceptance).Assess(UpperTen, result, Coverage.WithFactor(2)).ToString();

        Assert.StartsWith("Compliant: result 8.8 mg/L is at or below the decision limit 9 mg/L", text, StringComparison.Ordinal);
        Assert.Contains("U = 1 mg/L (k = 2)", text, StringComparison.Ordinal);
        Assert.Contains("(normal)", text, StringComparison.Ordinal);
    }

    [Fact]
    public void ToString_LowerLimitInconclusive_SaysBetweenTheLimits()
    {
        var lower = SpecificationLimit.Lower(Mg(10), "minimum content");
        Measured<Concentration> result = Measured.WithStandardUncertainty(Mg(9.8), Mg(0.5));
        ComplianceDecision d = DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary).Assess(lower, result);

        Assert.Equal(ComplianceOutcome.Inconclusive, d.Outcome);
        Assert.Null(d.SpecificRisk);
        string text = d.ToString();
        Assert.StartsWith("Inconclusive (zone: conditional fail): result 9.8 mg/L is between the acceptance limit 10.8224 mg/L and the rejection limit 9.17757 mg/L", text, StringComparison.Ordinal);
        Assert.Contains("lower limit 10 mg/L (minimum content)", text, StringComparison.Ordinal);
        Assert.Contains("P(true value < limit)", text, StringComparison.Ordinal);
    }

    // An exact result on the limit is within it (ILAC G8:09/2019 §4.2.1: compliant when x ≤ L): P(beyond) = 0.
    [Fact]
    public void Assess_ExactResultOnTheLimit_IsWithinWithCertainty()
    {
        ComplianceDecision d = DecisionRule.SimpleAcceptance.Assess(UpperTen, Measured.Exact(Mg(10)));

        Assert.Equal(ComplianceOutcome.Compliant, d.Outcome);
        Assert.Equal(ProbabilityModel.Exact, d.Model);
        Assert.Equal(0, d.ProbabilityBeyondLimit);
        Assert.Equal(1, d.ProbabilityWithinLimit);
    }

    private static Concentration Mg(double value) => Concentration.FromMilligramsPerLitre(value);
}
