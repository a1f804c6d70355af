using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Quantities;
using Xunit;
using static InternalStdCal.Tests.Hardening.BadInput.BadInput;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>Bad input to every entry point of <c>Limits</c>. Rules: α, β in (0, 0.5) (ISO 11843-2, DIN 32645);
/// MDL needs ≥ 7 spiked results (40 CFR 136 App. B); Grubbs ≥ 3 values, Dixon 3–10 (Rorabacher 1991), Cochran
/// ≥ 2 groups of ≥ 2 (ISO 5725-2); σ, slope and factors finite and &gt; 0 (ICH Q2(R2)).</summary>
public class LimitsBadInputTests
{
    private static readonly Type Range = typeof(ArgumentOutOfRangeException);
    private static readonly Type Arg = typeof(ArgumentException);
    private static readonly Type Null = typeof(ArgumentNullException);

    private static Concentration Ug(double v) => Concentration.FromMicrogramsPerLitre(v);

    private static RegressionCalibration Line(CalibrationModel model = CalibrationModel.Linear, Weighting? w = null) => RegressionCalibration.Fit(
        Enumerable.Range(1, 6).Select(i => new CalibrationStandard("L" + i, Ug(i), Ug(10), new[] { new Injection((0.2 * i) + 0.01 + (0.003 * (i % 3)), 1) })).ToArray(),
        model,
        w);

    private static readonly double[] Seven = { 1.1, 1.3, 0.9, 1.0, 1.2, 0.8, 1.05 };

    private static readonly ResponseSigma Sigma = ResponseSigma.FromBlankStandardDeviation(0.01);

