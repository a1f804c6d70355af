using System;
using System.Collections.Generic;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using InternalStdCal.Uncertainty;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>
/// <see cref="AnalyteResult.UncertaintyBudget"/> on results of <see cref="RunScenario"/>: the one-call budget equals
/// <see cref="ResultUncertaintyBudget.Create"/> called by hand on the same numbers (bit for bit), and its u_c matches
/// values worked out by hand with the product rule for relative uncertainties (JCGM 100:2008 §5.1.6, from memory;
/// the s_x0 of S1 Pb is the hand value of <see cref="RunProcessorTests"/>).
/// </summary>
public class AnalyteResultTests
{
    private const double SxS1Pb = 0.0335667108; // µg/L, hand-computed in RunProcessorTests

    private static readonly RunReport Report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), RunScenario.Method());

    // Class A tolerances as rectangular half-widths (field-reference §7.3, from memory): 1 mL pipette ±0.008 mL, 10 mL flask ±0.025 mL.
    private static readonly SamplePreparation Pipetted = SamplePreparation.Liquid(DilutionStep.Volumetric(
        Measured.FromTolerance(Volume.FromMillilitres(1), Volume.FromMillilitres(0.008), ToleranceDistribution.Rectangular),
        Measured.FromTolerance(Volume.FromMillilitres(10), Volume.FromMillilitres(0.025), ToleranceDistribution.Rectangular)));

    [Fact]
    public void UncertaintyBudget_ExactDilution_IsTheCalibrationTermTimesTheDilutionFactor()
    {
        // S1 Pb: x0 = 3 µg/L, s_x0 = 0.0335667108 µg/L, exact 1 → 10 mL: y = 30 µg/L, u_c = 0.335667108 µg/L.
        AnalyteResult r = Report.ResultFor("S1", "Pb")!;
        ResultUncertaintyBudget b = r.UncertaintyBudget();
        Assert.Equal(30, b.Gum.Value, 9);
        Assert.True(Math.Abs(b.Gum.StandardUncertainty - (10 * SxS1Pb)) <= 1e-8 * 10 * SxS1Pb);
        Assert.Equal(ConcentrationUnit.MicrogramPerLitre, b.Unit);

        SampleResult byHand = SampleResult.Liquid(Measured.Exact(RunScenario.Ug(3)), RunScenario.TenfoldDilution.Dilutions);
        AssertIdentical(ResultUncertaintyBudget.Create(r.Quantitation!, byHand), b);
    }

    [Fact]
    public void UncertaintyBudget_UncertainDilutionAndRecovery_MatchesHandProductRule()
    {
        // S7 = S1's signals with a pipetted 1 → 10 mL dilution; recovery R = 0.95 ± 0.02 (invented) corrects the result (exponent −1):
        // y = 3·10/0.95; (u/y)² = (s_x0/3)² + (0.008/√3/1)² + (0.025/√3/10)² + (0.02/0.95)².
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.Sample(18, "S7", RunScenario.Signals(31993.75, 100000, 15255, 50000), Pipetted));
        AnalyteResult r = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method()).ResultFor("S7", "Pb")!;
        var factors = new[] { UncertainInput.Normal("recovery", 0.95, 0.02) };
        var exponents = new[] { -1.0 };
        ResultUncertaintyBudget b = r.UncertaintyBudget(factors, exponents);

        double rel = Math.Sqrt(Math.Pow(SxS1Pb / 3, 2) + Math.Pow(0.008 / Math.Sqrt(3), 2) + Math.Pow(0.0025 / Math.Sqrt(3), 2) + Math.Pow(0.02 / 0.95, 2));
        Assert.True(Math.Abs(b.Gum.Value - (30 / 0.95)) <= 1e-9 * 30);
        Assert.True(Math.Abs(b.Gum.RelativeStandardUncertainty - rel) <= 1e-7 * rel, $"{b.Gum.RelativeStandardUncertainty:R} vs {rel:R}");

        SampleResult byHand = SampleResult.Liquid(r.Quantitation!.AsMeasured()!.Value, Pipetted.Dilutions);
        AssertIdentical(ResultUncertaintyBudget.Create(r.Quantitation, byHand, null, factors, exponents), b);
    }

    [Fact]
    public void UncertaintyBudget_DigestedSolid_IsInTheSampleUnitAndMatchesCreate()
    {
        // S2 Pb: 6 µg/L measured → 6 mg/kg (hand value in RunProcessorTests).
        AnalyteResult r = Report.ResultFor("S2", "Pb")!;
        ResultUncertaintyBudget b = r.UncertaintyBudget(coverageProbability: 0.99);
        Assert.Equal(ConcentrationUnit.MilligramPerKilogram, b.Unit);
        Assert.Equal(6, b.Gum.Value, 9);
        Assert.Equal(0.99, b.Gum.CoverageProbability);

        SampleResult byHand = SampleResult.Solid(
            r.Quantitation!.AsMeasured()!.Value,
            Measured.Exact(Volume.FromMillilitres(50)),
            Measured.Exact(Mass.FromGrams(0.25)),
            RunScenario.Digest.Dilutions,
            ConcentrationUnit.MilligramPerKilogram);
        AssertIdentical(ResultUncertaintyBudget.Create(r.Quantitation, byHand, coverageProbability: 0.99), b);
    }

    [Fact]
    public void UncertaintyBudget_CensoredResult_IsTheBudgetOfTheRawEstimate()
    {
        // MB Pb: 0.05 µg/L, below the LOD of 0.1 µg/L, reported "< LOD"; the budget is that of the raw 0.05 µg/L.
        AnalyteResult r = Report.ResultFor("MB", "Pb")!;
        Assert.True(r.Reported!.IsNotDetected);
        ResultUncertaintyBudget b = r.UncertaintyBudget();
        Assert.Equal(0.05, b.Gum.Value, 9);
        AssertIdentical(ResultUncertaintyBudget.Create(r.Quantitation!, r.SampleCalculation), b);
    }

    [Fact]
    public void UncertaintyBudget_MissingSignal_ThrowsWithTheReason()
    {
        // S3 has no Cd signal: nothing was quantified, so there is no budget.
        AnalyteResult r = Report.ResultFor("S3", "Cd")!;
        InvalidOperationException e = Assert.Throws<InvalidOperationException>(() => r.UncertaintyBudget());
        Assert.Contains("'S3' / Cd has no quantitation", e.Message, StringComparison.Ordinal);
        Assert.Contains("no analyte signal", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UncertaintyBudget_ReplicateTermWithOneInjection_ThrowsNamingTheParameter()
    {
        Assert.Throws<ArgumentException>("addReplicateRepeatability", () => Report.ResultFor("S1", "Pb")!.UncertaintyBudget(addReplicateRepeatability: true));
    }

    private static void AssertIdentical(ResultUncertaintyBudget expected, ResultUncertaintyBudget actual)
    {
        Assert.Equal(expected.Unit, actual.Unit);
        Assert.Equal(expected.Model.Inputs.Count, actual.Model.Inputs.Count);
        Assert.Equal(expected.Gum.Value, actual.Gum.Value);
        Assert.Equal(expected.Gum.StandardUncertainty, actual.Gum.StandardUncertainty);
        Assert.Equal(expected.Gum.EffectiveDegreesOfFreedom, actual.Gum.EffectiveDegreesOfFreedom);
        Assert.Equal(expected.Gum.CoverageFactor, actual.Gum.CoverageFactor);
        Assert.Equal(expected.Gum.ExpandedUncertainty, actual.Gum.ExpandedUncertainty);
    }
}
