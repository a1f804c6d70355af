using System;
using System.IO;
using System.Linq;
using InternalStdCal.IO;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.IO;

// Invented data only (demo file and hand-written snippets); checks are against the text written in each file
// (common practice: a reader must return exactly what the file says).
public class RunCsvTests
{
    private const string Header = "order,role,id,parent,analyte:Cd,is:Rh [10 µg/L],nominal:Cd [µg/L]";

    internal static string DemoFile => Path.Combine(RepositoryPaths.Root, "samples", "data", "river-water-run.csv");

    private static RunReadResult Read(string text) => RunCsv.Read(new StringReader(text), "t");

    [Fact]
    public void ReadFile_DemoRun_EveryRowPresentWithExactValues()
    {
        RunReadResult r = RunCsv.ReadFile(DemoFile);

        Assert.True(r.IsClean, string.Join("; ", r.Problems));
        AnalyticalRun run = r.Run!;
        Assert.Equal("river-water-run", run.Name);
        Assert.Equal(new[] { "Cd-111", "Cu-63", "Pb-208" }, run.Analytes);
        Assert.Equal(new[] { "Rh-103", "Bi-209" }, run.InternalStandards);
        Assert.Equal(Enumerable.Range(1, 16), run.Injections.Select(i => i.Order));
        Assert.Equal(Concentration.FromMicrogramsPerLitre(10), r.InternalStandardConcentrations["Bi-209"]);

        // Line 5 of the file: "1,cal-blank,BLK,,2026-04-14T09:02:00+02:00,,20.7,152.4,87.3,51450,79303,,,,,,"
        RunInjection blank = run.Injections[0];
        Assert.Equal(InjectionRole.CalibrationBlank, blank.Role);
        Assert.Equal(20.7, blank.Signals.Analyte("Cd-111"));
        Assert.Equal(79303, blank.Signals.InternalStandard("Bi-209"));
        Assert.Equal(new DateTimeOffset(2026, 4, 14, 9, 2, 0, TimeSpan.FromHours(2)), blank.AcquiredAt);

        RunInjection cal4 = run.Injections[4];
        Assert.Equal(Concentration.FromMicrogramsPerLitre(50), cal4.Nominal["Cu-63"]);

        RunInjection spike = run.Injections[10];
        Assert.Equal(InjectionRole.SpikedSample, spike.Role);
        Assert.Equal("RW-02", spike.ParentId);
        Assert.Equal(Concentration.FromMicrogramsPerLitre(10), spike.Added["Cu-63"]);
        Assert.Equal(10, spike.Preparation.TotalDilutionFactor);

        // Row 12 leaves the Cu-63 signal empty: missing, not a problem (the run flags it).
        Assert.Null(run.Injections[11].Signals.Analyte("Cu-63"));
    }

    [Fact]
    public void Read_RowWithExtraField_ProblemOnItsLineAndOtherRowsKept()
    {
        string text = Header + "\n1,cal,C1,,100,1000,1\n2,cal,C2,,200,1000,2,oops\n3,sample,S1,,150,1000,\n";

        RunReadResult r = Read(text);

        RunFileProblem p = Assert.Single(r.Problems);
        Assert.Equal(3, p.Line);
        Assert.Equal(8, p.ColumnNumber);
        Assert.Contains("8 fields", p.Message, StringComparison.Ordinal);
        Assert.Equal(new[] { 1, 3 }, r.Run!.Injections.Select(i => i.Order));
    }

    [Fact]
    public void Read_NonNumericSignal_ProblemNamesLineColumnAndValue()
    {
        string text = Header + "\n1,cal,C1,,100,1000,1\n2,sample,S1,,12x,1000,\n3,sample,S2,,,1000,\n";

        RunReadResult r = Read(text);

        RunFileProblem p = Assert.Single(r.Problems);
        Assert.Equal((3, 5, "analyte:Cd", "12x"), (p.Line, p.ColumnNumber, p.Column, p.Value));
        Assert.StartsWith("line 3, column 5 'analyte:Cd', value '12x': not a number", p.ToString(), StringComparison.Ordinal);
        Assert.Equal(new[] { 1, 3 }, r.Run!.Injections.Select(i => i.Order));
        Assert.Null(r.Run.Injections[1].Signals.Analyte("Cd"));
    }

    [Fact]
    public void Read_UnknownRole_ProblemOnRoleColumn()
    {
        RunReadResult r = Read(Header + "\n1,cal,C1,,100,1000,1\n2,unknown,X,,1,1000,\n");

        RunFileProblem p = Assert.Single(r.Problems);
        Assert.Equal((2 + 1, 2, "role", "unknown"), (p.Line, p.ColumnNumber, p.Column, p.Value));
        Assert.Single(r.Run!.Injections);
    }

    [Fact]
    public void Read_DuplicateHeader_ReportedAndSecondColumnIgnored()
    {
        RunReadResult r = Read("order,role,id,analyte:Cd,is:Rh,analyte:Cd,nominal:Cd\n1,cal,C1,100,1000,999,1 µg/L\n");

        RunFileProblem p = Assert.Single(r.Problems);
        Assert.Equal((1, 6, "analyte:Cd"), (p.Line, p.ColumnNumber, p.Column));
        Assert.Contains("duplicate column", p.Message, StringComparison.Ordinal);
        Assert.Equal(100, r.Run!.Injections[0].Signals.Analyte("Cd"));
    }

    [Fact]
    public void Read_MissingRequiredColumn_NoRunAndProblemNamesColumn()
    {
        RunReadResult r = Read("order,role,analyte:Cd,is:Rh\n1,sample,100,1000\n");

        Assert.Null(r.Run);
        Assert.Contains(r.Problems, p => p.Line == 1 && p.Column == "id" && p.Message.Contains("required column", StringComparison.Ordinal));
    }

