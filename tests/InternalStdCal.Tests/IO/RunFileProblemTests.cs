using System;
using InternalStdCal.IO;
using Xunit;

namespace InternalStdCal.Tests.IO;

// Message layout of our own format (common practice: say where, what value, what is wrong).
public class RunFileProblemTests
{
    [Fact]
    public void ToString_LineColumnValue_AllNamed() =>
        Assert.Equal("line 7, column 5 'analyte:Cd-111', value 'abc': not a number", new RunFileProblem(7, 5, "analyte:Cd-111", "abc", "not a number").ToString());

    [Fact]
    public void ToString_JsonPathWithoutLine_NamesPath() =>
        Assert.Equal("file, column 'injections[2].role': unknown role", new RunFileProblem(0, 0, "injections[2].role", null, "unknown role").ToString());

    [Fact]
    public void Constructor_NegativeLine_Throws() =>
        Assert.Throws<ArgumentOutOfRangeException>("line", () => new RunFileProblem(-1, 0, null, null, "x"));

    [Fact]
    public void Constructor_BlankMessage_Throws() =>
        Assert.Throws<ArgumentException>("message", () => new RunFileProblem(1, 1, null, null, " "));

    [Fact]
    public void RunFileException_NoProblems_Throws() =>
        Assert.Throws<ArgumentException>("problems", () => new RunFileException(Array.Empty<RunFileProblem>()));
}
