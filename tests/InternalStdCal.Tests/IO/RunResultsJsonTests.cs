using System.IO;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.IO;
using InternalStdCal.Limits;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.IO;

// Invented demo run processed by RunProcessor; the check is the round trip itself (written values read back
// identical), not the chemistry.
public class RunResultsJsonTests
{
    internal static RunReport ProcessDemo(DriftRule? drift = null)
    {
        RunReadResult r = RunCsv.ReadFile(RunCsvTests.DemoFile);
        var method = new RunMethod(
            "demo",
            new[]
            {
                new AnalyteMethod("Cd-111", "Rh-103", RatioModel.Linear, limits: new InternalStdCal.Limits.ReportingLimits(InternalStdCal.Quantities.Concentration.FromMicrogramsPerLitre(0.05), InternalStdCal.Quantities.Concentration.FromMicrogramsPerLitre(0.15))),
                new AnalyteMethod("Cu-63", "Rh-103", RatioModel.Linear),
                new AnalyteMethod("Pb-208", "Bi-209", RatioModel.Linear),
            },
            r.InternalStandardConcentrations,
            InternalStandardRecoveryWindow.UsEpa200Point8)
        {
            QualityControlRecovery = new RecoveryWindow("QC", "common practice", 90, 110),
            DuplicateRpd = new RpdLimit("RPD", "common practice", 20),
            SpikeRecovery = new RecoveryWindow("spike", "common practice", 75, 125),
            Drift = drift,
        };
        return RunProcessor.Process(r.Run!, method);
    }

    [Fact]
    public void Write_ProcessedRun_ReadsBackEqual()
    {
        RunResults results = RunResults.From(ProcessDemo());
        var text = new StringWriter();

        RunResultsJson.Write(results, text);
        RunResults back = RunResultsJson.Read(new StringReader(text.ToString()));

        Assert.Equal(results, back);
        Assert.Equal(16, back.Injections.Count);
        Assert.Equal(8 * 3, back.Results.Count); // 8 sample-like ids (MB-01, RW-01..05, RW-02D, RW-02S) × 3 analytes
        Assert.Contains(back.Results, x => x.SampleId == "RW-03" && x.Analyte == "Cu-63" && x.Qualifiers.HasFlag(ResultQualifiers.MissingOrInvalidSignal));
        Assert.Contains(back.Injections, x => x.Id == "RW-04" && x.InternalStandardRecoveries.Any(i => i.WithinWindow == false));
        Assert.Contains("\"role\": \"spike\"", text.ToString(), System.StringComparison.Ordinal);
    }

    [Fact]
    public void Write_ReportingLimits_CensoredValuesReadBackEqual()
    {
        RunReport report = ProcessDemo();
        RunResults results = RunResults.From(report);
        var text = new StringWriter();

        RunResultsJson.Write(results, text);
        RunResults back = RunResultsJson.Read(new StringReader(text.ToString()));

        Assert.Equal(results, back);
        for (int i = 0; i < report.Results.Count; i++)
        {
            AnalyteResult r = report.Results[i];
            SampleAnalyteResult x = back.Results[i];
            Assert.Equal(r.Reported?.Status, x.ReportedStatus);
            Assert.Equal(r.Reported?.Limit, x.ReportingLimit);
            Assert.Equal(r.Reported?.ToString(), x.ReportedText);
        }

        // Cd-111 has limits (LOD 0.05, LOQ 0.15 µg/L): the method blank is censored against one of them.
        SampleAnalyteResult blank = back.Results.Single(x => x.SampleId == "MB-01" && x.Analyte == "Cd-111");
        Assert.NotEqual(ReportedStatus.Quantified, blank.ReportedStatus);
        Assert.NotNull(blank.ReportingLimit);
        Assert.StartsWith("< ", blank.ReportedText, System.StringComparison.Ordinal);
        Assert.Contains("\"reportedStatus\": \"" + blank.ReportedStatus, text.ToString(), System.StringComparison.Ordinal);
    }

    [Fact]
    public void Write_DriftRule_DriftChecksAndNotesReadBackEqual()
    {
        RunReport report = ProcessDemo(DriftRule.MagnitudeOrSignificance(10));
        RunResults results = RunResults.From(report);
        var text = new StringWriter();

        RunResultsJson.Write(results, text);
        RunResults back = RunResultsJson.Read(new StringReader(text.ToString()));

        Assert.Equal(results, back);
        Assert.NotEmpty(back.Drift);
        Assert.Equal(report.Drift.Count, back.Drift.Count);
        Assert.Equal(report.Notes, back.Notes);
        for (int i = 0; i < report.Drift.Count; i++)
        {
            DriftCheck c = report.Drift[i];
            DriftResult d = back.Drift[i];
            Assert.Equal(c.Kind, d.Kind);
            Assert.Equal(c.Name, d.Name);
            Assert.Equal(c.InjectionOrders, d.InjectionOrders);
            Assert.Equal(c.Failure, d.Failure);
            Assert.Equal(c.IsFlagged, d.Flagged);
            Assert.Equal(c.Trend?.Slope, d.Slope);
            Assert.Equal(c.Trend?.SlopeInterval.Lower, d.SlopeLower);
            Assert.Equal(c.Trend?.SlopeInterval.Upper, d.SlopeUpper);
            Assert.Equal(c.Trend?.DriftOverRunPercent, d.DriftOverRunPercent);
            Assert.Equal(c.Trend?.Rule.ToString(), d.Rule);
        }

        Assert.Contains(back.Drift, d => d.Kind == DriftSeriesKind.InternalStandardSignal && d.Name == "Rh-103" && d.Slope is not null);
        Assert.Contains("\"kind\": \"InternalStandardSignal\"", text.ToString(), System.StringComparison.Ordinal);
    }

    [Fact]
    public void Read_DocumentWithoutNewMembers_DefaultsToEmpty()
    {
        RunResults back = RunResultsJson.Read(new StringReader("{\"format\": \"" + RunResults.CurrentFormat + "\", \"results\": [{\"sampleId\": \"S\", \"role\": \"sample\", \"analyte\": \"A\"}]}"));

        Assert.Empty(back.Drift);
        Assert.Empty(back.Notes);
        Assert.Null(back.Results[0].ReportedStatus);
        Assert.Null(back.Results[0].ReportingLimit);
    }

    [Fact]
    public void Read_OtherFormatTag_Throws()
    {
        var ex = Assert.Throws<RunFileException>(() => RunResultsJson.Read(new StringReader("{\"format\": \"x\"}")));

        Assert.Equal("format", ex.Problems[0].Column);
    }

    [Fact]
    public void Read_BadJson_ThrowsWithLine()
    {
        var ex = Assert.Throws<RunFileException>(() => RunResultsJson.Read(new StringReader("{\n\"runName\": 12\n}")));

        Assert.Equal(2, ex.Problems[0].Line);
    }
}
