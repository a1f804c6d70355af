using System;
using System.IO;
using System.Linq;
using System.Xml.Linq;
using InternalStdCal.IO;
using InternalStdCal.Run;
using InternalStdCal.Samples;
using InternalStdCal.Tests.IO;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Samples;

// Invented demo data (samples/data/river-water-run.csv): the check is that the README's demo runs end to end,
// writes its files and leaves no sample of the run file out of its output.
public class QuantifyDemoTests
{
    [Fact]
    public void Run_DemoRunFile_WritesJsonCsvReportAndPlotsAndPrintsEverySample()
    {
        string folder = Path.Combine(Path.GetTempPath(), "quantify-demo-test-" + Guid.NewGuid().ToString("N"));
        var output = new StringWriter();
        try
        {
            int exitCode = QuantifyDemo.Run(new[] { folder }, output);

            string text = output.ToString();
            Assert.True(exitCode == 0, text);
            Assert.True(File.Exists(Path.Combine(folder, "river-water-run-results.json")), text);
            Assert.True(File.Exists(Path.Combine(folder, "river-water-run-results.csv")), text);
            string html = File.ReadAllText(Path.Combine(folder, "run-report.html"));
            Assert.StartsWith("<!DOCTYPE html>\n", html, StringComparison.Ordinal);
            XDocument report = XDocument.Parse(html.Substring("<!DOCTYPE html>\n".Length)); // well-formed after the doctype
            Assert.Equal("River-water survey: run report", report.Descendants(XName.Get("h1", "http://www.w3.org/1999/xhtml")).Single().Value);
            Assert.Contains("Cd-111", XDocument.Load(Path.Combine(folder, "calibration-curve-Cd-111.svg")).Root!.Value, StringComparison.Ordinal);
            Assert.Contains("Rh-103", XDocument.Load(Path.Combine(folder, "is-recovery-Rh-103.svg")).Root!.Value, StringComparison.Ordinal);

            // The README's image is this plot; after a deliberate change of the plots regenerate it with
            // `dotnet run --project samples/QuantifyDemo` and copy quantify-output/calibration-curve-Cd-111.svg there.
            Assert.Equal(
                File.ReadAllText(Path.Combine(RepositoryPaths.Root, "docs", "images", "calibration-curve.svg")),
                File.ReadAllText(Path.Combine(folder, "calibration-curve-Cd-111.svg")));
            string[] sampleIds = RunCsv.ReadFile(RunCsvTests.DemoFile).Run!.Injections
                .Where(i => i.Role is not (InjectionRole.CalibrationStandard or InjectionRole.CalibrationBlank or InjectionRole.QualityControl))
                .Select(i => i.Id)
                .ToArray();
            Assert.Equal(8, sampleIds.Length); // MB-01, RW-01..05, RW-02D, RW-02S
            Assert.All(sampleIds, id => Assert.Contains(id, text, StringComparison.Ordinal));
            Assert.All(sampleIds, id => Assert.Contains(id, report.Root!.Value, StringComparison.Ordinal));
        }
        finally
        {
            if (Directory.Exists(folder))
            {
                Directory.Delete(folder, recursive: true);
            }
        }
    }

    [Fact]
    public void Run_MissingRunFile_ExitCodeOneAndMessage()
    {
        string folder = Path.Combine(Path.GetTempPath(), "quantify-demo-test-" + Guid.NewGuid().ToString("N"));
        var output = new StringWriter();

        int exitCode = QuantifyDemo.Run(new[] { folder, Path.Combine(folder, "no-such-run.csv") }, output);

        Assert.Equal(1, exitCode);
        Assert.Contains("Run file not found", output.ToString(), StringComparison.Ordinal);
        Assert.False(Directory.Exists(folder));
    }
}
