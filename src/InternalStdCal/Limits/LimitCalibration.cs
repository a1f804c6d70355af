using System;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>Checks shared by the calibration-based limits and the conversion of a value on the calibration axis to a
/// concentration.</summary>
internal static class LimitCalibration
{
    /// <summary>Refuses anything but a straight line (with intercept unless <paramref name="allowThroughOrigin"/>),
    /// optionally also weighted fits and fits of level means.</summary>
    internal static RegressionFit StraightLine(RegressionCalibration calibration, string paramName, string method, bool allowThroughOrigin, bool requireOrdinaryLeastSquares)
    {
        Guard.NotNull(calibration, paramName);
        RegressionFit fit = calibration.Regression;
        bool straight = fit.Model == CalibrationModel.Linear || (allowThroughOrigin && fit.Model == CalibrationModel.LinearThroughOrigin);
        if (!straight)
        {
            string allowed = allowThroughOrigin ? "a straight line (Linear or LinearThroughOrigin)" : "a straight line with intercept (Linear)";
            throw new ArgumentException(
                $"Parameter '{paramName}' is a {fit.Model} calibration; {method} needs {allowed}, because the limit is read off one constant slope.",
                paramName);
        }

        if (requireOrdinaryLeastSquares)
        {
            if (fit.Weighting.Scheme != WeightingScheme.None)
            {
                throw new ArgumentException(
                    $"Parameter '{paramName}' is weighted ('{fit.Weighting.Name}'); {method} is defined for an unweighted (ordinary least-squares) line.",
                    paramName);
            }

            if (calibration.Replicates == ReplicateHandling.LevelMeans)
            {
                throw new ArgumentException(
                    $"Parameter '{paramName}' was fitted to level means; {method} needs every injection as a calibration point (ReplicateHandling.EveryInjection), so that s_y/x is the SD of a single measurement.",
                    paramName);
            }
        }

        if (!(fit.Slope > 0))
        {
            throw new ArgumentException(
                $"Parameter '{paramName}' has slope {Guard.Format(fit.Slope)}; {method} needs a positive slope.",
                paramName);
        }

        return fit;
    }

    /// <summary>The factor f with concentration = f·x for a value x on the calibration axis, in the calibration's unit.
    /// Concentration axis: f = C_is(sample)/C_is(calibration), 1 when no IS concentration is given. Ratio axis:
    /// f = C_is(sample), which must then be given.</summary>
    internal static double AxisFactor(RegressionCalibration calibration, Concentration? internalStandardConcentration, string paramName)
    {
        if (internalStandardConcentration is not Concentration isConc)
        {
            if (calibration.Axis == CalibrationAxis.ConcentrationRatio)
            {
                throw new ArgumentException(
                    $"Parameter '{paramName}' is required: the calibration's x axis is the concentration ratio analyte/IS, so a limit on that axis becomes a concentration only with the IS concentration of the samples.",
                    paramName);
            }

            return 1.0;
        }

        if (isConc.Kind != Concentration.KindOf(calibration.Unit))
        {
            throw new ArgumentException(
                $"Parameter '{paramName}' was {isConc} ({isConc.Kind}); it must be of the calibration's kind ({Concentration.KindOf(calibration.Unit)}).",
                paramName);
        }

        Guard.PositiveQuantity(isConc, paramName, "an IS concentration");
        return calibration.Set.ToConcentration(1.0, isConc.In(calibration.Unit));
    }

    /// <summary>Sample standard deviation (two-pass) of at least two finite values.</summary>
    internal static double StandardDeviation(double[] values) =>
        SampleStatistics.StandardDeviation(values);

    internal static double[] Finite(System.Collections.Generic.IReadOnlyList<double>? values, int minCount, string paramName)
    {
        Guard.NotNull(values, paramName);
        if (values!.Count < minCount)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{paramName}' has {values.Count} values; at least {minCount} are required."),
                paramName);
        }

        var copy = new double[values.Count];
        for (int i = 0; i < copy.Length; i++)
        {
            double v = values[i];
            if (double.IsNaN(v) || double.IsInfinity(v))
            {
                throw new ArgumentException(
                    FormattableString.Invariant($"Parameter '{paramName}' has {Guard.Format(v)} at index {i}; every value must be a finite number."),
                    paramName);
            }

            copy[i] = v;
        }

        return copy;
    }
}
