using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Internal;
using InternalStdCal.Run;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace InternalStdCal.Reporting;

/// <summary>
/// Plots of a processed run (<see cref="RunReport"/>) over injection order as OxyPlot models: internal-standard
/// (IS) recovery and quality-control (QC) recovery with their acceptance windows and drift trends. Export them
/// with <see cref="PlotExport"/>. Deterministic: the same report gives the same plot.
/// </summary>
public static class RunPlots
{
    /// <summary>
    /// IS recovery % (100·IS signal / reference IS signal) of every injection where it could be computed, against
    /// injection order, with the recovery window of the method (<see cref="RunMethod.RecoveryWindow"/>) as a
    /// shaded band; injections outside the window are drawn as orange diamonds. When the report has a drift trend
    /// of this IS's signal and a reference signal, the trend is drawn on the recovery scale (100·(a + b·order)/reference).
    /// </summary>
    /// <param name="report">The processed run.</param>
    /// <param name="internalStandard">Name of the IS as in the method, e.g. "Rh-103" (ordinal comparison).</param>
    /// <param name="title">Plot title; null for "Internal-standard recovery: {name}".</param>
    /// <returns>A new plot model.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="report"/> or <paramref name="internalStandard"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="internalStandard"/> is not an IS of the run's method (the
    /// message lists the names available).</exception>
    public static PlotModel InternalStandardRecovery(RunReport report, string internalStandard, string? title = null)
    {
        Guard.NotNull(report, nameof(report));
        Guard.NotNull(internalStandard, nameof(internalStandard));
        IReadOnlyList<string> available = InternalStandardNames(report);
        RequireKnown(internalStandard, available, nameof(internalStandard), "internal standard");

        InternalStandardRecoveryWindow window = report.Method.RecoveryWindow;
        PlotModel model = PlotStyle.NewModel(title ?? "Internal-standard recovery: " + internalStandard);
        model.Subtitle = window.Name + ": " + PlotStyle.Text(window.LowerPercent) + "–" + PlotStyle.Text(window.UpperPercent)
            + " % of the " + (window.Reference == RecoveryReference.CalibrationBlankMean ? "calibration-blank" : "calibration-standard") + " mean";
        model.Axes.Add(OrderAxis());
        LinearAxis yAxis = PlotStyle.Axis(AxisPosition.Left, "IS recovery", "%");
        model.Axes.Add(yAxis);
        PlotStyle.AddWindow(model, window.LowerPercent, window.UpperPercent, "recovery window");

        ScatterSeries inside = PlotStyle.Points("within window", PlotStyle.Data, MarkerType.Circle);
        ScatterSeries outside = PlotStyle.FlaggedPoints("outside window");
        foreach (InjectionOutcome o in report.Injections)
        {
            foreach (InternalStandardRecovery r in o.InternalStandardRecoveries)
            {
                if (r.InternalStandard == internalStandard && r.RecoveryPercent is double recovery)
                {
                    (r.WithinWindow == false ? outside : inside).Points.Add(new ScatterPoint(o.Injection.Order, recovery));
                }
            }
        }

        PlotStyle.ShowWindow(yAxis, window.LowerPercent, window.UpperPercent, inside.Points.Concat(outside.Points).Select(p => p.Y));
        if (report.InternalStandardReferences.TryGetValue(internalStandard, out double? reference) && reference is double refSignal && refSignal > 0)
        {
            DriftTrend? trend = report.Drift.FirstOrDefault(d => d.Kind == DriftSeriesKind.InternalStandardSignal && d.Name == internalStandard)?.Trend;
            if (trend is not null)
            {
                model.Series.Add(TrendLine(trend, 100 / refSignal));
            }
        }

        model.Series.Add(inside);
        if (outside.Points.Count > 0)
        {
            model.Series.Add(outside);
        }

        return model;
    }

