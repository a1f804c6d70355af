using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Text;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Sylvan.Data.Csv;

namespace InternalStdCal.IO;

/// <summary>
/// Reads and writes an analytical run as CSV in the library's own column schema (docs/run-file-format.md): one row
/// per injection, comma-separated, invariant culture, header required, '#' comment lines.
/// </summary>
/// <remarks>
/// <para>Fixed columns (names case-insensitive, any order): <c>order</c>, <c>role</c>, <c>id</c> (required);
/// <c>parent</c>, <c>time</c>, <c>dilution</c>, <c>sample-mass</c>, <c>digest-volume</c>, <c>digest-mass</c>,
/// <c>result-unit</c> (optional). Named columns: <c>analyte:NAME</c> (analyte signal), <c>is:NAME [C]</c> (IS signal;
/// optional IS concentration C in every measured solution), <c>nominal:NAME [unit]</c>, <c>added:NAME [unit]</c>
/// (concentrations; with the unit in the header the cells are plain numbers, otherwise "number unit").</para>
/// <para>Lenient reading (<see cref="Read"/>): every problem is reported with its line, column and value, and only
/// the rows with a problem are left out; a file whose header lacks a required column gives no run. Strict reading
/// (<see cref="ReadStrict"/>) throws <see cref="RunFileException"/> listing every problem. Fields are split by the
/// CSV library (RFC 4180 quoting; malformed quotes are read leniently so later rows are not lost: a bad row whose quoted
/// field runs over line breaks is reported on its first line and reading goes on from the next line).</para>
/// </remarks>
public static class RunCsv
{
    private static readonly string[] FixedColumns = { "order", "role", "id", "parent", "time", "dilution", "sample-mass", "digest-volume", "digest-mass", "result-unit" };

    private enum Kind
    {
        Fixed,
        Analyte,
        InternalStandard,
        Nominal,
        Added,
    }

    /// <summary>Reads a run leniently: the good rows plus a problem per bad line, column or header issue.</summary>
    /// <param name="reader">The CSV text; read to the end, not disposed.</param>
    /// <param name="runName">Name of the run; not blank.</param>
    /// <returns>The run of good rows (null when none could be formed), the IS concentrations from the header and the
    /// problems.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="runName"/> is blank.</exception>
    public static RunReadResult Read(TextReader reader, string runName)
    {
        Guard.NotNull(reader, nameof(reader));
        Guard.NotBlank(runName, nameof(runName));
        int line = 0;
        var options = new CsvDataReaderOptions
        {
            Delimiter = ',',
            HasHeaders = true,
            CsvStyle = CsvStyle.Lax,
            OwnsReader = false,
            Comment = '#',
            CommentHandler = new Action<string>(_ => line++),
        };

        var fileProblems = new List<RunFileProblem>();
        var drafts = new List<RowDraft>();
        string text = RunText.WithoutByteOrderMark(reader.ReadToEnd());
        CsvDataReader csv;
        try
        {
            csv = CsvDataReader.Create(new StringReader(text), options);
        }
        catch (CsvMissingHeadersException)
        {
            fileProblems.Add(new RunFileProblem(line + 1, 0, null, null, "the file has no header row; a header naming the columns is required"));
            return RunAssembler.Assemble(runName, Array.Empty<string>(), Array.Empty<string>(), new Dictionary<string, Concentration>(), fileProblems, Array.Empty<RowDraft>(), fatal: true);
        }

        int headerLine = line + 1;
        string[] names = Enumerable.Range(0, csv.FieldCount).Select(i => csv.GetName(i) ?? string.Empty).ToArray();
        line = headerLine + names.Sum(Breaks);
        Column[] columns = Header(names, headerLine, fileProblems, out IReadOnlyDictionary<string, Concentration> isConcentrations, out bool fatal);
        string[] analytes = columns.Where(c => c.Kind == Kind.Analyte).Select(c => c.Name).ToArray();
        string[] internalStandards = columns.Where(c => c.Kind == Kind.InternalStandard).Select(c => c.Name).ToArray();
        var cache = new PreparationCache();
        try
        {
            while (!fatal && Next(csv, line, fileProblems))
            {
                int rowLine = line + 1;
                string[] cells = Enumerable.Range(0, csv.RowFieldCount).Select(i => csv.GetString(i)).ToArray();
                line = rowLine + cells.Sum(Breaks);
                if (cells.All(c => c.Trim().Length == 0))
                {
                    continue;
                }

                var d = new RowDraft(rowLine);
                drafts.Add(d);
                if (cells.Length != names.Length)
                {
                    d.Problem(Math.Min(cells.Length, names.Length) + 1, null, null, FormattableString.Invariant($"the row has {cells.Length} fields; the header has {names.Length}"));
                }
                else
                {
                    Row(d, cells, columns, cache);
                }

                if (line > rowLine && (d.Problems.Count > 0 || RunAssembler.Build(d) is null))
                {
                    // A bad row whose quoted field runs over line breaks most likely has an unclosed quote that swallowed
                    // the lines below it: only its first line is left out, and reading goes on from the next line.
                    int field = Array.FindIndex(cells, c => c.Contains('\n'));
                    d.Problems.Clear();
                    d.Problem(field + 1, field < names.Length ? names[field] : null, cells[field].Substring(0, cells[field].IndexOf('\n')).TrimEnd('\r'), "a quoted field is not closed on this line and the row is bad; the line is left out and the next line is read as a new row");
                    line = rowLine;
                    csv.Dispose();
                    options.HasHeaders = false;
                    csv = CsvDataReader.Create(new StringReader(text.Substring(LineStart(text, rowLine + 1))), options);
                }
            }
        }
        finally
        {
            csv.Dispose();
        }

        return RunAssembler.Assemble(runName, analytes, internalStandards, isConcentrations, fileProblems, drafts, fatal);
    }

