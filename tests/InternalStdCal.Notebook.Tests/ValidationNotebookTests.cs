using System;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Text.RegularExpressions;
using Xunit;

namespace InternalStdCal.Notebook.Tests;

/// <summary>
/// Runs samples/ValidationNotebook/validation-walkthrough.ipynb cell by cell in a C# kernel (the notebook's #r lines
/// pointed at the freshly built DLLs, see <see cref="NotebookRunner.UseBuiltReferences"/>) and checks that every cell
/// runs and that the key numbers it shows agree with an independent computation.
/// </summary>
public class ValidationNotebookTests : IClassFixture<NotebookFixture>
{
    // Nominal x of the six working standards in µg/L: 1002 mg/L × the dilution factors of the notebook's section 1
    // (1/100 · 1/100 · 5/100 · a/50 with a = 1, 2, 5, 10 mL from C; 1/100 · 1/100 · a/50 with a = 1, 2 mL from B), arithmetic.
    private static readonly double[] Levels = { 0.1002, 0.2004, 0.501, 1.002, 2.004, 4.008 };

    private readonly NotebookFixture _fixture;

    public ValidationNotebookTests(NotebookFixture fixture) => _fixture = fixture;

    [Fact]
    public void EveryCodeCell_RunsWithoutError()
    {
        string[] failures = _fixture.Run.Cells.Where(c => c.Error is not null).Select(c => $"cell {c.Index}: {c.Error}").ToArray();
        Assert.True(failures.Length == 0, "Notebook cells failed:\n" + string.Join("\n", failures));
        Assert.True(_fixture.Run.Cells.Count >= 10, $"only {_fixture.Run.Cells.Count} code cells ran");
    }

    [Fact]
    public void ReferenceCell_PointsAtReleaseBuildOfLibraryAndCentralPackageVersion()
    {
        var references = NotebookRunner.References(_fixture.Run.Document);
        string folder = Path.GetDirectoryName(NotebookFixture.NotebookPath)!;
        foreach (string project in new[] { "InternalStdCal", "InternalStdCal.Reporting" })
        {
            string library = references.Single(r => r.EndsWith("/" + project + ".dll", StringComparison.Ordinal));
            Assert.Equal(
                Path.Combine(NotebookFixture.RepositoryRoot, "src", project, "bin", "Release", "net8.0", project + ".dll"),
                Path.GetFullPath(Path.Combine(folder, library)));
        }

        // The NuGet references must name the versions the libraries are built with (Directory.Packages.props).
        string props = File.ReadAllText(Path.Combine(NotebookFixture.RepositoryRoot, "Directory.Packages.props"));
        foreach (string package in new[] { "MathNet.Numerics", "OxyPlot.Core" })
        {
            string version = Regex.Match(props, $@"Include=""{Regex.Escape(package)}"" Version=""(?<v>[^""]+)""").Groups["v"].Value;
            Assert.Contains($"nuget: {package}, {version}", references);
        }
    }

    [Fact]
    public void PlotCells_ShowSvgImages()
    {
        // Curve + residuals, then the %RE plots of the weighted and the unweighted line.
        foreach ((string code, int plots) in new[] { ("CalibrationPlots.Curve(", 2), ("CalibrationPlots.RelativeErrors(", 2) })
        {
            CellRun cell = Cell(code);
            string[] svgs = cell.Outputs.OfType<Microsoft.DotNet.Interactive.Documents.DisplayElement>()
                .Where(d => d.Data.ContainsKey("image/svg+xml"))
                .Select(d => d.Data["image/svg+xml"].ToString()!)
                .ToArray();
            Assert.Equal(plots, svgs.Length);
            Assert.All(svgs, svg => Assert.Contains("<svg", svg, StringComparison.Ordinal));
        }
    }

    [Fact]
    public void WeightingAndAcceptance_ChooseOneOverXSquaredAndRejectTheUnweightedLine()
    {
        Assert.Contains("choice: 1/x²", CellOutput("WeightingComparison.Compare"), StringComparison.Ordinal);
        string acceptance = CellOutput("rules.Evaluate(unweighted)");
        Assert.Contains("Teaching SOP, calibration: ACCEPTED", acceptance, StringComparison.Ordinal);
        Assert.Contains("Teaching SOP, calibration: REJECTED", acceptance, StringComparison.Ordinal);
    }

