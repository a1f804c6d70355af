using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Decisions;
using InternalStdCal.Quantities;
using Xunit;
using static InternalStdCal.Tests.Hardening.BadInput.BadInput;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>Bad input to every entry point of <c>Decisions</c>. Rules: k &gt; 0 and p in (0, 1) (JCGM 100 §6.2,
/// §6.3); risks and α in (0, 0.5) (JCGM 106 §9); ν ≥ 1 (JCGM 100 §G); power in (α, 1) for a one-sided test
/// (common practice); a guard band of a multiple of u needs u &gt; 0 (ILAC G8:09/2019 §4.2).</summary>
public class DecisionsBadInputTests
{
    private static readonly Type Range = typeof(ArgumentOutOfRangeException);
    private static readonly Type Arg = typeof(ArgumentException);
    private static readonly Type Null = typeof(ArgumentNullException);

    private static Concentration Ug(double v) => Concentration.FromMicrogramsPerLitre(v);

    private static readonly SpecificationLimit Limit = SpecificationLimit.Upper(Ug(10));

    private static readonly DecisionRule Guarded = DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedAcceptance);

    public static IEnumerable<object[]> Cases => Rows(new BadInputCase[]
    {
        new("Decisions.Coverage.WithFactor", "k = 0", () => Coverage.WithFactor(0), Range, "k", "0", FinitePositive),
        new("Decisions.Coverage.WithFactor", "k = +inf", () => Coverage.WithFactor(double.PositiveInfinity), Range, "k", "Infinity", FinitePositive),
        new("Decisions.Coverage.WithProbability", "p = 1", () => Coverage.WithProbability(1), Range, "probability", "1", "(0, 1)"),
        new("Decisions.Coverage.WithProbability", "p = NaN", () => Coverage.WithProbability(double.NaN), Range, "probability", "NaN", "(0, 1)"),
        new("Decisions.Coverage.FactorFor", "ν = 0.5", () => Coverage.WithProbability(0.95).FactorFor(0.5), Range, "degreesOfFreedom", "0.5", ">= 1"),
        new("Decisions.Coverage.FactorFor", "ν = NaN with a fixed k", () => Coverage.WithFactor(2).FactorFor(double.NaN), Range, "degreesOfFreedom", "NaN", ">= 1"),
        new("Decisions.DecisionRule.ExpandedUncertaintyGuardBand", "m = 0", () => DecisionRule.ExpandedUncertaintyGuardBand(0, DecisionMode.BinaryGuardedAcceptance), Range, "multiple", "0", FinitePositive),
        new("Decisions.DecisionRule.ExpandedUncertaintyGuardBand", "undefined mode", () => DecisionRule.ExpandedUncertaintyGuardBand((DecisionMode)5), Range, "mode", "5", "defined DecisionMode"),
        new("Decisions.DecisionRule.RiskGuardBand", "risk 0.5", () => DecisionRule.RiskGuardBand(0.5, DecisionMode.BinaryGuardedRejection), Range, "maximumRisk", "0.5", "(0, 0.5)"),
        new("Decisions.DecisionRule.RiskGuardBand", "undefined mode", () => DecisionRule.RiskGuardBand(0.05, (DecisionMode)(-1)), Range, "mode", "-1", "defined DecisionMode"),
        new("Decisions.DecisionRule.OneSidedTTest", "α = 0", () => DecisionRule.OneSidedTTest(0, DecisionMode.BinaryGuardedAcceptance), Range, "alpha", "0", "(0, 0.5)"),
        new("Decisions.DecisionRule.OneSidedTTest", "α = NaN", () => DecisionRule.OneSidedTTest(double.NaN, DecisionMode.NonBinary), Range, "alpha", "NaN", "(0, 0.5)"),
        new("Decisions.DecisionRule.Named", "blank", () => DecisionRule.SimpleAcceptance.Named("  "), Arg, "name", "non-blank"),
        new("Decisions.DecisionRule.Assess", "result of another kind (µmol/L vs µg/L)", () => DecisionRule.SimpleAcceptance.Assess(Limit, Measured.Exact(Concentration.FromMicromolesPerLitre(1))), Arg, "result", "µmol/L"),
        new("Decisions.DecisionRule.Assess", "guard band with u = 0", () => Guarded.Assess(Limit, Measured.Exact(Ug(9)), Coverage.WithFactor(2)), Arg, "result", "u > 0"),
        new("Decisions.DecisionRule.Assess", "guard band without coverage", () => Guarded.Assess(Limit, Measured.WithStandardUncertainty(Ug(9), Ug(0.5))), Null, "coverage", "coverage factor"),
        new("Decisions.DecisionRule.Assess", "null limit", () => DecisionRule.SimpleAcceptance.Assess(null!, Measured.Exact(Ug(9))), Null, "limit", "limit"),
        new("Decisions.DecisionRule.Assess", "one replicate", () => DecisionRule.OneSidedTTest(0.05, DecisionMode.BinaryGuardedAcceptance).Assess(Limit, new[] { Ug(9) }), Arg, "replicates", "1", "at least 2"),
        new("Decisions.DecisionRule.Assess", "empty replicates", () => DecisionRule.OneSidedTTest(0.05, DecisionMode.BinaryGuardedAcceptance).Assess(Limit, Array.Empty<Concentration>()), Arg, "replicates", "0", "at least 2"),
        new("Decisions.DecisionRule.Assess", "replicate of another kind", () => DecisionRule.OneSidedTTest(0.05, DecisionMode.BinaryGuardedAcceptance).Assess(Limit, new[] { Ug(9), Concentration.FromMicromolesPerLitre(9) }), Arg, "replicates", "µmol/L"),
        new("Decisions.DecisionRule.Assess", "all-equal replicates with a guard band of u", () => Guarded.Assess(Limit, new[] { Ug(9), Ug(9), Ug(9) }, Coverage.WithFactor(2)), Arg, "replicates", "u > 0"),
        new("Decisions.SpecificationLimit.Upper", "blank name", () => SpecificationLimit.Upper(Ug(1), " "), Arg, "name", "non-blank"),
        new("Decisions.SpecificationLimit.Lower", "null name", () => SpecificationLimit.Lower(Ug(1), null!), Null, "name", "name"),
        new("Decisions.ReplicatePlan.WithAlreadyMeasured", "-1", () => ReplicatesPlanner.ForEffectSize(1, 0.05, 0.9).WithAlreadyMeasured(-1), Range, "alreadyMeasured", "-1", ">= 0"),
        new("Decisions.ReplicatesPlanner.ForEffectSize", "effect 0", () => ReplicatesPlanner.ForEffectSize(0, 0.05, 0.9), Range, "effectSize", "0", FinitePositive),
        new("Decisions.ReplicatesPlanner.ForEffectSize", "power 1", () => ReplicatesPlanner.ForEffectSize(1, 0.05, 1), Range, "power", "1", "(0, 1)"),
        new("Decisions.ReplicatesPlanner.ForEffectSize", "α 0.5", () => ReplicatesPlanner.ForEffectSize(1, 0.5, 0.9), Range, "alpha", "0.5", "(0, 0.5)"),
        new("Decisions.ReplicatesPlanner.ForDistance", "σ = 0", () => ReplicatesPlanner.ForDistance(Ug(1), Ug(0), 0.05, 0.9), Range, "standardDeviation", "0", FinitePositive),
        new("Decisions.ReplicatesPlanner.ForDistance", "distance 0", () => ReplicatesPlanner.ForDistance(Ug(0), Ug(1), 0.05, 0.9), Range, "distance", "0", "non-zero"),
        new("Decisions.ReplicatesPlanner.ForDistance", "σ of another kind", () => ReplicatesPlanner.ForDistance(Ug(1), Concentration.FromMicromolesPerLitre(1), 0.05, 0.9), Arg, "standardDeviation", "µmol/L", "kinds must match"),
        new("Decisions.ReplicatesPlanner.ForExpectedMean", "mean on the limit", () => ReplicatesPlanner.ForExpectedMean(Limit, Ug(10), Ug(1), 0.05, 0.9), Range, "expectedMean", "10 µg/L", "non-zero"),
        new("Decisions.ReplicatesPlanner.ForExpectedMean", "RSD 0", () => ReplicatesPlanner.ForExpectedMean(Limit, Ug(8), 0, 0.05, 0.9), Range, "rsdPercent", "0", FinitePositive),
        new("Decisions.ReplicatesPlanner.ForExpectedMean", "mean of another kind", () => ReplicatesPlanner.ForExpectedMean(Limit, Concentration.FromMicromolesPerLitre(8), Ug(1), 0.05, 0.9), Arg, "expectedMean", "µmol/L", "same kind as the limit"),
        new("Decisions.ReplicatesPlanner.ForReplicates", "all equal", () => ReplicatesPlanner.ForReplicates(Limit, new[] { Ug(8), Ug(8) }, 0.05, 0.9), Arg, "replicates", "all 2 replicates are equal", "s = 0"),
        new("Decisions.ReplicatesPlanner.ForReplicates", "single point", () => ReplicatesPlanner.ForReplicates(Limit, new[] { Ug(8) }, 0.05, 0.9), Arg, "replicates", "1", "at least 2"),
        new("Decisions.ReplicatesPlanner.MinimumEffectSize", "1 replicate", () => ReplicatesPlanner.MinimumEffectSize(1, 0.05, 0.9), Range, "replicates", "1", ">= 2"),
        new("Decisions.ReplicatesPlanner.MinimumEffectSize", "power below α", () => ReplicatesPlanner.MinimumEffectSize(5, 0.05, 0.01), Range, "power", "0.01", "(0.05, 1)"),
        new("Decisions.ReplicatesPlanner.Power", "effect -1", () => ReplicatesPlanner.Power(-1, 5, 0.05), Range, "effectSize", "-1", FinitePositive),
        new("Decisions.ReplicatesPlanner.Power", "α NaN", () => ReplicatesPlanner.Power(1, 5, double.NaN), Range, "alpha", "NaN", "(0, 0.5)"),
        new("Decisions.ReplicatesPlanner.MaximumStandardDeviation", "mean on the limit", () => ReplicatesPlanner.MaximumStandardDeviation(Limit, Ug(10), 5, 0.05, 0.9), Range, "expectedMean", "10 µg/L", "non-zero"),
        new("Decisions.ReplicatesPlanner.MaximumStandardDeviation", "1 replicate", () => ReplicatesPlanner.MaximumStandardDeviation(Limit, Ug(8), 1, 0.05, 0.9), Range, "replicates", "1", ">= 2"),
        new("Decisions.ReplicatesPlanner.MaximumRsdPercent", "mean 0", () => ReplicatesPlanner.MaximumRsdPercent(SpecificationLimit.Lower(Ug(1)), Ug(0), 5, 0.05, 0.9), Range, "expectedMean", "0 µg/L", "non-zero mean"),
    });

    public static IEnumerable<object[]> Magnitudes => Rows(new MagnitudeCase[]
    {
        new("Decisions.DecisionRule.Assess", "u = 1e300", () => Values(Guarded.Assess(Limit, Measured.WithStandardUncertainty(Ug(9), Ug(1e300)), Coverage.WithFactor(2)))),
        new("Decisions.DecisionRule.Assess", "u = 1e-300", () => Values(DecisionRule.RiskGuardBand(0.05, DecisionMode.BinaryGuardedAcceptance).Assess(Limit, Measured.WithStandardUncertainty(Ug(9), Ug(1e-300))))),
        new("Decisions.DecisionRule.Assess", "replicates ±1e300", () => Values(DecisionRule.OneSidedTTest(0.05, DecisionMode.BinaryGuardedAcceptance).Assess(Limit, new[] { Ug(1e300), Ug(-1e300), Ug(1e300) }))),
        new("Decisions.DecisionRule.Assess", "guard band m = 1e300", () => Values(DecisionRule.ExpandedUncertaintyGuardBand(1e300, DecisionMode.BinaryGuardedRejection).Assess(Limit, Measured.WithStandardUncertainty(Ug(9), Ug(1e10)), Coverage.WithFactor(2)))),
        new("Decisions.Coverage.WithProbability", "p = 1 - 1e-16 at ν = 1", () => new[] { Coverage.WithProbability(1 - 1e-16).FactorFor(1) }),
        new("Decisions.Coverage.FactorFor", "p = 1 - 1e-15 at ν = 1", () => new[] { Coverage.WithProbability(1 - 1e-15).FactorFor(1) }),
        new("Decisions.ReplicatesPlanner.ForEffectSize", "effect 1e-300", () => { var p = ReplicatesPlanner.ForEffectSize(1e-300, 0.05, 0.9); return new[] { (double)p.Replicates, p.Power }; }),
        new("Decisions.ReplicatesPlanner.ForEffectSize", "effect 1e300", () => { var p = ReplicatesPlanner.ForEffectSize(1e300, 0.05, 0.9); return new[] { (double)p.Replicates, p.Power }; }),
        new("Decisions.ReplicatesPlanner.Power", "effect 1e300", () => new[] { ReplicatesPlanner.Power(1e300, 5, 0.05) }),
        new("Decisions.ReplicatesPlanner.MinimumEffectSize", "replicates int.MaxValue", () => new[] { ReplicatesPlanner.MinimumEffectSize(int.MaxValue, 0.05, 0.9) }),
        new("Decisions.ReplicatesPlanner.ForDistance", "distance 1e300, σ 1e-300", () => { var p = ReplicatesPlanner.ForDistance(Ug(1e300), Ug(1e-300), 0.05, 0.9); return new[] { (double)p.Replicates, p.EffectSize }; }),
        new("Decisions.ReplicatesPlanner.MaximumRsdPercent", "mean 1e-300", () => new[] { ReplicatesPlanner.MaximumRsdPercent(Limit, Ug(1e-300), 5, 0.05, 0.9) }),
    });

    private static double[] Values(ComplianceDecision d) =>
        new[] { d.GuardBand.Value, d.ProbabilityBeyondLimit, d.ProbabilityWithinLimit, d.StandardizedDistance ?? 0, d.ExpandedUncertainty?.Value ?? 0 };

    [Theory]
    [MemberData(nameof(Cases))]
    public void EntryPoint_BadInput_ThrowsDocumentedExceptionNamingParameterValueAndRange(string name, BadInputCase c)
    {
        Assert.NotNull(name);
        AssertRejected(c);
    }

    [Theory]
    [MemberData(nameof(Magnitudes))]
    public void EntryPoint_AbsurdMagnitude_FiniteOrDocumentedException(string name, MagnitudeCase c)
    {
        Assert.NotNull(name);
        AssertFiniteOrRejected(c);
    }
}
