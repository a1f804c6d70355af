using System;
using System.Collections.Generic;
using System.Globalization;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Legends;
using OxyPlot.Series;

namespace InternalStdCal.Reporting;

/// <summary>
/// The look shared by every plot of the package: our own palette (blue for data, orange with a different marker
/// shape for anything outside its window, so that colour is never the only cue), white background, light grid,
/// legend below the plot area, invariant culture.
/// </summary>
internal static class PlotStyle
{
    internal static readonly OxyColor Ink = OxyColor.FromRgb(0x22, 0x26, 0x2B);
    internal static readonly OxyColor Data = OxyColor.FromRgb(0x1F, 0x5A, 0x96);
    internal static readonly OxyColor Flagged = OxyColor.FromRgb(0xD9, 0x6C, 0x06);
    internal static readonly OxyColor Model = OxyColor.FromRgb(0x22, 0x26, 0x2B);
    internal static readonly OxyColor Band = OxyColor.FromArgb(0x40, 0x1F, 0x5A, 0x96);
    internal static readonly OxyColor Window = OxyColor.FromRgb(0x4F, 0x8A, 0x5B);
    internal static readonly OxyColor WindowFill = OxyColor.FromArgb(0x24, 0x4F, 0x8A, 0x5B);
    internal static readonly OxyColor Trend = OxyColor.FromRgb(0x6A, 0x3D, 0x9A);
    internal static readonly OxyColor Excluded = OxyColor.FromRgb(0x8C, 0x8C, 0x8C);
    internal static readonly OxyColor Grid = OxyColor.FromRgb(0xE3, 0xE6, 0xEA);

    internal static PlotModel NewModel(string title)
    {
        var model = new PlotModel
        {
            Title = title,
            Culture = CultureInfo.InvariantCulture,
            DefaultFont = "Arial",
            DefaultFontSize = 12,
            TitleFontSize = 15,
            TitleFontWeight = FontWeights.Bold,
            TitleColor = Ink,
            TextColor = Ink,
            PlotAreaBorderColor = OxyColor.FromRgb(0x9A, 0xA0, 0xA6),
            Background = OxyColors.White,
            IsLegendVisible = true,
        };
        model.Legends.Add(new Legend
        {
            LegendPlacement = LegendPlacement.Outside,
            LegendPosition = LegendPosition.BottomCenter,
            LegendOrientation = LegendOrientation.Horizontal,
            LegendBorderThickness = 0,
            LegendFontSize = 11,
            LegendTextColor = Ink,
            LegendSymbolLength = 22,
        });
        return model;
    }

    internal static LinearAxis Axis(AxisPosition position, string title, string unit)
    {
        return new LinearAxis
        {
            Position = position,
            Title = title,
            Unit = unit,
            TitleFormatString = "{0} ({1})",
            StringFormat = "G4",
            MajorGridlineStyle = LineStyle.Solid,
            MajorGridlineColor = Grid,
            TicklineColor = Ink,
            AxislineColor = Ink,
            MaximumPadding = 0.06,
            MinimumPadding = 0.06,
            AxisTitleDistance = 6,
        };
    }

    internal static ScatterSeries Points(string title, OxyColor colour, MarkerType marker, double size = 4.5)
    {
        return new ScatterSeries
        {
            Title = title,
            MarkerType = marker,
            MarkerSize = size,
            MarkerFill = marker == MarkerType.Cross ? OxyColors.Undefined : colour,
            MarkerStroke = marker == MarkerType.Cross ? colour : OxyColors.White,
            MarkerStrokeThickness = marker == MarkerType.Cross ? 2 : 0.8,
        };
    }

    internal static ScatterSeries FlaggedPoints(string title) => Points(title, Flagged, MarkerType.Diamond, 6);

    internal static LineSeries Line(string title, OxyColor colour, LineStyle style, double thickness = 1.6)
    {
        return new LineSeries
        {
            Title = title,
            Color = colour,
            LineStyle = style,
            StrokeThickness = thickness,
            MarkerType = MarkerType.None,
        };
    }

    /// <summary>A horizontal reference line across the plot (not in the legend).</summary>
    internal static LineAnnotation HorizontalLine(double y, OxyColor colour, LineStyle style, string? text = null)
    {
        return new LineAnnotation
        {
            Type = LineAnnotationType.Horizontal,
            Y = y,
            Color = colour,
            LineStyle = style,
            StrokeThickness = 1.2,
            Text = text,
            TextColor = colour,
            FontSize = 10,
            TextHorizontalAlignment = HorizontalAlignment.Right,
            TextVerticalAlignment = VerticalAlignment.Bottom,
        };
    }

    /// <summary>An acceptance window lower..upper drawn as a shaded band with solid edges; the band enters the
    /// legend as an area series so the reader sees what the shading means.</summary>
    internal static void AddWindow(PlotModel model, double lower, double upper, string legendText)
    {
        model.Annotations.Add(new RectangleAnnotation
        {
            MinimumY = lower,
            MaximumY = upper,
            Fill = WindowFill,
            Layer = AnnotationLayer.BelowSeries,
        });
        model.Annotations.Add(HorizontalLine(lower, Window, LineStyle.Dash, Text(lower) + " %"));
        model.Annotations.Add(HorizontalLine(upper, Window, LineStyle.Dash, Text(upper) + " %"));
        model.Series.Add(new AreaSeries { Title = legendText, Fill = WindowFill, Color = Window, StrokeThickness = 1, LineStyle = LineStyle.Dash });
    }

    /// <summary>Sets the axis range so that the window edges and every value are visible, with a margin of 8 %
    /// of the span on both sides.</summary>
    internal static void ShowWindow(Axis axis, double lower, double upper, IEnumerable<double> values)
    {
        double min = lower;
        double max = upper;
        foreach (double v in values)
        {
            min = Math.Min(min, v);
            max = Math.Max(max, v);
        }

        double margin = 0.08 * (max - min);
        axis.Minimum = min - margin;
        axis.Maximum = max + margin;
    }

    internal static string Text(double value) => value.ToString("G4", CultureInfo.InvariantCulture);
}
