using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.IO;

/// <summary>
/// Reads and writes an analytical run as JSON in the library's own schema (docs/run-file-format.md): the run name,
/// the analytes, the internal standards (with optional concentration) and one object per injection.
/// </summary>
/// <remarks>
/// <para>Cells are the same texts as in <see cref="RunCsv"/>: roles "cal", "cal-blank", "method-blank", "qc",
/// "sample", "duplicate", "spike"; concentrations "number unit"; dilution steps "aliquot into final". Signals are JSON
/// numbers (null or absent = not recorded).</para>
/// <para>Lenient reading (<see cref="Read"/>) reports each problem with the JSON path of the element (and, for a
/// syntax error, its line and character position) and leaves out only the injections with a problem; strict reading
/// (<see cref="ReadStrict"/>) throws <see cref="RunFileException"/>. Comments and trailing commas are accepted.</para>
/// </remarks>
public static class RunJson
{
    private static readonly string[] InjectionProperties = { "order", "role", "id", "parent", "time", "signals", "isSignals", "nominal", "added", "preparation" };

    private static readonly string[] PreparationProperties = { "dilutions", "sampleMass", "digestVolume", "digestMass", "resultUnit" };

    /// <summary>Reads a run leniently.</summary>
    /// <param name="reader">The JSON text; read to the end, not disposed.</param>
    /// <returns>The run of good injections (null when none could be formed), the IS concentrations and the problems.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="reader"/> is null.</exception>
    public static RunReadResult Read(TextReader reader)
    {
        Guard.NotNull(reader, nameof(reader));
        string text = RunText.WithoutByteOrderMark(reader.ReadToEnd());
        var fileProblems = new List<RunFileProblem>();
        var isConc = new SortedDictionary<string, Concentration>(StringComparer.Ordinal);
        JsonDocument doc;
        try
        {
            doc = JsonDocument.Parse(text, new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true });
        }
        catch (JsonException ex)
        {
            int line = (int)(ex.LineNumber ?? -1) + 1;
            int pos = (int)(ex.BytePositionInLine ?? -1) + 1;
            fileProblems.Add(new RunFileProblem(line, pos, null, null, "not valid JSON: " + ex.Message));
            return RunAssembler.Assemble("-", Array.Empty<string>(), Array.Empty<string>(), isConc, fileProblems, Array.Empty<RowDraft>(), fatal: true);
        }

