using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Text;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.IO;

/// <summary>
/// Writes the results of a run as CSV, one row per sample × analyte (docs/run-file-format.md): comma-separated,
/// invariant culture, numbers in round-trip precision, each number column beside its unit column.
/// </summary>
public static class RunResultsCsv
{
    /// <summary>The header written, in order.</summary>
    public static IReadOnlyList<string> Columns { get; } = new[]
    {
        "sample", "role", "analyte", "injections",
        "measured", "measured-low", "measured-high", "measured-unit",
        "in-sample", "in-sample-u", "sample-low", "sample-high", "sample-unit",
        "flags", "qualifiers", "notes",
        "reported", "reported-status", "reporting-limit", "reporting-limit-unit",
    };

    /// <summary>Writes one row per sample × analyte. Measured values are given in the unit of the measured result,
    /// sample values in the unit of the sample result; "flags" is the readable text of
    /// <see cref="RunReport.QualifierText"/>, "qualifiers" the flag names, "notes" the trail joined by " | ";
    /// "injections" the injection orders separated by spaces; "reported" is the reported value as text
    /// (e.g. <c>&lt; 0.15 µg/L (LOQ)</c>), "reported-status" its <see cref="InternalStdCal.Limits.ReportedStatus"/>
    /// name, "reporting-limit" the limit of a censored value in its own unit ("reporting-limit-unit").
    /// Empty cell = no value.</summary>
    /// <param name="results">The results.</param>
    /// <param name="writer">Where to write; not disposed.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static void Write(RunResults results, TextWriter writer)
    {
        Guard.NotNull(results, nameof(results));
        Guard.NotNull(writer, nameof(writer));
        var rows = new List<string?[]>();
        foreach (SampleAnalyteResult r in results.Results)
        {
            ConcentrationUnit? mu = r.Measured?.Unit ?? r.MeasuredLower?.Unit;
            ConcentrationUnit? su = r.InSample?.Unit ?? r.SampleLower?.Unit;
            rows.Add(new[]
            {
                r.SampleId,
                RunText.Token(r.Role),
                r.Analyte,
                string.Join(" ", r.InjectionOrders.Select(o => o.ToString(CultureInfo.InvariantCulture))),
                Number(r.Measured, mu),
                Number(r.MeasuredLower, mu),
                Number(r.MeasuredUpper, mu),
                mu is ConcentrationUnit m ? RunText.FormatUnit(m) : null,
                Number(r.InSample, su),
                Number(r.InSampleStandardUncertainty, su),
                Number(r.SampleLower, su),
                Number(r.SampleUpper, su),
                su is ConcentrationUnit s ? RunText.FormatUnit(s) : null,
                RunReport.QualifierText(r.Qualifiers),
                r.Qualifiers.ToString(),
                string.Join(" | ", r.Notes),
                r.ReportedText,
                r.ReportedStatus?.ToString(),
                Number(r.ReportingLimit, r.ReportingLimit?.Unit),
                r.ReportingLimit is Concentration limit ? RunText.FormatUnit(limit.Unit) : null,
            });
        }

        CsvTable.Write(writer, Columns, rows);
    }

    /// <summary>Writes the results of a report (see <see cref="RunResults.From"/>).</summary>
    /// <param name="report">The report.</param>
    /// <param name="writer">Where to write; not disposed.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static void Write(RunReport report, TextWriter writer) => Write(RunResults.From(report), writer);

    /// <summary>Writes results to a UTF-8 file.</summary>
    /// <param name="results">The results.</param>
    /// <param name="path">Path of the file; created or replaced.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="IOException">The file cannot be written.</exception>
    public static void WriteFile(RunResults results, string path)
    {
        Guard.NotNull(path, nameof(path));
        using var writer = new StreamWriter(path, false, new UTF8Encoding(false));
        Write(results, writer);
    }

    private static string? Number(Concentration? c, ConcentrationUnit? unit) =>
        c is Concentration v && unit is ConcentrationUnit u
            ? (v.Unit == u ? v.Value : v.In(u)).ToString("R", CultureInfo.InvariantCulture)
            : null;
}