    /// <summary>Reads a run file leniently; the run is named after the file (without extension).</summary>
    /// <param name="path">Path of a UTF-8 CSV file.</param>
    /// <returns>See <see cref="Read"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="path"/> is null.</exception>
    /// <exception cref="IOException">The file cannot be read.</exception>
    public static RunReadResult ReadFile(string path)
    {
        Guard.NotNull(path, nameof(path));
        using var reader = new StreamReader(path, Encoding.UTF8);
        return Read(reader, Path.GetFileNameWithoutExtension(path));
    }

    /// <summary>Reads a run and requires a clean file.</summary>
    /// <param name="reader">The CSV text; read to the end, not disposed.</param>
    /// <param name="runName">Name of the run; not blank.</param>
    /// <returns>The run.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="runName"/> is blank.</exception>
    /// <exception cref="RunFileException">The file has at least one problem (all are listed, with line and column).</exception>
    public static AnalyticalRun ReadStrict(TextReader reader, string runName) => Read(reader, runName).RunOrThrow();

    /// <summary>Writes a run in the CSV schema; <see cref="Read"/> reads it back to an equal run (same rows, values,
    /// times and preparation values; dilution-step labels and uncertainty evaluation types are not kept — a stated
    /// uncertainty is read back as a Type B standard uncertainty).</summary>
    /// <param name="run">The run.</param>
    /// <param name="writer">Where to write; not disposed.</param>
    /// <param name="internalStandardConcentrations">IS name → IS concentration to state in the header; null or empty
    /// for none. Names must be IS of the run.</param>
    /// <exception cref="ArgumentNullException"><paramref name="run"/> or <paramref name="writer"/> is null.</exception>
    /// <exception cref="ArgumentException">A name cannot be written (it contains '[' or ']', or starts or ends with
    /// white space), an id starts or ends with white space, a concentration names an IS the run lacks, or a dilution
    /// step uses a density.</exception>
    public static void Write(AnalyticalRun run, TextWriter writer, IReadOnlyDictionary<string, Concentration>? internalStandardConcentrations = null)
    {
        Guard.NotNull(run, nameof(run));
        Guard.NotNull(writer, nameof(writer));
        internalStandardConcentrations ??= new Dictionary<string, Concentration>();
        foreach (string n in internalStandardConcentrations.Keys)
        {
            if (!run.InternalStandards.Contains(n, StringComparer.Ordinal))
            {
                throw new ArgumentException("Parameter 'internalStandardConcentrations' names IS '" + n + "', which run '" + run.Name + "' does not declare.", nameof(internalStandardConcentrations));
            }
        }

        foreach (string n in run.Analytes.Concat(run.InternalStandards))
        {
            CheckName(n, nameof(run));
        }

        CheckIds(run);

        string[] nominal = run.Analytes.Where(a => run.Injections.Any(r => r.Nominal.ContainsKey(a))).ToArray();
        string[] added = run.Analytes.Where(a => run.Injections.Any(r => r.Added.ContainsKey(a))).ToArray();
        var header = new List<string>(FixedColumns);
        header.AddRange(run.Analytes.Select(a => "analyte:" + a));
        header.AddRange(run.InternalStandards.Select(s => "is:" + s + (internalStandardConcentrations.TryGetValue(s, out Concentration c) ? " [" + RunText.FormatConcentration(c) + "]" : string.Empty)));
        header.AddRange(nominal.Select(a => "nominal:" + a));
        header.AddRange(added.Select(a => "added:" + a));
        var rows = new List<string?[]>();
        foreach (RunInjection r in run.Injections)
        {
            var cells = new List<string?>
            {
                r.Order.ToString(CultureInfo.InvariantCulture),
                RunText.Token(r.Role),
                r.Id,
                r.ParentId,
                r.AcquiredAt is DateTimeOffset t ? RunText.FormatTime(t) : null,
            };
            cells.AddRange(PreparationCache.Fields(r.Preparation));
            cells.AddRange(run.Analytes.Select(a => r.Signals.Analyte(a) is double v ? RunText.FormatSignal(v) : null));
            cells.AddRange(run.InternalStandards.Select(s => r.Signals.InternalStandard(s) is double v ? RunText.FormatSignal(v) : null));
            cells.AddRange(nominal.Select(a => r.Nominal.TryGetValue(a, out Concentration v) ? RunText.FormatConcentration(v) : null));
            cells.AddRange(added.Select(a => r.Added.TryGetValue(a, out Concentration v) ? RunText.FormatConcentration(v) : null));
            rows.Add(cells.ToArray());
        }

        CsvTable.Write(writer, header, rows);
    }

