using OxyPlot;

namespace InternalStdCal.Reporting;

/// <summary>
/// Measures text for the SVG exporter with the PDF renderer's built-in Helvetica metrics (managed, the same on every
/// machine). The PDF renderer works in points (1/72 in) and SVG in CSS pixels (1/96 in), so its sizes are scaled by
/// 96/72; without that, labels are measured 25 % too narrow and overlap in the browser.
/// </summary>
internal sealed class SvgTextMeasurer : PdfRenderContext
{
    private const double PixelsPerPoint = 96.0 / 72.0;

    internal SvgTextMeasurer(double width, double height)
        : base(width, height, OxyColors.White)
    {
    }

    public override OxySize MeasureText(string text, string fontFamily, double fontSize, double fontWeight)
    {
        OxySize size = base.MeasureText(text, fontFamily, fontSize, fontWeight);
        return new OxySize(size.Width * PixelsPerPoint, size.Height * PixelsPerPoint);
    }
}
