using System;
using System.IO;
using System.Text;
using InternalStdCal.Internal;
using OxyPlot;

namespace InternalStdCal.Reporting;

/// <summary>
/// Writes plot models as SVG with OxyPlot's managed <see cref="SvgExporter"/> (no native code, works on a
/// headless server). SVG only: OxyPlot.Core has no managed PNG exporter and this package adds no native rendering
/// library; convert the SVG with a tool of your choice when a bitmap is needed.
/// </summary>
/// <remarks>The output is deterministic: the same model and size give byte-identical SVG (UTF-8, invariant
/// culture, text measured with OxyPlot's built-in Helvetica metrics rather than installed fonts).</remarks>
public static class PlotExport
{
    /// <summary>Smallest allowed width or height in pixels.</summary>
    public const int MinimumSize = 100;

    /// <summary>Largest allowed width or height in pixels.</summary>
    public const int MaximumSize = 10000;

    /// <summary>The plot as a complete SVG document (XML declaration, one svg root element).</summary>
    /// <param name="model">The plot model, e.g. from <see cref="CalibrationPlots"/> or <see cref="RunPlots"/>.</param>
    /// <param name="width">Width in pixels, <see cref="MinimumSize"/> to <see cref="MaximumSize"/>; default 720.</param>
    /// <param name="height">Height in pixels, <see cref="MinimumSize"/> to <see cref="MaximumSize"/>; default 450.</param>
    /// <returns>The SVG text.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="model"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="width"/> or <paramref name="height"/> is outside
    /// 100–10000.</exception>
    public static string ToSvg(PlotModel model, int width = 720, int height = 450) => Export(model, width, height, isDocument: true);

    /// <summary>Writes the plot as an SVG file (UTF-8), replacing an existing file.</summary>
    /// <param name="model">The plot model.</param>
    /// <param name="path">Path of the file to write; its folder must exist.</param>
    /// <param name="width">Width in pixels, <see cref="MinimumSize"/> to <see cref="MaximumSize"/>; default 720.</param>
    /// <param name="height">Height in pixels, <see cref="MinimumSize"/> to <see cref="MaximumSize"/>; default 450.</param>
    /// <exception cref="ArgumentNullException"><paramref name="model"/> or <paramref name="path"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="path"/> is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="width"/> or <paramref name="height"/> is outside
    /// 100–10000.</exception>
    /// <exception cref="IOException">The file cannot be written.</exception>
    public static void SaveSvg(PlotModel model, string path, int width = 720, int height = 450)
    {
        Guard.NotBlank(path, nameof(path));
        string svg = ToSvg(model, width, height);
        File.WriteAllText(path, svg, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false));
    }

    /// <summary>The svg element alone, for inline use in HTML; <paramref name="idPrefix"/> keeps element ids
    /// (clip paths) unique when several plots share one page.</summary>
    internal static string ToInlineSvg(PlotModel model, int width, int height, string idPrefix) =>
        Export(model, width, height, isDocument: false).Replace("id=\"clip", "id=\"" + idPrefix + "clip").Replace("url(#clip", "url(#" + idPrefix + "clip");

    private static string Export(PlotModel model, int width, int height, bool isDocument)
    {
        Guard.NotNull(model, nameof(model));
        CheckSize(width, nameof(width));
        CheckSize(height, nameof(height));
        lock (model.SyncRoot)
        {
            return SvgExporter.ExportToString(model, width, height, isDocument, new SvgTextMeasurer(width, height));
        }
    }

    private static void CheckSize(int value, string paramName)
    {
        if (value < MinimumSize || value > MaximumSize)
        {
            throw new ArgumentOutOfRangeException(
                paramName,
                value,
                FormattableString.Invariant($"Parameter '{paramName}' was {value} pixels; it must be in the range {MinimumSize}–{MaximumSize}."));
        }
    }
}
