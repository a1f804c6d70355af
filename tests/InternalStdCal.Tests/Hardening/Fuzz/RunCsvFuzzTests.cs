using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Text;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.IO;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Hardening.Fuzz;

// Fuzzed CSV run files (invented rows, randomly mutated). Checked against the reader's documented contract
// (RunCsv XML docs, docs/run-file-format.md): no exception besides the documented ones, every untouched good row
// survives with its values, and every row that is left out is reported on its own physical line.
public class RunCsvFuzzTests
{
    private static Arbitrary<int> Seeds => Gen.Choose(0, int.MaxValue).ToArbitrary();

    [Property(MaxTest = 300)]
    public Property Read_MutatedRows_KeepsEveryUntouchedRowAndReportsEveryDroppedRowOnItsLine() =>
        Prop.ForAll(Seeds, seed =>
        {
            var rnd = new Random(seed);
            CsvFuzz file = CsvFuzz.Generate(rnd);
            var mutated = new Dictionary<int, string>();
            for (int i = 0; i < file.Rows.Length; i++)
            {
                if (rnd.Next(3) == 0)
                {
                    mutated[i] = CsvFuzz.Mutate(rnd, file.Rows[i].Text, rnd.Next(8));
                }
            }

            (string text, int[] lines) = file.Text(mutated, comment: rnd.Next(2) == 0);
            RunReadResult r = RunCsv.Read(new StringReader(text), "fuzz");
            Check(file, mutated, lines, r, text);
        });

    [Property(MaxTest = 150)]
    public Property Read_InvalidUtf8BytesAndBomThroughAStream_KeepsEveryUntouchedRow() =>
        Prop.ForAll(Seeds, seed =>
        {
            var rnd = new Random(seed);
            CsvFuzz file = CsvFuzz.Generate(rnd);
            var broken = new HashSet<int>(Enumerable.Range(0, file.Rows.Length).Where(_ => rnd.Next(3) == 0));
            (string text, int[] lines) = file.Text(new Dictionary<int, string>(), comment: false);
            byte[][] invalid = { new byte[] { 0xFF }, new byte[] { 0xC3 }, new byte[] { 0xED, 0xA0, 0x80 }, new byte[] { 0xF8, 0x88, 0x80, 0x80, 0x80 }, new byte[] { 0xC0, 0xAF } };
            var bytes = new List<byte>();
            if (rnd.Next(2) == 0)
            {
                bytes.AddRange(Encoding.UTF8.GetPreamble());
            }

            bytes.AddRange(Encoding.UTF8.GetBytes(CsvFuzz.Header + "\n"));
            for (int i = 0; i < file.Rows.Length; i++)
            {
                byte[] row = Encoding.UTF8.GetBytes(file.Rows[i].Text);
                int at = rnd.Next(row.Length + 1);
                bytes.AddRange(row.Take(at));
                if (broken.Contains(i))
                {
                    bytes.AddRange(invalid[rnd.Next(invalid.Length)]);
                }

                bytes.AddRange(row.Skip(at));
                bytes.AddRange(Encoding.UTF8.GetBytes(file.Rows[i].Ending));
            }

            using var reader = new StreamReader(new MemoryStream(bytes.ToArray()), Encoding.UTF8);
            RunReadResult r = RunCsv.Read(reader, "fuzz");
            Check(file, broken.ToDictionary(i => i, i => "\ufffd" + file.Rows[i].Text), lines, r, text);
        });

    [Theory]
    [InlineData("")]
    [InlineData("\ufeff")]
    [InlineData("\n\n\n")]
    [InlineData("\r\n")]
    [InlineData("# only a comment\n")]
    [InlineData("\"")]
    [InlineData("\"unclosed header,role\nrow")]
    [InlineData(CsvFuzz.Header)]
    [InlineData("order;role;id;analyte:Cd;is:Rh\n1;cal;C1;1;2\n")]
    [InlineData("order\trole\tid\tanalyte:Cd\tis:Rh\n1\tcal\tC1\t1\t2\n")]
    [InlineData("order,role,analyte:Cd,is:Rh\n1,cal,1,2\n")]
    [InlineData("order,role,id,id,analyte:Cd,analyte:Cd,is:Rh,IS:Rh\n1,sample,S1,S2,1,2,3,4\n")]
    [InlineData("order,role,id,analyte:,is:[,nominal:Cd [\n1,sample,S1,1,2,3\n")]
    [InlineData("order,role,id,analyte:Cd,is:Rh [1e400 µg/L]\n1,sample,S1,1,2\n")]
    [InlineData("order,role,id,analyte:Cd,is:Rh\n123456789012345678901234567890,sample,S1,1,2\n")]
    [InlineData("\0\0\0\0")]
    public void Read_BrokenWholeFile_ReportsProblemsAndNeverThrows(string text)
    {
        RunReadResult r = RunCsv.Read(new StringReader(text), "fuzz");

        Assert.NotEmpty(r.Problems);
        Assert.All(r.Problems, p => Assert.False(string.IsNullOrWhiteSpace(p.Message)));
        Assert.Throws<RunFileException>(() => r.RunOrThrow());
    }

