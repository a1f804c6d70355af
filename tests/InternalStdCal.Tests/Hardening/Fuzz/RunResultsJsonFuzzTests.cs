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
using InternalStdCal.Tests.IO;
using Xunit;

namespace InternalStdCal.Tests.Hardening.Fuzz;

// Fuzzed results documents (the invented demo run's results, then mutated). Checked against RunResultsJson.Read's
// XML docs: it returns results or throws RunFileException, nothing else; and what it returns is usable — it writes
// back to JSON and CSV and compares and hashes without throwing.
public class RunResultsJsonFuzzTests
{
    private static readonly string[] RawValues = { "1e400", "-1e400", "123456789012345678901234567890", "1.5", "-1", "\"NaN\"", "true", "[]", "{}", "\"\"", "\"x\"", "null", "[null]", "{\"value\":1e400,\"unit\":\"µg/L\"}", "{\"value\":-1,\"unit\":\"µg/L\"}", "{\"value\":1,\"unit\":\"ppm\"}", "{\"unit\":\"µg/L\",\"value\":1}", "\"Quantified, Bogus\"", "\"cal\"", "2147483648", "\"\\ud800\"" };

    private static readonly Lazy<string> Demo = new(() =>
    {
        var text = new StringWriter();
        RunResultsJson.Write(RunResults.From(RunResultsJsonTests.ProcessDemo()), text);
        return text.ToString();
    });

    private static Arbitrary<int> Seeds => Gen.Choose(0, int.MaxValue).ToArbitrary();

    [Property(MaxTest = 150)]
    public Property Read_MutatedValues_ReturnsUsableResultsOrThrowsRunFileException() =>
        Prop.ForAll(Seeds, seed =>
        {
            var rnd = new Random(seed);
            JsonNode doc = JsonNode.Parse(Demo.Value)!;
            var slots = new List<(JsonNode Parent, string? Name, int Index)>();
            Collect(doc, slots);
            var raw = new List<string>();
            for (int n = rnd.Next(1, 4); n > 0; n--)
            {
                (JsonNode parent, string? name, int index) = slots[rnd.Next(slots.Count)];
                raw.Add(RawValues[rnd.Next(RawValues.Length)]);
                JsonNode value = JsonValue.Create("@@RAW" + (raw.Count - 1) + "@@");
                if (parent is JsonObject o && rnd.Next(4) == 0)
                {
                    o.Remove(name!);
                }
                else if (parent is JsonObject o2)
                {
                    o2[name!] = value;
                }
                else
                {
                    ((JsonArray)parent)[index] = value;
                }
            }

            string text = doc.ToJsonString();
            for (int k = 0; k < raw.Count; k++)
            {
                text = text.Replace("\"@@RAW" + k + "@@\"", raw[k], StringComparison.Ordinal);
            }

            ReadAndUse(text);
        });

    [Property(MaxTest = 100)]
    public Property Read_DamagedText_ReturnsUsableResultsOrThrowsRunFileException() =>
        Prop.ForAll(Seeds, seed =>
        {
            byte[] bytes = RunJsonFuzzTests.Damage(new Random(seed), Encoding.UTF8.GetBytes(Demo.Value));
            using var reader = new StreamReader(new MemoryStream(bytes), Encoding.UTF8);
            ReadAndUse(reader.ReadToEnd());
        });

    [Theory]
    [InlineData("")]
    [InlineData("null")]
    [InlineData("[]")]
    [InlineData("{}")]
    [InlineData("{\"format\":\"internalstdcal.run-results/1\",\"runName\":null,\"methodName\":null,\"results\":null,\"injections\":null,\"notes\":null}")]
    [InlineData("{\"format\":\"internalstdcal.run-results/1\",\"results\":[null],\"calibrations\":[null]}")]
    [InlineData("{\"format\":\"internalstdcal.run-results/1\",\"results\":[{\"sampleId\":\"S\",\"analyte\":\"Cd\",\"role\":\"sample\",\"measured\":{\"value\":1e400,\"unit\":\"µg/L\"}}]}")]
    public void Read_BrokenWholeDocument_ReturnsUsableResultsOrThrowsRunFileException(string text) => ReadAndUse(text);

