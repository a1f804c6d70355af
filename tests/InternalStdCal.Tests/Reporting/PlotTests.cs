using System;
using System.IO;
using System.Linq;
using System.Xml.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Reporting;
using InternalStdCal.Run;
using OxyPlot;
using Xunit;

namespace InternalStdCal.Tests.Reporting;

// Plots of the invented demo run: the checks are structural (SVG is XML, axis titles name quantity and unit,
// the same input gives the same bytes) and the argument checks of the public surface.
public class PlotTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static RatioCalibration Calibration(string analyte) =>
        DemoRun.Report.Calibrations.Single(c => c.Analyte == analyte).Calibration!;

    private static string[] Texts(string svg) =>
        XDocument.Parse(svg).Descendants(Svg + "text").Select(t => t.Value).ToArray();

    [Fact]
    public void Curve_DemoCalibration_SvgParsesWithAxisTitlesAndLegend()
    {
        string svg = PlotExport.ToSvg(CalibrationPlots.Curve(Calibration("Cd-111")));

        string[] texts = Texts(svg);
        Assert.Contains("analyte concentration (µg/L)", texts);
        Assert.Contains("signal ratio A/A_IS (1)", texts);
        Assert.Contains("95 % confidence band of the mean", texts);
        Assert.Contains("standards (injections)", texts);
    }

    [Fact]
    public void Curve_ResponseFactorCalibration_HasBandAndLine()
    {
        string[] texts = Texts(PlotExport.ToSvg(CalibrationPlots.Curve(Calibration("Pb-208"), 0.99)));

        Assert.Contains("99 % confidence band of the mean", texts);
        Assert.Contains("fitted: average response factor", texts);
    }

    [Fact]
    public void Residuals_WeightedFit_AxisSaysWeighted()
    {
        string[] weighted = Texts(PlotExport.ToSvg(CalibrationPlots.Residuals(Calibration("Cu-63"))));
        string[] plain = Texts(PlotExport.ToSvg(CalibrationPlots.Residuals(Calibration("Cd-111"))));

        Assert.Contains(weighted, t => t.StartsWith("weighted residual √w·(y − ŷ), weights 1/x", StringComparison.Ordinal));
        Assert.Contains("residual y − ŷ (unweighted) (1)", plain);
    }

    [Fact]
    public void RelativeErrors_WithRules_ShowsLimitAndLevels()
    {
        string[] texts = Texts(PlotExport.ToSvg(CalibrationPlots.RelativeErrors(Calibration("Cd-111"), DemoRun.Rules)));

        Assert.Contains("relative error %RE (%)", texts);
        Assert.Contains("±%RE limit (Demo SOP calibration)", texts);
        Assert.Contains("CAL-1 (0.5)", texts); // nominal 0.5 µg/L in the run file
    }

    [Fact]
    public void InternalStandardRecovery_DemoRun_WindowAndFailingPoints()
    {
        // RW-04 (order 14) has about 53 % Rh-103 recovery in the invented file, below the 60 % of US EPA 200.8.
        string[] texts = Texts(PlotExport.ToSvg(RunPlots.InternalStandardRecovery(DemoRun.Report, "Rh-103")));

        Assert.Contains("IS recovery (%)", texts);
        Assert.Contains("injection order", texts);
        Assert.Contains("recovery window", texts);
        Assert.Contains("outside window", texts);
    }

    [Fact]
    public void QualityControlDrift_DemoRun_WindowAndTrend()
    {
        string[] texts = Texts(PlotExport.ToSvg(RunPlots.QualityControlDrift(DemoRun.Report, "Cd-111")));

        Assert.Contains("QC recovery (%)", texts);
        Assert.Contains("QC window", texts);
        Assert.Contains(texts, t => t.StartsWith("drift trend", StringComparison.Ordinal));
    }

    [Fact]
    public void ToSvg_SameInputTwice_ByteIdentical()
    {
        string a = PlotExport.ToSvg(CalibrationPlots.Curve(Calibration("Cd-111")));
        string b = PlotExport.ToSvg(CalibrationPlots.Curve(Calibration("Cd-111")));

        Assert.Equal(a, b);
    }

    [Fact]
    public void SaveSvg_WritesSameTextAsToSvg()
    {
        PlotModel model = RunPlots.QualityControlDrift(DemoRun.Report, "Pb-208");
        string path = Path.Combine(Path.GetTempPath(), "plot-test-" + Guid.NewGuid().ToString("N") + ".svg");
        try
        {
            PlotExport.SaveSvg(model, path);

            Assert.Equal(PlotExport.ToSvg(model), File.ReadAllText(path));
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Plots_NullArguments_ArgumentNullException()
    {
        Assert.Equal("calibration", Assert.Throws<ArgumentNullException>(() => CalibrationPlots.Curve(null!)).ParamName);
        Assert.Equal("calibration", Assert.Throws<ArgumentNullException>(() => CalibrationPlots.Residuals(null!)).ParamName);
        Assert.Equal("calibration", Assert.Throws<ArgumentNullException>(() => CalibrationPlots.RelativeErrors(null!)).ParamName);
        Assert.Equal("report", Assert.Throws<ArgumentNullException>(() => RunPlots.InternalStandardRecovery(null!, "Rh-103")).ParamName);
        Assert.Equal("analyte", Assert.Throws<ArgumentNullException>(() => RunPlots.QualityControlDrift(DemoRun.Report, null!)).ParamName);
        Assert.Equal("model", Assert.Throws<ArgumentNullException>(() => PlotExport.ToSvg(null!)).ParamName);
        Assert.Equal("path", Assert.Throws<ArgumentNullException>(() => PlotExport.SaveSvg(new PlotModel(), null!)).ParamName);
    }

    [Fact]
    public void InternalStandardRecovery_UnknownName_MessageListsAvailable()
    {
        var e = Assert.Throws<ArgumentException>(() => RunPlots.InternalStandardRecovery(DemoRun.Report, "Ge-72"));

        Assert.Equal("internalStandard", e.ParamName);
        Assert.Contains("'Ge-72'", e.Message, StringComparison.Ordinal);
        Assert.Contains("'Rh-103', 'Bi-209'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void QualityControlDrift_UnknownAnalyte_MessageListsAvailable()
    {
        var e = Assert.Throws<ArgumentException>(() => RunPlots.QualityControlDrift(DemoRun.Report, "Zn-66"));

        Assert.Equal("analyte", e.ParamName);
        Assert.Contains("'Zn-66'", e.Message, StringComparison.Ordinal);
        Assert.Contains("'Cd-111', 'Cu-63', 'Pb-208'", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(99, 450)]
    [InlineData(720, 10001)]
    public void ToSvg_SizeOutOfRange_MessageNamesValueAndRange(int width, int height)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => PlotExport.ToSvg(new PlotModel(), width, height));

        Assert.Contains("100–10000", e.Message, StringComparison.Ordinal);
        Assert.Contains(width == 99 ? "was 99 pixels" : "was 10001 pixels", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Curve_ConfidenceLevelOutOfRange_Throws()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => CalibrationPlots.Curve(Calibration("Cd-111"), 1));

        Assert.Equal("confidenceLevel", e.ParamName);
    }
}
