using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;
using MathNet.Numerics.Distributions;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace InternalStdCal.Reporting;

/// <summary>
/// Plots of a fitted <see cref="RatioCalibration"/> as OxyPlot models: the calibration curve with its confidence
/// band, the residuals, and the back-calculated relative errors of the standards. Export them with
/// <see cref="PlotExport"/>. Every model is built from the calibration's numbers only (no randomness, invariant
/// culture), so the same calibration gives the same plot.
/// </summary>
/// <remarks>
/// Axes: x is the calibration axis of the calibration (<see cref="RatioCalibration.Axis"/>): the analyte
/// concentration in <see cref="RatioCalibration.AxisUnitSymbol"/>, or the dimensionless concentration ratio
/// C/C_IS; y is the dimensionless signal ratio A/A_IS.
/// </remarks>
public static class CalibrationPlots
{
    private const int CurveSegments = 200;

    /// <summary>
    /// The calibration curve: every injection of every standard as a point (standards left out of the fit drawn
    /// grey), the fitted function as a line, and the two-sided confidence band of the fitted mean response.
    /// </summary>
    /// <remarks>
    /// Band of a regression: ŷ ± t·s·√(z(x)ᵀ(XᵀWX)⁻¹z(x)) (<see cref="RegressionFit.MeanResponseInterval"/>).
    /// Band of an average response factor: the fitted line scaled by mean RF ± t((1 + P)/2, n − 1)·s_RF/√n (the
    /// confidence interval of the mean RF, common practice); none for a single-point calibration. The curve is
    /// drawn from x = 0 (or the lowest fitted x if negative) to the highest fitted x.
    /// </remarks>
    /// <param name="calibration">The fitted calibration.</param>
    /// <param name="confidenceLevel">Confidence level P of the band, in (0, 1); default 0.95.</param>
    /// <param name="title">Plot title; null for "Calibration curve".</param>
    /// <returns>A new plot model.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="calibration"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="confidenceLevel"/> is not in (0, 1).</exception>
    public static PlotModel Curve(RatioCalibration calibration, double confidenceLevel = 0.95, string? title = null)
    {
        Guard.NotNull(calibration, nameof(calibration));
        Guard.InOpenRange(confidenceLevel, 0, 1, nameof(confidenceLevel));

        PlotModel model = PlotStyle.NewModel(title ?? "Calibration curve");
        model.Subtitle = ModelText(calibration);
        model.Axes.Add(XAxis(calibration));
        model.Axes.Add(PlotStyle.Axis(AxisPosition.Left, "signal ratio A/A_IS", "1"));

        double x0 = Math.Min(0, calibration.LowestX);
        double x1 = calibration.HighestX;
        string percent = PlotStyle.Text(100 * confidenceLevel);
        var band = new AreaSeries
        {
            Title = percent + " % confidence band of the mean",
            Fill = PlotStyle.Band,
            Color = OxyColors.Undefined,
            Color2 = OxyColors.Undefined,
            StrokeThickness = 0,
        };
        LineSeries line = PlotStyle.Line("fitted: " + ModelName(calibration.Model), PlotStyle.Model, LineStyle.Solid);
        for (int i = 0; i <= CurveSegments; i++)
        {
            double x = x0 + ((x1 - x0) * i / CurveSegments);
            (double yFit, double? lower, double? upper) = Evaluate(calibration, x, confidenceLevel);
            line.Points.Add(new DataPoint(x, yFit));
            if (lower is double lo && upper is double hi)
            {
                band.Points.Add(new DataPoint(x, lo));
                band.Points2.Add(new DataPoint(x, hi));
            }
        }

        if (band.Points.Count > 0)
        {
            model.Series.Add(band);
        }

        model.Series.Add(line);
        ScatterSeries fitted = PlotStyle.Points("standards (injections)", PlotStyle.Data, MarkerType.Circle);
        ScatterSeries excluded = PlotStyle.Points("not fitted", PlotStyle.Excluded, MarkerType.Cross);
        foreach (StandardResult s in calibration.Standards)
        {
            foreach (InjectionResult r in s.Injections)
            {
                (s.Included ? fitted : excluded).Points.Add(new ScatterPoint(s.X, r.Response));
            }
        }

        model.Series.Add(fitted);
        if (excluded.Points.Count > 0)
        {
            model.Series.Add(excluded);
        }

        return model;
    }