    /// <summary>Writes a run to a UTF-8 file (see <see cref="Write"/>).</summary>
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

    internal static void CheckName(string name, string paramName)
    {
        if (name.Any(ch => ch is '[' or ']') || name.Trim().Length != name.Length)
        {
            throw new ArgumentException("Parameter '" + paramName + "' has the name '" + name + "'; names written to a run file must not contain '[' or ']' nor start or end with white space.", paramName);
        }
    }

    /// <summary>Readers trim ids, so ids with outer white space cannot be written faithfully.</summary>
    internal static void CheckIds(AnalyticalRun run)
    {
        foreach (RunInjection r in run.Injections.Where(r => r.Id.Trim().Length != r.Id.Length))
        {
            throw new ArgumentException("Parameter 'run': row " + r + " has an id with leading or trailing white space, which a run file cannot keep.", nameof(run));
        }
    }

    private static int Breaks(string s) => s.Count(ch => ch == '\n');

    /// <summary>Offset of the first character of a 1-based physical line (lines end with '\n').</summary>
    private static int LineStart(string text, int line)
    {
        int at = 0;
        for (int n = 1; n < line; n++)
        {
            at = text.IndexOf('\n', at) + 1;
        }

        return at;
    }

    // The CSV library throws only on what it cannot split at all (e.g. a record larger than its buffer): reported,
    // and the rows read so far are kept.
    private static bool Next(CsvDataReader csv, int line, List<RunFileProblem> problems)
    {
        try
        {
            return csv.Read();
        }
        catch (Exception ex) when (ex is CsvFormatException or CsvRecordTooLargeException)
        {
            problems.Add(new RunFileProblem(line + 1, 0, null, null, "the CSV reader stopped here (" + ex.Message + "); later rows were not read"));
            return false;
        }
    }

