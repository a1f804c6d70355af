using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Preparation;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using InternalStdCal.Tests.Run;
using Xunit;
using static InternalStdCal.Tests.Hardening.BadInput.BadInput;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>
/// Bad input to every entry point of <c>Run</c>. Building a run or a method rejects bad arguments with an exception;
/// processing a run never throws for bad data: each bad row gets a status, a reason and qualifiers (common practice:
/// no row is dropped silently). Rules: a ratio needs an IS signal &gt; 0; recovery windows 0 ≤ lower &lt; upper;
/// drift needs ≥ 3 finite values with a positive mean; confidence levels in (0, 1).
/// </summary>
public class RunBadInputTests
{
    private static readonly Type Range = typeof(ArgumentOutOfRangeException);
    private static readonly Type Arg = typeof(ArgumentException);
    private static readonly Type Null = typeof(ArgumentNullException);

    private static Concentration Ug(double v) => Concentration.FromMicrogramsPerLitre(v);

    private static Dictionary<string, Concentration> Pb(double v) => new() { ["Pb"] = Ug(v) };

    private static InjectionSignals Signals => InjectionSignals.Empty.WithAnalyte("Pb", 1000).WithInternalStandard("Bi", 100000);

    private static readonly DriftRule Drift = DriftRule.Magnitude(10);

    private static InternalStandardSelectionCandidate Candidate(string name) => new(name, new[] { 100.0, 102, 98, 101 });

