using System;
using InternalStdCal.Decisions;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Decisions;

/// <summary>
/// The full wording of each rule and of a decision's justification. A decision rule is agreed with the customer
/// before measuring and reported with the result (ISO/IEC 17025:2017 §7.1.3, §7.8.6), so its text is part of the
/// contract: the terms are ILAC G8:09/2019's (binary statement, guarded acceptance/rejection, pass/conditional
/// pass/conditional fail/fail zones) and the EURACHEM/CITAC Guide 2021's (guard band g = k·u, §4.3).
/// </summary>
public class DecisionRuleTextTests
{
    private const string Eurachem = "EURACHEM/CITAC Guide \"Use of uncertainty information in compliance assessment\", 2nd ed. 2021";
    private const string AcceptanceText = "Upper limit L: compliant when x ≤ L − w, otherwise non-compliant (lower limit: compliant when x ≥ L + w).";
    private const string RejectionText = "Upper limit L: non-compliant when x > L + w, otherwise compliant (lower limit: non-compliant when x < L − w).";
    private const string ZonesText = "Upper limit L: pass (compliant) when x ≤ L − w, conditional pass when L − w < x ≤ L, conditional fail when L < x ≤ L + w "
        + "(both inconclusive), fail (non-compliant) when x > L + w; a lower limit is the mirror image.";

    private static readonly SpecificationLimit UpperTen = SpecificationLimit.Upper(Mg(10));
    private static readonly SpecificationLimit LowerTen = SpecificationLimit.Lower(Mg(10));

    // ILAC G8:09/2019 §4.2.1: simple acceptance, w = 0.
    [Fact]
    public void SimpleAcceptance_Text_IsComplete()
    {
        DecisionRule rule = DecisionRule.SimpleAcceptance;
        Assert.Equal("Simple acceptance (w = 0)", rule.Name);
        Assert.Equal("ILAC G8:09/2019, binary statement with simple acceptance; " + Eurachem + ", §4.2", rule.Source);
        Assert.Equal(
            "Guard band w = 0. Upper limit L: compliant when x ≤ L, otherwise non-compliant (lower limit: compliant when x ≥ L). "
            + "No uncertainty is needed to decide; the probability of false acceptance can reach 50 % for a result on the limit.",
            rule.Description);
        Assert.Equal(rule.Name + " — " + rule.Description + " Source: " + rule.Source + ".", rule.ToString());
    }

    // ILAC G8:09/2019 §4.2.2 (w = U) and §4.2.3 (other multiples chosen by the laboratory).
    [Fact]
    public void ExpandedUncertaintyGuardBand_Text_NamesTheMultipleAndTheMode()
    {
        DecisionRule plain = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedAcceptance);
        Assert.Equal("Guard band w = U, binary, guarded acceptance", plain.Name);
        Assert.Equal("ILAC G8:09/2019, guard band w = U with binary and non-binary statements", plain.Source);
        Assert.Equal("Guard band w = U, with U = k·u the expanded uncertainty of the result (k as stated when assessing). " + AcceptanceText, plain.Description);

        DecisionRule doubled = DecisionRule.ExpandedUncertaintyGuardBand(2, DecisionMode.BinaryGuardedRejection);
        Assert.Equal("Guard band w = 2·U, binary, guarded rejection", doubled.Name);
        Assert.Equal("ILAC G8:09/2019, guard band w = U with binary and non-binary statements; the multiple 2 is the laboratory's choice", doubled.Source);
        Assert.Equal("Guard band w = 2·U, with U = k·u the expanded uncertainty of the result (k as stated when assessing). " + RejectionText, doubled.Description);

