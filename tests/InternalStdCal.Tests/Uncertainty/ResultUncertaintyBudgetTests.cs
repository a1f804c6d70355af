using System;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Preparation;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.Calibration;
using InternalStdCal.Tests.TestSupport;
using InternalStdCal.Uncertainty;
using Xunit;

namespace InternalStdCal.Tests.Uncertainty;

public class ResultUncertaintyBudgetTests
{
    // x₀ = 6.2072155 ng/L, s_x0 = 0.239754 (m = 1), ν = 5: field reference §1.2 inverse prediction at ȳ0 = 13.5
    // (data FROM MEMORY of Miller & Miller, values COMPUTED).
    private const double X0 = 6.2072155;
    private const double Sx0 = 0.239754;

    private static QuantitationResult Quantified(int m = 1)
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear);
        Injection[] injections = m == 1 ? new[] { new Injection(13.5, 1) } : new[] { new Injection(13.4, 1), new Injection(13.6, 1) };
        return SampleQuantitation.Quantify(cal, new UnknownSample("U", Concentration.From(1, ConcentrationUnit.NanogramPerLitre), injections));
    }

    // Class A tolerances (field reference §7.3, FROM MEMORY; rectangular as in §7.5): 1 mL pipette ±0.008 mL, 100 mL flask ±0.10 mL.
    private static VolumetricDilution OneInHundred() => DilutionStep.Volumetric(
        Measured.FromTolerance(Volume.FromMillilitres(1), Volume.FromMillilitres(0.008), ToleranceDistribution.Rectangular),
        Measured.FromTolerance(Volume.FromMillilitres(100), Volume.FromMillilitres(0.10), ToleranceDistribution.Rectangular));

    [Fact]
    public void Create_QuantitationOnly_IsTheCalibrationComponent()
    {
        ResultUncertaintyBudget b = ResultUncertaintyBudget.Create(Quantified());
        Assert.Equal(X0, b.Gum.Value, 6);
        Assert.Equal(Sx0, b.Gum.StandardUncertainty, 5);
        Assert.Equal(5, b.Gum.EffectiveDegreesOfFreedom, 10);
        Assert.Equal(2.5705818, b.Gum.CoverageFactor, 6); // t(0.975, 5), field reference §1.2/§6
        Assert.Equal(ConcentrationUnit.NanogramPerLitre, b.Unit);
        Assert.Equal(InputDistribution.StudentT, b.Model.Inputs[0].Distribution);
    }

    [Fact]
    public void Create_LiquidWithDilution_CombinesRelativeTermsInQuadrature()
    {
        // y = x₀·V_final/V_aliquot; (u/y)² = (s_x0/x₀)² + (0.008/√3/1)² + (0.10/√3/100)² (JCGM 100:2008 §5.1.6, COMPUTED here).
        QuantitationResult q = Quantified();
        SampleResult template = SampleResult.Liquid(q.AsMeasured()!.Value, new DilutionStep[] { OneInHundred() });
        ResultUncertaintyBudget b = ResultUncertaintyBudget.Create(q, template);
        double rel = Math.Sqrt(Math.Pow(Sx0 / X0, 2) + Math.Pow(0.008 / Math.Sqrt(3), 2) + Math.Pow(0.001 / Math.Sqrt(3), 2));
        Assert.Equal(100 * X0, b.Gum.Value, 4);
        Assert.Equal(rel, b.Gum.RelativeStandardUncertainty, 6);
        Assert.Equal(3, b.Model.Inputs.Count);
        Assert.Equal(InputDistribution.Rectangular, b.Model.Inputs[1].Distribution);

        // Same numbers as the preparation module's own budget for this result.
        Numeric.AssertRelative(template.Result.StandardUncertainty.Value, b.Gum.StandardUncertainty, 1e-12);
        Numeric.AssertRelative(template.Result.DegreesOfFreedom!.Value, b.Gum.EffectiveDegreesOfFreedom, 1e-12);
        Numeric.AssertRelative(template.Result.Value.Value, b.ToMeasured().Value.Value, 1e-14);
    }

    [Fact]
    public void Create_SolidDigest_MatchesPreparationModule()
    {
        QuantitationResult q = Quantified();
        SampleResult template = SampleResult.Solid(
            q.AsMeasured()!.Value,
            Measured.FromTolerance(Volume.FromMillilitres(50), Volume.FromMillilitres(0.06), ToleranceDistribution.Rectangular),
            Measured.WithStandardUncertainty(Mass.FromGrams(0.5), Mass.FromGrams(0.0001)),
            new DilutionStep[] { OneInHundred() },
            ConcentrationUnit.MicrogramPerKilogram);
        ResultUncertaintyBudget b = ResultUncertaintyBudget.Create(q, template);
        Assert.Equal(ConcentrationUnit.MicrogramPerKilogram, b.Unit);
        Numeric.AssertRelative(template.Result.Value.Value, b.Gum.Value, 1e-13);
        Numeric.AssertRelative(template.Result.StandardUncertainty.Value, b.Gum.StandardUncertainty, 1e-12);
        Assert.Contains(b.Model.Inputs, x => x.Name == "Sample: sample mass");
    }

    [Fact]
    public void Create_RecoveryAndInternalStandard_AddTheirRelativeTerms()
    {
        QuantitationResult q = Quantified();
        var recovery = UncertainInput.Normal("recovery", 0.95, 0.02);
        InternalStandardSpike spike = InternalStandardSpike.Create(
            PreparedSolution.FromCertificate("IS stock", Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(10), Concentration.FromMilligramsPerLitre(0.05))),
            DilutionStep.Volumetric(Measured.WithStandardUncertainty(Volume.FromMicrolitres(100), Volume.FromMicrolitres(0.5)), Measured.WithStandardUncertainty(Volume.FromMillilitres(10), Volume.FromMillilitres(0.02))),
            SpikeTiming.BeforeSamplePreparation);
        ResultUncertaintyBudget b = ResultUncertaintyBudget.Create(q, internalStandard: spike, factors: new[] { recovery }, factorExponents: new[] { -1.0 });
        double isRel = spike.Concentration.RelativeStandardUncertainty;
        double rel = Math.Sqrt(Math.Pow(Sx0 / X0, 2) + Math.Pow(isRel, 2) + Math.Pow(0.02 / 0.95, 2));
        Assert.Equal(X0 / 0.95, b.Gum.Value, 5);
        Assert.Equal(rel, b.Gum.RelativeStandardUncertainty, 6);
    }

    [Fact]
    public void Create_SamePipetteInTwoSteps_CorrelationAddsTheCrossTerm()
    {
        // Two 1 → 100 steps with one pipette: with r = 1 between the two aliquot volumes their relative terms add
        // linearly, (u/y)² = (s_x0/x₀)² + (2·u_p)² + 2·u_f² with u_p = 0.008/√3, u_f = 0.001/√3
        // (JCGM 100:2008 §5.2.2, correlated inputs; COMPUTED here).
        QuantitationResult q = Quantified();
        SampleResult template = SampleResult.Liquid(q.AsMeasured()!.Value, new DilutionStep[] { OneInHundred(), OneInHundred() });
        ResultUncertaintyBudget independent = ResultUncertaintyBudget.Create(q, template);
        string[] aliquots = independent.Model.Inputs.Select(i => i.Name).Where(n => n.EndsWith("aliquot volume", StringComparison.Ordinal)).ToArray();
        Assert.Equal(2, aliquots.Length);

        ResultUncertaintyBudget shared = ResultUncertaintyBudget.Create(q, template, correlations: new[] { new InputCorrelation(aliquots[0], aliquots[1], 1) });
        double up = 0.008 / Math.Sqrt(3), uf = 0.001 / Math.Sqrt(3);
        double relShared = Math.Sqrt(Math.Pow(Sx0 / X0, 2) + Math.Pow(2 * up, 2) + (2 * uf * uf));
        double relIndependent = Math.Sqrt(Math.Pow(Sx0 / X0, 2) + (2 * up * up) + (2 * uf * uf));
        Assert.Equal(relShared, shared.Gum.RelativeStandardUncertainty, 6);
        Assert.Equal(relIndependent, independent.Gum.RelativeStandardUncertainty, 6);
        Assert.Throws<ArgumentException>(() => ResultUncertaintyBudget.Create(q, template, correlations: new[] { new InputCorrelation("no such input", aliquots[1], 0.5) }));
    }

    [Fact]
    public void Create_ReplicateRepeatability_AddsTypeAFactor()
    {
        QuantitationResult q = Quantified(m: 2);
        ResultUncertaintyBudget b = ResultUncertaintyBudget.Create(q, addReplicateRepeatability: true);
        UncertainInput rep = b.Model.Inputs.Single(x => x.Name == "replicate repeatability");
        Assert.Equal(1, rep.DegreesOfFreedom);
        Numeric.AssertRelative(q.InjectionStandardDeviation!.Value.Value / Math.Sqrt(2) / q.Concentration.Value, rep.StandardUncertainty, 1e-14);
        Assert.Throws<ArgumentException>(() => ResultUncertaintyBudget.Create(Quantified(), addReplicateRepeatability: true));
    }

    [Fact]
    public void MonteCarlo_AgreesWithGumWithinTolerance()
    {
        QuantitationResult q = Quantified();
        ResultUncertaintyBudget b = ResultUncertaintyBudget.Create(q, SampleResult.Liquid(q.AsMeasured()!.Value, new DilutionStep[] { OneInHundred() }));
        MonteCarloEvaluation mc = b.MonteCarlo(77);
        Assert.True(Math.Abs(mc.Value - b.Gum.Value) <= 2 * mc.NumericalTolerance(2), mc.ToString());
        Assert.Contains("x0 (calibration)", b.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Create_BadArguments_Throw()
    {
        Assert.Equal("quantitation", Assert.Throws<ArgumentNullException>(() => ResultUncertaintyBudget.Create(null!)).ParamName);
        Assert.Equal("factorExponents", Assert.Throws<ArgumentException>(() => ResultUncertaintyBudget.Create(Quantified(), factors: new[] { UncertainInput.Normal("r", 1, 0.1) }, factorExponents: new[] { 1.0, 2 })).ParamName);
        Assert.Equal("coverageProbability", Assert.Throws<ArgumentOutOfRangeException>(() => ResultUncertaintyBudget.Create(Quantified(), coverageProbability: 0)).ParamName);
    }
}