    public static IEnumerable<object[]> Cases => Rows(new BadInputCase[]
    {
        new("Run.InjectionSignals.#ctor", "NaN analyte signal", () => new InjectionSignals(new Dictionary<string, double> { ["Pb"] = double.NaN }, new Dictionary<string, double>()), Range, "analytes", "'Pb' = NaN", "finite"),
        new("Run.InjectionSignals.#ctor", "blank IS name", () => new InjectionSignals(new Dictionary<string, double>(), new Dictionary<string, double> { [" "] = 1 }), Arg, "internalStandards", "empty or white-space name"),
        new("Run.InjectionSignals.#ctor", "null analytes", () => new InjectionSignals(null!, new Dictionary<string, double>()), Null, "analytes", "analytes"),
        new("Run.InjectionSignals.WithAnalyte", "NaN", () => InjectionSignals.Empty.WithAnalyte("Pb", double.NaN), Range, "signal", "NaN", Finite),
        new("Run.InjectionSignals.WithAnalyte", "blank name", () => InjectionSignals.Empty.WithAnalyte(" ", 1), Arg, "name", "empty or white space"),
        new("Run.InjectionSignals.WithInternalStandard", "-inf", () => InjectionSignals.Empty.WithInternalStandard("Bi", double.NegativeInfinity), Range, "signal", "-Infinity", Finite),
        new("Run.InjectionSignals.Analyte", "null name", () => Signals.Analyte(null!), Null, "name", "name"),
        new("Run.InjectionSignals.InternalStandard", "null name", () => Signals.InternalStandard(null!), Null, "name", "name"),
        new("Run.RunInjection.CalibrationStandard", "negative nominal", () => RunInjection.CalibrationStandard(1, "CAL-1", Pb(-1), Signals), Range, "nominal", "-1 µg/L"),
        new("Run.RunInjection.CalibrationStandard", "empty nominal", () => RunInjection.CalibrationStandard(1, "CAL-1", new Dictionary<string, Concentration>(), Signals), Arg, "nominal", "empty"),
        new("Run.RunInjection.CalibrationStandard", "blank level", () => RunInjection.CalibrationStandard(1, " ", Pb(1), Signals), Arg, "level", "empty or white space"),
        new("Run.RunInjection.QualityControl", "nominal 0", () => RunInjection.QualityControl(1, "CCV", Pb(0), Signals), Range, "nominal", "0 µg/L"),
        new("Run.RunInjection.SpikedSample", "added 0", () => RunInjection.SpikedSample(2, "S1-MS", "S1", Pb(0), Signals), Range, "added", "0 µg/L"),
        new("Run.RunInjection.SpikedSample", "own parent", () => RunInjection.SpikedSample(2, "S1", "S1", Pb(1), Signals), Arg, "parentId", "'S1'", "another sample"),
        new("Run.RunInjection.SampleDuplicate", "own parent", () => RunInjection.SampleDuplicate(2, "S1", "S1", Signals), Arg, "parentId", "'S1'", "another sample"),
        new("Run.RunInjection.Sample", "blank id", () => RunInjection.Sample(1, "", Signals), Arg, "id", "empty or white space"),
        new("Run.RunInjection.MethodBlank", "null signals", () => RunInjection.MethodBlank(1, "MB", null!), Null, "signals", "signals"),
        new("Run.RunInjection.CalibrationBlank", "blank id", () => RunInjection.CalibrationBlank(1, "\t", Signals), Arg, "id", "empty or white space"),
        new("Run.AnalyticalRun.Create", "no injections", () => AnalyticalRun.Create("r", new[] { "Pb" }, new[] { "Bi" }, Array.Empty<RunInjection>()), Arg, "injections", "empty"),
        new("Run.AnalyticalRun.Create", "duplicate order", () => AnalyticalRun.Create("r", new[] { "Pb" }, new[] { "Bi" }, new[] { RunInjection.Sample(1, "S1", Signals), RunInjection.Sample(1, "S2", Signals) }), Arg, "injections", "same injection order"),
        new("Run.AnalyticalRun.Create", "undeclared analyte", () => AnalyticalRun.Create("r", new[] { "Cd" }, new[] { "Bi" }, new[] { RunInjection.Sample(1, "S1", Signals) }), Arg, "injections", "'Pb'", "not declared"),
        new("Run.AnalyticalRun.Create", "analyte twice", () => AnalyticalRun.Create("r", new[] { "Pb", "Pb" }, new[] { "Bi" }, new[] { RunInjection.Sample(1, "S1", Signals) }), Arg, "analytes", "'Pb' twice"),
        new("Run.AnalyticalRun.Create", "no IS", () => AnalyticalRun.Create("r", new[] { "Pb" }, Array.Empty<string>(), new[] { RunInjection.Sample(1, "S1", Signals) }), Arg, "internalStandards", "empty"),
        new("Run.AnalyticalRun.Create", "unknown parent", () => AnalyticalRun.Create("r", new[] { "Pb" }, new[] { "Bi" }, new[] { RunInjection.SampleDuplicate(1, "S1-D", "S9", Signals) }), Arg, "injections", "'S9'"),
        new("Run.AnalyteMethod.#ctor", "undefined model", () => new AnalyteMethod("Pb", "Bi", (RatioModel)9), Range, "model", "9", "defined RatioModel"),
        new("Run.AnalyteMethod.#ctor", "custom weighting", () => new AnalyteMethod("Pb", "Bi", RatioModel.Linear, Weighting.Custom(new[] { 1.0, 2 })), Arg, "weighting", "per-point weights"),
        new("Run.AnalyteMethod.#ctor", "weighting with a response factor", () => new AnalyteMethod("Pb", "Bi", RatioModel.AverageResponseFactor, Weighting.InverseX), Arg, "weighting", "response-factor models take no weighting"),
        new("Run.AnalyteMethod.#ctor", "blank IS", () => new AnalyteMethod("Pb", " ", RatioModel.Linear), Arg, "internalStandard", "non-blank"),
        new("Run.RunMethod.#ctor", "IS concentration 0", () => new RunMethod("m", new[] { new AnalyteMethod("Pb", "Bi", RatioModel.Linear) }, new Dictionary<string, Concentration> { ["Bi"] = Ug(0) }, InternalStandardRecoveryWindow.UsEpa200Point8), Range, "internalStandardConcentrations", "Bi = 0 µg/L"),
        new("Run.RunMethod.#ctor", "IS without concentration", () => new RunMethod("m", new[] { new AnalyteMethod("Pb", "Bi", RatioModel.Linear) }, new Dictionary<string, Concentration> { ["In"] = Ug(10) }, InternalStandardRecoveryWindow.UsEpa200Point8), Arg, "internalStandardConcentrations", "'Bi'"),
        new("Run.RunMethod.#ctor", "no analytes", () => new RunMethod("m", Array.Empty<AnalyteMethod>(), new Dictionary<string, Concentration> { ["Bi"] = Ug(10) }, InternalStandardRecoveryWindow.UsEpa200Point8), Arg, "analytes", "empty"),
        new("Run.RunMethod.ConfidenceLevel", "1", () => _ = new RunMethod("m", new[] { new AnalyteMethod("Pb", "Bi", RatioModel.Linear) }, new Dictionary<string, Concentration> { ["Bi"] = Ug(10) }, InternalStandardRecoveryWindow.UsEpa200Point8) { ConfidenceLevel = 1 }, Range, "ConfidenceLevel", "1", "(0, 1)"),
        new("Run.RunMethod.ReplicateOutlierSignificance", "0.5", () => _ = new RunMethod("m", new[] { new AnalyteMethod("Pb", "Bi", RatioModel.Linear) }, new Dictionary<string, Concentration> { ["Bi"] = Ug(10) }, InternalStandardRecoveryWindow.UsEpa200Point8) { ReplicateOutlierSignificance = 0.5 }, Range, "ReplicateOutlierSignificance", "0.5", "(0, 0.5)"),
        new("Run.RunMethod.IntervalMethod", "undefined", () => _ = new RunMethod("m", new[] { new AnalyteMethod("Pb", "Bi", RatioModel.Linear) }, new Dictionary<string, Concentration> { ["Bi"] = Ug(10) }, InternalStandardRecoveryWindow.UsEpa200Point8) { IntervalMethod = (InverseIntervalMethod)9 }, Range, "IntervalMethod", "9", "Symmetric or Fieller"),
        new("Run.RunMethod.For", "null", () => RunScenario.Method().For(null!), Null, "analyte", "analyte"),
        new("Run.RecoveryWindow.#ctor", "lower -1", () => new RecoveryWindow("w", "s", -1, 110), Range, "lowerPercent", "-1", FiniteNonNegative),
        new("Run.RecoveryWindow.#ctor", "upper = lower", () => new RecoveryWindow("w", "s", 90, 90), Range, "upperPercent", "90", "> lowerPercent (90)"),
        new("Run.RecoveryWindow.#ctor", "upper +inf", () => new RecoveryWindow("w", "s", 90, double.PositiveInfinity), Range, "upperPercent", "Infinity", Finite),
        new("Run.RpdLimit.#ctor", "0", () => new RpdLimit("r", "s", 0), Range, "maxPercent", "0", FinitePositive),
        new("Run.InternalStandardRecoveryWindow.Custom", "NaN lower", () => InternalStandardRecoveryWindow.Custom("w", "s", double.NaN, 120, RecoveryReference.CalibrationBlankMean), Range, "lowerPercent", "NaN", FiniteNonNegative),
        new("Run.InternalStandardRecoveryWindow.Custom", "undefined reference", () => InternalStandardRecoveryWindow.Custom("w", "s", 60, 120, (RecoveryReference)4), Range, "reference", "4", "defined RecoveryReference"),
        new("Run.DriftRule.Magnitude", "limit 0", () => DriftRule.Magnitude(0), Range, "limitPercentOverRun", "0", FinitePositive),
        new("Run.DriftRule.Significance", "level 1", () => DriftRule.Significance(1), Range, "confidenceLevel", "1", "(0, 1)"),
        new("Run.DriftRule.MagnitudeAndSignificance", "NaN limit", () => DriftRule.MagnitudeAndSignificance(double.NaN), Range, "limitPercentOverRun", "NaN", FinitePositive),
        new("Run.DriftRule.MagnitudeOrSignificance", "level 0", () => DriftRule.MagnitudeOrSignificance(10, 0), Range, "confidenceLevel", "0", "(0, 1)"),
        new("Run.DriftTrend.Fit", "two values", () => DriftTrend.Fit(new[] { 1.0, 2 }, Drift), Arg, "values", "2", "at least 3"),
        new("Run.DriftTrend.Fit", "NaN value", () => DriftTrend.Fit(new[] { 1.0, double.NaN, 3 }, Drift), Arg, "values", "NaN at index 1", "finite number"),
        new("Run.DriftTrend.Fit", "mismatched positions", () => DriftTrend.Fit(new[] { 1.0, 2 }, new[] { 1.0, 2, 3 }, Drift), Arg, "positions", "2 elements", "as many as 'values' (3)"),
        new("Run.DriftTrend.Fit", "all-equal positions", () => DriftTrend.Fit(new[] { 4.0, 4, 4 }, new[] { 1.0, 2, 3 }, Drift), Arg, "positions", "only the value 4", "at least 2 distinct"),
        new("Run.DriftTrend.Fit", "mean <= 0", () => DriftTrend.Fit(new[] { -1.0, -2, -3 }, Drift), Arg, "values", "mean -2", "> 0"),
        new("Run.DriftTrend.Fit", "null rule", () => DriftTrend.Fit(new[] { 1.0, 2, 3 }, null!), Null, "rule", "rule"),
        new("Run.InternalStandardSelectionCandidate.#ctor", "NaN signal", () => new InternalStandardSelectionCandidate("Rh", new[] { 1.0, double.NaN }), Arg, "signals", "missing (NaN)"),
        new("Run.InternalStandardSelectionCandidate.#ctor", "empty", () => new InternalStandardSelectionCandidate("Rh", Array.Empty<double>()), Arg, "signals", "empty"),
        new("Run.InternalStandardSelectionCandidate.#ctor", "IS signal 0", () => new InternalStandardSelectionCandidate("Rh", new[] { 1.0, 0 }), Arg, "signals", "0"),
        new("Run.InternalStandardSelection.Evaluate", "two injections", () => InternalStandardSelection.Evaluate("Pb", new[] { 1.0, 2 }, new[] { new InternalStandardSelectionCandidate("Rh", new[] { 1.0, 2 }) }), Arg, "analyteSignals", "2", "3"),
        new("Run.InternalStandardSelection.Evaluate", "no candidates", () => InternalStandardSelection.Evaluate("Pb", new[] { 1.0, 2, 3, 4 }, Array.Empty<InternalStandardSelectionCandidate>()), Arg, "candidates", "empty"),
        new("Run.InternalStandardSelection.Evaluate", "significance 0.5", () => InternalStandardSelection.Evaluate("Pb", new[] { 10.0, 12, 9, 11 }, new[] { Candidate("Rh") }, 0.5), Range, "significanceLevel", "0.5", "(0, 0.5)"),
        new("Run.InternalStandardSelection.Evaluate", "negative blank warning", () => InternalStandardSelection.Evaluate("Pb", new[] { 10.0, 12, 9, 11 }, new[] { Candidate("Rh") }, 0.05, -1), Range, "blankWarningPercent", "-1", FiniteNonNegative),
        new("Run.InternalStandardSelection.Evaluate", "all-equal analyte signals", () => InternalStandardSelection.Evaluate("Pb", new[] { 5.0, 5, 5, 5 }, new[] { Candidate("Rh") }), Arg, "analyteSignals", "same value 5"),
        new("Run.InternalStandardSelection.Evaluate", "candidate count mismatch", () => InternalStandardSelection.Evaluate("Pb", new[] { 10.0, 12, 9 }, new[] { Candidate("Rh") }), Arg, "candidates", "4"),
        new("Run.SamplePreparation.Liquid", "null step", () => SamplePreparation.Liquid(new DilutionStep[] { null! }), Null, "dilutions", "null at index 0"),
        new("Run.SamplePreparation.SolidToVolume", "zero digest volume", () => SamplePreparation.SolidToVolume(Measured.Exact(Volume.FromMillilitres(0)), Measured.Exact(Mass.FromGrams(0.25)), ConcentrationUnit.MilligramPerKilogram), Range, "digestVolume", "0 mL", "> 0"),
        new("Run.SamplePreparation.SolidToVolume", "mg/L result (wrong kind)", () => SamplePreparation.SolidToVolume(Measured.Exact(Volume.FromMillilitres(50)), Measured.Exact(Mass.FromGrams(0.25)), ConcentrationUnit.MilligramPerLitre), Range, "resultUnit", "mg/L"),
        new("Run.SamplePreparation.SolidToMass", "zero sample mass", () => SamplePreparation.SolidToMass(Measured.Exact(Mass.FromGrams(50)), Measured.Exact(Mass.FromGrams(0)), ConcentrationUnit.MilligramPerKilogram), Range, "sampleMass", "0 g", "> 0"),
        new("Run.SamplePreparation.ToSample", "µmol/L measured through a gravimetric step (wrong kind)", () => SamplePreparation.Liquid(DilutionStep.Gravimetric(Measured.Exact(Mass.FromGrams(1)), Measured.Exact(Mass.FromGrams(10)))).ToSample(Measured.Exact(Concentration.FromMicromolesPerLitre(1))), Arg, "dilutions[0]", "cannot have produced"),
        new("Run.RunProcessor.Process", "null run", () => RunProcessor.Process(null!, RunScenario.Method()), Null, "run", "run"),
        new("Run.RunProcessor.Process", "method names an undeclared IS", () => RunProcessor.Process(AnalyticalRun.Create("r", new[] { "Pb" }, new[] { "Rh" }, new[] { RunInjection.Sample(1, "S1", InjectionSignals.Empty.WithAnalyte("Pb", 1).WithInternalStandard("Rh", 1)) }), new RunMethod("m", new[] { new AnalyteMethod("Pb", "Bi", RatioModel.Linear) }, new Dictionary<string, Concentration> { ["Bi"] = Ug(10) }, InternalStandardRecoveryWindow.UsEpa200Point8)), Arg, "method", "'Bi'"),
        new("Run.AnalyteResult.UncertaintyBudget", "p = 1", () => Report().ResultFor("S1", "Pb")!.UncertaintyBudget(coverageProbability: 1), Range, "coverageProbability", "1", "(0, 1)"),
        new("Run.AnalyteResult.UncertaintyBudget", "not quantified", () => Report().ResultFor("S3", "Cd")!.UncertaintyBudget(), typeof(InvalidOperationException), null, "S3"),
    });