    [Fact]
    public void Read_QuotedFieldsWithCommaAndLineBreak_ValuesKeptAndLaterLinesCounted()
    {
        string text = "# comment line\n" + Header + "\n1,cal,\"C,1\",,\"100\",1000,1\n2,sample,\"S\n1\",,50,1000,\n3,sample,S2,,bad,1000,\n";

        RunReadResult r = Read(text);

        Assert.Equal("C,1", r.Run!.Injections[0].Id);
        Assert.Equal("S\n1", r.Run.Injections[1].Id);
        RunFileProblem p = Assert.Single(r.Problems);
        Assert.Equal(6, p.Line); // comment 1, header 2, row 1 on 3, row 2 on 4–5 (quoted line break), row 3 on 6
    }

    [Theory]
    [InlineData("")]
    [InlineData("# only a comment\n")]
    public void Read_NoHeader_NoRunAndProblem(string text)
    {
        RunReadResult r = Read(text);

        Assert.Null(r.Run);
        Assert.NotEmpty(r.Problems);
    }

    [Fact]
    public void Read_SemicolonSeparated_NoRunAndHintAtSeparator()
    {
        RunReadResult r = Read("order;role;id;analyte:Cd;is:Rh\n1;sample;S1;100;1000\n");

        Assert.Null(r.Run);
        Assert.All(r.Problems, p => Assert.Equal(1, p.Line));
        Assert.Contains(r.Problems, p => p.Message.Contains("separated by ';'", StringComparison.Ordinal));
        Assert.Throws<RunFileException>(() => RunCsv.ReadStrict(new StringReader("order;role;id;analyte:Cd;is:Rh\n"), "t"));
    }

    [Fact]
    public void Read_DuplicateOrderAndOrphanSpike_ProblemsOnThoseRowsOnly()
    {
        string text = "order,role,id,parent,analyte:Cd,is:Rh,added:Cd [µg/L]\n1,sample,S1,,10,1000,\n1,sample,S2,,11,1000,\n2,spike,SP,S9,12,1000,5\n3,duplicate,D1,S1,10,1000,\n";

        RunReadResult r = Read(text);

        Assert.Equal(2, r.Problems.Count);
        Assert.Equal((3, "order"), (r.Problems[0].Line, r.Problems[0].Column));
        Assert.Equal((4, "parent", "S9"), (r.Problems[1].Line, r.Problems[1].Column, r.Problems[1].Value));
        Assert.Equal(new[] { "S1", "D1" }, r.Run!.Injections.Select(i => i.Id));
    }

    [Fact]
    public void Read_ReplicatesWithSamePreparation_FormOneSample()
    {
        string text = "order,role,id,dilution,sample-mass,digest-volume,result-unit,analyte:Cd,is:Rh\n"
            + "1,sample,S1,1 mL into 10 mL,0.25 g ± 0.0001 g,50 mL,mg/kg,10,1000\n2,sample,S1,1 mL into 10 mL,0.25 g ± 0.0001 g,50 mL,mg/kg,11,1000\n";

        RunReadResult r = Read(text);

        Assert.True(r.IsClean, string.Join("; ", r.Problems));
        Assert.Same(r.Run!.Injections[0].Preparation, r.Run.Injections[1].Preparation);
        Assert.True(r.Run.Injections[0].Preparation.IsSolid);
        Assert.Equal(Mass.FromGrams(0.0001), r.Run.Injections[0].Preparation.SampleMass!.Value.StandardUncertainty);
    }

    [Fact]
    public void ReadStrict_BadFile_ThrowsWithEveryProblem()
    {
        var ex = Assert.Throws<RunFileException>(() => RunCsv.ReadStrict(new StringReader(Header + "\n1,cal,C1,,x,1000,1\n2,qc,Q,,1,y,2\n"), "t"));

        Assert.Equal(new[] { 0, 2, 3 }, ex.Problems.Select(p => p.Line)); // 0: no good row, so no run
        Assert.Contains("line 3, column 6 'is:Rh [10 µg/L]', value 'y'", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Write_DemoRun_ReadsBackEqual()
    {
        RunReadResult first = RunCsv.ReadFile(DemoFile);
        var text = new StringWriter();

        RunCsv.Write(first.Run!, text, first.InternalStandardConcentrations);
        RunReadResult back = RunCsv.Read(new StringReader(text.ToString()), first.Run!.Name);

        Assert.True(back.IsClean, string.Join("; ", back.Problems));
        RunAssert.Equal(first.Run!, back.Run!);
        Assert.Equal(first.InternalStandardConcentrations, back.InternalStandardConcentrations);
    }

    [Fact]
    public void Write_IdWithOuterSpace_ThrowsNamingRow()
    {
        AnalyticalRun run = AnalyticalRun.Create("r", new[] { "Cd" }, new[] { "Rh" }, new[] { RunInjection.Sample(1, " S1", InjectionSignals.Empty) });

        var ex = Assert.Throws<ArgumentException>("run", () => RunCsv.Write(run, new StringWriter()));
        Assert.Contains("#1 Sample ' S1'", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Write_DensityStep_Throws()
    {
        var step = InternalStdCal.Preparation.DilutionStep.VolumetricWithDensity(Measured.Exact(Volume.FromMillilitres(1)), Measured.Exact(Volume.FromMillilitres(10)), Density.FromGramsPerMillilitre(1.02), 0);
        AnalyticalRun run = AnalyticalRun.Create("r", new[] { "Cd" }, new[] { "Rh" }, new[] { RunInjection.Sample(1, "S1", InjectionSignals.Empty, SamplePreparation.Liquid(step)) });

        Assert.Throws<ArgumentException>("step", () => RunCsv.Write(run, new StringWriter()));
    }
}
