using System;
using System.Collections.Generic;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.Quantitation;
using InternalStdCal.Tests.TestSupport;

namespace InternalStdCal.Tests.Hardening.Properties;

// Calibration → Quantitation for every model and weighting (random invented designs, CalibrationDesign): noise-free
// data are recovered; only ratios of weights matter (weighted least squares, ISO 8466-1 / common practice); a
// change of the response unit y' = a·y + b leaves concentrations and their standard errors unchanged where the model
// and weighting allow it (intercept models with x-based weights for b ≠ 0; every model for b = 0). Permutation of
// the standards and scaling the IS signals are covered by RatioCalibrationPropertyTests and
// SampleQuantitationPropertyTests and not repeated here.
public class CalibrationInvariancePropertyTests
{
    private static readonly CalibrationOptions Ratio = new() { Axis = CalibrationAxis.ConcentrationRatio };

    private static Arbitrary<double> Factors(params double[] values) => Gen.Elements(values).ToArbitrary();

    [Property(MaxTest = 60)]
    public Property Quantify_NoiseFreeData_RecoveredByEveryModelAndWeighting() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: true, noisy: false, intercept: true, curved: false), CalibrationDesign.Arbitrary(variableIs: true, noisy: false, intercept: false, curved: false), CalibrationDesign.Arbitrary(variableIs: true, noisy: false, intercept: true, curved: true), (line, proportional, curved) =>
        {
            foreach (Weighting w in Weightings(line))
            {
                Recovers(line, RegressionCalibration.Fit(line.Standards(), CalibrationModel.Linear, w, Ratio), w.Name + " line");
            }

            foreach (Weighting w in Weightings(proportional))
            {
                Recovers(proportional, RegressionCalibration.Fit(proportional.Standards(), CalibrationModel.LinearThroughOrigin, w, Ratio), w.Name + " through origin");
            }

            foreach (Weighting w in Weightings(curved))
            {
                Recovers(curved, RegressionCalibration.Fit(curved.Standards(), CalibrationModel.Quadratic, w, Ratio), w.Name + " quadratic");
            }

            Recovers(proportional, ResponseFactorCalibration.Fit(proportional.Standards(), Ratio), "average RF");
            foreach (CalibrationStandard single in proportional.Standards())
            {
                Recovers(proportional, ResponseFactorCalibration.FitSinglePoint(single, Ratio), "single-point RF at " + single.Label);
            }
        });

    [Property(MaxTest = 80)]
    public Property Quantify_AllWeightsScaledByAPositiveConstant_SameResult() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: true, noisy: true, intercept: true, curved: true), Factors(1e-6, 0.3, 7.0, 1e6), (d, c) =>
        {
            double[] w = CustomWeights(d);
            foreach (CalibrationModel model in new[] { CalibrationModel.Linear, CalibrationModel.LinearThroughOrigin, CalibrationModel.Quadratic })
            {
                QuantitationResult a = SampleQuantitation.Quantify(RegressionCalibration.Fit(d.Standards(), model, Weighting.Custom(w), Ratio), d.Unknown());
                QuantitationResult b = SampleQuantitation.Quantify(RegressionCalibration.Fit(d.Standards(), model, Weighting.Custom(w.Select(x => x * c).ToArray()), Ratio), d.Unknown());
                Same(a, b, 1e-10, model + " with weights × " + c);
            }
        });

    [Property(MaxTest = 80)]
    public Property Quantify_ResponseUnitScaled_SameResultForEveryModelAndWeighting() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: true, noisy: true, intercept: true, curved: true), Factors(1e-3, 0.37, 8.0, 1e4), (d, a) =>
        {
            IReadOnlyList<CalibrationStandard> scaled = Transform(d.Standards(), a, 0);
            UnknownSample unknown = Transform(d.Unknown(), a, 0);
            foreach (Weighting w in Weightings(d))
            {
                foreach (CalibrationModel model in new[] { CalibrationModel.Linear, CalibrationModel.LinearThroughOrigin, CalibrationModel.Quadratic })
                {
                    Same(SampleQuantitation.Quantify(RegressionCalibration.Fit(d.Standards(), model, w, Ratio), d.Unknown()), SampleQuantitation.Quantify(RegressionCalibration.Fit(scaled, model, w, Ratio), unknown), 1e-9, model + " " + w.Name + " y × " + a);
                }
            }

            Same(SampleQuantitation.Quantify(ResponseFactorCalibration.Fit(d.Standards(), Ratio), d.Unknown()), SampleQuantitation.Quantify(ResponseFactorCalibration.Fit(scaled, Ratio), unknown), 1e-9, "average RF y × " + a);
        });

    [Property(MaxTest = 80)]
    public Property Quantify_ResponseUnitShiftedAndScaled_SameResultForInterceptModelsWithXWeights() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: true, noisy: true, intercept: true, curved: true), Factors(0.01, 0.5, 3.0, 200.0), Factors(0.001, 0.25, 2.0, 40.0), (d, a, b) =>
        {
            IReadOnlyList<CalibrationStandard> moved = Transform(d.Standards(), a, b);
            UnknownSample unknown = Transform(d.Unknown(), a, b);
            foreach (Weighting w in new[] { Weighting.None, Weighting.InverseX, Weighting.InverseXSquared, Weighting.Custom(CustomWeights(d)) })
            {
                foreach (CalibrationModel model in new[] { CalibrationModel.Linear, CalibrationModel.Quadratic })
                {
                    Same(SampleQuantitation.Quantify(RegressionCalibration.Fit(d.Standards(), model, w, Ratio), d.Unknown()), SampleQuantitation.Quantify(RegressionCalibration.Fit(moved, model, w, Ratio), unknown), 1e-8, model + " " + w.Name + " y × " + a + " + " + b);
                }
            }
        });

    private static Weighting[] Weightings(CalibrationDesign d) =>
        new[] { Weighting.None, Weighting.InverseX, Weighting.InverseXSquared, Weighting.InverseY, Weighting.InverseYSquared, Weighting.Custom(CustomWeights(d)) };

    /// <summary>Invented positive weights, one per injection (every injection is a calibration point).</summary>
    private static double[] CustomWeights(CalibrationDesign d) =>
        Enumerable.Range(0, d.Conc.Length * d.Reps).Select(k => 1 + (k * 7 % 5) + (d.Conc[k / d.Reps] / 100)).ToArray();

    private static void Recovers(CalibrationDesign d, RatioCalibration cal, string what)
    {
        QuantitationResult r = SampleQuantitation.Quantify(cal, d.Unknown());
        Xunit.Assert.True(Math.Abs(r.Concentration.Value - d.UnknownConc) <= 1e-8 * d.UnknownConc, what + ": " + r.Concentration.Value + " for " + d.UnknownConc + " (" + d + ")");
    }

    private static void Same(QuantitationResult expected, QuantitationResult actual, double relative, string what)
    {
        Xunit.Assert.Equal(expected.Concentration.Unit, actual.Concentration.Unit);
        Numeric.AssertRelative(expected.Concentration.Value, actual.Concentration.Value, relative);
        if (expected.StandardError is Concentration se)
        {
            // The standard error is a difference-based statistic; it keeps about half the digits of the estimate.
            Xunit.Assert.True(actual.StandardError is Concentration, what + ": standard error lost");
            Numeric.AssertRelative(se.Value, actual.StandardError!.Value.Value, Math.Sqrt(relative));
        }
    }

    private static CalibrationStandard[] Transform(IReadOnlyList<CalibrationStandard> standards, double a, double b) =>
        standards.Select(s => new CalibrationStandard(s.Label, s.AnalyteConcentration, s.InternalStandardConcentration, s.Injections.Select(i => Transform(i, a, b)))).ToArray();

    private static UnknownSample Transform(UnknownSample u, double a, double b) =>
        new(u.Label, u.InternalStandardConcentration, u.Injections.Select(i => Transform(i, a, b)));

    private static Injection Transform(Injection i, double a, double b) =>
        new(((a * i.Ratio) + b) * i.InternalStandardSignal, i.InternalStandardSignal);
}
