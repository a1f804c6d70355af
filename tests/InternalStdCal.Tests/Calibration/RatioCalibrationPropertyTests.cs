using System;
using System.Collections.Generic;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;
using InternalStdCal.Tests.Quantitation;

namespace InternalStdCal.Tests.Calibration;

public class RatioCalibrationPropertyTests
{
    [Property(MaxTest = 100)]
    public Property Fit_PermutingTheStandards_LeavesEveryResultUnchanged() =>
        Prop.ForAll(
            CalibrationDesign.Arbitrary(variableIs: true, noisy: true, intercept: true, curved: false),
            Gen.Shuffle(Enumerable.Range(0, 8).ToArray()).ToArbitrary(),
            (d, order) =>
            {
                IReadOnlyList<CalibrationStandard> standards = d.Standards();
                List<CalibrationStandard> permuted = order.Where(i => i < standards.Count).Select(i => standards[i]).ToList();
                var options = new CalibrationOptions { Axis = CalibrationAxis.ConcentrationRatio };
                return Same(ResponseFactorCalibration.Fit(standards, options), ResponseFactorCalibration.Fit(permuted, options))
                    && Same(RegressionCalibration.Fit(standards, CalibrationModel.Linear, Weighting.InverseX, options), RegressionCalibration.Fit(permuted, CalibrationModel.Linear, Weighting.InverseX, options))
                    && Same(RegressionCalibration.Fit(standards, CalibrationModel.Quadratic, null, options), RegressionCalibration.Fit(permuted, CalibrationModel.Quadratic, null, options));
            });

    // Per-label back-calculated values, errors and residuals, the RSE and (for regressions) the coefficients agree.
    private static bool Same(RatioCalibration a, RatioCalibration b)
    {
        foreach (StandardResult sa in a.Standards)
        {
            StandardResult sb = b.Standards.Single(s => s.Label == sa.Label);
            if (!Close(sa.BackCalculated!.Value.Value, sb.BackCalculated!.Value.Value) || !Close(sa.RelativeErrorPercent!.Value, sb.RelativeErrorPercent!.Value, 1e-7)
                || !Close(sa.FittedResponse, sb.FittedResponse))
            {
                return false;
            }
        }

        if (!Close(a.RelativeStandardErrorPercent!.Value, b.RelativeStandardErrorPercent!.Value))
        {
            return false;
        }

        return a is not RegressionCalibration ra
            || ra.Coefficients.Zip(((RegressionCalibration)b).Coefficients, (x, y) => Close(x.Value, y.Value, 1e-8) && Close(x.StandardError, y.StandardError, 1e-8)).All(ok => ok);
    }

    private static bool Close(double x, double y, double relative = 1e-9) =>
        Math.Abs(x - y) <= (relative * Math.Max(Math.Abs(x), Math.Abs(y))) + 1e-12;
}
