using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using InternalStdCal.Uncertainty;
using Xunit;
using static InternalStdCal.Tests.Hardening.BadInput.BadInput;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>Bad input to every entry point of <c>Uncertainty</c>. Rules: u ≥ 0, ν ≥ 1 (JCGM 100 §G), correlation
/// in [−1, 1] (JCGM 100 §5.2.2), coverage probability in (0, 1), Monte Carlo M ≥ 100/(1 − p) (JCGM 101 §7.2.1),
/// significant digits 1–4 (JCGM 101 §7.9).</summary>
public class UncertaintyBadInputTests
{
    private static readonly Type Range = typeof(ArgumentOutOfRangeException);
    private static readonly Type Arg = typeof(ArgumentException);
    private static readonly Type Null = typeof(ArgumentNullException);

    private static readonly UncertainInput A = UncertainInput.Normal("a", 2, 0.1);
    private static readonly UncertainInput B = UncertainInput.Rectangular("b", 3, 0.2);

    private static MeasurementModel Model => MeasurementModel.Product("y", null, 1, new[] { A, B }, new[] { 1.0, -1 });

    private static QuantitationResult Result()
    {
        Concentration Ug(double v) => Concentration.FromMicrogramsPerLitre(v);
        var cal = RegressionCalibration.Fit(
            Enumerable.Range(1, 5).Select(i => new CalibrationStandard("L" + i, Ug(i), Ug(10), new[] { new Injection((0.2 * i) + (0.002 * (i % 2)), 1) })).ToArray(),
            CalibrationModel.Linear);
        return SampleQuantitation.Quantify(cal, UnknownSample.Create("S", Ug(10), new Injection(0.5, 1), new Injection(0.51, 1)));
    }

