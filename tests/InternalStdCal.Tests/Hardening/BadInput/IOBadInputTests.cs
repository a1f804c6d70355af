using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using InternalStdCal.IO;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using InternalStdCal.Tests.Run;
using Xunit;
using static InternalStdCal.Tests.Hardening.BadInput.BadInput;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>
/// Bad input to every entry point of <c>InternalStdCal.IO</c>. Arguments are checked with exceptions; bad file
/// content never throws from <c>Read</c>: each bad value is a problem naming line, column and value, the bad row is
/// left out and the good rows survive (docs/run-file-format.md; common practice).
/// </summary>
public class IOBadInputTests
{
    private static readonly Type Range = typeof(ArgumentOutOfRangeException);
    private static readonly Type Arg = typeof(ArgumentException);
    private static readonly Type Null = typeof(ArgumentNullException);

    private const string Header = "order,role,id,parent,analyte:Cd,is:Rh [10 µg/L],nominal:Cd [µg/L]";

    private static AnalyticalRun Run => RunScenario.Run(RunScenario.Rows());

    private static RunReport Report => RunProcessor.Process(Run, RunScenario.Method());

    private static readonly Dictionary<string, Concentration> UnknownIs = new() { ["Xx"] = Concentration.FromMicrogramsPerLitre(10) };

    public static IEnumerable<object[]> Cases => Rows(new BadInputCase[]
    {
        new("IO.RunFileProblem.#ctor", "line -1", () => new RunFileProblem(-1, 0, null, null, "m"), Range, "line", "-1", ">= 0"),
        new("IO.RunFileProblem.#ctor", "column -2", () => new RunFileProblem(1, -2, null, null, "m"), Range, "columnNumber", "-2", ">= 0"),
        new("IO.RunFileProblem.#ctor", "blank message", () => new RunFileProblem(1, 1, null, null, " "), Arg, "message", "empty"),
        new("IO.RunFileException.#ctor", "no problems", () => new RunFileException(Array.Empty<RunFileProblem>()), Arg, "problems", "empty"),
        new("IO.RunFileException.#ctor", "null", () => new RunFileException(null!), Null, "problems", "problems"),
        new("IO.RunCsv.Read", "null reader", () => RunCsv.Read(null!, "t"), Null, "reader", "reader"),
        new("IO.RunCsv.Read", "blank run name", () => RunCsv.Read(new StringReader(Header), " "), Arg, "runName", "non-blank"),
        new("IO.RunCsv.ReadFile", "null path", () => RunCsv.ReadFile(null!), Null, "path", "path"),
        new("IO.RunCsv.ReadStrict", "NaN signal", () => RunCsv.ReadStrict(new StringReader(Header + "\n1,sample,S1,,NaN,1000,\n"), "t"), typeof(RunFileException), null, "line 2", "NaN"),
        new("IO.RunCsv.Write", "IS concentration for an undeclared IS", () => RunCsv.Write(Run, new StringWriter(), UnknownIs), Arg, "internalStandardConcentrations", "'Xx'", "does not declare"),
        new("IO.RunCsv.Write", "null writer", () => RunCsv.Write(Run, null!), Null, "writer", "writer"),
        new("IO.RunCsv.WriteFile", "null path", () => RunCsv.WriteFile(Run, null!), Null, "path", "path"),
        new("IO.RunJson.Read", "null reader", () => RunJson.Read(null!), Null, "reader", "reader"),
        new("IO.RunJson.ReadFile", "null path", () => RunJson.ReadFile(null!), Null, "path", "path"),
        new("IO.RunJson.ReadStrict", "not JSON", () => RunJson.ReadStrict(new StringReader("{ oops")), typeof(RunFileException), null, "line 1"),
        new("IO.RunJson.Write", "IS concentration for an undeclared IS", () => RunJson.Write(Run, new StringWriter(), UnknownIs), Arg, "internalStandardConcentrations", "'Xx'", "does not declare"),
        new("IO.RunJson.WriteFile", "null run", () => RunJson.WriteFile(null!, "x.json"), Null, "run", "run"),
        new("IO.RunResults.From", "null report", () => RunResults.From(null!), Null, "report", "report"),
        new("IO.RunResultsCsv.Write", "null writer", () => RunResultsCsv.Write(Report, null!), Null, "writer", "writer"),
        new("IO.RunResultsCsv.WriteFile", "null results", () => RunResultsCsv.WriteFile(null!, "x.csv"), Null, "results", "results"),
        new("IO.RunResultsJson.Write", "null results", () => RunResultsJson.Write((RunResults)null!, new StringWriter()), Null, "results", "results"),
        new("IO.RunResultsJson.WriteFile", "null path", () => RunResultsJson.WriteFile(RunResults.From(Report), null!), Null, "path", "path"),
        new("IO.RunResultsJson.Read", "null reader", () => RunResultsJson.Read(null!), Null, "reader", "reader"),
        new("IO.RunResultsJson.Read", "not JSON", () => RunResultsJson.Read(new StringReader("[1, 2")), typeof(RunFileException), null, "JSON"),
    });

