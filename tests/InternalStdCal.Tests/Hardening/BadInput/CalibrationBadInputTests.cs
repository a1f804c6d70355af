using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Quantities;
using Xunit;
using static InternalStdCal.Tests.Hardening.BadInput.BadInput;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>Bad input to every entry point of <c>Calibration</c>. Rules: IS signal &gt; 0 (a ratio needs it,
/// common practice); a fit needs more points than coefficients and enough distinct x (ISO 8466-1: residual
/// standard deviation with ≥ 1 degree of freedom); weights finite and &gt; 0; confidence levels in (0, 1).</summary>
public class CalibrationBadInputTests
{
    private static readonly Type Range = typeof(ArgumentOutOfRangeException);
    private static readonly Type Arg = typeof(ArgumentException);
    private static readonly Type Null = typeof(ArgumentNullException);
    private static readonly Type Invalid = typeof(InvalidOperationException);

    private static readonly double[] X = { 1, 2, 3, 4, 5 };
    private static readonly double[] Y = { 2.1, 3.9, 6.2, 7.8, 10.1 };

    private static RegressionFit Line => RegressionFit.Fit(X, Y, CalibrationModel.Linear);

    private static RegressionFit Parabola => RegressionFit.Fit(X, new[] { 1.1, 3.9, 9.2, 15.8, 25.1 }, CalibrationModel.Quadratic);

    private static Concentration Ug(double v) => Concentration.FromMicrogramsPerLitre(v);

    private static CalibrationStandard Std(string label, double x, params double[] ratios) =>
        new(label, Ug(x), Ug(10), ratios.Select(r => new Injection(r * 1000, 1000)));

    private static CalibrationStandard[] Standards(int n) =>
        Enumerable.Range(1, n).Select(i => Std("L" + i, i, 0.2 * i + (0.001 * (i % 2)))).ToArray();

    private static RegressionCalibration Calibration => RegressionCalibration.Fit(Standards(5), CalibrationModel.Linear);

    public static IEnumerable<object[]> Cases => Rows(new BadInputCase[]
    {
        new("Calibration.Injection.#ctor", "NaN analyte", () => new Injection(double.NaN, 1000), Range, "analyteSignal", "NaN", Finite),
        new("Calibration.Injection.#ctor", "IS signal 0", () => new Injection(100, 0), Range, "internalStandardSignal", "0", FinitePositive),
        new("Calibration.Injection.#ctor", "IS signal negative", () => new Injection(100, -5), Range, "internalStandardSignal", "-5", FinitePositive),
        new("Calibration.Injection.#ctor", "IS signal +inf", () => new Injection(100, double.PositiveInfinity), Range, "internalStandardSignal", "Infinity", FinitePositive),
        new("Calibration.Injection.#ctor", "ratio 1e300/1e-300 overflows", () => new Injection(1e300, 1e-300), Range, "internalStandardSignal", "1E-300", "is finite"),
        new("Calibration.CalibrationStandard.#ctor", "blank label", () => new CalibrationStandard(" ", Ug(1), Ug(10), new[] { new Injection(1, 1) }), Arg, "label", "empty or white space"),
        new("Calibration.CalibrationStandard.#ctor", "negative concentration", () => new CalibrationStandard("L1", Ug(-1), Ug(10), new[] { new Injection(1, 1) }), Range, "analyteConcentration", "-1 µg/L", ">= 0"),
        new("Calibration.CalibrationStandard.#ctor", "IS concentration 0", () => new CalibrationStandard("L1", Ug(1), Ug(0), new[] { new Injection(1, 1) }), Range, "internalStandardConcentration", "0 µg/L", "> 0"),
        new("Calibration.CalibrationStandard.#ctor", "no injections", () => new CalibrationStandard("L1", Ug(1), Ug(10), Array.Empty<Injection>()), Arg, "injections", "empty", "at least one"),
        new("Calibration.CalibrationStandard.#ctor", "null injection", () => new CalibrationStandard("L1", Ug(1), Ug(10), new Injection[] { null! }), Null, "injections", "null element at index 0"),
        new("Calibration.CalibrationStandard.Create", "IS concentration negative", () => CalibrationStandard.Create("L1", Ug(1), Ug(-10), new Injection(1, 1)), Range, "internalStandardConcentration", "-10 µg/L", "> 0"),
        new("Calibration.ConfidenceInterval.#ctor", "NaN lower", () => new ConfidenceInterval(double.NaN, 1, 0.95), Range, "lower", "NaN", Finite),
        new("Calibration.ConfidenceInterval.#ctor", "upper < lower", () => new ConfidenceInterval(2, 1, 0.95), Range, "upper", "1", ">= lower (2)"),
        new("Calibration.ConfidenceInterval.#ctor", "level 1", () => new ConfidenceInterval(1, 2, 1), Range, "confidenceLevel", "1", "(0, 1)"),
        new("Calibration.ConfidenceInterval.#ctor", "level 0", () => new ConfidenceInterval(1, 2, 0), Range, "confidenceLevel", "0", "(0, 1)"),
        new("Calibration.AcceptanceRuleSet.#ctor", "blank name", () => new AcceptanceRuleSet(" ", "common practice"), Arg, "name", "empty or white space"),
        new("Calibration.AcceptanceRuleSet.#ctor", "null source", () => new AcceptanceRuleSet("rules", null!), Null, "source", "source"),
        new("Calibration.AcceptanceRuleSet.MaxAbsRelativeErrorPercent", "0", () => _ = new AcceptanceRuleSet("r", "s") { MaxAbsRelativeErrorPercent = 0 }, Range, "MaxAbsRelativeErrorPercent", "0", FinitePositive),
        new("Calibration.AcceptanceRuleSet.MaxAbsRelativeErrorAtLowestLevelPercent", "NaN", () => _ = new AcceptanceRuleSet("r", "s") { MaxAbsRelativeErrorAtLowestLevelPercent = double.NaN }, Range, "MaxAbsRelativeErrorAtLowestLevelPercent", "NaN", FinitePositive),
        new("Calibration.AcceptanceRuleSet.MaxAbsRelativeErrorAtHighestLevelPercent", "-1", () => _ = new AcceptanceRuleSet("r", "s") { MaxAbsRelativeErrorAtHighestLevelPercent = -1 }, Range, "MaxAbsRelativeErrorAtHighestLevelPercent", "-1", FinitePositive),
        new("Calibration.AcceptanceRuleSet.MinFractionOfCalibratorsPassing", "1.5", () => _ = new AcceptanceRuleSet("r", "s") { MinFractionOfCalibratorsPassing = 1.5 }, Range, "MinFractionOfCalibratorsPassing", "1.5", "(0, 1]"),
        new("Calibration.AcceptanceRuleSet.LevelPassingFraction", "0", () => _ = new AcceptanceRuleSet("r", "s") { LevelPassingFraction = 0 }, Range, "LevelPassingFraction", "0", "(0, 1]"),
        new("Calibration.AcceptanceRuleSet.MinLevels", "0", () => _ = new AcceptanceRuleSet("r", "s") { MinLevels = 0 }, Range, "MinLevels", "0", ">= 1"),
        new("Calibration.AcceptanceRuleSet.MinPassingLevels", "-1", () => _ = new AcceptanceRuleSet("r", "s") { MinPassingLevels = -1 }, Range, "MinPassingLevels", "-1", ">= 1"),
        new("Calibration.AcceptanceRuleSet.MinCorrelationCoefficientLinear", "1.1", () => _ = new AcceptanceRuleSet("r", "s") { MinCorrelationCoefficientLinear = 1.1 }, Range, "MinCorrelationCoefficientLinear", "1.1", "(0, 1]"),
        new("Calibration.AcceptanceRuleSet.MinCoefficientOfDeterminationNonLinear", "NaN", () => _ = new AcceptanceRuleSet("r", "s") { MinCoefficientOfDeterminationNonLinear = double.NaN }, Range, "MinCoefficientOfDeterminationNonLinear", "NaN", "(0, 1]"),
        new("Calibration.AcceptanceRuleSet.MaxRelativeStandardErrorPercent", "+inf", () => _ = new AcceptanceRuleSet("r", "s") { MaxRelativeStandardErrorPercent = double.PositiveInfinity }, Range, "MaxRelativeStandardErrorPercent", "Infinity", FinitePositive),
        new("Calibration.AcceptanceRuleSet.MaxResponseFactorRsdPercent", "0", () => _ = new AcceptanceRuleSet("r", "s") { MaxResponseFactorRsdPercent = 0 }, Range, "MaxResponseFactorRsdPercent", "0", FinitePositive),
        new("Calibration.AcceptanceRuleSet.Evaluate", "null calibration", () => new AcceptanceRuleSet("r", "s").Evaluate(null!), Null, "calibration", "calibration"),
        new("Calibration.CalibrationOptions.ConfidenceLevel", "1", () => _ = new CalibrationOptions { ConfidenceLevel = 1 }, Range, "ConfidenceLevel", "1", "(0, 1)"),
        new("Calibration.CalibrationOptions.SignificanceLevel", "0.5", () => _ = new CalibrationOptions { SignificanceLevel = 0.5 }, Range, "SignificanceLevel", "0.5", "(0, 0.5)"),
        new("Calibration.CalibrationOptions.Unit", "undefined unit", () => _ = new CalibrationOptions { Unit = (ConcentrationUnit)999 }, Range, "unit", "999", "defined unit"), // the setter reports the unit table's parameter name
        new("Calibration.Weighting.Custom", "empty", () => Weighting.Custom(Array.Empty<double>()), Arg, "weights", "empty", "at least one"),
        new("Calibration.Weighting.Custom", "zero weight", () => Weighting.Custom(new[] { 1.0, 0 }), Arg, "weights", "0 at index 1", "finite number > 0"),
        new("Calibration.Weighting.Custom", "negative weight", () => Weighting.Custom(new[] { -1.0 }), Arg, "weights", "-1 at index 0", "finite number > 0"),
        new("Calibration.Weighting.InverseVariance", "NaN s", () => Weighting.InverseVariance(new[] { double.NaN }), Arg, "standardDeviations", "NaN at index 0", "finite number > 0"),
        new("Calibration.Weighting.InverseVariance", "zero s (singular weight)", () => Weighting.InverseVariance(new[] { 0.1, 0 }), Arg, "standardDeviations", "0 at index 1", "finite number > 0"),
        new("Calibration.Weighting.ComputeWeights", "mismatched lengths", () => Weighting.None.ComputeWeights(X, new[] { 1.0, 2 }), Arg, "y", "2 elements", "as many as 'x' (5)"),
        new("Calibration.Weighting.ComputeWeights", "1/x at x = 0", () => Weighting.InverseX.ComputeWeights(new[] { 0.0, 1, 2 }, new[] { 0.1, 1, 2 }), Arg, "x", "x = 0", "1/x needs x > 0"),
        new("Calibration.Weighting.ComputeWeights", "1/y² at y < 0", () => Weighting.InverseYSquared.ComputeWeights(new[] { 1.0, 2, 3 }, new[] { -0.1, 1, 2 }), Arg, "y", "y = -0.1", "1/y² needs y > 0"),
        new("Calibration.Weighting.ComputeWeights", "custom weights for another count", () => Weighting.Custom(new[] { 1.0, 1 }).ComputeWeights(X, Y), Arg, "x", "5"),
        new("Calibration.RegressionFit.Fit", "NaN x", () => RegressionFit.Fit(new[] { 1, double.NaN, 3 }, new[] { 1.0, 2, 3 }, CalibrationModel.Linear), Arg, "x", "NaN at index 1", "finite number"),
        new("Calibration.RegressionFit.Fit", "+inf y", () => RegressionFit.Fit(new[] { 1.0, 2, 3 }, new[] { 1.0, double.PositiveInfinity, 3 }, CalibrationModel.Linear), Arg, "y", "Infinity at index 1", "finite number"),
        new("Calibration.RegressionFit.Fit", "empty", () => RegressionFit.Fit(Array.Empty<double>(), Array.Empty<double>(), CalibrationModel.Linear), Arg, "x", "0 points", "at least 3"),
        new("Calibration.RegressionFit.Fit", "single point", () => RegressionFit.Fit(new[] { 1.0 }, new[] { 1.0 }, CalibrationModel.LinearThroughOrigin), Arg, "x", "1 points", "at least 2"),
        new("Calibration.RegressionFit.Fit", "mismatched lengths", () => RegressionFit.Fit(X, new[] { 1.0, 2, 3 }, CalibrationModel.Linear), Arg, "y", "3 elements", "as many as 'x' (5)"),
        new("Calibration.RegressionFit.Fit", "two points for a line", () => RegressionFit.Fit(new[] { 1.0, 2 }, new[] { 1.0, 2 }, CalibrationModel.Linear), Arg, "x", "2 points", "at least 3"),
        new("Calibration.RegressionFit.Fit", "three points for a quadratic", () => RegressionFit.Fit(new[] { 1.0, 2, 3 }, new[] { 1.0, 4, 9 }, CalibrationModel.Quadratic), Arg, "x", "3 points", "at least 4"),
        new("Calibration.RegressionFit.Fit", "all-equal x", () => RegressionFit.Fit(new[] { 2.0, 2, 2, 2 }, new[] { 1.0, 1.1, 0.9, 1 }, CalibrationModel.Linear), Arg, "x", "1 distinct", "at least 2"),
        new("Calibration.RegressionFit.Fit", "duplicate x, two levels, quadratic", () => RegressionFit.Fit(new[] { 1.0, 1, 2, 2 }, new[] { 1.0, 1.1, 2, 2.1 }, CalibrationModel.Quadratic), Arg, "x", "2 distinct", "at least 3"),
        new("Calibration.RegressionFit.Fit", "undefined model", () => RegressionFit.Fit(X, Y, (CalibrationModel)7), Range, "model", "7", "defined CalibrationModel"),
        new("Calibration.RegressionFit.Fit", "custom weights for another count", () => RegressionFit.Fit(X, Y, CalibrationModel.Linear, Weighting.Custom(new[] { 1.0, 1, 1 })), Arg, "weighting", "3 values", "one per point"),
        new("Calibration.RegressionFit.Fit", "1/x with x = 0", () => RegressionFit.Fit(new[] { 0.0, 1, 2, 3 }, new[] { 0.1, 1, 2, 3 }, CalibrationModel.Linear, Weighting.InverseX), Arg, "x", "x = 0", "1/x needs x > 0"),
        new("Calibration.RegressionFit.Predict", "NaN", () => Line.Predict(double.NaN), Range, "x", "NaN", Finite),
        new("Calibration.LineFit.Predict", "NaN", () => RegressionFit.FitLine(X, Y).Predict(double.NaN), Range, "x", "NaN", Finite),
        new("Calibration.LineFit.Predict", "ŷ overflows", () => RegressionFit.FitLine(X, Y).Predict(double.MaxValue), Range, "x", "1.79", "fitted response is finite"),
        new("Calibration.RegressionFit.Sensitivity", "+inf", () => Line.Sensitivity(double.PositiveInfinity), Range, "x", "Infinity", Finite),
        new("Calibration.RegressionFit.MeanResponseStandardError", "-inf", () => Line.MeanResponseStandardError(double.NegativeInfinity), Range, "x", "-Infinity", Finite),
        new("Calibration.RegressionFit.Covariance", "index 2 of a line", () => Line.Covariance(0, 2), Range, "j", "2"),
        new("Calibration.RegressionFit.CoefficientInterval", "index -1", () => Line.CoefficientInterval(-1), Range, "index", "-1"),
        new("Calibration.RegressionFit.CoefficientInterval", "level 1.5", () => Line.CoefficientInterval(0, 1.5), Range, "confidenceLevel", "1.5", "(0, 1)"),
        new("Calibration.RegressionFit.MeanResponseInterval", "level 0", () => Line.MeanResponseInterval(1, 0), Range, "confidenceLevel", "0", "(0, 1)"),
        new("Calibration.RegressionFit.MeanResponseInterval", "NaN x", () => Line.MeanResponseInterval(double.NaN), Range, "x", "NaN", Finite),
        new("Calibration.RegressionFit.PredictionInterval", "0 replicates", () => Line.PredictionInterval(1, 0), Range, "replicates", "0", ">= 1"),
        new("Calibration.RegressionFit.PredictionInterval", "negative unknown weight", () => Line.PredictionInterval(1, 1, 0.95, -1), Range, "unknownWeight", "-1", FinitePositive),
        new("Calibration.RegressionFit.PredictionInterval", "level NaN", () => Line.PredictionInterval(1, 1, double.NaN), Range, "confidenceLevel", "NaN", "(0, 1)"),
        new("Calibration.RegressionFit.InverseEvaluate", "NaN", () => Line.InverseEvaluate(double.NaN), Range, "response", "NaN", Finite),
        new("Calibration.RegressionFit.InverseEvaluate", "below the parabola's vertex", () => Parabola.InverseEvaluate(-1e6), Range, "response", "-1000000", "never reaches it"),
        new("Calibration.RegressionFit.InversePredict", "NaN", () => Line.InversePredict(double.NaN), Range, "response", "NaN", Finite), // names the response (pinned by RegressionFitTests)
        new("Calibration.RegressionFit.InversePredict", "0 replicates", () => Line.InversePredict(1, 0), Range, "replicates", "0", ">= 1"),
        new("Calibration.RegressionFit.InversePredict", "level 1", () => Line.InversePredict(1, 1, 1), Range, "confidenceLevel", "1", "(0, 1)"),
        new("Calibration.RegressionFit.EstimateInverse", "+inf", () => Line.EstimateInverse(double.PositiveInfinity), Range, "response", "Infinity", Finite), // names the response (pinned by RegressionFitTests)
        new("Calibration.RegressionFit.EstimateInverse", "level -0.5", () => Line.EstimateInverse(1, 1, -0.5), Range, "confidenceLevel", "-0.5", "(0, 1)"),
        new("Calibration.RegressionFit.EstimateInverse", "unknown weight 0", () => Line.EstimateInverse(1, 1, 0.95, 0), Range, "unknownWeight", "0", FinitePositive),
        new("Calibration.RegressionFit.FiellerInterval", "NaN", () => Line.FiellerInterval(double.NaN), Range, "response", "NaN", Finite), // names the response (pinned by RegressionFitTests)
        new("Calibration.RegressionFit.FiellerInterval", "-3 replicates", () => Line.FiellerInterval(1, -3), Range, "replicates", "-3", ">= 1"),
        new("Calibration.RegressionFit.FiellerInterval", "quadratic", () => Parabola.FiellerInterval(1), Invalid, null, "straight-line models only"),
        new("Calibration.RegressionCalibration.Fit", "empty", () => RegressionCalibration.Fit(Array.Empty<CalibrationStandard>(), CalibrationModel.Linear), Arg, "standards", "empty"),
        new("Calibration.RegressionCalibration.Fit", "null element", () => RegressionCalibration.Fit(new CalibrationStandard[] { null! }, CalibrationModel.Linear), Null, "standards", "null element at index 0"),
        new("Calibration.RegressionCalibration.Fit", "two standards for a line", () => RegressionCalibration.Fit(Standards(2), CalibrationModel.Linear), Arg, "standards", "2 points", "at least 3"),
        new("Calibration.RegressionCalibration.Fit", "three standards for a quadratic", () => RegressionCalibration.Fit(Standards(3), CalibrationModel.Quadratic), Arg, "standards", "3 points", "at least 4"),
        new("Calibration.RegressionCalibration.Fit", "duplicate labels", () => RegressionCalibration.Fit(new[] { Std("L1", 1, 0.2), Std("L1", 2, 0.4), Std("L3", 3, 0.6) }, CalibrationModel.Linear), Arg, "standards", "'L1'", "unique"),
        new("Calibration.RegressionCalibration.Fit", "all at one level (duplicate x, no replicates)", () => RegressionCalibration.Fit(new[] { Std("A", 2, 0.4), Std("B", 2, 0.41), Std("C", 2, 0.39) }, CalibrationModel.Linear), Arg, "standards", "1 distinct", "at least 2"),
        new("Calibration.RegressionCalibration.Fit", "mixed concentration kinds", () => RegressionCalibration.Fit(new[] { Std("L1", 1, 0.2), Std("L2", 2, 0.4), new CalibrationStandard("L3", Concentration.FromMicromolesPerLitre(3), Ug(10), new[] { new Injection(600, 1000) }) }, CalibrationModel.Linear), Arg, "standards", "AmountConcentration"),
        new("Calibration.RegressionCalibration.Fit", "undefined model", () => RegressionCalibration.Fit(Standards(5), (CalibrationModel)9), Range, "model", "9"),
        new("Calibration.RegressionCalibration.Fit", "custom weights for another count", () => RegressionCalibration.Fit(Standards(5), CalibrationModel.Linear, Weighting.Custom(new[] { 1.0, 2 })), Arg, "weighting", "2 values", "one per point"),
        new("Calibration.RegressionCalibration.Covariance", "index 5", () => Calibration.Covariance(5, 0), Range, "i", "5"),
        new("Calibration.RegressionCalibration.ReplicateVarianceWeighting", "single injections", () => RegressionCalibration.ReplicateVarianceWeighting(Standards(5)), Arg, "standards", "1 injection(s)", "at least 2 injections"),
        new("Calibration.ResponseFactorCalibration.Fit", "empty", () => ResponseFactorCalibration.Fit(Array.Empty<CalibrationStandard>()), Arg, "standards", "empty"),
        new("Calibration.ResponseFactorCalibration.Fit", "negative mean response factor", () => ResponseFactorCalibration.Fit(new[] { new CalibrationStandard("L1", Ug(5), Ug(10), new[] { new Injection(-100, 1000) }) }), Arg, "standards", "> 0"),
        new("Calibration.ResponseFactorCalibration.FitSinglePoint", "null", () => ResponseFactorCalibration.FitSinglePoint(null!), Null, "standard", "standard"),
        new("Calibration.ResponseFactorCalibration.FitSinglePoint", "zero response", () => ResponseFactorCalibration.FitSinglePoint(new CalibrationStandard("L1", Ug(5), Ug(10), new[] { new Injection(0, 1000) })), Arg, "standard", "> 0"),
        new("Calibration.WeightingComparison.Compare", "undefined model", () => WeightingComparison.Compare(Standards(5), (CalibrationModel)9), Range, "model", "9", "Linear, LinearThroughOrigin or Quadratic"),
        new("Calibration.WeightingComparison.Compare", "null weighting", () => WeightingComparison.Compare(Standards(5), CalibrationModel.Linear, null, new Weighting[] { null! }), Null, "weightings", "weightings"),
    });

    public static IEnumerable<object[]> Magnitudes => Rows(new MagnitudeCase[]
    {
        new("Calibration.Injection.#ctor", "1e-300 / 1e300", () => new[] { new Injection(1e-300, 1e300).Ratio }),
        new("Calibration.RegressionFit.Fit", "x ~ 1e300", () => { var f = RegressionFit.Fit(X.Select(v => v * 1e300).ToArray(), Y, CalibrationModel.Linear); return new[] { f.Intercept, f.Slope, f.ResidualStandardDeviation }; }),
        new("Calibration.RegressionFit.Fit", "x ~ 1e-300", () => { var f = RegressionFit.Fit(X.Select(v => v * 1e-300).ToArray(), Y, CalibrationModel.Linear); return new[] { f.Intercept, f.Slope, f.ResidualStandardDeviation }; }),
        new("Calibration.RegressionFit.Fit", "weights 1e-300 to 1e300", () => { var f = RegressionFit.Fit(X, Y, CalibrationModel.Linear, Weighting.Custom(new[] { 1e-300, 1, 1, 1, 1e300 })); return new[] { f.Intercept, f.Slope }; }),
        new("Calibration.RegressionFit.InversePredict", "response 1e300", () => { var p = Line.InversePredict(1e300); return new[] { p.Value, p.StandardError, p.Interval.Lower, p.Interval.Upper }; }),
        new("Calibration.RegressionFit.EstimateInverse", "response -1e300", () => { var p = Line.EstimateInverse(-1e300); return new[] { p.Value, p.StandardError }; }),
        new("Calibration.RegressionFit.PredictionInterval", "x 1e300", () => { var i = Line.PredictionInterval(1e300); return new[] { i.Lower, i.Upper }; }),
        new("Calibration.RegressionFit.MeanResponseInterval", "x -1e300", () => { var i = Line.MeanResponseInterval(-1e300); return new[] { i.Lower, i.Upper }; }),
        new("Calibration.RegressionFit.Predict", "x 1e300 on a parabola", () => new[] { Parabola.Predict(1e300) }),
        new("Calibration.RegressionFit.FiellerInterval", "response 1e300", () => Line.FiellerInterval(1e300) is ConfidenceInterval i ? new[] { i.Lower, i.Upper } : Array.Empty<double>()),
        new("Calibration.RegressionCalibration.Fit", "concentrations 1e-300 µg/L", () => { var c = RegressionCalibration.Fit(Enumerable.Range(1, 5).Select(i => new CalibrationStandard("L" + i, Ug(i * 1e-300), Ug(10), new[] { new Injection(i + (0.01 * (i % 2)), 1) })).ToArray(), CalibrationModel.Linear); return new[] { c.Regression.Slope, c.Regression.Intercept }; }),
    });

    [Theory]
    [MemberData(nameof(Cases))]
    public void EntryPoint_BadInput_ThrowsDocumentedExceptionNamingParameterValueAndRange(string name, BadInputCase c)
    {
        Assert.NotNull(name);
        AssertRejected(c);
    }

    [Theory]
    [InlineData(CalibrationModel.Linear)]
    [InlineData(CalibrationModel.LinearThroughOrigin)]
    [InlineData(CalibrationModel.Quadratic)]
    public void Fit_ResponsesNear1e300_ResidualStandardDeviationAndRSquaredFiniteAndScaled(CalibrationModel model)
    {
        // Scaling y by a power of two scales s exactly and leaves R² unchanged (scale equivariance of least squares).
        const double Scale = 1.0715086071862673e301; // 2^1000
        RegressionFit f = RegressionFit.Fit(X, Y.Select(v => v * (Scale / 16)).ToArray(), model);
        RegressionFit g = RegressionFit.Fit(X, Y, model);
        Assert.True(double.IsFinite(f.ResidualStandardDeviation));
        Assert.Equal(g.ResidualStandardDeviation * (Scale / 16), f.ResidualStandardDeviation, 1e-9 * f.ResidualStandardDeviation);
        Assert.Equal(g.RSquared, f.RSquared, 1e-12);
    }

    [Theory]
    [MemberData(nameof(Magnitudes))]
    public void EntryPoint_AbsurdMagnitude_FiniteOrDocumentedException(string name, MagnitudeCase c)
    {
        Assert.NotNull(name);
        AssertFiniteOrRejected(c);
    }
}