        using (doc)
        {
            try
            {
                return Document(doc.RootElement, fileProblems, isConc);
            }
            catch (InvalidOperationException ex)
            {
                // System.Text.Json refuses to return a string holding a lone surrogate escape ("\ud800").
                fileProblems.Add(new RunFileProblem(0, 0, null, null, "a name in the document is not valid Unicode: " + ex.Message));
                return RunAssembler.Assemble("-", Array.Empty<string>(), Array.Empty<string>(), isConc, fileProblems, Array.Empty<RowDraft>(), fatal: true);
            }
        }
    }

    private static RunReadResult Document(JsonElement root, List<RunFileProblem> fileProblems, SortedDictionary<string, Concentration> isConc)
    {
        void Fatal(string path, string message) => fileProblems.Add(new RunFileProblem(0, 0, path, null, message));
        if (root.ValueKind != JsonValueKind.Object)
        {
            Fatal("$", "the document must be an object with name, analytes, internalStandards and injections");
            return RunAssembler.Assemble("-", Array.Empty<string>(), Array.Empty<string>(), isConc, fileProblems, Array.Empty<RowDraft>(), fatal: true);
        }

        string? name = root.TryGetProperty("name", out JsonElement n) && n.ValueKind == JsonValueKind.String && !string.IsNullOrWhiteSpace(n.GetString()) ? n.GetString() : null;
        if (name is null)
        {
            Fatal("name", "the run name (a non-blank string) is required");
        }

        var analytes = new List<string>();
        if (root.TryGetProperty("analytes", out JsonElement a) && a.ValueKind == JsonValueKind.Array)
        {
            int i = 0;
            foreach (JsonElement e in a.EnumerateArray())
            {
                if (e.ValueKind == JsonValueKind.String && !string.IsNullOrWhiteSpace(e.GetString()) && !analytes.Contains(e.GetString()!))
                {
                    analytes.Add(e.GetString()!);
                }
                else
                {
                    fileProblems.Add(new RunFileProblem(0, 0, Path("analytes", i), e.GetRawText(), "an analyte must be a non-blank string, named once; ignored"));
                }

                i++;
            }
        }

        if (analytes.Count == 0)
        {
            Fatal("analytes", "at least one analyte (array of names) is required");
        }

        var internalStandards = new List<string>();
        if (root.TryGetProperty("internalStandards", out JsonElement s) && s.ValueKind == JsonValueKind.Array)
        {
            int i = 0;
            foreach (JsonElement e in s.EnumerateArray())
            {
                string path = Path("internalStandards", i++);
                string? isName = e.ValueKind == JsonValueKind.Object && e.TryGetProperty("name", out JsonElement en) && en.ValueKind == JsonValueKind.String ? en.GetString() : null;
                if (string.IsNullOrWhiteSpace(isName) || internalStandards.Contains(isName!))
                {
                    fileProblems.Add(new RunFileProblem(0, 0, path, e.GetRawText(), "an internal standard must be an object with a non-blank, unique \"name\" (and optional \"concentration\"); ignored"));
                    continue;
                }

                internalStandards.Add(isName!);
                if (e.TryGetProperty("concentration", out JsonElement ec) && ec.ValueKind != JsonValueKind.Null)
                {
                    Concentration c = default;
                    string? err = ec.ValueKind == JsonValueKind.String ? RunText.Concentration(ec.GetString()!, null, out c) : "must be a string \"number unit\"";
                    if (err is null && !(c.Value > 0))
                    {
                        err = "must be > 0";
                    }

                    if (err is null)
                    {
                        isConc[isName!] = c;
                    }
                    else
                    {
                        fileProblems.Add(new RunFileProblem(0, 0, path + ".concentration", ec.GetRawText(), "IS concentration " + err));
                    }
                }
            }
        }

        if (internalStandards.Count == 0)
        {
            Fatal("internalStandards", "at least one internal standard is required");
        }

        var drafts = new List<RowDraft>();
        if (!root.TryGetProperty("injections", out JsonElement inj) || inj.ValueKind != JsonValueKind.Array)
        {
            Fatal("injections", "the injections (an array of objects) are required");
        }
        else
        {
            var cache = new PreparationCache();
            int i = 0;
            foreach (JsonElement e in inj.EnumerateArray())
            {
                string path = Path("injections", i++);
                try
                {
                    drafts.Add(Injection(e, path, analytes, internalStandards, cache));
                }
                catch (InvalidOperationException ex)
                {
                    // System.Text.Json refuses to return a string holding a lone surrogate escape ("\ud800").
                    var d = new RowDraft(0);
                    d.Problem(0, path, null, "the injection holds a string or name that is not valid Unicode: " + ex.Message);
                    drafts.Add(d);
                }
            }
        }

        bool fatal = name is null || analytes.Count == 0 || internalStandards.Count == 0 || drafts.Count == 0 && fileProblems.Count > 0;
        return RunAssembler.Assemble(name ?? "-", analytes, internalStandards, isConc, fileProblems, drafts, fatal);
    }

    /// <summary>Reads a run file leniently (see <see cref="Read"/>).</summary>
    /// <param name="path">Path of a UTF-8 JSON file.</param>
    /// <returns>See <see cref="Read"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="path"/> is null.</exception>
    /// <exception cref="IOException">The file cannot be read.</exception>
    public static RunReadResult ReadFile(string path)
    {
        Guard.NotNull(path, nameof(path));
        using var reader = new StreamReader(path, Encoding.UTF8);
        return Read(reader);
    }

    /// <summary>Reads a run and requires a clean file.</summary>
    /// <param name="reader">The JSON text; not disposed.</param>
    /// <returns>The run.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="reader"/> is null.</exception>
    /// <exception cref="RunFileException">The file has at least one problem (all are listed).</exception>
    public static AnalyticalRun ReadStrict(TextReader reader) => Read(reader).RunOrThrow();

    /// <summary>Writes a run in the JSON schema (indented, UTF-8 text); <see cref="Read"/> reads it back to an equal run
    /// (as <see cref="RunCsv.Write"/>: step labels and uncertainty evaluation types are not kept).</summary>
    /// <param name="run">The run.</param>
    /// <param name="writer">Where to write; not disposed.</param>
    /// <param name="internalStandardConcentrations">IS name → IS concentration to state; null for none. Names must be
    /// IS of the run.</param>
    /// <exception cref="ArgumentNullException"><paramref name="run"/> or <paramref name="writer"/> is null.</exception>
    /// <exception cref="ArgumentException">A concentration names an IS the run lacks, an id starts or ends with white
    /// space, or a dilution step uses a density.</exception>
    public static void Write(AnalyticalRun run, TextWriter writer, IReadOnlyDictionary<string, Concentration>? internalStandardConcentrations = null)
    {
        Guard.NotNull(run, nameof(run));
        Guard.NotNull(writer, nameof(writer));
        internalStandardConcentrations ??= new Dictionary<string, Concentration>();
        foreach (string isName in internalStandardConcentrations.Keys.Where(k => !run.InternalStandards.Contains(k, StringComparer.Ordinal)))
        {
            throw new ArgumentException("Parameter 'internalStandardConcentrations' names IS '" + isName + "', which run '" + run.Name + "' does not declare.", nameof(internalStandardConcentrations));
        }

        RunCsv.CheckIds(run);
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, WriterOptions))
        {
            w.WriteStartObject();
            w.WriteString("name", run.Name);
            w.WriteStartArray("analytes");
            foreach (string a in run.Analytes)
            {
                w.WriteStringValue(a);
            }

            w.WriteEndArray();
            w.WriteStartArray("internalStandards");
            foreach (string s in run.InternalStandards)
            {
                w.WriteStartObject();
                w.WriteString("name", s);
                if (internalStandardConcentrations.TryGetValue(s, out Concentration c))
                {
                    w.WriteString("concentration", RunText.FormatConcentration(c));
                }

                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteStartArray("injections");
            foreach (RunInjection r in run.Injections)
            {
                WriteInjection(w, r);
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        writer.Write(Encoding.UTF8.GetString(stream.ToArray()));
        writer.Write('\n');
    }

    /// <summary>Writes a run to a UTF-8 JSON file (see <see cref="Write"/>).</summary>
    /// <param name="run">The run.</param>
    /// <param name="path">Path of the file; created or replaced.</param>
    /// <param name="internalStandardConcentrations">IS concentrations to state; null for none.</param>
    /// <exception cref="ArgumentNullException"><paramref name="run"/> or <paramref name="path"/> is null.</exception>
    /// <exception cref="ArgumentException">As <see cref="Write"/>.</exception>
    /// <exception cref="IOException">The file cannot be written.</exception>
    public static void WriteFile(AnalyticalRun run, string path, IReadOnlyDictionary<string, Concentration>? internalStandardConcentrations = null)
    {
        Guard.NotNull(path, nameof(path));
        using var writer = new StreamWriter(path, false, new UTF8Encoding(false));
        Write(run, writer, internalStandardConcentrations);
    }

    internal static JsonWriterOptions WriterOptions => new() { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    private static string Path(string array, int index) => array + "[" + index.ToString(CultureInfo.InvariantCulture) + "]";

    private static void WriteInjection(Utf8JsonWriter w, RunInjection r)
    {
        w.WriteStartObject();
        w.WriteNumber("order", r.Order);
        w.WriteString("role", RunText.Token(r.Role));
        w.WriteString("id", r.Id);
        if (r.ParentId is string p)
        {
            w.WriteString("parent", p);
        }

        if (r.AcquiredAt is DateTimeOffset t)
        {
            w.WriteString("time", RunText.FormatTime(t));
        }

        WriteSignals(w, "signals", r.Signals.Analytes);
        WriteSignals(w, "isSignals", r.Signals.InternalStandards);
        WriteConcentrations(w, "nominal", r.Nominal);
        WriteConcentrations(w, "added", r.Added);
        if (r.Preparation.Dilutions.Count > 0 || r.Preparation.IsSolid)
        {
            string[] f = PreparationCache.Fields(r.Preparation);
            w.WriteStartObject("preparation");
            w.WriteStartArray("dilutions");
            foreach (string step in r.Preparation.Dilutions.Select(RunText.FormatStep))
            {
                w.WriteStringValue(step);
            }

            w.WriteEndArray();
            for (int i = 1; i < 5; i++)
            {
                if (f[i].Length > 0)
                {
                    w.WriteString(PreparationProperties[i], f[i]);
                }
            }

            w.WriteEndObject();
        }

        w.WriteEndObject();
    }

    private static void WriteSignals(Utf8JsonWriter w, string name, IReadOnlyDictionary<string, double> signals)
    {
        w.WriteStartObject(name);
        foreach (KeyValuePair<string, double> s in signals)
        {
            w.WriteNumber(s.Key, s.Value);
        }

        w.WriteEndObject();
    }

    private static void WriteConcentrations(Utf8JsonWriter w, string name, IReadOnlyDictionary<string, Concentration> values)
    {
        if (values.Count == 0)
        {
            return;
        }

        w.WriteStartObject(name);
        foreach (KeyValuePair<string, Concentration> c in values)
        {
            w.WriteString(c.Key, RunText.FormatConcentration(c.Value));
        }

        w.WriteEndObject();
    }

    private static RowDraft Injection(JsonElement e, string path, List<string> analytes, List<string> internalStandards, PreparationCache cache)
    {
        var d = new RowDraft(0);
        d.At(RowField.Row, 0, path);
        if (e.ValueKind != JsonValueKind.Object)
        {
            d.Problem(RowField.Row, e.GetRawText(), "an injection must be an object");
            return d;
        }

        foreach (JsonProperty p in e.EnumerateObject())
        {
            string at = path + "." + p.Name;
            JsonElement v = p.Value;
            void Bad(string message) => d.Problem(0, at, v.GetRawText(), message);
            int k = Array.IndexOf(InjectionProperties, p.Name);
            if (k < 0)
            {
                Bad("unknown property; known: " + string.Join(", ", InjectionProperties));
                continue;
            }

            RowField field = k switch { 0 => RowField.Order, 1 => RowField.Role, 2 => RowField.Id, 3 => RowField.Parent, 4 => RowField.Time, 5 or 6 => RowField.Signal, 7 => RowField.Nominal, 8 => RowField.Added, _ => RowField.Preparation };
            d.At(field, 0, at);
            if (v.ValueKind == JsonValueKind.Null)
            {
                continue;
            }

            switch (p.Name)
            {
                case "order":
                    if (v.ValueKind == JsonValueKind.Number && v.TryGetInt32(out int order))
                    {
                        d.Order = order;
                    }
                    else
                    {
                        Bad("the injection order must be a whole number");
                    }

                    break;
                case "role":
                    if (v.ValueKind != JsonValueKind.String || RunText.Role(v.GetString()!, out InjectionRole role) is not null)
                    {
                        Bad("unknown role; known roles: " + RunText.RoleList);
                    }
                    else
                    {
                        d.Role = role;
                    }

                    break;
                case "id" or "parent":
                    if (v.ValueKind != JsonValueKind.String || string.IsNullOrWhiteSpace(v.GetString()))
                    {
                        Bad("must be a non-blank string");
                    }
                    else if (p.Name == "id")
                    {
                        d.Id = v.GetString()!.Trim();
                    }
                    else
                    {
                        d.Parent = v.GetString()!.Trim();
                    }

                    break;
                case "time":
                    DateTimeOffset time = default;
                    string? te = v.ValueKind != JsonValueKind.String ? "must be a string (ISO 8601)" : RunText.Time(v.GetString()!, out time);
                    if (te is not null)
                    {
                        Bad(te);
                    }
                    else
                    {
                        d.Time = time;
                    }

                    break;
                case "signals" or "isSignals":
                    bool analyte = p.Name == "signals";
                    Map(d, v, at, analyte ? analytes : internalStandards, analyte ? "analyte" : "internal standard", (name, x) =>
                    {
                        if (x.ValueKind != JsonValueKind.Number || !x.TryGetDouble(out double s) || double.IsInfinity(s))
                        {
                            return "a signal must be a finite number, or null when not recorded";
                        }

                        (analyte ? d.Signals : d.InternalStandardSignals)[name] = s;
                        return null;
                    });
                    break;
                case "nominal" or "added":
                    bool nominal = p.Name == "nominal";
                    Map(d, v, at, analytes, "analyte", (name, x) =>
                    {
                        if (x.ValueKind != JsonValueKind.String)
                        {
                            return "a concentration must be a string \"number unit\", e.g. \"5 µg/L\"";
                        }

                        if (RunText.Concentration(x.GetString()!, null, out Concentration c) is string ce)
                        {
                            return ce;
                        }

                        (nominal ? d.Nominal : d.Added)[name] = c;
                        return null;
                    });
                    break;
                default:
                    Preparation(d, v, at, cache);
                    break;
            }
        }

        foreach (string required in new[] { "order", "role", "id" })
        {
            if (!e.TryGetProperty(required, out JsonElement r) || r.ValueKind == JsonValueKind.Null)
            {
                d.Problem(0, path + "." + required, null, "the " + required + " is required");
            }
        }

        return d;
    }

    private static void Map(RowDraft d, JsonElement v, string at, List<string> declared, string what, Func<string, JsonElement, string?> take)
    {
        if (v.ValueKind != JsonValueKind.Object)
        {
            d.Problem(0, at, v.GetRawText(), "must be an object of name → value");
            return;
        }

        foreach (JsonProperty p in v.EnumerateObject())
        {
            if (!declared.Contains(p.Name))
            {
                d.Problem(0, at + "." + p.Name, null, "'" + p.Name + "' is not a declared " + what + " (declared: " + string.Join(", ", declared) + ")");
            }
            else if (p.Value.ValueKind != JsonValueKind.Null && take(p.Name, p.Value) is string error)
            {
                d.Problem(0, at + "." + p.Name, p.Value.GetRawText(), error);
            }
        }
    }

    private static void Preparation(RowDraft d, JsonElement v, string at, PreparationCache cache)
    {
        if (v.ValueKind != JsonValueKind.Object)
        {
            d.Problem(0, at, v.GetRawText(), "the preparation must be an object with " + string.Join(", ", PreparationProperties));
            return;
        }

        var cells = new string?[5];
        foreach (JsonProperty p in v.EnumerateObject())
        {
            int k = Array.IndexOf(PreparationProperties, p.Name);
            if (k < 0)
            {
                d.Problem(0, at + "." + p.Name, null, "unknown property; known: " + string.Join(", ", PreparationProperties));
            }
            else if (k == 0 && p.Value.ValueKind == JsonValueKind.Array && p.Value.EnumerateArray().All(x => x.ValueKind == JsonValueKind.String))
            {
                cells[0] = string.Join("; ", p.Value.EnumerateArray().Select(x => x.GetString()));
            }
            else if (k > 0 && p.Value.ValueKind == JsonValueKind.String)
            {
                cells[k] = p.Value.GetString();
            }
            else if (p.Value.ValueKind != JsonValueKind.Null)
            {
                d.Problem(0, at + "." + p.Name, p.Value.GetRawText(), k == 0 ? "must be an array of strings \"aliquot into final\"" : "must be a string");
            }
        }

        if (cache.Parse(cells, out SamplePreparation? prep, out int field) is string error)
        {
            d.Problem(0, at + "." + PreparationProperties[field], cells[field], error);
        }
        else
        {
            d.Preparation = prep;
        }
    }
}
