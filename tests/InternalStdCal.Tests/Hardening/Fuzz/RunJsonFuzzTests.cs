using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Text;
using System.Text.Json.Nodes;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.IO;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Hardening.Fuzz;

// Fuzzed JSON run files (invented rows written by RunJson.Write, then mutated). Checked against the reader's
// documented contract (RunJson XML docs, docs/run-file-format.md): no exception besides the documented ones, every
// untouched injection survives with its values, and every injection left out is reported under its JSON path.
public class RunJsonFuzzTests
{
    // Raw JSON texts that a JsonNode cannot hold (out-of-range numbers) go in through placeholders.
    private static readonly string[] RawValues = { "1e400", "-1e400", "123456789012345678901234567890", "1.5", "-0", "1e-400", "\"NaN\"", "\"Infinity\"", "true", "[]", "{}", "\"\"", "\"  \"", "\"\\u0000\"", "\"\\ud800\"", "[[[[1]]]]", "{\"x\":{\"y\":null}}", "null" };

    private static readonly string[] Members = { "order", "role", "id", "parent", "time", "signals", "isSignals", "nominal", "added", "preparation" };

    private static Arbitrary<int> Seeds => Gen.Choose(0, int.MaxValue).ToArbitrary();

    [Property(MaxTest = 250)]
    public Property Read_MutatedInjections_KeepsEveryUntouchedInjectionAndReportsEveryDroppedOneByPath() =>
        Prop.ForAll(Seeds, seed =>
        {
            var rnd = new Random(seed);
            CsvFuzz file = CsvFuzz.Generate(rnd);
            JsonObject doc = Document(file);
            var injections = (JsonArray)doc["injections"]!;
            var raw = new List<string>();
            JsonNode Raw()
            {
                raw.Add(RawValues[rnd.Next(RawValues.Length)]);
                return JsonValue.Create("@@RAW" + (raw.Count - 1) + "@@");
            }

            var mutated = new HashSet<int>();
            for (int i = 0; i < injections.Count; i++)
            {
                if (rnd.Next(3) != 0)
                {
                    continue;
                }

                mutated.Add(i);
                var o = (JsonObject)injections[i]!;
                switch (rnd.Next(6))
                {
                    case 0:
                        o[Members[rnd.Next(Members.Length)]] = Raw();
                        break;
                    case 1:
                        o.Remove(new[] { "order", "role", "id" }[rnd.Next(3)]);
                        break;
                    case 2:
                        o[rnd.Next(2) == 0 ? "nomnal" : "Order"] = 1;
                        break;
                    case 3:
                        o[rnd.Next(2) == 0 ? "signals" : "isSignals"] = new JsonObject { [rnd.Next(2) == 0 ? "Cd" : "Rh"] = Raw() };
                        break;
                    case 4:
                        var signals = (JsonObject?)o["signals"] ?? new JsonObject();
                        signals["Xx"] = 1;
                        o["signals"] = signals.DeepClone();
                        break;
                    default:
                        injections[i] = Raw();
                        break;
                }
            }

            string text = doc.ToJsonString();
            for (int k = 0; k < raw.Count; k++)
            {
                text = text.Replace("\"@@RAW" + k + "@@\"", raw[k], StringComparison.Ordinal);
            }

            RunReadResult r = RunJson.Read(new StringReader(text));
            string context = "\n" + text + "\nproblems:\n" + string.Join("\n", r.Problems);
            var byOrder = (r.Run?.Injections ?? Array.Empty<RunInjection>()).ToDictionary(x => x.Order);
            bool Reported(int i) => r.Problems.Any(p => p.Column is string c && (c == "injections[" + i + "]" || c.StartsWith("injections[" + i + "].", StringComparison.Ordinal)));
            var fromMutated = byOrder.Values.Where(x => !file.Rows.Where((_, i) => !mutated.Contains(i)).Any(f => f.Order == x.Order && f.Id == x.Id)).ToArray();
            for (int i = 0; i < file.Rows.Length; i++)
            {
                CsvFuzz.Row row = file.Rows[i];
                if (mutated.Contains(i))
                {
                    continue;
                }

                if (byOrder.TryGetValue(row.Order, out RunInjection? got) && got.Id == row.Id)
                {
                    Assert.True(got.Signals.Analyte("Cd") == row.Cd && got.Signals.Analyte("Pb") == row.Pb && got.Signals.InternalStandard("Rh") == row.Rh, "values of untouched injection " + i + " changed" + context);
                }
                else
                {
                    Assert.True(fromMutated.Any(x => x.Order == row.Order || x.Id == row.Id), "untouched injection " + i + " was lost" + context);
                    Assert.True(Reported(i), "untouched injection " + i + " left out without a problem" + context);
                }
            }

            // Every injection is either in the run or reported under its path.
            int reported = Enumerable.Range(0, file.Rows.Length).Count(Reported);
            Assert.True(file.Rows.Length == byOrder.Count + reported, "injections " + file.Rows.Length + " != run rows " + byOrder.Count + " + reported " + reported + context);
        });