    private static Column[] Header(string[] names, int line, List<RunFileProblem> problems, out IReadOnlyDictionary<string, Concentration> isConcentrations, out bool fatal)
    {
        var columns = new List<Column>();
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        var isConc = new SortedDictionary<string, Concentration>(StringComparer.Ordinal);
        for (int i = 0; i < names.Length; i++)
        {
            string raw = names[i].Trim();
            void Problem(string message) => problems.Add(new RunFileProblem(line, i + 1, raw, null, message));
            if (raw.Length == 0)
            {
                Problem("empty column name; the column is ignored");
                continue;
            }

            Column? c = Parse(raw, i, out string? error);
            if (c is null)
            {
                Problem(error!);
                continue;
            }

            string key = c.Kind + ":" + c.Name;
            if (seen.TryGetValue(key, out int first))
            {
                Problem("duplicate column (first is column " + (first + 1).ToString(CultureInfo.InvariantCulture) + "); this one is ignored");
                continue;
            }

            if (c.Bracket is string b)
            {
                if (c.Kind == Kind.InternalStandard)
                {
                    string? e = RunText.Concentration(b, null, out Concentration conc);
                    if (e is not null || !(conc.Value > 0))
                    {
                        Problem("the IS concentration in brackets must be a concentration > 0, e.g. [10 µg/L]" + (e is null ? string.Empty : ": " + e));
                    }
                    else
                    {
                        isConc[c.Name] = conc;
                    }
                }
                else if (c.Kind is Kind.Nominal or Kind.Added)
                {
                    if (RunText.Unit(b, out ConcentrationUnit u) is string e)
                    {
                        Problem("the unit in brackets is " + e);
                        continue;
                    }

                    c.Unit = u;
                }
                else
                {
                    Problem("brackets are only allowed in is:, nominal: and added: columns; the column is ignored");
                    continue;
                }
            }

            seen[key] = i;
            columns.Add(c);
        }

        var analytes = new HashSet<string>(columns.Where(c => c.Kind == Kind.Analyte).Select(c => c.Name), StringComparer.Ordinal);
        foreach (Column c in columns.Where(c => c.Kind is Kind.Nominal or Kind.Added && !analytes.Contains(c.Name)).ToArray())
        {
            problems.Add(new RunFileProblem(line, c.Index + 1, c.Header, null, "names analyte '" + c.Name + "', which has no analyte:" + c.Name + " column; the column is ignored"));
            columns.Remove(c);
        }

        fatal = false;
        string hint = names.Length == 1 && (names[0].Contains(';') || names[0].Contains('\t'))
            ? " (the header has a single column: is the file separated by ';' or tabs? This format uses ',')"
            : string.Empty;
        foreach (string required in new[] { "order", "role", "id" })
        {
            if (!columns.Any(c => c.Kind == Kind.Fixed && c.Name == required))
            {
                problems.Add(new RunFileProblem(line, 0, required, null, "required column '" + required + "' is missing; no row can be read" + hint));
                fatal = true;
            }
        }

        if (!fatal && analytes.Count == 0)
        {
            problems.Add(new RunFileProblem(line, 0, "analyte:", null, "no analyte:NAME column; a run needs at least one analyte"));
            fatal = true;
        }

        if (!fatal && !columns.Any(c => c.Kind == Kind.InternalStandard))
        {
            problems.Add(new RunFileProblem(line, 0, "is:", null, "no is:NAME column; a run needs at least one internal standard"));
            fatal = true;
        }

        isConcentrations = isConc;
        return columns.ToArray();
    }

    private static Column? Parse(string raw, int index, out string? error)
    {
        error = null;
        foreach (string f in FixedColumns)
        {
            if (string.Equals(raw, f, StringComparison.OrdinalIgnoreCase))
            {
                return new Column(Kind.Fixed, f, null, index, raw);
            }
        }

        int colon = raw.IndexOf(':');
        Kind? kind = colon < 0 ? null : raw.Substring(0, colon).Trim().ToUpperInvariant() switch
        {
            "ANALYTE" => Kind.Analyte,
            "IS" => Kind.InternalStandard,
            "NOMINAL" => Kind.Nominal,
            "ADDED" => Kind.Added,
            _ => null,
        };
        if (kind is null)
        {
            error = "unknown column; known: " + string.Join(", ", FixedColumns) + ", analyte:NAME, is:NAME, nominal:NAME, added:NAME; the column is ignored";
            return null;
        }

        string rest = raw.Substring(colon + 1).Trim();
        string? bracket = null;
        int open = rest.IndexOf('[');
        if (open >= 0)
        {
            if (rest[rest.Length - 1] != ']')
            {
                error = "a '[' must close with ']' at the end of the column name; the column is ignored";
                return null;
            }

            bracket = rest.Substring(open + 1, rest.Length - open - 2).Trim();
            rest = rest.Substring(0, open).Trim();
        }

        if (rest.Length == 0 || rest.Contains(']'))
        {
            error = "the column names no analyte or IS after the prefix; the column is ignored";
            return null;
        }

        return new Column(kind.Value, rest, bracket, index, raw);
    }

