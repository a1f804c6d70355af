using System;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Decisions;
using InternalStdCal.Quantities;

namespace InternalStdCal.Tests.Decisions;

/// <summary>Properties every decision rule must have (invented data; the rules are those of ILAC G8:09/2019 and
/// EURACHEM/CITAC 2021, field-reference §8): monotone in the result, guard bands that only ever make acceptance
/// harder (or, guarded rejection, rejection harder), and mirror symmetry between upper and lower limits.</summary>
public class DecisionRulePropertyTests
{
    private static readonly Coverage K2 = Coverage.WithFactor(2);

    private static readonly Gen<DecisionRule> Rules = Gen.Elements(
        DecisionRule.SimpleAcceptance,
        DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedAcceptance),
        DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedRejection),
        DecisionRule.ExpandedUncertaintyGuardBand(0.83, DecisionMode.NonBinary),
        DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary),
        DecisionRule.RiskGuardBand(0.01, DecisionMode.BinaryGuardedAcceptance),
        DecisionRule.RiskGuardBand(0.2, DecisionMode.BinaryGuardedRejection),
        DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary),
        DecisionRule.OneSidedTTest(0.01, DecisionMode.BinaryGuardedAcceptance));

    private static readonly Gen<double> Values = Gen.Choose(-20_000, 20_000).Select(i => i / 1000.0);

    private static readonly Gen<double> Uncertainties = Gen.Choose(1, 3000).Select(i => i / 1000.0);

    private static readonly Gen<double?> DegreesOfFreedom = Gen.OneOf(Gen.Constant<double?>(null), Gen.Choose(1, 40).Select(i => (double?)i));

    private static readonly Gen<Case> Cases =
        from rule in Rules
        from limit in Values
        from x1 in Values
        from x2 in Values
        from u in Uncertainties
        from dof in DegreesOfFreedom
        select new Case(rule, limit, Math.Min(x1, x2), Math.Max(x1, x2), u, dof);

    [Property(MaxTest = 300)]
    public Property Assess_UpperLimit_RaisingTheResultNeverImprovesTheOutcome() =>
        Prop.ForAll(Cases.ToArbitrary(), c =>
        {
            var limit = SpecificationLimit.Upper(MgL(c.Limit));
            ComplianceDecision low = c.Rule.Assess(limit, c.Result(c.Low), K2);
            ComplianceDecision high = c.Rule.Assess(limit, c.Result(c.High), K2);
            return Rank(low.Outcome) <= Rank(high.Outcome) && low.ProbabilityBeyondLimit <= high.ProbabilityBeyondLimit;
        });

    [Property(MaxTest = 300)]
    public Property Assess_LowerLimit_LoweringTheResultNeverImprovesTheOutcome() =>
        Prop.ForAll(Cases.ToArbitrary(), c =>
        {
            var limit = SpecificationLimit.Lower(MgL(c.Limit));
            ComplianceDecision low = c.Rule.Assess(limit, c.Result(c.Low), K2);
            ComplianceDecision high = c.Rule.Assess(limit, c.Result(c.High), K2);
            return Rank(high.Outcome) <= Rank(low.Outcome);
        });

    [Property(MaxTest = 300)]
    public Property Assess_MirroredLimitAndResult_GiveTheMirroredDecision() =>
        Prop.ForAll(Cases.ToArbitrary(), c =>
        {
            ComplianceDecision upper = c.Rule.Assess(SpecificationLimit.Upper(MgL(c.Limit)), c.Result(c.Low), K2);
            ComplianceDecision lower = c.Rule.Assess(SpecificationLimit.Lower(MgL(-c.Limit)), c.Result(-c.Low), K2);
            return upper.Outcome == lower.Outcome
                && upper.Zone == lower.Zone
                && upper.ProbabilityBeyondLimit.Equals(lower.ProbabilityBeyondLimit)
                && upper.ProbabilityWithinLimit.Equals(lower.ProbabilityWithinLimit)
                && upper.AcceptanceLimit.Value.Equals(-lower.AcceptanceLimit.Value)
                && upper.RejectionLimit.Value.Equals(-lower.RejectionLimit.Value);
        });

    private static readonly Gen<(DecisionRule Narrow, DecisionRule Wide)> Widenings = Gen.Elements(
        (DecisionRule.SimpleAcceptance, DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedAcceptance)),
        (DecisionRule.SimpleAcceptance, DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary)),
        (DecisionRule.ExpandedUncertaintyGuardBand(0.5, DecisionMode.NonBinary), DecisionRule.ExpandedUncertaintyGuardBand(1.5, DecisionMode.NonBinary)),
        (DecisionRule.ExpandedUncertaintyGuardBand(0.83, DecisionMode.BinaryGuardedAcceptance), DecisionRule.ExpandedUncertaintyGuardBand(1, DecisionMode.BinaryGuardedAcceptance)),
        (DecisionRule.RiskGuardBand(0.2, DecisionMode.NonBinary), DecisionRule.RiskGuardBand(0.01, DecisionMode.NonBinary)),
        (DecisionRule.RiskGuardBand(0.05, DecisionMode.BinaryGuardedAcceptance), DecisionRule.RiskGuardBand(0.001, DecisionMode.BinaryGuardedAcceptance)),
        (DecisionRule.OneSidedTTest(0.1, DecisionMode.NonBinary), DecisionRule.OneSidedTTest(0.01, DecisionMode.NonBinary)));

    [Property(MaxTest = 300)]
    public Property Assess_WideningTheGuardBand_NeverTurnsNonCompliantOrInconclusiveIntoCompliant() =>
        Prop.ForAll(Cases.ToArbitrary(), Widenings.ToArbitrary(), (c, pair) =>
        {
            foreach (SpecificationLimit limit in new[] { SpecificationLimit.Upper(MgL(c.Limit)), SpecificationLimit.Lower(MgL(c.Limit)) })
            {
                ComplianceOutcome narrow = pair.Narrow.Assess(limit, c.Result(c.Low, pair.Narrow), K2).Outcome;
                ComplianceOutcome wide = pair.Wide.Assess(limit, c.Result(c.Low, pair.Wide), K2).Outcome;
                if (narrow != ComplianceOutcome.Compliant && wide == ComplianceOutcome.Compliant)
                {
                    return false;
                }
            }

            return true;
        });

    // Guarded rejection is the mirror rule: widening its guard band never turns compliant into non-compliant.
    [Property(MaxTest = 300)]
    public Property Assess_WideningAGuardedRejectionBand_NeverTurnsCompliantIntoNonCompliant() =>
        Prop.ForAll(Cases.ToArbitrary(), c =>
        {
            var limit = SpecificationLimit.Upper(MgL(c.Limit));
            ComplianceOutcome narrow = DecisionRule.RiskGuardBand(0.2, DecisionMode.BinaryGuardedRejection).Assess(limit, c.Result(c.Low)).Outcome;
            ComplianceOutcome wide = DecisionRule.RiskGuardBand(0.01, DecisionMode.BinaryGuardedRejection).Assess(limit, c.Result(c.Low)).Outcome;
            return !(narrow == ComplianceOutcome.Compliant && wide == ComplianceOutcome.NonCompliant);
        });

    [Property(MaxTest = 300)]
    public Property Assess_Probabilities_AreComplementaryAndInRange() =>
        Prop.ForAll(Cases.ToArbitrary(), c =>
        {
            ComplianceDecision d = c.Rule.Assess(SpecificationLimit.Upper(MgL(c.Limit)), c.Result(c.Low), K2);
            return d.ProbabilityBeyondLimit >= 0 && d.ProbabilityWithinLimit >= 0
                && Math.Abs(d.ProbabilityBeyondLimit + d.ProbabilityWithinLimit - 1) < 1e-12;
        });

    private static int Rank(ComplianceOutcome outcome) => outcome switch
    {
        ComplianceOutcome.Compliant => 0,
        ComplianceOutcome.Inconclusive => 1,
        _ => 2,
    };

    private static Concentration MgL(double value) => Concentration.FromMilligramsPerLitre(value);

    // A t test needs degrees of freedom: a result without them is given ν = 30 for the t-test rules.
    internal sealed record Case(DecisionRule Rule, double Limit, double Low, double High, double U, double? Dof)
    {
        internal Measured<Concentration> Result(double x) => Result(x, Rule);

        internal Measured<Concentration> Result(double x, DecisionRule rule)
        {
            double? dof = Dof is null && rule.Kind == DecisionRuleKind.OneSidedTTest ? 30 : Dof;
            return Measured.WithStandardUncertainty(MgL(x), MgL(U), dof);
        }
    }
}