    public static IEnumerable<object[]> Cases => Rows(new BadInputCase[]
    {
        new("Limits.CurrieLimits.ForKnownSigma", "σ0 = 0", () => CurrieLimits.ForKnownSigma(0), Range, "sigma0", "0", FinitePositive),
        new("Limits.CurrieLimits.ForKnownSigma", "σ0 = NaN", () => CurrieLimits.ForKnownSigma(double.NaN), Range, "sigma0", "NaN", FinitePositive),
        new("Limits.CurrieLimits.ForKnownSigma", "α = 0.5", () => CurrieLimits.ForKnownSigma(1, 0.5), Range, "alpha", "0.5", "(0, 0.5)"),
        new("Limits.CurrieLimits.ForKnownSigma", "β = 0", () => CurrieLimits.ForKnownSigma(1, 0.05, 0), Range, "beta", "0", "(0, 0.5)"),
        new("Limits.CurrieLimits.ForKnownSigma", "k_Q = -10", () => CurrieLimits.ForKnownSigma(1, 0.05, 0.05, -10), Range, "quantificationFactor", "-10", FinitePositive),
        new("Limits.CurrieLimits.ForKnownSigma", "σ_Q = +inf", () => CurrieLimits.ForKnownSigma(1, 0.05, 0.05, 10, double.PositiveInfinity), Range, "quantificationSigma", "Infinity", FinitePositive),
        new("Limits.CurrieLimits.ForEstimatedSigma", "s0 negative", () => CurrieLimits.ForEstimatedSigma(-1, 5), Range, "s0", "-1", FinitePositive),
        new("Limits.CurrieLimits.ForEstimatedSigma", "ν = 0", () => CurrieLimits.ForEstimatedSigma(1, 0), Range, "degreesOfFreedom", "0", ">= 1"),
        new("Limits.CurrieLimits.ForEstimatedSigma", "α NaN", () => CurrieLimits.ForEstimatedSigma(1, 5, double.NaN), Range, "alpha", "NaN", "(0, 0.5)"),
        new("Limits.IchLimits.ComputeForSlope", "slope 0", () => IchLimits.ComputeForSlope(Sigma, 0, ConcentrationUnit.MicrogramPerLitre), Range, "slope", "0", FinitePositive),
        new("Limits.IchLimits.ComputeForSlope", "slope -inf", () => IchLimits.ComputeForSlope(Sigma, double.NegativeInfinity, ConcentrationUnit.MicrogramPerLitre), Range, "slope", "-Infinity", FinitePositive),
        new("Limits.IchLimits.ComputeForSlope", "detection factor 0", () => IchLimits.ComputeForSlope(Sigma, 1, ConcentrationUnit.MicrogramPerLitre, 0), Range, "detectionFactor", "0", FinitePositive),
        new("Limits.IchLimits.ComputeForSlope", "LOQ factor below LOD factor", () => IchLimits.ComputeForSlope(Sigma, 1, ConcentrationUnit.MicrogramPerLitre, 3.3, 2), Range, "quantificationFactor", "2", ">= detectionFactor (3.3)"),
        new("Limits.IchLimits.ComputeForSlope", "undefined unit", () => IchLimits.ComputeForSlope(Sigma, 1, (ConcentrationUnit)999), Range, "unit", "999"),
        new("Limits.IchLimits.ComputeForSlope", "null σ", () => IchLimits.ComputeForSlope(null!, 1, ConcentrationUnit.MicrogramPerLitre), Null, "sigma", "sigma"),
        new("Limits.IchLimits.Compute", "quadratic", () => IchLimits.Compute(Sigma, Line(CalibrationModel.Quadratic)), Arg, "calibration", "Quadratic"),
        new("Limits.IchLimits.Compute", "IS concentration 0", () => IchLimits.Compute(Sigma, Line(), Ug(0)), Range, "internalStandardConcentration", "0 µg/L", "> 0"),
        new("Limits.IchLimits.Compute", "detection factor NaN", () => IchLimits.Compute(Sigma, Line(), null, double.NaN), Range, "detectionFactor", "NaN", FinitePositive),
        new("Limits.Iso11843Limits.Compute", "0 replicates", () => Iso11843Limits.Compute(Line(), 0), Range, "testSampleReplicates", "0", ">= 1"),
        new("Limits.Iso11843Limits.Compute", "α = 0", () => Iso11843Limits.Compute(Line(), 1, 0), Range, "alpha", "0", "(0, 0.5)"),
        new("Limits.Iso11843Limits.Compute", "β = 0.7", () => Iso11843Limits.Compute(Line(), 1, 0.05, 0.7), Range, "beta", "0.7", "(0, 0.5)"),
        new("Limits.Iso11843Limits.Compute", "weighted line", () => Iso11843Limits.Compute(Line(CalibrationModel.Linear, Weighting.InverseX)), Arg, "calibration", "unweighted"),
        new("Limits.Iso11843Limits.Compute", "IS concentration in µmol/L (wrong kind)", () => Iso11843Limits.Compute(Line(), 1, 0.05, 0.05, Concentration.FromMicromolesPerLitre(1)), Arg, "internalStandardConcentration", "µmol/L"),
        new("Limits.Din32645Limits.Compute", "0 replicates", () => Din32645Limits.Compute(Line(), 0), Range, "sampleReplicates", "0", ">= 1"),
        new("Limits.Din32645Limits.Compute", "α = 1", () => Din32645Limits.Compute(Line(), 1, 1), Range, "alpha", "1", "(0, 0.5)"),
        new("Limits.Din32645Limits.Compute", "k = 0", () => Din32645Limits.Compute(Line(), 1, 0.05, 0), Range, "k", "0", FinitePositive),
        new("Limits.Din32645Limits.Compute", "through origin", () => Din32645Limits.Compute(Line(CalibrationModel.LinearThroughOrigin)), Arg, "calibration", "LinearThroughOrigin"),
        new("Limits.MethodDetectionLimit.Compute", "6 spiked results", () => MethodDetectionLimit.Compute(Seven.Take(6).Select(Ug).ToArray(), Array.Empty<BlankResult>(), Ug(1)), Arg, "spikedResults", "6", "7"),
        new("Limits.MethodDetectionLimit.Compute", "all spiked results equal", () => MethodDetectionLimit.Compute(Enumerable.Repeat(Ug(1), 7).ToArray(), Array.Empty<BlankResult>(), Ug(1)), Arg, "spikedResults", "7 equal results", "S_s = 0"),
        new("Limits.MethodDetectionLimit.Compute", "spike level 0", () => MethodDetectionLimit.Compute(Seven.Select(Ug).ToArray(), Array.Empty<BlankResult>(), Ug(0)), Range, "spikeLevel", "0 µg/L", "> 0"),
        new("Limits.MethodDetectionLimit.Compute", "null blank", () => MethodDetectionLimit.Compute(Seven.Select(Ug).ToArray(), new BlankResult[] { null! }, Ug(1)), Null, "blankResults", "index 0"),
        new("Limits.MethodDetectionLimit.Compute", "spiked result in µmol/L (wrong kind)", () => MethodDetectionLimit.Compute(Seven.Select(Ug).Append(Concentration.FromMicromolesPerLitre(1)).ToArray(), Array.Empty<BlankResult>(), Ug(1)), Arg, "spikedResults", "µmol/L"),
        new("Limits.ResponseSigma.FromBlankStandardDeviation", "0", () => ResponseSigma.FromBlankStandardDeviation(0), Range, "standardDeviation", "0", FinitePositive),
        new("Limits.ResponseSigma.FromBlankStandardDeviation", "NaN", () => ResponseSigma.FromBlankStandardDeviation(double.NaN), Range, "standardDeviation", "NaN", FinitePositive),
        new("Limits.ResponseSigma.FromBlankResponses", "single point", () => ResponseSigma.FromBlankResponses(new[] { 0.1 }), Arg, "responses", "1", "at least 2"),
        new("Limits.ResponseSigma.FromBlankResponses", "NaN", () => ResponseSigma.FromBlankResponses(new[] { 0.1, double.NaN }), Arg, "responses", "NaN at index 1", "finite number"),
        new("Limits.ResponseSigma.FromBlankResponses", "all equal", () => ResponseSigma.FromBlankResponses(new[] { 0.1, 0.1, 0.1 }), Arg, "responses", "3 equal values", "SD is 0"),
        new("Limits.ResponseSigma.FromInterceptsOfLines", "empty", () => ResponseSigma.FromInterceptsOfLines(Array.Empty<double>()), Arg, "intercepts", "0", "at least 2"),
        new("Limits.ResponseSigma.FromResidual", "quadratic", () => ResponseSigma.FromResidual(Line(CalibrationModel.Quadratic)), Arg, "calibration", "Quadratic"),
        new("Limits.ResponseSigma.FromInterceptStandardError", "through origin", () => ResponseSigma.FromInterceptStandardError(Line(CalibrationModel.LinearThroughOrigin)), Arg, "calibration", "LinearThroughOrigin"),
        new("Limits.ReportingLimits.#ctor", "LOD 0", () => new ReportingLimits(Ug(0), Ug(1)), Range, "detectionLimit", "0 µg/L", "> 0"),
        new("Limits.ReportingLimits.#ctor", "LOQ < LOD", () => new ReportingLimits(Ug(2), Ug(1)), Arg, "quantificationLimit", "1 µg/L", "2 µg/L"),
        new("Limits.ReportingLimits.#ctor", "kinds differ", () => new ReportingLimits(Ug(1), Concentration.FromMicromolesPerLitre(3)), Arg, "quantificationLimit", "µmol/L"),
        new("Limits.ReportingLimits.QuantificationOnly", "negative", () => ReportingLimits.QuantificationOnly(Ug(-1)), Range, "quantificationLimit", "-1 µg/L", "> 0"),
        new("Limits.ReportingLimits.Apply", "estimate in µmol/L (wrong kind)", () => new ReportingLimits(Ug(1), Ug(3)).Apply(Concentration.FromMicromolesPerLitre(5)), Arg, "estimate", "µmol/L"),
        new("Limits.ReportedValue.ToString", "0 significant digits", () => new ReportingLimits(Ug(1), Ug(3)).Apply(Ug(5)).ToString(0), Range, "significantDigits", "0", ">= 1"),
        new("Limits.ReportedValue.ToString", "16 significant digits", () => new ReportingLimits(Ug(1), Ug(3)).Apply(Ug(5)).ToString(16), Range, "significantDigits", "16", "<= 15"),
        new("Limits.GrubbsTest.Evaluate", "two values", () => GrubbsTest.Evaluate(new[] { 1.0, 2 }, 0.05, OutlierSide.TwoSided), Range, "values", "2 elements", "at least 3"),
        new("Limits.GrubbsTest.Evaluate", "NaN value", () => GrubbsTest.Evaluate(new[] { 1.0, double.NaN, 2 }, 0.05, OutlierSide.TwoSided), Range, "values", "NaN at index 1", "finite number"),
        new("Limits.GrubbsTest.Evaluate", "α = 0.5", () => GrubbsTest.Evaluate(Seven, 0.5, OutlierSide.TwoSided), Range, "alpha", "0.5", "(0, 0.5)"),
        new("Limits.GrubbsTest.Evaluate", "undefined side", () => GrubbsTest.Evaluate(Seven, 0.05, (OutlierSide)5), Range, "alternative", "5", "TwoSided, High or Low"),
        new("Limits.GrubbsTest.CriticalValue", "count 2", () => GrubbsTest.CriticalValue(2, 0.05, OutlierSide.TwoSided), Range, "count", "2", ">= 3"),
        new("Limits.GrubbsTest.CriticalValue", "α = 0", () => GrubbsTest.CriticalValue(5, 0, OutlierSide.High), Range, "alpha", "0", "(0, 0.5)"),
        new("Limits.DixonQTest.Evaluate", "11 values", () => DixonQTest.Evaluate(Enumerable.Range(0, 11).Select(i => (double)i).ToArray(), 0.05), Range, "values", "11 elements", "from 3 to 10"),
        new("Limits.DixonQTest.Evaluate", "+inf value", () => DixonQTest.Evaluate(new[] { 1.0, 2, double.PositiveInfinity }, 0.05), Range, "values", "Infinity at index 2", "finite number"),
        new("Limits.DixonQTest.CriticalValue", "α = 0.03 not tabulated", () => DixonQTest.CriticalValue(5, 0.03), Range, "alpha", "0.03", "0.10, 0.05, 0.04, 0.02, 0.01"),
        new("Limits.DixonQTest.CriticalValue", "count 2", () => DixonQTest.CriticalValue(2, 0.05), Range, "count", "2", "3"),
        new("Limits.CochranTest.Evaluate", "one group", () => CochranTest.Evaluate(new[] { new[] { 1.0, 2 } }, 0.05), Range, "groups", "1", "at least 2"),
        new("Limits.CochranTest.Evaluate", "groups of different sizes", () => CochranTest.Evaluate(new[] { new[] { 1.0, 2 }, new[] { 1.0, 2, 3 } }, 0.05), Arg, "groups", "3", "2"),
        new("Limits.CochranTest.Evaluate", "NaN in a group", () => CochranTest.Evaluate(new[] { new[] { 1.0, 2 }, new[] { 1.0, double.NaN } }, 0.05), Range, "groups[1]", "NaN at index 1", "finite number"),
        new("Limits.CochranTest.Evaluate", "negative variance", () => CochranTest.Evaluate(new[] { 0.1, -0.2, 0.3 }, 3, 0.05), Range, "variances", "-0.2 at index 1", ">= 0"),
        new("Limits.CochranTest.Evaluate", "1 replicate per group", () => CochranTest.Evaluate(new[] { 0.1, 0.2, 0.3 }, 1, 0.05), Range, "replicatesPerGroup", "1", ">= 2"),
        new("Limits.CochranTest.Evaluate", "α = 0.6", () => CochranTest.Evaluate(new[] { 0.1, 0.2, 0.3 }, 3, 0.6), Range, "alpha", "0.6", "(0, 0.5)"),
        new("Limits.CochranTest.Classify", "one group", () => CochranTest.Classify(new[] { new[] { 1.0, 2 } }), Range, "groups", "1", "at least 2"),
        new("Limits.CochranTest.Classify", "single variance", () => CochranTest.Classify(new[] { 0.1 }, 3), Range, "variances", "1", "at least 2"),
        new("Limits.CochranTest.CriticalValue", "1 group", () => CochranTest.CriticalValue(1, 3, 0.05), Range, "groupCount", "1", ">= 2"),
        new("Limits.CochranTest.CriticalValue", "α NaN", () => CochranTest.CriticalValue(3, 3, double.NaN), Range, "alpha", "NaN", "(0, 0.5)"),
    });