    private static void Row(RowDraft d, string[] cells, Column[] columns, PreparationCache cache)
    {
        var prep = new string?[5];
        var prepColumns = new Column?[5];
        foreach (Column c in columns)
        {
            string text = cells[c.Index];
            string t = text.Trim();
            int n = c.Index + 1;
            void Bad(string message) => d.Problem(n, c.Header, text, message);
            switch (c.Kind)
            {
                case Kind.Analyte or Kind.InternalStandard:
                    d.At(RowField.Signal, n, c.Header);
                    if (t.Length == 0)
                    {
                        break;
                    }

                    if (RunText.Signal(t, out double v) is string se)
                    {
                        Bad(se);
                    }
                    else
                    {
                        (c.Kind == Kind.Analyte ? d.Signals : d.InternalStandardSignals)[c.Name] = v;
                    }

                    break;
                case Kind.Nominal or Kind.Added:
                    d.At(c.Kind == Kind.Nominal ? RowField.Nominal : RowField.Added, n, c.Header);
                    if (t.Length == 0)
                    {
                        break;
                    }

                    if (RunText.Concentration(t, c.Unit, out Concentration conc) is string ce)
                    {
                        Bad(ce);
                    }
                    else
                    {
                        (c.Kind == Kind.Nominal ? d.Nominal : d.Added)[c.Name] = conc;
                    }

                    break;
                default:
                    Fixed(d, c, text, n, prep, prepColumns);
                    break;
            }
        }

        if (prep.Any(p => !string.IsNullOrWhiteSpace(p)))
        {
            if (cache.Parse(prep, out SamplePreparation? p, out int field) is string pe)
            {
                Column c = prepColumns[field] ?? prepColumns.First(x => x is not null)!;
                d.Problem(c.Index + 1, c.Header, prep[field] ?? cells[c.Index], pe);
            }
            else
            {
                d.Preparation = p;
                Column c = prepColumns.First(x => x is not null)!;
                d.At(RowField.Preparation, c.Index + 1, c.Header);
            }
        }
    }

    private static void Fixed(RowDraft d, Column c, string text, int n, string?[] prep, Column?[] prepColumns)
    {
        string t = text.Trim();
        void Bad(string message) => d.Problem(n, c.Header, text, message);
        switch (c.Name)
        {
            case "order":
                d.At(RowField.Order, n, c.Header);
                if (t.Length == 0)
                {
                    Bad("the injection order is required");
                }
                else if (RunText.Order(t, out int order) is string oe)
                {
                    Bad(oe);
                }
                else
                {
                    d.Order = order;
                }

                break;
            case "role":
                d.At(RowField.Role, n, c.Header);
                if (RunText.Role(t, out InjectionRole role) is string re)
                {
                    Bad(t.Length == 0 ? "the role is required; roles: " + RunText.RoleList : re);
                }
                else
                {
                    d.Role = role;
                }

                break;
            case "id":
                d.At(RowField.Id, n, c.Header);
                if (t.Length == 0)
                {
                    Bad("the id is required");
                }
                else
                {
                    d.Id = t;
                }

                break;
            case "parent":
                d.At(RowField.Parent, n, c.Header);
                d.Parent = t.Length == 0 ? null : t;
                break;
            case "time":
                d.At(RowField.Time, n, c.Header);
                if (t.Length == 0)
                {
                    break;
                }

                if (RunText.Time(t, out DateTimeOffset time) is string te)
                {
                    Bad(te);
                }
                else
                {
                    d.Time = time;
                }

                break;
            default:
                int k = Array.IndexOf(FixedColumns, c.Name) - 5;
                prep[k] = t;
                prepColumns[k] = c;
                break;
        }
    }

    private sealed class Column
    {
        internal Column(Kind kind, string name, string? bracket, int index, string header)
        {
            Kind = kind;
            Name = name;
            Bracket = bracket;
            Index = index;
            Header = header;
        }

        internal Kind Kind { get; }

        internal string Name { get; }

        internal string? Bracket { get; }

        internal int Index { get; }

        internal string Header { get; }

        internal ConcentrationUnit? Unit { get; set; }
    }
}