    [Fact]
    public void DetectionLimit_AgreesWithIchFormulaComputedHere()
    {
        // ICH Q2(R2): LOD = 3.3·σ/S, LOQ = 10·σ/S; σ = sample SD of the ten blank ratios, S = slope of the 1/x² line,
        // both computed here with plain sums from the notebook's own data.
        double[] blanks = _fixture.Run.Value<double[]>("blankRatios");
        double mean = blanks.Average();
        double sigma = Math.Sqrt(blanks.Sum(b => (b - mean) * (b - mean)) / (blanks.Length - 1));
        (_, double slope) = InverseXSquaredLine();

        string text = CellOutput("IchLimits.Compute(ResponseSigma.FromBlankResponses");
        Match m = Regex.Match(text, @"LOD = (?<lod>[0-9.Ee+-]+) µg/L, LOQ = (?<loq>[0-9.Ee+-]+) µg/L\s+\(LOD = 3\.3·σ/S, LOQ = 10·σ/S; σ = [^(]+\(SD of 10 blank");
        Assert.True(m.Success, "no LOD from the blanks in:\n" + text);
        AssertRelative(3.3 * sigma / slope, Parse(m.Groups["lod"].Value), 1e-5);
        AssertRelative(10 * sigma / slope, Parse(m.Groups["loq"].Value), 1e-5);
    }

    [Fact]
    public void InversePrediction_OfRf19_AgreesWithLineComputedHere()
    {
        // x0 = (ȳ0 − a)/b with the 1/x² line computed here and the mean ratio of RF-19's two injections (counts from the notebook).
        (double a, double b) = InverseXSquaredLine();
        double y0 = ((6_284.0 / 624_251) + (6_142.0 / 597_736)) / 2;
        Match m = Regex.Match(CellOutput("SampleQuantitation.QuantifyAll"), @"RF-19: (?<x>[0-9.]+) µg/L, s = ");
        Assert.True(m.Success);
        AssertRelative((y0 - a) / b, Parse(m.Groups["x"].Value), 1e-5);
    }

    [Fact]
    public void Decision_NearTheLimit_DependsOnTheStatedRule()
    {
        // ILAC G8: a result within ±U of the limit is neither accepted nor rejected under a guard band w = U
        // (inconclusive); simple acceptance compares the value alone (0.2024 > 0.20 mg/kg: non-compliant).
        string text = CellOutput("DecisionRule.ExpandedUncertaintyGuardBand");
        Assert.Contains("Non-compliant: result 0.202449 mg/kg", text, StringComparison.Ordinal);
        Assert.Contains("Inconclusive (zone: conditional fail)", text, StringComparison.Ordinal);
    }

    [SkippableFact]
    public void WriteOutputs_WhenAsked()
    {
        Skip.IfNot(
            Environment.GetEnvironmentVariable("NOTEBOOK_WRITE_OUTPUTS") == "1",
            "Set NOTEBOOK_WRITE_OUTPUTS=1 to write this run's outputs into the notebook file.");
        Assert.DoesNotContain(_fixture.Run.Cells, c => c.Error is not null);
        File.WriteAllText(NotebookFixture.NotebookPath, _fixture.Run.ToJupyterJson(File.ReadAllText(NotebookFixture.NotebookPath)));
    }

    private static double Parse(string value) => double.Parse(value, NumberStyles.Float, CultureInfo.InvariantCulture);

    private static void AssertRelative(double expected, double actual, double tolerance) =>
        Assert.True(Math.Abs(actual - expected) <= tolerance * Math.Abs(expected), $"expected {expected:R}, notebook shows {actual:R}");

    private string CellOutput(string codeFragment) => Cell(codeFragment).Text;

    private CellRun Cell(string codeFragment) =>
        _fixture.Run.Cells.Single(c => _fixture.Run.Document.Elements[c.Index].Contents.Contains(codeFragment, StringComparison.Ordinal));

    // Weighted least squares y = a + b·x with w = 1/x², closed form (weighted means and centred sums).
    private (double A, double B) InverseXSquaredLine()
    {
        double[][] counts = _fixture.Run.Value<double[][]>("counts");
        var points = counts.SelectMany((c, i) => new[] { (X: Levels[i], Y: c[0] / c[1]), (X: Levels[i], Y: c[2] / c[3]) }).ToArray();
        double sw = points.Sum(p => 1 / (p.X * p.X));
        double xm = points.Sum(p => p.X / (p.X * p.X)) / sw;
        double ym = points.Sum(p => p.Y / (p.X * p.X)) / sw;
        double b = points.Sum(p => (p.X - xm) * (p.Y - ym) / (p.X * p.X)) / points.Sum(p => (p.X - xm) * (p.X - xm) / (p.X * p.X));
        return (ym - (b * xm), b);
    }
}