    /// <summary>
    /// The residuals of the fitted points against x. A weighted regression shows the weighted residuals
    /// √wᵢ·(yᵢ − ŷᵢ) (<see cref="RegressionFit.WeightedResiduals"/>, normalised weights), an unweighted one and a
    /// response-factor calibration the plain residuals yᵢ − ŷᵢ of the injections of the fitted standards; the
    /// y-axis title says which.
    /// </summary>
    /// <param name="calibration">The fitted calibration.</param>
    /// <param name="title">Plot title; null for "Residuals".</param>
    /// <returns>A new plot model.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="calibration"/> is null.</exception>
    public static PlotModel Residuals(RatioCalibration calibration, string? title = null)
    {
        Guard.NotNull(calibration, nameof(calibration));

        PlotModel model = PlotStyle.NewModel(title ?? "Residuals");
        model.Subtitle = ModelText(calibration);
        model.Axes.Add(XAxis(calibration));
        ScatterSeries points = PlotStyle.Points("fitted points", PlotStyle.Data, MarkerType.Circle);
        string yTitle;
        if (calibration is RegressionCalibration regression)
        {
            RegressionFit fit = regression.Regression;
            bool weighted = regression.Weighting.Scheme != WeightingScheme.None;
            IReadOnlyList<double> residuals = weighted ? fit.WeightedResiduals : fit.Residuals;
            yTitle = weighted ? "weighted residual √w·(y − ŷ), weights " + regression.Weighting.Name : "residual y − ŷ (unweighted)";
            for (int i = 0; i < fit.Count; i++)
            {
                points.Points.Add(new ScatterPoint(fit.X[i], residuals[i]));
            }
        }
        else
        {
            yTitle = "residual y − ŷ (unweighted)";
            foreach (StandardResult s in calibration.Standards.Where(s => s.Included))
            {
                foreach (InjectionResult r in s.Injections)
                {
                    points.Points.Add(new ScatterPoint(s.X, r.Residual));
                }
            }
        }

        model.Axes.Add(PlotStyle.Axis(AxisPosition.Left, yTitle, "1"));
        model.Annotations.Add(PlotStyle.HorizontalLine(0, PlotStyle.Model, LineStyle.Solid));
        model.Series.Add(points);
        return model;
    }

    /// <summary>
    /// Back-calculated relative error %RE = 100·(x' − x)/x of every fitted non-blank point, one column per
    /// standard level (in the order given), with the acceptance band ±limit of <paramref name="rules"/> drawn per
    /// level when given; points outside their band are drawn as orange diamonds.
    /// </summary>
    /// <remarks>
    /// With rules the points and their limits are those of <see cref="AcceptanceRuleSet.Evaluate"/> (per injection
    /// or per level mean, as fitted); without rules the per-injection (or level-mean) %RE of the standards.
    /// Points without a back-calculated value are left out and counted in the subtitle.
    /// </remarks>
    /// <param name="calibration">The fitted calibration.</param>
    /// <param name="rules">Acceptance rules whose %RE limits are drawn; null for none.</param>
    /// <param name="title">Plot title; null for "Back-calculated relative error".</param>
    /// <returns>A new plot model.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="calibration"/> is null.</exception>
    public static PlotModel RelativeErrors(RatioCalibration calibration, AcceptanceRuleSet? rules = null, string? title = null)
    {
        Guard.NotNull(calibration, nameof(calibration));

        var levels = calibration.Standards.Where(s => s.Included && !s.IsBlank).ToList();
        PlotModel model = PlotStyle.NewModel(title ?? "Back-calculated relative error");
        string unit = Concentration.SymbolOf(calibration.Unit);
        var axis = new CategoryAxis
        {
            Position = AxisPosition.Bottom,
            Title = "standard level (nominal concentration)",
            Unit = unit,
            TitleFormatString = "{0}, {1}",
            TicklineColor = PlotStyle.Ink,
            AxislineColor = PlotStyle.Ink,
            GapWidth = 0.4,
        };
        foreach (StandardResult s in levels)
        {
            axis.Labels.Add(s.Label + " (" + PlotStyle.Text(s.Standard.AnalyteConcentration.In(calibration.Unit)) + ")");
        }

        model.Axes.Add(axis);
        model.Axes.Add(PlotStyle.Axis(AxisPosition.Left, "relative error %RE", "%"));
        model.Annotations.Add(PlotStyle.HorizontalLine(0, PlotStyle.Model, LineStyle.Solid));

        ScatterSeries passed = PlotStyle.Points(rules is null ? "standards" : "within limit", PlotStyle.Data, MarkerType.Circle);
        ScatterSeries failed = PlotStyle.FlaggedPoints("outside limit");
        int missing = 0;
        if (rules is null)
        {
            for (int i = 0; i < levels.Count; i++)
            {
                StandardResult s = levels[i];
                IEnumerable<double?> values = calibration.Replicates == ReplicateHandling.LevelMeans
                    ? new[] { s.RelativeErrorPercent }
                    : s.Injections.Select(r => r.RelativeErrorPercent);
                foreach (double? re in values)
                {
                    if (re is double v)
                    {
                        passed.Points.Add(new ScatterPoint(i, v));
                    }
                    else
                    {
                        missing++;
                    }
                }
            }
        }
        else
        {
            AcceptanceVerdict verdict = rules.Evaluate(calibration);
            var limitBand = new LineSeries { Title = "±%RE limit (" + rules.Name + ")", Color = PlotStyle.Window, LineStyle = LineStyle.Dash, StrokeThickness = 1.4 };
            var drawnLimits = new HashSet<int>();
            foreach (CalibratorOutcome c in verdict.Calibrators)
            {
                int i = levels.FindIndex(s => s.Label == c.Level);
                if (i < 0)
                {
                    continue;
                }

                if (c.LimitPercent is double limit && drawnLimits.Add(i))
                {
                    // One short segment above and one below each level; a break (NaN point) separates them.
                    limitBand.Points.Add(new DataPoint(i - 0.35, limit));
                    limitBand.Points.Add(new DataPoint(i + 0.35, limit));
                    limitBand.Points.Add(DataPoint.Undefined);
                    limitBand.Points.Add(new DataPoint(i - 0.35, -limit));
                    limitBand.Points.Add(new DataPoint(i + 0.35, -limit));
                    limitBand.Points.Add(DataPoint.Undefined);
                }

                if (c.RelativeErrorPercent is double v)
                {
                    (c.Passed ? passed : failed).Points.Add(new ScatterPoint(i, v));
                }
                else
                {
                    missing++;
                }
            }

            if (limitBand.Points.Count > 0)
            {
                model.Series.Add(limitBand);
            }
        }

        model.Series.Add(passed);
        if (failed.Points.Count > 0)
        {
            model.Series.Add(failed);
        }

        model.Subtitle = ModelText(calibration) + (missing > 0 ? "; " + missing.ToString(System.Globalization.CultureInfo.InvariantCulture) + " point(s) without a back-calculated value not shown" : string.Empty);
        return model;
    }

