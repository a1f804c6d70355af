using System;
using System.Collections.Generic;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Tests.Quantitation;

/// <summary>Invariances of internal-standard quantitation that follow from y = f(C_x/C_is) (SW-846 8000C §11.4.3
/// ratio form): the result depends on signal ratios and concentration ratios only.</summary>
public class SampleQuantitationPropertyTests
{
    private delegate RatioCalibration Fitter(IReadOnlyList<CalibrationStandard> standards, CalibrationOptions options);

    private static readonly (string Name, Fitter Fit)[] Models =
    {
        ("average RF", (s, o) => ResponseFactorCalibration.Fit(s, o)),
        ("line", (s, o) => RegressionCalibration.Fit(s, CalibrationModel.Linear, null, o)),
        ("line 1/x²", (s, o) => RegressionCalibration.Fit(s, CalibrationModel.Linear, Weighting.InverseXSquared, o)),
        ("line 1/y", (s, o) => RegressionCalibration.Fit(s, CalibrationModel.Linear, Weighting.InverseY, o)),
        ("through origin", (s, o) => RegressionCalibration.Fit(s, CalibrationModel.LinearThroughOrigin, null, o)),
        ("quadratic", (s, o) => RegressionCalibration.Fit(s, CalibrationModel.Quadratic, null, o)),
    };

    [Property(MaxTest = 100)]
    public Property Quantify_ScalingEveryIsConcentrationOnTheRatioAxis_LeavesTheResultUnchanged() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: true, noisy: true, intercept: true, curved: false), Factors(0.1, 0.5, 3.0, 1000.0), (d, k) =>
            AllModelsAgree(d, CalibrationAxis.ConcentrationRatio, (1, 1, 1), (k, 1, 1)));

    [Property(MaxTest = 100)]
    public Property Quantify_ScalingTheCommonIsConcentration_LeavesTheResultUnchanged() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: false, noisy: true, intercept: true, curved: false), Factors(0.1, 0.5, 3.0, 1000.0), (d, k) =>
            AllModelsAgree(d, CalibrationAxis.AnalyteConcentration, (1, 1, 1), (k, 1, 1)));

    [Property(MaxTest = 100)]
    public Property Quantify_ScalingAllSignals_LeavesTheResultUnchanged() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: false, noisy: true, intercept: true, curved: false), Factors(1e-3, 0.37, 8.0, 1e4), (d, c) =>
            AllModelsAgree(d, CalibrationAxis.AnalyteConcentration, (1, 1, 1), (1, c, c)));

    [Property(MaxTest = 100)]
    public Property Quantify_ScalingAllIsSignals_LeavesConcentrationsUnchanged() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: true, noisy: true, intercept: true, curved: false), Factors(0.01, 0.6, 2.5, 100.0), (d, c) =>
            AllModelsAgree(d, CalibrationAxis.ConcentrationRatio, (1, 1, 1), (1, 1, c)));

    [Property(MaxTest = 100)]
    public Property Quantify_NoiseFreeStraightLine_RecoversTheTrueConcentration() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: true, noisy: false, intercept: true, curved: false), d =>
            Recovers(d, RegressionCalibration.Fit(d.Standards(), CalibrationModel.Linear, null, RatioAxis))
            && Recovers(d, RegressionCalibration.Fit(d.Standards(), CalibrationModel.Linear, Weighting.InverseXSquared, RatioAxis)));

    [Property(MaxTest = 100)]
    public Property Quantify_NoiseFreeProportionalResponse_RecoversWithEveryProportionalModel() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: true, noisy: false, intercept: false, curved: false), d =>
            Recovers(d, ResponseFactorCalibration.Fit(d.Standards(), RatioAxis))
            && Recovers(d, RegressionCalibration.Fit(d.Standards(), CalibrationModel.LinearThroughOrigin, null, RatioAxis)));

    [Property(MaxTest = 100)]
    public Property Quantify_NoiseFreeCurvedResponse_RecoversWithTheQuadratic() =>
        Prop.ForAll(CalibrationDesign.Arbitrary(variableIs: true, noisy: false, intercept: true, curved: true), d =>
            Recovers(d, RegressionCalibration.Fit(d.Standards(), CalibrationModel.Quadratic, null, RatioAxis)));

    private static CalibrationOptions RatioAxis => new() { Axis = CalibrationAxis.ConcentrationRatio };

    private static Arbitrary<double> Factors(params double[] values) => Gen.Elements(values).ToArbitrary();

    private static bool Recovers(CalibrationDesign d, RatioCalibration cal)
    {
        QuantitationResult r = SampleQuantitation.Quantify(cal, d.Unknown());
        return Close(d.UnknownConc, r.Concentration.Value, 1e-8);
    }

    private static bool AllModelsAgree(CalibrationDesign d, CalibrationAxis axis, (double Is, double A, double IsSignal) first, (double Is, double A, double IsSignal) second)
    {
        var options = new CalibrationOptions { Axis = axis };
        foreach ((string _, Fitter fit) in Models)
        {
            QuantitationResult r1 = SampleQuantitation.Quantify(fit(d.Standards(first.Is, first.A, first.IsSignal), options), d.Unknown(first.Is, first.A, first.IsSignal));
            QuantitationResult r2 = SampleQuantitation.Quantify(fit(d.Standards(second.Is, second.A, second.IsSignal), options), d.Unknown(second.Is, second.A, second.IsSignal));
            if (!Close(r1.Concentration.Value, r2.Concentration.Value, 1e-9)
                || !Close(r1.StandardError!.Value.Value, r2.StandardError!.Value.Value, 1e-7)
                || r1.Extrapolation != r2.Extrapolation)
            {
                return false;
            }
        }

        return true;
    }

    private static bool Close(double expected, double actual, double relative) =>
        Math.Abs(expected - actual) <= relative * Math.Max(Math.Abs(expected), 1e-300) + 1e-14;
}
