using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>
/// End-to-end processing of <see cref="RunScenario"/>. Every expected value below was worked out by hand (exact
/// decimal arithmetic) from the published formulas, not by the library:
/// <list type="bullet">
/// <item>ratio y = A_analyte / A_IS (SW-846 8000C §11.4.3; field-reference §0, VERIFIED);</item>
/// <item>OLS line b = Sxy/Sxx, a = ȳ − b·x̄, s_y/x = sqrt(Σ(y − ŷ)²/(n − 2)), x0 = (ȳ0 − a)/b,
///   s_x0 = (s_y/x/b)·sqrt(1/m + 1/n + (ȳ0 − ȳ)²/(b²·Sxx)) (field-reference §1.1; x0 formula VERIFIED, rest from memory
///   / standard textbook);</item>
/// <item>t(0.975, 4) = 2.77644511 (field-reference §6, COMPUTED);</item>
/// <item>C_sample = C_measured · ΠDF, solid: · V_digest / m_sample (field-reference §0, COMPUTED algebra);</item>
/// <item>IS recovery, QC recovery, RPD and spike recovery formulas: common practice; the 60–125 % IS window is
///   US EPA 200.8, from memory (field-reference §4.3).</item>
/// </list>
/// </summary>
public class RunProcessorTests
{
    private const double Tol = 1e-9;

    // Pb (IS Bi), blank included (BlankHandling.Include), x = 0, 1, 2, 4, 8, 15 µg/L:
    //   y = 2200/100000 = 0.022, 11466/98000 = 0.117, 22542/102000 = 0.221, 41778/99000 = 0.422,
    //       82416/101000 = 0.816, 152200/100000 = 1.522
    //   n = 6, x̄ = 30/6 = 5, ȳ = 3.120/6 = 0.52, Sxx = 25 + 16 + 9 + 1 + 9 + 100 = 160
    //   Sxy = Σ(x − 5)·y = −0.110 − 0.468 − 0.663 − 0.422 + 2.448 + 15.220 = 16.005
    //   b = 16.005/160 = 0.10003125, a = 0.52 − 5·0.10003125 = 0.01984375
    //   residuals 0.00215625, −0.002875, 0.00109375, 0.00203125, −0.00409375, 0.0016875 → SSR = 3.784375e-5,
    //   s_y/x = sqrt(3.784375e-5/4) = 0.0030758637
    private const double PbSlope = 0.10003125;
    private const double PbIntercept = 0.01984375;

    // Cd (IS In), x = 0, 0.5, 1, 2, 4, 7.5 µg/L:
    //   y = 200/50000 = 0.004, 5194/49000 = 0.106, 10506/51000 = 0.206, 20402/50500 = 0.404,
    //       39897/49500 = 0.806, 75200/50000 = 1.504
    //   x̄ = 15/6 = 2.5, ȳ = 3.030/6 = 0.505, Sxx = 40
    //   Sxy = −0.010 − 0.212 − 0.309 − 0.202 + 1.209 + 7.520 = 7.996
    //   b = 7.996/40 = 0.1999, a = 0.505 − 2.5·0.1999 = 0.00525
    private const double CdSlope = 0.1999;
    private const double CdIntercept = 0.00525;