    private static LinearAxis XAxis(RatioCalibration calibration) =>
        calibration.Axis == CalibrationAxis.AnalyteConcentration
            ? PlotStyle.Axis(AxisPosition.Bottom, "analyte concentration", calibration.AxisUnitSymbol)
            : PlotStyle.Axis(AxisPosition.Bottom, "concentration ratio C/C_IS", "1");

    private static (double Fitted, double? Lower, double? Upper) Evaluate(RatioCalibration calibration, double x, double confidenceLevel)
    {
        if (calibration is RegressionCalibration regression)
        {
            RegressionFit fit = regression.Regression;
            double y = fit.Predict(x);
            if (fit.DegreesOfFreedom < 1)
            {
                return (y, null, null);
            }

            ConfidenceInterval ci = fit.MeanResponseInterval(x, confidenceLevel);
            return (y, ci.Lower, ci.Upper);
        }

        var rf = (ResponseFactorCalibration)calibration;
        double slope = ResponseFactorSlope(rf);
        double mean = slope * x;
        if (rf.ResponseFactorStandardDeviation is not double sd || rf.ResponseFactorCount < 2)
        {
            return (mean, null, null);
        }

        int n = rf.ResponseFactorCount;
        double t = StudentT.InvCDF(0, 1, n - 1, (1 + confidenceLevel) / 2);
        double relativeHalfWidth = t * sd / Math.Sqrt(n) / Math.Abs(rf.MeanResponseFactor);
        return (mean, mean * (1 - relativeHalfWidth), mean * (1 + relativeHalfWidth));
    }

    // y = mean RF · x / C_IS on the concentration axis, y = mean RF · x on the ratio axis: the fitted line's slope
    // read back from a fitted standard so that both axes are covered without repeating the model's algebra.
    private static double ResponseFactorSlope(ResponseFactorCalibration rf)
    {
        foreach (StandardResult s in rf.Standards)
        {
            if (s.Included && !s.IsBlank && s.X != 0)
            {
                return s.FittedResponse / s.X;
            }
        }

        return 0;
    }

    private static string ModelText(RatioCalibration calibration)
    {
        string text = ModelName(calibration.Model);
        if (calibration is RegressionCalibration regression && regression.Weighting.Scheme != WeightingScheme.None)
        {
            text += ", weighting " + regression.Weighting.Name;
        }

        return text + ", " + calibration.PointCount.ToString(System.Globalization.CultureInfo.InvariantCulture)
            + (calibration.Replicates == ReplicateHandling.EveryInjection ? " injections" : " level means") + " fitted";
    }

    internal static string ModelName(RatioModel model) => model switch
    {
        RatioModel.SinglePointResponseFactor => "single-point response factor",
        RatioModel.AverageResponseFactor => "average response factor",
        RatioModel.Linear => "straight line",
        RatioModel.LinearThroughOrigin => "straight line through origin",
        _ => "quadratic",
    };
}