    public static IEnumerable<object[]> Cases => Rows(new BadInputCase[]
    {
        new("Uncertainty.UncertainInput.Normal", "NaN value", () => UncertainInput.Normal("x", double.NaN, 1), Range, "value", "NaN", Finite),
        new("Uncertainty.UncertainInput.Normal", "negative u", () => UncertainInput.Normal("x", 1, -0.1), Range, "standardUncertainty", "-0.1", FiniteNonNegative),
        new("Uncertainty.UncertainInput.Normal", "ν = 0.5", () => UncertainInput.Normal("x", 1, 0.1, 0.5), Range, "degreesOfFreedom", "0.5", ">= 1"),
        new("Uncertainty.UncertainInput.Normal", "blank name", () => UncertainInput.Normal(" ", 1, 0.1), Arg, "name", "non-blank"),
        new("Uncertainty.UncertainInput.Rectangular", "negative half-width", () => UncertainInput.Rectangular("x", 1, -1), Range, "halfWidth", "-1", FiniteNonNegative),
        new("Uncertainty.UncertainInput.Rectangular", "+inf value", () => UncertainInput.Rectangular("x", double.PositiveInfinity, 1), Range, "value", "Infinity", Finite),
        new("Uncertainty.UncertainInput.Triangular", "NaN half-width", () => UncertainInput.Triangular("x", 1, double.NaN), Range, "halfWidth", "NaN", FiniteNonNegative),
        new("Uncertainty.UncertainInput.StudentT", "ν = +inf", () => UncertainInput.StudentT("x", 1, 0.1, double.PositiveInfinity), Range, "degreesOfFreedom", "Infinity", ">= 1"),
        new("Uncertainty.UncertainInput.StudentT", "ν = 0", () => UncertainInput.StudentT("x", 1, 0.1, 0), Range, "degreesOfFreedom", "0", ">= 1"),
        new("Uncertainty.UncertainInput.From", "null name", () => UncertainInput.From(null!, Measured.Exact(Mass.FromGrams(1))), Null, "name", "name"),
        new("Uncertainty.InputCorrelation.#ctor", "r = 1.5", () => new InputCorrelation("a", "b", 1.5), Range, "coefficient", "1.5", "[-1, 1]"),
        new("Uncertainty.InputCorrelation.#ctor", "r = NaN", () => new InputCorrelation("a", "b", double.NaN), Range, "coefficient", "NaN", "[-1, 1]"),
        new("Uncertainty.InputCorrelation.#ctor", "same input twice", () => new InputCorrelation("a", "a", 0.5), Arg, "secondInput", "'a'", "two different inputs"),
        new("Uncertainty.MeasurementModel.Create", "no inputs", () => MeasurementModel.Create("y", null, Array.Empty<UncertainInput>(), x => 1), Arg, "inputs", "empty"),
        new("Uncertainty.MeasurementModel.Create", "null function", () => MeasurementModel.Create("y", null, new[] { A }, null!), Null, "function", "function"),
        new("Uncertainty.MeasurementModel.Create", "duplicate names", () => MeasurementModel.Create("y", null, new[] { A, A }, x => x[0]), Arg, "inputs", "'a' twice"),
        new("Uncertainty.MeasurementModel.Create", "correlation with an unknown input", () => MeasurementModel.Create("y", null, new[] { A, B }, x => x[0], null, new[] { new InputCorrelation("a", "c", 0.5) }), Arg, "correlations", "'c'", "not an input"),
        new("Uncertainty.MeasurementModel.Product", "constant 0", () => MeasurementModel.Product("y", null, 0, new[] { A }, new[] { 1.0 }), Range, "constant", "0", "finite non-zero"),
        new("Uncertainty.MeasurementModel.Product", "constant NaN", () => MeasurementModel.Product("y", null, double.NaN, new[] { A }, new[] { 1.0 }), Range, "constant", "NaN", Finite),
        new("Uncertainty.MeasurementModel.Product", "mismatched exponents", () => MeasurementModel.Product("y", null, 1, new[] { A, B }, new[] { 1.0 }), Arg, "exponents", "1 elements", "as many as 'inputs' (2)"),
        new("Uncertainty.MeasurementModel.Product", "exponent 0", () => MeasurementModel.Product("y", null, 1, new[] { A, B }, new[] { 1.0, 0 }), Range, "exponents[1]", "0", "finite non-zero"),
        new("Uncertainty.MeasurementModel.Product", "zero input with a negative exponent", () => MeasurementModel.Product("y", null, 1, new[] { UncertainInput.Normal("z", 0, 0.1) }, new[] { -1.0 }), Arg, "inputs", "'z' is 0", "exponent -1"),
        new("Uncertainty.MeasurementModel.Correlation", "unknown input", () => Model.Correlation("a", "c"), Arg, "secondInput", "'c'", "not an input"),
        new("Uncertainty.MeasurementModel.EvaluateGum", "p = 1", () => Model.EvaluateGum(1), Range, "coverageProbability", "1", "(0, 1)"),
        new("Uncertainty.MeasurementModel.EvaluateGum", "p = NaN", () => Model.EvaluateGum(double.NaN), Range, "coverageProbability", "NaN", "(0, 1)"),
        new("Uncertainty.MeasurementModel.EvaluateMonteCarlo", "10 trials", () => Model.EvaluateMonteCarlo(10, 1), Range, "trials", "10", ">= 2000"),
        new("Uncertainty.MeasurementModel.EvaluateMonteCarlo", "p = 0", () => Model.EvaluateMonteCarlo(10000, 1, 0), Range, "coverageProbability", "0", "(0, 1)"),
        new("Uncertainty.MeasurementModel.EvaluateMonteCarloAdaptive", "5 significant digits", () => Model.EvaluateMonteCarloAdaptive(1, 0.95, 5), Range, "significantDigits", "5", "[1, 4]"),
        new("Uncertainty.MeasurementModel.EvaluateMonteCarloAdaptive", "max trials 10", () => Model.EvaluateMonteCarloAdaptive(1, 0.95, 2, 10), Range, "maxTrials", "10"),
        new("Uncertainty.MeasurementModel.EvaluateMonteCarloAdaptive", "p = -0.1", () => Model.EvaluateMonteCarloAdaptive(1, -0.1), Range, "coverageProbability", "-0.1", "(0, 1)"),
        new("Uncertainty.MonteCarloEvaluation.NumericalTolerance", "0 digits", () => Model.EvaluateMonteCarlo(10000, 1).NumericalTolerance(0), Range, "significantDigits", "0", "[1, 4]"),
        new("Uncertainty.MonteCarloEvaluation.ValidateGum", "null", () => Model.EvaluateMonteCarlo(10000, 1).ValidateGum(null!), Null, "gum", "gum"),
        new("Uncertainty.MonteCarloEvaluation.ValidateGum", "other coverage probability", () => { MeasurementModel m = Model; return m.EvaluateMonteCarlo(10000, 1).ValidateGum(m.EvaluateGum(0.99)); }, Arg, "gum", "0.99"),
        new("Uncertainty.MonteCarloEvaluation.ToMeasuredConcentration", "undefined unit", () => Model.EvaluateMonteCarlo(10000, 1).ToMeasuredConcentration((ConcentrationUnit)999), Range, "unit", "999"),
        new("Uncertainty.GumEvaluation.ToMeasuredConcentration", "undefined unit", () => Model.EvaluateGum().ToMeasuredConcentration((ConcentrationUnit)(-3)), Range, "unit", "-3"),
        new("Uncertainty.ResultUncertaintyBudget.Create", "p = 1", () => ResultUncertaintyBudget.Create(Result(), coverageProbability: 1), Range, "coverageProbability", "1", "(0, 1)"),
        new("Uncertainty.ResultUncertaintyBudget.Create", "null quantitation", () => ResultUncertaintyBudget.Create(null!), Null, "quantitation", "quantitation"),
        new("Uncertainty.ResultUncertaintyBudget.Create", "mismatched factor exponents", () => ResultUncertaintyBudget.Create(Result(), factors: new[] { A }, factorExponents: new[] { 1.0, 1 }), Arg, "factorExponents", "2 elements", "as many as 'factors' (1)"),
        new("Uncertainty.ResultUncertaintyBudget.Create", "null factor", () => ResultUncertaintyBudget.Create(Result(), factors: new UncertainInput[] { null! }), Null, "factors", "null at index 0"),
        new("Uncertainty.ResultUncertaintyBudget.MonteCarlo", "0 digits", () => ResultUncertaintyBudget.Create(Result()).MonteCarlo(1, 0), Range, "significantDigits", "0", "[1, 4]"),
    });