    // Regressions, minimal inputs found by the properties above: each was read without a RunFileException before
    // (an ArgumentOutOfRangeException for 1e400 in a concentration; infinity kept silently; nulls that later made the
    // CSV writer, Equals or GetHashCode throw).
    [Theory]
    [InlineData("{\"format\":\"internalstdcal.run-results/1\",\"results\":[{\"sampleId\":\"S\",\"analyte\":\"Cd\",\"role\":\"sample\",\"measured\":{\"value\":1e400,\"unit\":\"µg/L\"}}]}", "$.results[0].measured")]
    [InlineData("{\"format\":\"internalstdcal.run-results/1\",\"confidenceLevel\":1e400}", "$.confidenceLevel")]
    [InlineData("{\"format\":\"internalstdcal.run-results/1\",\"results\":null}", "$.results")]
    [InlineData("{\"format\":\"internalstdcal.run-results/1\",\"runName\":null}", "$.runName")]
    [InlineData("{\"format\":\"internalstdcal.run-results/1\",\"calibrations\":[null]}", "$.calibrations[0]")]
    [InlineData("{\"format\":\"internalstdcal.run-results/1\",\"notes\":[\"a\",null]}", "$.notes[1]")]
    public void Read_MinimalCounterexample_ThrowsRunFileExceptionNamingThePath(string text, string path)
    {
        RunFileException ex = Assert.Throws<RunFileException>(() => RunResultsJson.Read(new StringReader(text)));

        Assert.Equal(path, Assert.Single(ex.Problems).Column);
    }

    [Fact]
    public void Read_NullOnlyWhereTheSchemaAllowsIt_ReadsBack()
    {
        const string Text = "{\"format\":\"internalstdcal.run-results/1\",\"calibrations\":[{\"analyte\":\"Cd\",\"internalStandard\":\"Rh\",\"model\":\"Linear\",\"pointCount\":null,\"ruleSet\":null,\"failure\":null,\"injectionOrders\":[]}]}";

        RunResults r = RunResultsJson.Read(new StringReader(Text));

        Assert.Null(Assert.Single(r.Calibrations).Failure);
    }

    private static void ReadAndUse(string text)
    {
        RunResults results;
        try
        {
            results = RunResultsJson.Read(new StringReader(text));
        }
        catch (RunFileException ex)
        {
            Assert.NotEmpty(ex.Problems);
            return;
        }
        catch (Exception ex)
        {
            Assert.Fail("undocumented " + ex.GetType().Name + ": " + ex.Message + "\n" + text);
            return;
        }

        try
        {
            RunResultsJson.Write(results, new StringWriter());
            RunResultsCsv.Write(results, new StringWriter());
            Assert.True(results.Equals(results with { }));
            _ = results.GetHashCode();
        }
        catch (Exception ex) when (ex is not Xunit.Sdk.XunitException)
        {
            Assert.Fail("results read from the text are not usable: " + ex.GetType().Name + ": " + ex.Message + "\n" + text);
        }
    }

    private static void Collect(JsonNode node, List<(JsonNode Parent, string? Name, int Index)> slots)
    {
        switch (node)
        {
            case JsonObject o:
                foreach (KeyValuePair<string, JsonNode?> p in o.ToArray())
                {
                    slots.Add((o, p.Key, -1));
                    if (p.Value is not null)
                    {
                        Collect(p.Value, slots);
                    }
                }

                break;
            case JsonArray a:
                for (int i = 0; i < a.Count; i++)
                {
                    slots.Add((a, null, i));
                    if (a[i] is JsonNode child)
                    {
                        Collect(child, slots);
                    }
                }

                break;
        }
    }
}