    /// <summary>Bad values in a run file: (what, format, text, line, column, value).</summary>
    public static IEnumerable<object[]> FileRows => new (string What, string Format, string Text, int Line, string Value)[]
    {
        ("NaN signal", "csv", Header + "\n1,cal,C1,,100,1000,1\n2,sample,S1,,NaN,1000,\n3,sample,S2,,120,1000,\n", 3, "NaN"),
        ("+inf signal", "csv", Header + "\n1,cal,C1,,100,1000,1\n2,sample,S1,,Infinity,1000,\n3,sample,S2,,120,1000,\n", 3, "Infinity"),
        ("signal 1e999 overflows", "csv", Header + "\n1,cal,C1,,100,1000,1\n2,sample,S1,,1e999,1000,\n3,sample,S2,,120,1000,\n", 3, "1e999"),
        ("IS signal -inf", "csv", Header + "\n1,cal,C1,,100,1000,1\n2,sample,S1,,100,-Infinity,\n3,sample,S2,,120,1000,\n", 3, "-Infinity"),
        ("negative nominal", "csv", Header + "\n1,cal,C1,,100,1000,-1\n2,sample,S1,,100,1000,\n3,sample,S2,,120,1000,\n", 2, "-1"),
        ("NaN nominal", "csv", Header + "\n1,cal,C1,,100,1000,NaN\n2,sample,S1,,100,1000,\n3,sample,S2,,120,1000,\n", 2, "NaN"),
        ("signal \"NaN\"", "json", Json("\"NaN\""), 0, "NaN"),
        ("signal 1e999 overflows", "json", Json("1e999"), 0, "1e999"),
    }.Select(r => new object[] { r.What, r.Format, r.Text, r.Line, r.Value });

    private static string Json(string signal) =>
        "{ \"name\": \"J\", \"analytes\": [\"Cd\"], \"internalStandards\": [{ \"name\": \"Rh\", \"concentration\": \"10 µg/L\" }], \"injections\": ["
        + "{ \"order\": 1, \"role\": \"cal\", \"id\": \"C1\", \"signals\": { \"Cd\": 100 }, \"isSignals\": { \"Rh\": 1000 }, \"nominal\": { \"Cd\": \"1 µg/L\" } },"
        + "{ \"order\": 2, \"role\": \"sample\", \"id\": \"S1\", \"signals\": { \"Cd\": " + signal + " }, \"isSignals\": { \"Rh\": 1000 } },"
        + "{ \"order\": 3, \"role\": \"sample\", \"id\": \"S2\", \"signals\": { \"Cd\": 120 }, \"isSignals\": { \"Rh\": 1000 } } ] }";

    [Theory]
    [MemberData(nameof(Cases))]
    public void EntryPoint_BadInput_ThrowsDocumentedExceptionNamingParameterValueAndRange(string name, BadInputCase c)
    {
        Assert.NotNull(name);
        AssertRejected(c);
    }

    [Theory]
    [MemberData(nameof(FileRows))]
    public void Read_BadValue_ProblemNamesLineAndValueAndGoodRowsSurvive(string what, string format, string text, int line, string value)
    {
        RunReadResult r = format == "csv" ? RunCsv.Read(new StringReader(text), "t") : RunJson.Read(new StringReader(text));

        RunFileProblem p = Assert.Single(r.Problems);
        if (line > 0)
        {
            Assert.True(line == p.Line, $"{what}: problem on line {p.Line}: {p}");
        }

        Assert.True(p.ToString().Contains(value, StringComparison.Ordinal), $"{what}: problem does not show '{value}': {p}");
        Assert.NotNull(r.Run);
        Assert.Equal(2, r.Run!.Injections.Count); // the bad row is left out, the others survive
        Assert.All(r.Run.Injections, i => Assert.All(i.Signals.Analytes.Values.Concat(i.Signals.InternalStandards.Values), v => Assert.True(double.IsFinite(v))));
    }
}