    /// <summary>Bad rows in run processing: rows of (what, the changed row, sample, analyte, flags, reason fragment).</summary>
    public static IEnumerable<object[]> RunRows => new (string What, Func<RunInjection> Row, string Analyte, ResultQualifiers Flags, string Reason)[]
    {
        ("IS signal 0", () => RunInjection.Sample(9, "S1", RunScenario.Signals(31993.75, 0, 15255, 50000), RunScenario.TenfoldDilution), "Pb", ResultQualifiers.NotQuantified | ResultQualifiers.MissingOrInvalidSignal, "IS Bi signal 0"),
        ("IS signal negative", () => RunInjection.Sample(9, "S1", RunScenario.Signals(31993.75, -100, 15255, 50000), RunScenario.TenfoldDilution), "Pb", ResultQualifiers.NotQuantified | ResultQualifiers.MissingOrInvalidSignal, "IS Bi signal -100"),
        ("IS signal missing", () => RunInjection.Sample(9, "S1", RunScenario.Signals(31993.75, null, 15255, 50000), RunScenario.TenfoldDilution), "Pb", ResultQualifiers.NotQuantified | ResultQualifiers.MissingOrInvalidSignal, "Bi"),
        ("analyte signal missing", () => RunInjection.Sample(9, "S1", RunScenario.Signals(null, 100000, 15255, 50000), RunScenario.TenfoldDilution), "Pb", ResultQualifiers.NotQuantified | ResultQualifiers.MissingOrInvalidSignal, "Pb"),
        ("analyte signal negative", () => RunInjection.Sample(9, "S1", RunScenario.Signals(-500, 100000, 15255, 50000), RunScenario.TenfoldDilution), "Pb", ResultQualifiers.NonPositiveAnalyteSignal, "Pb"),
        ("IS signal 1e-300 (ratio 3e304)", () => RunInjection.Sample(9, "S1", RunScenario.Signals(31993.75, 1e-300, 15255, 50000), RunScenario.TenfoldDilution), "Pb", ResultQualifiers.NotQuantified, "Pb"),
        ("analyte signal 1e300", () => RunInjection.Sample(9, "S1", RunScenario.Signals(1e300, 100000, 15255, 50000), RunScenario.TenfoldDilution), "Pb", ResultQualifiers.NotQuantified, "Pb"),
        ("IS signal 1e300 (ratio 3e-296)", () => RunInjection.Sample(9, "S1", RunScenario.Signals(31993.75, 1e300, 15255, 50000), RunScenario.TenfoldDilution), "Pb", ResultQualifiers.InternalStandardRecoveryOutOfWindow, "Bi"),
    }.Select(r => new object[] { r.What, r.Row, r.Analyte, r.Flags, r.Reason });