    /// <summary>
    /// QC recovery % (100·found / nominal) of one analyte in every QC injection where it could be computed,
    /// against injection order, with each check's recovery window as a shaded band (the method's
    /// <see cref="RunMethod.QualityControlRecovery"/>), failing checks as orange diamonds, and the fitted drift
    /// trend line of the report's QC drift check for the analyte when it has one.
    /// </summary>
    /// <param name="report">The processed run.</param>
    /// <param name="analyte">Name of the analyte as in the method, e.g. "Cd-111" (ordinal comparison).</param>
    /// <param name="title">Plot title; null for "QC recovery and drift: {name}".</param>
    /// <returns>A new plot model.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="report"/> or <paramref name="analyte"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="analyte"/> is not an analyte of the run's method (the
    /// message lists the names available).</exception>
    public static PlotModel QualityControlDrift(RunReport report, string analyte, string? title = null)
    {
        Guard.NotNull(report, nameof(report));
        Guard.NotNull(analyte, nameof(analyte));
        RequireKnown(analyte, report.Method.Analytes.Select(a => a.Analyte).ToList(), nameof(analyte), "analyte");

        var checks = report.QualityControl.Where(c => c.Analyte == analyte).ToList();
        RecoveryWindow? window = checks.Select(c => c.Window).FirstOrDefault(w => w is not null) ?? report.Method.QualityControlRecovery;
        PlotModel model = PlotStyle.NewModel(title ?? "QC recovery and drift: " + analyte);
        model.Axes.Add(OrderAxis());
        LinearAxis yAxis = PlotStyle.Axis(AxisPosition.Left, "QC recovery", "%");
        model.Axes.Add(yAxis);
        if (window is not null)
        {
            PlotStyle.AddWindow(model, window.LowerPercent, window.UpperPercent, "QC window");
        }

        model.Annotations.Add(PlotStyle.HorizontalLine(100, PlotStyle.Excluded, LineStyle.Dot));
        DriftCheck? drift = report.Drift.FirstOrDefault(d => d.Kind == DriftSeriesKind.QualityControlRecovery && d.Name == analyte);
        if (drift?.Trend is DriftTrend trend)
        {
            model.Series.Add(TrendLine(trend, 1));
            model.Subtitle = "drift over the run " + PlotStyle.Text(trend.DriftOverRunPercent) + " % of the mean"
                + (trend.IsFlagged ? " (flagged)" : " (not flagged)");
        }
        else
        {
            model.Subtitle = drift?.Failure is string failure ? "no drift trend: " + failure : "no drift check";
        }

        ScatterSeries passed = PlotStyle.Points("QC within window", PlotStyle.Data, MarkerType.Circle);
        ScatterSeries failed = PlotStyle.FlaggedPoints("QC outside window");
        foreach (QualityControlCheck c in checks)
        {
            if (c.RecoveryPercent is double recovery)
            {
                (c.Passed == false ? failed : passed).Points.Add(new ScatterPoint(c.Injection.Order, recovery));
            }
        }

        if (window is not null)
        {
            PlotStyle.ShowWindow(yAxis, window.LowerPercent, window.UpperPercent, passed.Points.Concat(failed.Points).Select(p => p.Y));
        }

        model.Series.Add(passed);
        if (failed.Points.Count > 0)
        {
            model.Series.Add(failed);
        }

        return model;
    }

    /// <summary>Names of the internal standards of the method, in method order, without repeats.</summary>
    internal static IReadOnlyList<string> InternalStandardNames(RunReport report) =>
        report.Method.Analytes.Select(a => a.InternalStandard).Distinct(StringComparer.Ordinal).ToList();

    internal static void RequireKnown(string value, IReadOnlyList<string> available, string paramName, string what)
    {
        if (!available.Contains(value, StringComparer.Ordinal))
        {
            throw new ArgumentException(
                $"Parameter '{paramName}' was '{value}'; it must be the name of an {what} of the run's method: {string.Join(", ", available.Select(n => "'" + n + "'"))}.",
                paramName);
        }
    }

    private static LinearAxis OrderAxis()
    {
        LinearAxis axis = PlotStyle.Axis(AxisPosition.Bottom, "injection order", "#");
        axis.TitleFormatString = "{0}";
        axis.MajorStep = double.NaN;
        axis.MinorStep = 1;
        axis.StringFormat = "0";
        return axis;
    }

    private static LineSeries TrendLine(DriftTrend trend, double scale)
    {
        double first = trend.Positions.Min();
        double last = trend.Positions.Max();
        LineSeries line = PlotStyle.Line(
            "drift trend (" + (trend.IsFlagged ? "flagged" : "not flagged") + ")",
            PlotStyle.Trend,
            LineStyle.DashDot,
            2);
        line.Points.Add(new DataPoint(first, scale * (trend.Intercept + (trend.Slope * first))));
        line.Points.Add(new DataPoint(last, scale * (trend.Intercept + (trend.Slope * last))));
        return line;
    }
}