    [Property(MaxTest = 250)]
    public Property Read_DamagedText_NeverThrowsAndAlwaysExplainsAMissingRun() =>
        Prop.ForAll(Seeds, seed =>
        {
            var rnd = new Random(seed);
            string text = Document(CsvFuzz.Generate(rnd)).ToJsonString();
            byte[] bytes = Damage(rnd, Encoding.UTF8.GetBytes(text));
            using var reader = new StreamReader(new MemoryStream(bytes), Encoding.UTF8);
            RunReadResult r = RunJson.Read(reader);
            Assert.True(r.Run is not null || r.Problems.Count > 0, "no run and no problem:\n" + Encoding.UTF8.GetString(bytes));
        });

    [Theory]
    [InlineData("")]
    [InlineData("\ufeff")]
    [InlineData("null")]
    [InlineData("[]")]
    [InlineData("{}")]
    [InlineData("{\"name\":\"r\",\"analytes\":[\"Cd\"],\"internalStandards\":[{\"name\":\"Rh\"}],\"injections\":[]}")]
    [InlineData("{\"name\":\"r\",\"analytes\":\"Cd\",\"internalStandards\":{},\"injections\":{}}")]
    [InlineData("{\"name\":1e400,\"analytes\":[1e400],\"internalStandards\":[{\"name\":\"Rh\",\"concentration\":\"1e400 µg/L\"}],\"injections\":[1e400]}")]
    public void Read_BrokenWholeDocument_ReportsProblemsAndNeverThrows(string text)
    {
        RunReadResult r = RunJson.Read(new StringReader(text));

        Assert.NotEmpty(r.Problems);
        Assert.Throws<RunFileException>(() => r.RunOrThrow());
    }

    [Fact]
    public void Read_DeeplyNestedValue_IsASyntaxProblemNotAnException()
    {
        // System.Text.Json stops at depth 64 by default (from memory); the reader must report it, not throw.
        string text = "{\"name\":\"r\",\"analytes\":[\"Cd\"],\"internalStandards\":[{\"name\":\"Rh\"}],\"injections\":[{\"order\":" + new string('[', 200) + new string(']', 200) + "}]}";

        RunReadResult r = RunJson.Read(new StringReader(text));

        Assert.Null(r.Run);
        Assert.Single(r.Problems);
    }

    [Fact]
    public void Read_LoneSurrogateEscapeInAnInjection_ReportsThatInjectionAndKeepsTheOthers()
    {
        // Regression (found by the fuzz property above): JsonElement.GetString threw InvalidOperationException out of
        // RunJson.Read for "\ud800".
        const string Text = "{\"name\":\"r\",\"analytes\":[\"Cd\"],\"internalStandards\":[{\"name\":\"Rh\"}],\"injections\":["
            + "{\"order\":1,\"role\":\"sample\",\"id\":\"\\ud800\"},{\"order\":2,\"role\":\"sample\",\"id\":\"S2\"}]}";

        RunReadResult r = RunJson.Read(new StringReader(Text));

        Assert.Equal("injections[0]", Assert.Single(r.Problems).Column);
        Assert.Equal("S2", Assert.Single(r.Run!.Injections).Id);
    }

    [Fact]
    public void Read_LoneSurrogateEscapeInTheAnalyteList_IsAProblemNotAnException()
    {
        RunReadResult r = RunJson.Read(new StringReader("{\"name\":\"r\",\"analytes\":[\"\\udc00\"],\"internalStandards\":[{\"name\":\"Rh\"}],\"injections\":[]}"));

        Assert.Null(r.Run);
        Assert.NotEmpty(r.Problems);
    }

    [Fact]
    public void Read_ByteOrderMarkInTheText_ReadsClean()
    {
        RunReadResult r = RunJson.Read(new StringReader("\ufeff{\"name\":\"r\",\"analytes\":[\"Cd\"],\"internalStandards\":[{\"name\":\"Rh\"}],\"injections\":[{\"order\":1,\"role\":\"sample\",\"id\":\"S1\"}]}"));

        Assert.True(r.IsClean, string.Join("; ", r.Problems));
    }

    /// <summary>The JSON document of a fuzz file's rows (as RunJson.Write writes them).</summary>
    internal static JsonObject Document(CsvFuzz file)
    {
        (string csv, _) = file.Text(new Dictionary<int, string>(), comment: false);
        AnalyticalRun run = RunCsv.ReadStrict(new StringReader(csv), "fuzz");
        var json = new StringWriter();
        RunJson.Write(run, json);
        return (JsonObject)JsonNode.Parse(json.ToString())!;
    }

    /// <summary>Truncation, byte flips, invalid UTF-8, a BOM or a doubled tail.</summary>
    internal static byte[] Damage(Random rnd, byte[] bytes)
    {
        var b = new List<byte>(bytes);
        switch (rnd.Next(5))
        {
            case 0:
                int cut = rnd.Next(b.Count);
                b.RemoveRange(cut, b.Count - cut);
                break;
            case 1:
                for (int n = rnd.Next(1, 6); n > 0; n--)
                {
                    b[rnd.Next(b.Count)] = (byte)rnd.Next(256);
                }

                break;
            case 2:
                b.InsertRange(rnd.Next(b.Count), new byte[] { 0xFF, 0xC3, 0x28 });
                break;
            case 3:
                b.InsertRange(0, Encoding.UTF8.GetPreamble());
                break;
            default:
                b.AddRange(bytes.Skip(rnd.Next(bytes.Length)));
                break;
        }

        return b.ToArray();
    }
}