    public static IEnumerable<object[]> Magnitudes => Rows(new MagnitudeCase[]
    {
        new("Run.DriftTrend.Fit", "values 1e300", () => { var d = DriftTrend.Fit(new[] { 1e300, 1.1e300, 1.2e300, 1.3e300 }, Drift); return new[] { d.Slope, d.DriftOverRun }; }),
        new("Run.DriftTrend.Fit", "positions 1e-300 apart", () => { var d = DriftTrend.Fit(new[] { 0, 1e-300, 2e-300, 3e-300 }, new[] { 1.0, 1.1, 1.2, 1.35 }, Drift); return new[] { d.Slope, d.DriftOverRun }; }),
        new("Run.InternalStandardSelection.Evaluate", "signals 1e300", () => { var s = InternalStandardSelection.Evaluate("Pb", new[] { 1e300, 1.2e300, 0.9e300, 1.1e300 }, new[] { new InternalStandardSelectionCandidate("Rh", new[] { 1e300, 1.19e300, 0.91e300, 1.1e300 }) }); return new[] { s.AnalyteRsdPercent, s.AnalyteLogSd }; }),
        new("Run.RunProcessor.Process", "every sample 1e300", () => RunProcessor.Process(RunScenario.Run(RunScenario.Rows().Select(r => r.Role == InjectionRole.Sample ? RunInjection.Sample(r.Order, r.Id, RunScenario.Signals(1e300, 100000, 1e300, 50000), r.Preparation) : r)), RunScenario.Method()).Results.SelectMany(Numbers)),
    });