    public static IEnumerable<object[]> Magnitudes => Rows(new MagnitudeCase[]
    {
        new("Uncertainty.MeasurementModel.Product", "inputs 1e300 multiplied", () => { var g = MeasurementModel.Product("y", null, 1, new[] { UncertainInput.Normal("p", 1e300, 1e299), UncertainInput.Normal("q", 1e300, 1e299) }, new[] { 1.0, 1 }).EvaluateGum(); return new[] { g.Value, g.StandardUncertainty, g.ExpandedUncertainty, g.EffectiveDegreesOfFreedom }; }),
        new("Uncertainty.MeasurementModel.EvaluateGum", "inputs 1e-300 divided", () => { var g = MeasurementModel.Product("y", null, 1, new[] { UncertainInput.Normal("p", 1, 0.1), UncertainInput.Normal("q", 1e-300, 1e-301) }, new[] { 1.0, -1 }).EvaluateGum(); return new[] { g.Value, g.StandardUncertainty }; }),
        new("Uncertainty.MeasurementModel.EvaluateGum", "u = 1e300 on a sum", () => { var g = MeasurementModel.Create("y", null, new[] { UncertainInput.Normal("p", 1, 1e300), UncertainInput.Normal("q", 1, 1e300) }, x => x[0] + x[1]).EvaluateGum(); return new[] { g.Value, g.StandardUncertainty, g.ExpandedUncertainty }; }),
        new("Uncertainty.MeasurementModel.EvaluateGum", "ν = 1 with p = 1 - 1e-15", () => { var g = MeasurementModel.Create("y", null, new[] { UncertainInput.StudentT("p", 1, 1, 1) }, x => x[0]).EvaluateGum(1 - 1e-15); return new[] { g.CoverageFactor, g.ExpandedUncertainty }; }),
        new("Uncertainty.MeasurementModel.EvaluateMonteCarlo", "u = 1e300", () => { var m = MeasurementModel.Create("y", null, new[] { UncertainInput.Normal("p", 0, 1e300) }, x => x[0]).EvaluateMonteCarlo(10000, 7); return new[] { m.Value, m.StandardUncertainty }; }),
        new("Uncertainty.MeasurementModel.Create", "squares of 1e200 ± 1e200", () => { var m = MeasurementModel.Create("y", null, new[] { UncertainInput.Normal("p", 1e200, 1e200) }, x => x[0] * x[0]).EvaluateMonteCarlo(10000, 7); return new[] { m.Value, m.StandardUncertainty }; }),
        new("Uncertainty.UncertainInput.Rectangular", "half-width 1e308", () => new[] { UncertainInput.Rectangular("r", 0, 1e308).StandardUncertainty }),
    });

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