    private static readonly RunReport Report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), RunScenario.Method());

    [Fact]
    public void Process_Scenario_CalibrationLinesMatchHandComputedOls()
    {
        var pb = (RegressionCalibration)Report.Calibrations.Single(c => c.Analyte == "Pb").Calibration!;
        var cd = (RegressionCalibration)Report.Calibrations.Single(c => c.Analyte == "Cd").Calibration!;
        AssertClose(PbIntercept, pb.Regression.Coefficients[0]);
        AssertClose(PbSlope, pb.Regression.Coefficients[1]);
        AssertClose(0.0030758637, pb.ResidualStandardDeviation, 1e-8);
        AssertClose(CdIntercept, cd.Regression.Coefficients[0]);
        AssertClose(CdSlope, cd.Regression.Coefficients[1]);
        Assert.Equal(new[] { 1, 2, 3, 4, 5, 6 }, Report.Calibrations[0].InjectionOrders);
    }

    [Fact]
    public void Process_Scenario_PbCalibrationAcceptedByUsEpa8000D()
    {
        // r and RSE of this near-perfect line are far inside r ≥ 0.995 and RSE ≤ 20 % (8000D, from memory, §4.1).
        AnalyteCalibration pb = Report.Calibrations.Single(c => c.Analyte == "Pb");
        Assert.NotNull(pb.Verdict);
        Assert.True(pb.IsAccepted);
        Assert.Null(Report.Calibrations.Single(c => c.Analyte == "Cd").Verdict);
    }

    [Theory]
    // Pb: y0 = A/A_Bi, x0 = (y0 − 0.01984375)/0.10003125, sample = x0 · 10 (1 mL → 10 mL).
    //   S1:    31993.75/100000 = 0.3199375          → x0 = 0.30009375/0.10003125 = 3   → 30 µg/L
    //   S1-D:  33244.953125/95000 = 0.349946875     → x0 = 0.330103125/0.10003125 = 3.3 → 33 µg/L
    //   S1-MS: 50999.6875/100000 = 0.509996875      → x0 = 4.9 → 49 µg/L
    //   S3:    67112.03125/55000 = 1.22021875       → x0 = 12 (undiluted) → 12 µg/L
    //   S4:    202046.875/100000 = 2.02046875       → x0 = 20 (above the top standard, 15)
    //   S5:    21990.625/100000 = 0.21990625        → x0 = 2
    //   MB:    2484.53125/100000 = 0.0248453125     → x0 = 0.05
    [InlineData("S1", 3.0, 30.0)]
    [InlineData("S1-D", 3.3, 33.0)]
    [InlineData("S1-MS", 4.9, 49.0)]
    [InlineData("S3", 12.0, 12.0)]
    [InlineData("S4", 20.0, 20.0)]
    [InlineData("S5", 2.0, 2.0)]
    [InlineData("MB", 0.05, 0.05)]
    public void Process_PbLiquidSamples_MatchHandComputedValues(string id, double measured, double inSample)
    {
        AnalyteResult r = Report.ResultFor(id, "Pb")!;
        AssertClose(measured, r.InMeasuredSolution!.Value.In(ConcentrationUnit.MicrogramPerLitre));
        AssertClose(inSample, r.InSample!.Value.Value.In(ConcentrationUnit.MicrogramPerLitre));
    }

    [Theory]
    // Cd: x0 = (y0 − 0.00525)/0.1999, sample = x0 · 10 for S1, S1-D, S1-MS.
    //   S1:    15255/50000 = 0.3051     → x0 = 0.29985/0.1999 = 1.5 → 15 µg/L
    //   S1-D:  16904.68/52000 = 0.32509 → x0 = 0.31984/0.1999 = 1.6 → 16 µg/L
    //   S1-MS: 24250.5/50000 = 0.48501  → x0 = 2.4 → 24 µg/L
    //   S5:    30247.5/50000 = 0.60495  → x0 = 3
    //   MB:    462.4/50000 = 0.009248   → x0 = 0.003998/0.1999 = 0.02
    [InlineData("S1", 1.5, 15.0)]
    [InlineData("S1-D", 1.6, 16.0)]
    [InlineData("S1-MS", 2.4, 24.0)]
    [InlineData("S5", 3.0, 3.0)]
    [InlineData("MB", 0.02, 0.02)]
    public void Process_CdLiquidSamples_MatchHandComputedValues(string id, double measured, double inSample)
    {
        AnalyteResult r = Report.ResultFor(id, "Cd")!;
        AssertClose(measured, r.InMeasuredSolution!.Value.In(ConcentrationUnit.MicrogramPerLitre));
        AssertClose(inSample, r.InSample!.Value.Value.In(ConcentrationUnit.MicrogramPerLitre));
    }

    [Fact]
    public void Process_DigestedSolid_ReachesTheOriginalSampleInMilligramsPerKilogram()
    {
        // Pb: 62003.125/100000 = 0.62003125 → x0 = 0.60018750/0.10003125 = 6 µg/L in the measured solution;
        //     digest = 6 · (25 mL/5 mL) = 30 µg/L; sample = 30 µg/L · 0.050 L / 0.00025 kg = 6000 µg/kg = 6 mg/kg.
        // Cd: 1262/50000 = 0.02524 → x0 = 0.01999/0.1999 = 0.1 µg/L; sample = 0.1 · 5 · 0.050/0.00025 = 100 µg/kg = 0.1 mg/kg.
        AnalyteResult pb = Report.ResultFor("S2", "Pb")!;
        AnalyteResult cd = Report.ResultFor("S2", "Cd")!;
        AssertClose(6, pb.InMeasuredSolution!.Value.In(ConcentrationUnit.MicrogramPerLitre));
        Assert.Equal(ConcentrationUnit.MilligramPerKilogram, pb.InSample!.Value.Value.Unit);
        AssertClose(6, pb.InSample!.Value.Value.Value);
        AssertClose(0.1, cd.InSample!.Value.Value.In(ConcentrationUnit.MilligramPerKilogram));
        AssertClose(5, pb.SampleCalculation!.TotalDilutionFactor);
    }

    [Fact]
    public void Process_S1Pb_IntervalAndUncertaintyMatchHandComputedInversePrediction()
    {
        // m = 1, ȳ0 = 0.3199375, ȳ = 0.52: (ȳ0 − ȳ)² = 0.04002500390625; b²·Sxx = 0.10003125²·160 = 1.60100…
        // s_x0 = (0.0030758637/0.10003125)·sqrt(1 + 1/6 + 0.040025004/1.6010001) = 0.0335667108 µg/L
        // 95 % interval: 3 ± 2.77644511·0.0335667108 = [2.90680387, 3.09319613] µg/L; ×10 in the sample.
        AnalyteResult r = Report.ResultFor("S1", "Pb")!;
        AssertClose(0.0335667108, r.Quantitation!.StandardError!.Value.Value, 1e-8);
        AssertClose(2.90680387, r.MeasuredLower!.Value.Value, 1e-8);
        AssertClose(3.09319613, r.MeasuredUpper!.Value.Value, 1e-8);
        AssertClose(29.0680387, r.SampleLower!.Value.Value, 1e-8);
        AssertClose(30.9319613, r.SampleUpper!.Value.Value, 1e-8);
        AssertClose(0.335667108, r.InSample!.Value.StandardUncertainty.Value, 1e-8);
    }

    [Fact]
    public void Process_Scenario_QualifiersAsDesigned()
    {
        // Limits: Pb LOD 0.1, LOQ 0.3 µg/L; Cd LOD 0.05, LOQ 0.15 µg/L, in the original sample (the solid S2, in mg/kg,
        // is not censored by limits in µg/L).
        Assert.Equal(ResultQualifiers.BelowLimitOfDetection | ResultQualifiers.Extrapolated, Report.ResultFor("MB", "Pb")!.Qualifiers); // 0.05 < 0.1 and < 1
        Assert.Equal(ResultQualifiers.None, Report.ResultFor("S1", "Pb")!.Qualifiers);
        Assert.Equal(ResultQualifiers.InternalStandardRecoveryOutOfWindow, Report.ResultFor("S3", "Pb")!.Qualifiers); // Bi 55000/100000 = 55 % < 60 %
        Assert.Equal(ResultQualifiers.Extrapolated, Report.ResultFor("S4", "Pb")!.Qualifiers); // 20 > 15

        // Cd: the QC at order 15 fails (80 %), so every sample between the QCs at 7 and 17 is flagged.
        const ResultQualifiers Qc = ResultQualifiers.QualityControlFailureInBracket;
        Assert.Equal(Qc | ResultQualifiers.BelowLimitOfDetection | ResultQualifiers.Extrapolated, Report.ResultFor("MB", "Cd")!.Qualifiers);
        Assert.Equal(Qc, Report.ResultFor("S1", "Cd")!.Qualifiers);
        Assert.Equal(Qc | ResultQualifiers.Extrapolated, Report.ResultFor("S2", "Cd")!.Qualifiers); // 0.1 µg/L measured < 0.5
        Assert.Null(Report.ResultFor("S2", "Cd")!.Reported);
        Assert.Contains(Report.ResultFor("S2", "Cd")!.Notes, n => n.StartsWith("Reporting limits (LOD 0.05 µg/L, LOQ 0.15 µg/L) not applied", StringComparison.Ordinal));
        Assert.Equal(Qc | ResultQualifiers.NotQuantified | ResultQualifiers.MissingOrInvalidSignal, Report.ResultFor("S3", "Cd")!.Qualifiers); // Cd signal missing
        Assert.Equal(Qc | ResultQualifiers.NotQuantified | ResultQualifiers.MissingOrInvalidSignal, Report.ResultFor("S4", "Cd")!.Qualifiers); // In signal 0
        Assert.Equal(Qc, Report.ResultFor("S5", "Cd")!.Qualifiers);
        Assert.Null(Report.ResultFor("S3", "Cd")!.InMeasuredSolution);
    }

    [Fact]
    public void Process_QualityControl_RecoveriesMatchHandComputedValues()
    {
        // Pb CCV (nominal 5): 0.530003125 → 5.1 (102 %), 0.49999375 → 4.8 (96 %), 0.52 → 5.0 (100 %).
        // Cd CCV (nominal 2): 0.40505 → 2.0 (100 %), 0.32509 → 1.6 (80 %, outside 90–110 %), 0.42504 → 2.1 (105 %).
        double[] pb = Report.QualityControl.Where(c => c.Analyte == "Pb").Select(c => c.RecoveryPercent!.Value).ToArray();
        double[] cd = Report.QualityControl.Where(c => c.Analyte == "Cd").Select(c => c.RecoveryPercent!.Value).ToArray();
        AssertClose(102, pb[0]);
        AssertClose(96, pb[1]);
        AssertClose(100, pb[2]);
        AssertClose(100, cd[0]);
        AssertClose(80, cd[1]);
        AssertClose(105, cd[2]);
        Assert.Equal(new bool?[] { true, false, true }, Report.QualityControl.Where(c => c.Analyte == "Cd").Select(c => c.Passed).ToArray());
    }

    [Fact]
    public void Process_DuplicateAndSpike_MatchHandComputedValues()
    {
        // RPD = |a − b|/((a + b)/2)·100: Pb |30 − 33|/31.5·100 = 9.5238095 %; Cd |15 − 16|/15.5·100 = 6.4516129 %.
        // Spike recovery = (spiked − unspiked)/added·100: Pb (49 − 30)/20·100 = 95 %; Cd (24 − 15)/10·100 = 90 %.
        AssertClose(300.0 / 31.5, Report.Duplicates.Single(d => d.Analyte == "Pb").RpdPercent!.Value);
        AssertClose(100.0 / 15.5, Report.Duplicates.Single(d => d.Analyte == "Cd").RpdPercent!.Value);
        AssertClose(95, Report.Spikes.Single(s => s.Analyte == "Pb").RecoveryPercent!.Value);
        AssertClose(90, Report.Spikes.Single(s => s.Analyte == "Cd").RecoveryPercent!.Value);
        Assert.All(Report.Duplicates, d => Assert.True(d.Passed));
        Assert.All(Report.Spikes, s => Assert.True(s.Passed));
    }

    [Fact]
    public void Process_Scenario_InternalStandardRecoveriesAgainstCalibrationBlank()
    {
        // US EPA 200.8 window, reference = calibration blank: Bi 100000, In 50000.
        // S1-D: Bi 95000/100000 = 95 %, In 52000/50000 = 104 %; S3: Bi 55 % (outside 60–125 %); S4: In 0 → no recovery.
        Assert.Equal(100000, Report.InternalStandardReferences["Bi"]);
        InjectionOutcome dup = Report.Injections.Single(o => o.Injection.Order == 10);
        AssertClose(95, dup.InternalStandardRecoveries.Single(x => x.InternalStandard == "Bi").RecoveryPercent!.Value);
        AssertClose(104, dup.InternalStandardRecoveries.Single(x => x.InternalStandard == "In").RecoveryPercent!.Value);
        InjectionOutcome s3 = Report.Injections.Single(o => o.Injection.Order == 13);
        Assert.False(s3.InternalStandardRecoveries.Single(x => x.InternalStandard == "Bi").WithinWindow);
        Assert.Null(Report.Injections.Single(o => o.Injection.Order == 14).InternalStandardRecoveries.Single(x => x.InternalStandard == "In").RecoveryPercent);
    }

    [Fact]
    public void Process_Scenario_EveryInjectionHasAStatus()
    {
        Assert.Equal(Enumerable.Range(1, 17), Report.Injections.Select(o => o.Injection.Order));
        Assert.All(Report.Injections.Take(6), o => Assert.Equal(InjectionStatus.UsedInCalibration, o.Status));
        Assert.Equal(InjectionStatus.QualityControlEvaluated, Report.Injections[6].Status);
        InjectionOutcome s4 = Report.Injections.Single(o => o.Injection.Id == "S4");
        Assert.Equal(InjectionStatus.Quantified, s4.Status);
        Assert.Equal(InjectionStatus.Excluded, s4.AnalyteStatuses["Cd"]);
        Assert.Contains(s4.Reasons, r => r.StartsWith("Cd: IS In signal 0", StringComparison.Ordinal));
    }

    [Fact]
    public void ToString_Scenario_PrintsEverySectionAndFlag()
    {
        string text = Report.ToString();
        Assert.Contains("Calibrations", text, StringComparison.Ordinal);
        Assert.Contains("QC bracket", text, StringComparison.Ordinal);
        Assert.Contains("<LOD", text, StringComparison.Ordinal);
        Assert.Contains("< 0.10 µg/L (LOD)", text, StringComparison.Ordinal);
        Assert.Contains("Drift across injection order", text, StringComparison.Ordinal);
        Assert.Contains("Injections", text, StringComparison.Ordinal);
        Assert.Contains("FAIL (test QC window", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Process_NullArguments_Throw()
    {
        Assert.Throws<ArgumentNullException>("run", () => RunProcessor.Process(null!, RunScenario.Method()));
        Assert.Throws<ArgumentNullException>("method", () => RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), null!));
    }

    [Fact]
    public void Process_MethodAnalyteNotInRun_ThrowsNamingTheAnalyte()
    {
        var method = new RunMethod(
            "m",
            new[] { new AnalyteMethod("Zn", "Bi", RatioModel.Linear) },
            new Dictionary<string, Concentration> { ["Bi"] = RunScenario.IsConcentration },
            InternalStandardRecoveryWindow.UsEpa200Point8);
        ArgumentException e = Assert.Throws<ArgumentException>("method", () => RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), method));
        Assert.Contains("'Zn'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Process_LimitsInMassFraction_CensorTheSolidAndAreNotedOnLiquids()
    {
        // Limits in mg/kg are the method's limits in the original solid sample: S2 Pb = 6 mg/kg (hand value above) is
        // below an LOQ of 8 mg/kg; liquid results (µg/L) are of another kind and keep their value uncensored, with a note.
        RunMethod method = WithPb(new AnalyteMethod("Pb", "Bi", RatioModel.Linear, limits: new ReportingLimits(Concentration.FromMilligramsPerKilogram(2), Concentration.FromMilligramsPerKilogram(8))));
        RunReport report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), method);
        AnalyteResult s2 = report.ResultFor("S2", "Pb")!;
        Assert.Equal(ReportedStatus.BelowQuantificationLimit, s2.Reported!.Status);
        Assert.Equal(s2.InSample!.Value.Value, s2.Reported.Estimate);
        Assert.Equal("< 8.0 mg/kg (LOQ)", s2.Reported.ToString());
        Assert.True(s2.Has(ResultQualifiers.BelowLimitOfQuantitation));
        AnalyteResult s1 = report.ResultFor("S1", "Pb")!;
        Assert.Null(s1.Reported);
        Assert.False(s1.Has(ResultQualifiers.BelowLimitOfQuantitation));
        Assert.Contains(s1.Notes, n => n.Contains("not applied", StringComparison.Ordinal) && n.Contains("MassFraction", StringComparison.Ordinal));
    }

    [Fact]
    public void Process_LimitsInTheSampleUnit_JudgeTheOriginalSampleNotTheMeasuredSolution()
    {
        // Cd LOQ 5 µg/L: S1 is 1.5 µg/L measured but 15 µg/L in the sample (tenfold dilution) → quantified;
        // S5 (undiluted) is 3 µg/L → "< LOQ"; MB 0.02 µg/L < LOD 1 µg/L → not detected (hand values above).
        RunMethod m = RunScenario.Method();
        var method = new RunMethod(
            m.Name,
            new[] { m.Analytes[0], new AnalyteMethod("Cd", "In", RatioModel.Linear, limits: new ReportingLimits(RunScenario.Ug(1), RunScenario.Ug(5))) },
            m.InternalStandardConcentrations,
            m.RecoveryWindow);
        RunReport report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), method);
        Assert.Equal(ReportedStatus.Quantified, report.ResultFor("S1", "Cd")!.Reported!.Status);
        Assert.Equal(ReportedStatus.BelowQuantificationLimit, report.ResultFor("S5", "Cd")!.Reported!.Status);
        Assert.Equal("< 5.0 µg/L (LOQ)", report.ResultFor("S5", "Cd")!.Reported!.ToString());
        AnalyteResult mb = report.ResultFor("MB", "Cd")!;
        Assert.True(mb.Reported!.IsNotDetected);
        Assert.Equal(ResultQualifiers.BelowLimitOfDetection | ResultQualifiers.Extrapolated, mb.Qualifiers);
        AssertClose(0.02, mb.Reported.Estimate.Value); // raw estimate kept
    }

    [Fact]
    public void Process_NoLimits_ReportsTheSampleValueAsQuantified()
    {
        RunReport report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), WithPb(new AnalyteMethod("Pb", "Bi", RatioModel.Linear)));
        AnalyteResult mb = report.ResultFor("MB", "Pb")!;
        Assert.Equal(ReportedStatus.Quantified, mb.Reported!.Status);
        Assert.Equal(mb.InSample!.Value.Value, mb.Reported.Estimate);
        Assert.Null(report.ResultFor("S3", "Cd")!.Reported); // not quantified
    }

    [Fact]
    public void Process_TooFewValidStandards_ReportsTheFailureAndFlagsSamplesInsteadOfThrowing()
    {
        // Only the blank and CAL-1 keep a valid Bi signal: a straight line with intercept needs 3 points (ISO 8466-1).
        List<RunInjection> rows = RunScenario.Rows();
        for (int i = 2; i < 6; i++)
        {
            RunInjection r = rows[i];
            rows[i] = RunInjection.CalibrationStandard(r.Order, r.Id, r.Nominal.ToDictionary(p => p.Key, p => p.Value), RunScenario.Signals(r.Signals.Analyte("Pb"), -1, r.Signals.Analyte("Cd"), r.Signals.InternalStandard("In")));
        }

        RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
        AnalyteCalibration pb = report.Calibrations.Single(c => c.Analyte == "Pb");
        Assert.Null(pb.Calibration);
        Assert.NotNull(pb.Failure);
        Assert.True(report.ResultFor("S1", "Pb")!.Has(ResultQualifiers.NotQuantified));
        Assert.NotNull(report.ResultFor("S1", "Cd")!.InMeasuredSolution);
        Assert.All(report.Injections.Skip(2).Take(4), o => Assert.Equal(InjectionStatus.Excluded, o.AnalyteStatuses["Pb"]));
        Assert.All(report.Injections.Take(2), o => Assert.Equal(InjectionStatus.Excluded, o.AnalyteStatuses["Pb"]));
    }

    [Fact]
    public void Process_ReplicateInjections_AreAveraged()
    {
        // Two injections of S5 with ratios 0.21990625 and 0.32 average to 0.269953125 → x0 = (0.269953125 − 0.01984375)/0.10003125 = 2.5003124…
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.Sample(18, "S5", RunScenario.Signals(32000, 100000, 30247.5, 50000)));
        RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
        AnalyteResult r = report.ResultFor("S5", "Pb")!;
        Assert.Equal(new[] { 16, 18 }, r.InjectionOrders);
        Assert.Equal(2, r.Quantitation!.Replicates);
        AssertClose((((0.21990625 + 0.32) / 2) - PbIntercept) / PbSlope, r.InMeasuredSolution!.Value.Value);
    }

    [Fact]
    public void Process_AverageResponseFactor_MatchesHandComputedMeanRfAndLeavesTheBlankOutWithAReason()
    {
        // RF_i = A_x·C_is/(A_is·C_x) = y_i·10/x_i (SW-846 8000C §11.4.3, field-reference §0, VERIFIED):
        //   1.17, 1.105, 1.055, 1.02, 1.0146667 → mean RF = 8.047/7.5 = 1.07293333
        // S1: C = A_x·C_is/(A_is·mean RF) = 0.3199375·10/1.07293333 = 2.98189543 µg/L → ×10 = 29.8189543 µg/L.
        RunMethod method = WithPb(new AnalyteMethod("Pb", "Bi", RatioModel.AverageResponseFactor));
        RunReport report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), method);
        AssertClose(383925.0 / 128752, report.ResultFor("S1", "Pb")!.InMeasuredSolution!.Value.Value);
        AssertClose(3839250.0 / 128752, report.ResultFor("S1", "Pb")!.InSample!.Value.Value.Value);
        InjectionOutcome blank = report.Injections[0];
        Assert.Equal(InjectionStatus.Excluded, blank.AnalyteStatuses["Pb"]);
        Assert.Contains(blank.Reasons, r => r.Contains("response-factor", StringComparison.Ordinal));
        Assert.Equal(InjectionStatus.UsedInCalibration, blank.Status); // still a Cd calibration point
    }

    [Fact]
    public void Process_SinglePointModelWithFiveLevels_ReportsTheFailure()
    {
        RunReport report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), WithPb(new AnalyteMethod("Pb", "Bi", RatioModel.SinglePointResponseFactor)));
        AnalyteCalibration pb = report.Calibrations.Single(c => c.Analyte == "Pb");
        Assert.Null(pb.Calibration);
        Assert.Contains("exactly one standard level", pb.Failure, StringComparison.Ordinal);
        Assert.All(report.Injections.Skip(1).Take(5), o => Assert.Equal(InjectionStatus.Excluded, o.AnalyteStatuses["Pb"]));
    }

    [Fact]
    public void Process_BlanksExcludedByOptions_BlankRowExcludedWithReason()
    {
        var options = new CalibrationOptions { Blanks = BlankHandling.Exclude };
        RunReport report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), WithPb(new AnalyteMethod("Pb", "Bi", RatioModel.Linear, options: options)));
        Assert.Equal(5, report.Calibrations.Single(c => c.Analyte == "Pb").Calibration!.PointCount);
        Assert.Equal(InjectionStatus.Excluded, report.Injections[0].AnalyteStatuses["Pb"]);
        Assert.Contains(report.Injections[0].Reasons, r => r.StartsWith("Pb: blank left out", StringComparison.Ordinal));
    }

    [Fact]
    public void Process_RecoveryAgainstStandardsMean_UsesTheStandardsOnly()
    {
        // Bi in the standards: (98000 + 102000 + 99000 + 101000 + 100000)/5 = 100000; CAL-1: 98000/100000 = 98 %.
        RunMethod m = RunScenario.Method();
        var method = new RunMethod(m.Name, m.Analytes, m.InternalStandardConcentrations, InternalStandardRecoveryWindow.Custom("lab window", "common practice (test)", 80, 120, RecoveryReference.CalibrationStandardsMean));
        RunReport report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), method);
        Assert.Equal(100000, report.InternalStandardReferences["Bi"]);
        AssertClose(98, report.Injections[1].InternalStandardRecoveries[0].RecoveryPercent!.Value);
        Assert.False(report.Injections.Single(o => o.Injection.Id == "S3").InternalStandardRecoveries[0].WithinWindow); // 55 %
    }

    [Fact]
    public void Process_AnalyteNotInMethod_IsNamedInTheNotes()
    {
        RunReport report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), WithPb(new AnalyteMethod("Pb", "Bi", RatioModel.Linear), withCd: false));
        Assert.Contains(report.Notes, n => n.Contains("'Cd'", StringComparison.Ordinal));
        Assert.DoesNotContain(report.Results, r => r.Analyte == "Cd");
        Assert.Equal(17, report.Injections.Count);
    }

    [Fact]
    public void Process_NegativeAnalyteSignal_IsUsedAndFlagged()
    {
        // A blank-corrected signal may be negative: y = −500/100000 = −0.005 → x0 = (−0.005 − 0.01984375)/0.10003125 < 0.
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.Sample(18, "S6", RunScenario.Signals(-500, 100000, 0, 50000)));
        RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
        AnalyteResult pb = report.ResultFor("S6", "Pb")!;
        AssertClose((-0.005 - PbIntercept) / PbSlope, pb.InMeasuredSolution!.Value.Value);
        Assert.True(pb.Has(ResultQualifiers.NonPositiveAnalyteSignal | ResultQualifiers.BelowLimitOfDetection | ResultQualifiers.Extrapolated));
        Assert.True(report.ResultFor("S6", "Cd")!.Has(ResultQualifiers.NonPositiveAnalyteSignal));
        Assert.Contains(report.Injections.Single(o => o.Injection.Order == 18).Reasons, r => r.StartsWith("Pb: analyte signal -500 ≤ 0 (used)", StringComparison.Ordinal));
    }

    [Fact]
    public void Process_QcOfAnotherAnalyteOnly_DoesNotCloseTheBracket()
    {
        // A Pb-only check inserted at order 13 (later rows move up by one): if every QC row closed brackets, the failing
        // Cd check (now order 16) would bracket only 14–15 and S1 (order 9) would go unflagged. Brackets are per analyte.
        List<RunInjection> rows = RunScenario.Rows().Select(r => r.Order >= 13 ? RunProcessorPropertyTests.Rebuild(r, r.Order + 1, r.Signals) : r).ToList();
        rows.Add(RunInjection.QualityControl(13, "PB-CHK", new Dictionary<string, Concentration> { ["Pb"] = RunScenario.Ug(5) }, RunScenario.Signals(52000, 100000, 1, 50000)));
        RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
        Assert.True(report.ResultFor("S1", "Cd")!.Has(ResultQualifiers.QualityControlFailureInBracket));
        Assert.Equal(InjectionStatus.Excluded, report.Injections.Single(o => o.Injection.Id == "PB-CHK").AnalyteStatuses["Cd"]);
    }

    [Fact]
    public void Process_LinearIsDecline_ShowsTheSlopeAndFlagsTheDrift()
    {
        // Bi set to 100000 − 1000·order in every row (Pb signal scaled with it, so every ratio is kept): the points lie
        // exactly on a line, so OLS returns slope −1000 per injection with s_b = 0 (field-reference §1.1). Orders 1–17:
        // mean = 100000 − 1000·9 = 91000; drift over the run = −1000·16 = −16000 = −17.5824 % of the mean (COMPUTED by hand).
        List<RunInjection> rows = RunScenario.Rows().Select(r =>
        {
            double bi = 100000 - (1000.0 * r.Order);
            double scale = bi / r.Signals.InternalStandard("Bi")!.Value;
            return RunProcessorPropertyTests.Rebuild(r, r.Order, RunScenario.Signals(r.Signals.Analyte("Pb") * scale, bi, r.Signals.Analyte("Cd"), r.Signals.InternalStandard("In")));
        }).ToList();
        RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
        DriftCheck bi = report.Drift.Single(d => d.Kind == DriftSeriesKind.InternalStandardSignal && d.Name == "Bi");
        Assert.Equal(Enumerable.Range(1, 17), bi.InjectionOrders);
        AssertClose(-1000, bi.Trend!.Slope);
        AssertClose(-1600.0 / 91, bi.Trend.DriftOverRunPercent);
        Assert.True(bi.IsFlagged);
        Assert.Contains(report.Notes, n => n.StartsWith("Drift flagged for IS Bi signal: -17.6 % of the mean over injections 1–17", StringComparison.Ordinal));
        Assert.Contains("DRIFT", report.ToString(), StringComparison.Ordinal);
        AssertClose(30, report.ResultFor("S1", "Pb")!.InSample!.Value.Value.Value); // ratios kept → same result
    }

    [Fact]
    public void Process_ConstantIs_IsNotFlagged()
    {
        // Every IS signal set to one constant (analyte signals scaled to keep the ratios): no slope, no flag, even with
        // the strictest rule (significance alone).
        List<RunInjection> rows = RunScenario.Rows().Select(r =>
        {
            double? inSignal = r.Signals.InternalStandard("In");
            double? cd = r.Signals.Analyte("Cd") is double c && inSignal > 0 ? c * 50000 / inSignal : r.Signals.Analyte("Cd");
            return RunProcessorPropertyTests.Rebuild(r, r.Order, RunScenario.Signals(r.Signals.Analyte("Pb") * 100000 / r.Signals.InternalStandard("Bi"), 100000, cd, inSignal > 0 ? 50000 : inSignal));
        }).ToList();
        RunMethod m = RunScenario.Method();
        var method = new RunMethod(m.Name, m.Analytes, m.InternalStandardConcentrations, m.RecoveryWindow) { Drift = DriftRule.Significance() };
        RunReport report = RunProcessor.Process(RunScenario.Run(rows), method);
        DriftCheck[] isChecks = report.Drift.Where(d => d.Kind == DriftSeriesKind.InternalStandardSignal).ToArray();
        Assert.Equal(new[] { "Bi", "In" }, isChecks.Select(d => d.Name));
        Assert.All(isChecks, d => Assert.False(d.IsFlagged));
        Assert.All(isChecks, d => Assert.False(d.Trend!.IsSlopeSignificant));
        Assert.Equal(16, isChecks[1].InjectionOrders.Count); // In is 0 (invalid) in S4, order 14
        Assert.DoesNotContain(report.Notes, n => n.StartsWith("Drift flagged for IS", StringComparison.Ordinal));
    }

    [Fact]
    public void Process_QcRecoveryTrend_MatchesHandComputedSlope()
    {
        // Pb QC recoveries 102, 96, 100 % at orders 7, 15, 17: x̄ = 13, Sxx = 36 + 4 + 16 = 56,
        // Sxy = −6·102 + 2·96 + 4·100 = −20 → b = −5/14 % per injection; Cd 100, 80, 105 % gives Sxy = −20 too
        // (OLS slope, field-reference §1.1, COMPUTED by hand).
        DriftCheck pb = Report.Drift.Single(d => d.Kind == DriftSeriesKind.QualityControlRecovery && d.Name == "Pb");
        DriftCheck cd = Report.Drift.Single(d => d.Kind == DriftSeriesKind.QualityControlRecovery && d.Name == "Cd");
        Assert.Equal(new[] { 7, 15, 17 }, pb.InjectionOrders);
        AssertClose(-5.0 / 14, pb.Trend!.Slope, 1e-8);
        AssertClose(-5.0 / 14, cd.Trend!.Slope, 1e-8);
        Assert.Equal("Pb QC recovery %", pb.ToString());
    }

    [Fact]
    public void Process_TooFewQcPoints_NotesWhyThereIsNoTrend()
    {
        List<RunInjection> rows = RunScenario.Rows().Where(r => r.Order != 17).ToList();
        RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
        DriftCheck pb = report.Drift.Single(d => d.Kind == DriftSeriesKind.QualityControlRecovery && d.Name == "Pb");
        Assert.Null(pb.Trend);
        Assert.False(pb.IsFlagged);
        Assert.Contains("at least 3", pb.Failure, StringComparison.Ordinal);
        Assert.Contains(report.Notes, n => n.StartsWith("No drift trend for Pb QC recovery %", StringComparison.Ordinal));
    }

    [Fact]
    public void Process_NoDriftRule_NoDriftChecks()
    {
        RunReport report = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), WithPb(new AnalyteMethod("Pb", "Bi", RatioModel.Linear)));
        Assert.Empty(report.Drift);
        Assert.DoesNotContain("Drift across", report.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Process_FiveReplicatesWithOneFarOff_FlagsTheSuspectAndKeepsItInTheMean()
    {
        // S8: Pb ratios 0.22, 0.22, 0.22, 0.22, 0.30 (Bi 100000). Mean 0.236, s = sqrt((4·0.016² + 0.064²)/4) = 0.0357771,
        // G = 0.064/0.0357771 = 4/√5 = 1.78885 > G_crit(α = 0.05, n = 5, two-sided) = 1.7150 (field-reference §5.1, VERIFIED).
        List<RunInjection> rows = RunScenario.Rows();
        double[] pb = { 22000, 22000, 30000, 22000, 22000 };
        for (int k = 0; k < pb.Length; k++)
        {
            rows.Add(RunInjection.Sample(18 + k, "S8", RunScenario.Signals(pb[k], 100000, 15000, 50000)));
        }

        RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
        AnalyteResult r = report.ResultFor("S8", "Pb")!;
        Assert.True(r.Has(ResultQualifiers.SuspectReplicate));
        Assert.Equal(5, r.Quantitation!.Replicates); // flagged, not removed
        AssertClose((0.236 - PbIntercept) / PbSlope, r.InMeasuredSolution!.Value.Value);
        Assert.Contains(r.Notes, n => n.StartsWith("Injection 20: ratio 0.3 is a suspect outlier by Grubbs' test (G = 1.78885 > 1.71", StringComparison.Ordinal));
        InjectionOutcome suspect = report.Injections.Single(o => o.Injection.Order == 20);
        Assert.Equal(InjectionStatus.Quantified, suspect.AnalyteStatuses["Pb"]);
        Assert.Contains(suspect.Reasons, t => t.StartsWith("Pb: ratio 0.3 is a suspect outlier", StringComparison.Ordinal));
        Assert.False(report.ResultFor("S8", "Cd")!.Has(ResultQualifiers.SuspectReplicate)); // identical Cd ratios: G = 0
        Assert.Contains("suspect replicate", report.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Process_ReplicatesWithinNormalScatter_AreNotFlagged()
    {
        // Ratios 0.2200, 0.2210, 0.2190, 0.2205: mean 0.220125, deviations −0.000125, 0.000875, −0.001125, 0.000375,
        // s = sqrt(2.1875e-6/3) = 0.000853913, G = 0.001125/0.000853913 = 1.3175 < 1.4812 (n = 4, α = 0.05, field-reference §5.1).
        List<RunInjection> rows = RunScenario.Rows();
        double[] pb = { 22000, 22100, 21900, 22050 };
        for (int k = 0; k < pb.Length; k++)
        {
            rows.Add(RunInjection.Sample(18 + k, "S8", RunScenario.Signals(pb[k], 100000, 15000, 50000)));
        }

        RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
        Assert.False(report.ResultFor("S8", "Pb")!.Has(ResultQualifiers.SuspectReplicate));
    }

    [Theory]
    // Ratios 0.22, 0.22, 0.205, 0.235, 0.22, 0.30: mean 1.4/6 = 0.2333333, SS = 3·0.0133333² + 0.0283333² + 0.0016667² + 0.0666667²
    // = 0.00578333, s = sqrt(SS/5) = 0.0340098, G = 0.0666667/0.0340098 = 1.96022: above G_crit(n = 6) = 1.8871 at α = 0.05,
    // below 1.9728 at α = 0.01 (two-sided, field-reference §5.1, VERIFIED).
    [InlineData(0.05, true)]
    [InlineData(0.01, false)]
    public void Process_ReplicateOutlierSignificance_DecidesTheFlag(double alpha, bool flagged)
    {
        List<RunInjection> rows = RunScenario.Rows();
        double[] pb = { 22000, 22000, 20500, 23500, 22000, 30000 };
        for (int k = 0; k < pb.Length; k++)
        {
            rows.Add(RunInjection.Sample(18 + k, "S8", RunScenario.Signals(pb[k], 100000, 15000, 50000)));
        }

        RunMethod m = RunScenario.Method();
        var method = new RunMethod(m.Name, m.Analytes, m.InternalStandardConcentrations, m.RecoveryWindow) { ReplicateOutlierSignificance = alpha };
        RunReport report = RunProcessor.Process(RunScenario.Run(rows), method);
        Assert.Equal(flagged, report.ResultFor("S8", "Pb")!.Has(ResultQualifiers.SuspectReplicate));
    }

    private static RunMethod WithPb(AnalyteMethod pb, bool withCd = true) =>
        new(
            "m",
            withCd ? new[] { pb, new AnalyteMethod("Cd", "In", RatioModel.Linear) } : new[] { pb },
            new Dictionary<string, Concentration> { ["Bi"] = RunScenario.IsConcentration, ["In"] = RunScenario.IsConcentration },
            InternalStandardRecoveryWindow.UsEpa200Point8);

    private static void AssertClose(double expected, double actual, double relative = Tol) =>
        Assert.True(Math.Abs(expected - actual) <= relative * Math.Max(1e-12, Math.Abs(expected)), $"expected {expected:R}, got {actual:R}");
}
