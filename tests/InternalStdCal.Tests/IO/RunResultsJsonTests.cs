using System.IO;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.IO;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.IO;

// Invented demo run processed by RunProcessor; the check is the round trip itself (written values read back
// identical), not the chemistry.
public class RunResultsJsonTests
{
    internal static RunReport ProcessDemo()
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