    [Fact]
    public void Read_UnclosedQuote_ReportsItsLineAndKeepsTheRowsBelow()
    {
        // Regression (found by the fuzz property above): the quote opened in line 2 ran to the end of the file and
        // the good row on line 3 was lost without a problem.
        const string Text = "order,role,id,analyte:Cd,is:Rh\n1,sample,\"S1,1,2\n2,sample,S2,3,4\n";

        RunReadResult r = RunCsv.Read(new StringReader(Text), "t");

        RunFileProblem p = Assert.Single(r.Problems);
        Assert.Equal((2, 3, "id"), (p.Line, p.ColumnNumber, p.Column));
        RunInjection kept = Assert.Single(r.Run!.Injections);
        Assert.Equal((2, "S2", 3.0), (kept.Order, kept.Id, kept.Signals.Analyte("Cd")));
    }

    [Fact]
    public void Read_StrayQuoteClosedRowsLater_KeepsTheRowsBetween()
    {
        // Regression (found by the fuzz property above): the quote opened in line 2 closed in line 4, the merged record
        // had the header's field count and failed only the role checks, so line 3 was lost without a problem.
        const string Text = "order,role,id,parent,analyte:Cd,is:Rh\n1,sample,S1,\"x,1,2\n2,sample,S2,,3,4\n3,sample,S3,\"x,5,6\n";

        RunReadResult r = RunCsv.Read(new StringReader(Text), "t");

        Assert.Equal(new[] { 2, 4 }, r.Problems.Select(p => p.Line));
        Assert.Equal(2, Assert.Single(r.Run!.Injections).Order);
    }

    [Fact]
    public void Read_ByteOrderMarkInTheText_ReadsLikeTheFileWithout()
    {
        // A BOM decoded into the text (e.g. File.ReadAllText of a file written with a BOM by another encoding path)
        // must not hide the first column name.
        const string Text = "order,role,id,analyte:Cd,is:Rh\n1,sample,S1,1,2\n";

        RunReadResult withBom = RunCsv.Read(new StringReader("\ufeff" + Text), "t");

        Assert.True(withBom.IsClean, string.Join("; ", withBom.Problems));
        Assert.Equal(1, Assert.Single(withBom.Run!.Injections).Order);
    }

    private static void Check(CsvFuzz file, Dictionary<int, string> mutated, int[] lines, RunReadResult r, string text)
    {
        string context = "\n" + text + "\nproblems:\n" + string.Join("\n", r.Problems);
        Assert.True(r.Run is not null || r.Problems.Count > 0, "no run and no problem" + context);
        var byOrder = (r.Run?.Injections ?? Array.Empty<RunInjection>()).ToDictionary(x => x.Order);
        var problemLines = new HashSet<int>(r.Problems.Select(p => p.Line));
        Assert.True(problemLines.All(l => l == 0 || l == lines.Min() - 1 || lines.Contains(l)), "a problem on a line that starts no row" + context);

        // Rows read from mutated text that now share an order or id with an untouched row take precedence only when
        // they come first; the untouched row is then rightly reported as a conflict.
        var mutatedOrders = new HashSet<int>();
        var mutatedIds = new HashSet<string>(StringComparer.Ordinal);
        var untouchedOrders = new HashSet<int>(file.Rows.Where((_, i) => !mutated.ContainsKey(i)).Select(x => x.Order));
        foreach (RunInjection x in byOrder.Values.Where(x => !untouchedOrders.Contains(x.Order) || !file.Rows.Any(f => f.Order == x.Order && f.Id == x.Id)))
        {
            mutatedOrders.Add(x.Order);
            mutatedIds.Add(x.Id);
        }

        int records = 0;
        for (int i = 0; i < file.Rows.Length; i++)
        {
            CsvFuzz.Row row = file.Rows[i];
            if (mutated.TryGetValue(i, out string? m))
            {
                if (m.Split(',').All(c => c.Trim().Length == 0) || m.StartsWith('#'))
                {
                    continue;
                }

                records++;
                continue;
            }

            records++;
            if (byOrder.TryGetValue(row.Order, out RunInjection? got) && got.Id == row.Id)
            {
                Assert.True(got.Signals.Analyte("Cd") == row.Cd && got.Signals.Analyte("Pb") == row.Pb && got.Signals.InternalStandard("Rh") == row.Rh, "values of untouched row " + row.Order + " changed" + context);
            }
            else
            {
                Assert.True(mutatedOrders.Contains(row.Order) || mutatedIds.Contains(row.Id), "untouched row " + row.Order + " (line " + lines[i] + ") was lost" + context);
                Assert.True(problemLines.Contains(lines[i]), "untouched row " + row.Order + " left out without a problem on line " + lines[i] + context);
            }
        }

        // Every record is either in the run or reported (with a column) on its own line.
        int reported = lines.Count(l => problemLines.Contains(l));
        Assert.True(records == byOrder.Count + reported, "records " + records + " != run rows " + byOrder.Count + " + reported rows " + reported + context);
        Assert.All(r.Problems.Where(p => lines.Contains(p.Line)), p => Assert.True(p.ColumnNumber > 0 || p.Column is not null, "row problem without a column: " + p + context));
    }
}
