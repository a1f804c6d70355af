using System;
using System.IO;
using System.Linq;
using InternalStdCal.IO;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.IO;

// Invented data only; checks against the text of each snippet (common practice: a reader returns what the file says).
public class RunJsonTests
{
    private const string Good = """
        {
          "name": "J-1",
          "analytes": ["Cd"],
          "internalStandards": [{ "name": "Rh", "concentration": "10 µg/L" }],
          "injections": [
            { "order": 1, "role": "cal", "id": "C1", "signals": { "Cd": 100 }, "isSignals": { "Rh": 1000 }, "nominal": { "Cd": "1 µg/L" } },
            { "order": 2, "role": "sample", "id": "S1", "signals": { "Cd": "x" }, "isSignals": { "Rh": 1000 } },
            { "order": 3, "role": "sample", "id": "S2", "signals": { "Cd": null }, "isSignals": { "Rh": 990 },
              "preparation": { "dilutions": ["1 mL into 10 mL"] } }
          ]
        }
        """;

    [Fact]
    public void Read_BadSignal_ProblemNamesPathAndOtherInjectionsKept()
    {
        RunReadResult r = RunJson.Read(new StringReader(Good));

        RunFileProblem p = Assert.Single(r.Problems);
        Assert.Equal("injections[1].signals.Cd", p.Column);
        Assert.Equal("\"x\"", p.Value);
        Assert.Equal(new[] { 1, 3 }, r.Run!.Injections.Select(i => i.Order));
        Assert.Null(r.Run.Injections[1].Signals.Analyte("Cd"));
        Assert.Equal(10, r.Run.Injections[1].Preparation.TotalDilutionFactor);
    }

    [Fact]
    public void Read_SyntaxError_ProblemNamesLineAndPosition()
    {
        RunReadResult r = RunJson.Read(new StringReader("{\n  \"name\": \"x\",\n  \"analytes\": [\"Cd\" \"Pb\"]\n}"));

        Assert.Null(r.Run);
        RunFileProblem p = Assert.Single(r.Problems);
        Assert.Equal(3, p.Line);
        Assert.True(p.ColumnNumber > 0);
    }

    [Fact]
    public void Read_UnknownRoleAndUndeclaredAnalyte_Reported()
    {
        string text = Good.Replace("\"role\": \"sample\", \"id\": \"S2\"", "\"role\": \"sampel\", \"id\": \"S2\"", StringComparison.Ordinal)
            .Replace("\"nominal\": { \"Cd\"", "\"nominal\": { \"Zn\"", StringComparison.Ordinal);

        RunReadResult r = RunJson.Read(new StringReader(text));

        Assert.Contains(r.Problems, p => p.Column == "injections[2].role" && p.Value == "\"sampel\"");
        Assert.Contains(r.Problems, p => p.Column == "injections[0].nominal.Zn");
        Assert.Null(r.Run);
    }

    [Fact]
    public void Write_DemoRun_ReadsBackEqual()
    {
        RunReadResult csv = RunCsv.ReadFile(RunCsvTests.DemoFile);
        var text = new StringWriter();

        RunJson.Write(csv.Run!, text, csv.InternalStandardConcentrations);
        RunReadResult back = RunJson.Read(new StringReader(text.ToString()));

        Assert.True(back.IsClean, string.Join("; ", back.Problems));
        RunAssert.Equal(csv.Run!, back.Run!);
        Assert.Equal(csv.InternalStandardConcentrations, back.InternalStandardConcentrations);
        Assert.Contains("\"µg/L\"".Trim('"'), text.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void ReadFile_DemoJson_EqualsDemoCsv()
    {
        RunReadResult json = RunJson.ReadFile(System.IO.Path.ChangeExtension(RunCsvTests.DemoFile, ".json"));

        Assert.True(json.IsClean, string.Join("; ", json.Problems));
        RunAssert.Equal(RunCsv.ReadFile(RunCsvTests.DemoFile).Run!, json.Run!);
    }

    [Fact]
    public void ReadStrict_CleanFile_ReturnsRun()
    {
        AnalyticalRun run = RunJson.ReadStrict(new StringReader(Good.Replace("\"Cd\": \"x\"", "\"Cd\": 50", StringComparison.Ordinal)));

        Assert.Equal(3, run.Injections.Count);
        Assert.Equal(50, run.Injections[1].Signals.Analyte("Cd"));
    }
}