    private static RunReport Report() => RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), RunScenario.Method());

    private static double[] Numbers(AnalyteResult r) => new[]
    {
        r.InMeasuredSolution?.Value ?? 0, r.MeasuredLower?.Value ?? 0, r.MeasuredUpper?.Value ?? 0, r.InSample?.Value.Value ?? 0,
        r.InSample?.StandardUncertainty.Value ?? 0, r.SampleLower?.Value ?? 0, r.SampleUpper?.Value ?? 0,
    };

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

    [Theory]
    [MemberData(nameof(RunRows))]
    public void Process_BadRow_FlaggedWithReasonNeverThrowsNorDropsTheRow(string what, Func<RunInjection> row, string analyte, ResultQualifiers flags, string reason)
    {
        List<RunInjection> rows = RunScenario.Rows();
        int i = rows.FindIndex(r => r.Id == "S1" && r.Role == InjectionRole.Sample);
        rows[i] = row();

        RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());

        Assert.Equal(rows.Count, report.Injections.Count); // no row dropped
        AnalyteResult result = report.ResultFor("S1", analyte)!;
        Assert.True(result.Has(flags), $"{what}: qualifiers {result.Qualifiers}, expected {flags}.");
        InjectionOutcome outcome = report.Injections.Single(o => o.Injection.Id == "S1" && o.Injection.Role == InjectionRole.Sample);
        Assert.Contains(outcome.Reasons.Concat(result.Notes), r => r.Contains(reason, StringComparison.Ordinal));
        Assert.All(Numbers(result), v => Assert.True(double.IsFinite(v), $"{what}: a result is {Text(v)}."));
    }

    [Fact]
    public void Contains_NaN_IsFalseAsDocumented()
    {
        // Documented predicates: NaN is never inside a window or interval (no exception, no NaN returned).
        Assert.False(new RecoveryWindow("w", "s", 90, 110).Contains(double.NaN));
        Assert.False(InternalStandardRecoveryWindow.UsEpa200Point8.Contains(double.NaN));
        Assert.False(new ConfidenceInterval(0, 1, 0.95).Contains(double.NaN));
    }
}