        DecisionRule zones = DecisionRule.ExpandedUncertaintyGuardBand(0.5, DecisionMode.NonBinary);
        Assert.Equal("Guard band w = 0.5·U, non-binary (ILAC G8 zones)", zones.Name);
        Assert.EndsWith(ZonesText, zones.Description, StringComparison.Ordinal);
        Assert.Equal(0.5, zones.Parameter);
    }

    // EURACHEM/CITAC Guide 2021 §4.3 and Annex A: g = k·u with k = z(1 − risk).
    [Fact]
    public void RiskGuardBand_Text_NamesTheRisk()
    {
        DecisionRule rule = DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary);
        Assert.Equal("Guard band g = k·u for 5 % maximum risk, non-binary (ILAC G8 zones)", rule.Name);
        Assert.Equal(Eurachem + ", §4.3 and Annex A (g = k·u; k = 1.64 for 5 %, 2.33 for 1 %)", rule.Source);
        Assert.Equal(
            "Guard band g = k·u with k = z(1 − 0.05) for a normal distribution, or t(1 − 0.05, ν) when u has ν degrees of freedom. " + ZonesText,
            rule.Description);
        Assert.Equal("Guard band g = k·u for 1 % maximum risk, binary, guarded acceptance", DecisionRule.RiskGuardBand(0.01, DecisionMode.BinaryGuardedAcceptance).Name);
    }

    // One-sided one-sample Student t test of H0: μ ≤ L (standard statistics, e.g. NIST/SEMATECH e-Handbook §7.2.2).
    [Theory]
    [InlineData(DecisionMode.BinaryGuardedAcceptance, "binary, guarded acceptance", "Compliant only when the mean is significantly within the limit (t ≤ −t(1 − α, ν)), otherwise non-compliant.")]
    [InlineData(DecisionMode.BinaryGuardedRejection, "binary, guarded rejection", "Non-compliant only when the mean is significantly beyond the limit (t > t(1 − α, ν)), otherwise compliant.")]
    [InlineData(DecisionMode.NonBinary, "non-binary (ILAC G8 zones)", "Non-compliant when the mean is significantly beyond the limit (t > t(1 − α, ν)), compliant when significantly within (t ≤ −t(1 − α, ν)), otherwise inconclusive.")]
    public void OneSidedTTest_Text_StatesTheTest(DecisionMode mode, string modeName, string tests)
    {
        DecisionRule rule = DecisionRule.OneSidedTTest(0.05, mode);
        Assert.Equal("One-sided t test at α = 0.05, " + modeName, rule.Name);
        Assert.Equal("One-sided one-sample Student t test of the mean against the limit (standard statistics); decision limits L ± t(1 − α, n − 1)·s/√n", rule.Source);
        Assert.Equal("t = (x̄ − L)/(s/√n) with ν = n − 1 for an upper limit ((L − x̄)/(s/√n) for a lower limit), α = 0.05. " + tests, rule.Description);
        Assert.Equal(mode == DecisionMode.NonBinary, rule.HasZones);
    }

    // Equality is by kind, mode, parameter and name (documented on DecisionRule): each one alone makes a difference.
    [Fact]
    public void Equals_EachComponent_Matters()
    {
        DecisionRule rule = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary);
        Assert.True(rule.Equals(DecisionRule.ExpandedUncertaintyGuardBand(1, DecisionMode.NonBinary)));
        Assert.Equal(rule.GetHashCode(), DecisionRule.ExpandedUncertaintyGuardBand(1, DecisionMode.NonBinary).GetHashCode());
        Assert.False(rule.Equals(DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedAcceptance)));
        Assert.False(rule.Equals(DecisionRule.ExpandedUncertaintyGuardBand(2, DecisionMode.NonBinary)));
        Assert.False(rule.Equals(rule.Named("Own rule")));
        Assert.False(DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary).Equals(DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary)));
        Assert.False(rule.Equals((DecisionRule?)null));
        Assert.False(rule.Equals((object)"Guard band w = U"));
        Assert.True(rule.Equals((object)DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary)));
    }

    // ILAC G8:09/2019 §4.2.1, simple acceptance of an exact result: P is 0 or 1.
    [Fact]
    public void DecisionToString_ExactResultSimpleAcceptance_IsComplete()
    {
        string text = DecisionRule.SimpleAcceptance.Assess(UpperTen, Measured.Exact(Mg(9))).ToString();
        Assert.Equal(
            "Compliant: result 9 mg/L is at or below the decision limit 10 mg/L of the upper limit 10 mg/L. Rule: Simple acceptance (w = 0); u = 0 mg/L. "
            + "P(true value > limit) = 0 % (zero uncertainty: result taken as exact).",
            text);

        string lower = DecisionRule.SimpleAcceptance.Assess(LowerTen, Measured.Exact(Mg(9))).ToString();
        Assert.Equal(
            "Non-compliant: result 9 mg/L is below the decision limit 10 mg/L of the lower limit 10 mg/L. Rule: Simple acceptance (w = 0); u = 0 mg/L. "
            + "P(true value < limit) = 100 % (zero uncertainty: result taken as exact).",
            lower);
    }

    // ILAC G8:09/2019 §4.2.2 with U = 2u: w = 2·0.5 = 1 mg/L; zones pass/conditional pass/conditional fail/fail.
    [Theory]
    [InlineData(8.5, "Compliant (zone: pass): result 8.5 mg/L is at or below the acceptance limit 9 mg/L")]
    [InlineData(9.5, "Inconclusive (zone: conditional pass): result 9.5 mg/L is between the acceptance limit 9 mg/L and the rejection limit 11 mg/L")]
    [InlineData(10.5, "Inconclusive (zone: conditional fail): result 10.5 mg/L is between the acceptance limit 9 mg/L and the rejection limit 11 mg/L")]
    [InlineData(11.5, "Non-compliant (zone: fail): result 11.5 mg/L is above the rejection limit 11 mg/L")]
    public void DecisionToString_Zones_NameTheZoneAndLimit(double x, string start)
    {
        ComplianceDecision d = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary).Assess(UpperTen, Measured.WithStandardUncertainty(Mg(x), Mg(0.5)), Coverage.WithFactor(2));
        string text = d.ToString();
        Assert.StartsWith(start + " of the upper limit 10 mg/L. Rule: Guard band w = U, non-binary (ILAC G8 zones); u = 0.5 mg/L, U = 1 mg/L (k = 2), w = 2·u = 1 mg/L, (x − L)/u = ", text, StringComparison.Ordinal);
        Assert.EndsWith(" (normal).", text, StringComparison.Ordinal);
    }

    // Mirror image for a lower limit (ILAC G8:09/2019 §4.2): acceptance limit L + w, rejection limit L − w.
    [Fact]
    public void DecisionToString_LowerLimitZones_AreMirrored()
    {
        DecisionRule rule = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary);
        string pass = rule.Assess(LowerTen, Measured.WithStandardUncertainty(Mg(11.5), Mg(0.5)), Coverage.WithFactor(2)).ToString();
        Assert.StartsWith("Compliant (zone: pass): result 11.5 mg/L is at or above the acceptance limit 11 mg/L of the lower limit 10 mg/L.", pass, StringComparison.Ordinal);
        Assert.Contains(", (x − L)/u = 3.", pass, StringComparison.Ordinal);
        Assert.Contains("P(true value < limit) = ", pass, StringComparison.Ordinal);

        string fail = rule.Assess(LowerTen, Measured.WithStandardUncertainty(Mg(8.5), Mg(0.5)), Coverage.WithFactor(2)).ToString();
        Assert.StartsWith("Non-compliant (zone: fail): result 8.5 mg/L is below the rejection limit 9 mg/L of the lower limit 10 mg/L.", fail, StringComparison.Ordinal);
        Assert.Contains(", (x − L)/u = -3.", fail, StringComparison.Ordinal);
    }

    // Binary guarded rejection (ILAC G8:09/2019 §4.2.2): non-compliant above L + w.
    [Fact]
    public void DecisionToString_GuardedRejection_NamesTheDecisionLimit()
    {
        ComplianceDecision d = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedRejection)
            .Assess(UpperTen, Measured.WithStandardUncertainty(Mg(11.5), Mg(0.5)), Coverage.WithFactor(2));
        Assert.Equal(ComplianceOutcome.NonCompliant, d.Outcome);
        Assert.Null(d.Zone);
        Assert.StartsWith("Non-compliant: result 11.5 mg/L is above the decision limit 11 mg/L of the upper limit 10 mg/L.", d.ToString(), StringComparison.Ordinal);
    }

    // A replicate mean states s as well as u = s/√n (standard statistics); field-reference §8.2 replicates.
    [Fact]
    public void DecisionToString_Replicates_StatesTheStandardDeviation()
    {
        Concentration[] replicates = { Mg(9), Mg(9.2), Mg(8.8), Mg(9) };
        string text = DecisionRule.RiskGuardBand(0.05, DecisionMode.BinaryGuardedAcceptance).Assess(UpperTen, replicates).ToString();
        Assert.StartsWith("Compliant: mean of 4 replicates 9 mg/L is at or below the decision limit ", text, StringComparison.Ordinal);
        Assert.Contains(" (s = 0.163299 mg/L)", text, StringComparison.Ordinal); // s = √(0.08/3) = 0.1632993...
        Assert.Contains("; u = 0.0816497 mg/L", text, StringComparison.Ordinal); // s/√4
        Assert.Contains(", w = ", text, StringComparison.Ordinal);
        Assert.EndsWith(" (Student t, ν = 3).", text, StringComparison.Ordinal);
    }

    private static Concentration Mg(double value) => Concentration.FromMilligramsPerLitre(value);
}