    public static IEnumerable<object[]> Magnitudes => Rows(new MagnitudeCase[]
    {
        new("Limits.CurrieLimits.ForKnownSigma", "σ0 = 1e300", () => { var r = CurrieLimits.ForKnownSigma(1e300); return new[] { r.CriticalLevel, r.DetectionLimit, r.QuantificationLimit }; }),
        new("Limits.CurrieLimits.ForEstimatedSigma", "s0 = 1e300, ν = 1", () => { var r = CurrieLimits.ForEstimatedSigma(1e300, 1); return new[] { r.CriticalLevel, r.DetectionLimit, r.QuantificationLimit }; }),
        new("Limits.CurrieLimits.ForKnownSigma", "σ0 = 1e-300, α = 1e-300", () => { var r = CurrieLimits.ForKnownSigma(1e-300, 1e-300, 1e-300); return new[] { r.CriticalLevel, r.DetectionLimit, r.QuantificationLimit }; }),
        new("Limits.IchLimits.ComputeForSlope", "σ 1e300, slope 1e-300", () => { var r = IchLimits.ComputeForSlope(ResponseSigma.FromBlankStandardDeviation(1e300), 1e-300, ConcentrationUnit.MicrogramPerLitre); return new[] { r.DetectionLimit.Value, r.QuantificationLimit.Value }; }),
        new("Limits.ResponseSigma.FromBlankResponses", "±1e300", () => new[] { ResponseSigma.FromBlankResponses(new[] { 1e300, -1e300, 1e300 }).Value }),
        new("Limits.GrubbsTest.Evaluate", "values ±1e300", () => new[] { GrubbsTest.Evaluate(new[] { 1e300, -1e300, 1e300, 0.5e300 }, 0.05, OutlierSide.TwoSided).Statistic }),
        new("Limits.DixonQTest.Evaluate", "values 1e-300 apart", () => new[] { DixonQTest.Evaluate(new[] { 1.0, 1 + 2.2e-16, 1 + 4.4e-16, 5 }, 0.05).Statistic }),
        new("Limits.CochranTest.Evaluate", "variances 1e300", () => new[] { CochranTest.Evaluate(new[] { 1e300, 1e300, 1e300 }, 3, 0.05).Statistic }),
        new("Limits.CochranTest.Evaluate", "groups ±1e300", () => new[] { CochranTest.Evaluate(new[] { new[] { 1e300, -1e300 }, new[] { 1.0, 2 } }, 0.05).Statistic }),
        new("Limits.MethodDetectionLimit.Compute", "spiked results 1e300", () => { var r = MethodDetectionLimit.Compute(Seven.Select(v => Ug(v * 1e300)).ToArray(), Array.Empty<BlankResult>(), Ug(1e300)); return new[] { r.Mdl.Value }; }),
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
