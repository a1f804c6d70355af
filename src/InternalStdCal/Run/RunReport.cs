using System.Collections.Generic;
using System.Linq;
using System.Text;
using InternalStdCal.Calibration;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>
/// The outcome of <see cref="RunProcessor.Process"/>: per analyte the calibration and its verdict, per sample and
/// analyte the result with flags and its reported value, the quality-control checks, the drift trends, and a status
/// row for every input injection. The uncertainty budget of a result is one call away
/// (<see cref="AnalyteResult.UncertaintyBudget"/>).
/// </summary>
/// <remarks>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide what is reported. Immutable.</remarks>
public sealed class RunReport
{
    private static readonly string[] Header1 = new[] { "analyte", "IS", "model", "points", "verdict" };

    private static readonly string[] Header2 = new[] { "sample", "role", "analyte", "measured", "interval", "in sample", "interval", "reported", "flags" };

    private static readonly string[] Header3 = new[] { "order", "id", "analyte", "nominal", "found", "recovery %", "verdict" };

    private static readonly string[] Header4 = new[] { "sample", "duplicate", "analyte", "sample value", "duplicate value", "RPD %", "verdict" };

    private static readonly string[] Header5 = new[] { "spiked", "parent", "analyte", "spiked value", "unspiked", "added", "recovery %", "verdict" };

    private static readonly string[] Header6 = new[] { "order", "role", "id", "status", "IS recovery %", "reasons" };

    private static readonly string[] Header7 = new[] { "series", "points", "slope per injection", "interval", "drift over run %", "verdict" };

    private static readonly bool[] Align1 = new[] { false, false, false, true, false };

    private static readonly bool[] Align2 = new[] { false, false, false, true, false, true, false, true, false };

    private static readonly bool[] Align3 = new[] { true, false, false, true, true, true, false };

    private static readonly bool[] Align4 = new[] { false, false, false, true, true, true, false };

    private static readonly bool[] Align5 = new[] { false, false, false, true, true, true, true, false };

    private static readonly bool[] Align6 = new[] { true, false, false, false, false, false };

    private static readonly bool[] Align7 = new[] { false, true, true, false, true, false };

    internal RunReport(
        AnalyticalRun run,
        RunMethod method,
        IReadOnlyDictionary<string, double?> references,
        IReadOnlyList<AnalyteCalibration> calibrations,
        IReadOnlyList<AnalyteResult> results,
        IReadOnlyList<QualityControlCheck> qualityControl,
        IReadOnlyList<DuplicateCheck> duplicates,
        IReadOnlyList<SpikeCheck> spikes,
        IReadOnlyList<InjectionOutcome> injections,
        IReadOnlyList<DriftCheck> drift,
        IReadOnlyList<string> notes)
    {
        Run = run;
        Method = method;
        InternalStandardReferences = references;
        Calibrations = calibrations;
        Results = results;
        QualityControl = qualityControl;
        Duplicates = duplicates;
        Spikes = spikes;
        Injections = injections;
        Drift = drift;
        Notes = notes;
    }

    /// <summary>The run processed.</summary>
    public AnalyticalRun Run { get; }

    /// <summary>The method used.</summary>
    public RunMethod Method { get; }

    /// <summary>IS name → reference IS signal of the recovery window (null when the run has no valid reference injection).</summary>
    public IReadOnlyDictionary<string, double?> InternalStandardReferences { get; }

    /// <summary>One calibration per analyte of the method, in the method's order.</summary>
    public IReadOnlyList<AnalyteCalibration> Calibrations { get; }

    /// <summary>One result per sample-like id (sample, duplicate, spiked sample, method blank) and analyte, by analyte
    /// then first injection order.</summary>
    public IReadOnlyList<AnalyteResult> Results { get; }

    /// <summary>One check per quality-control injection and analyte with a nominal value.</summary>
    public IReadOnlyList<QualityControlCheck> QualityControl { get; }

    /// <summary>One check per duplicate and analyte.</summary>
    public IReadOnlyList<DuplicateCheck> Duplicates { get; }

    /// <summary>One check per spiked sample and analyte with an added amount.</summary>
    public IReadOnlyList<SpikeCheck> Spikes { get; }

    /// <summary>One status row per input injection, in injection order.</summary>
    public IReadOnlyList<InjectionOutcome> Injections { get; }

    /// <summary>Drift trends with the method's <see cref="RunMethod.Drift"/> rule: one per IS of the run (signal in every
    /// injection where it is valid), then one per analyte of the method (QC recovery %), against injection order;
    /// empty when the method has no drift rule. Flagged drifts and series too short for a trend are also in
    /// <see cref="Notes"/>.</summary>
    public IReadOnlyList<DriftCheck> Drift { get; }

    /// <summary>Run-level remarks: analytes declared in the run but not processed by the method, flagged drifts, drift
    /// series without a trend.</summary>
    public IReadOnlyList<string> Notes { get; }

    /// <summary>The result of one sample for one analyte.</summary>
    /// <param name="sampleId">Sample id.</param>
    /// <param name="analyte">Analyte name.</param>
    /// <returns>The result, or null when there is none.</returns>
    public AnalyteResult? ResultFor(string sampleId, string analyte) =>
        Results.FirstOrDefault(r => r.SampleId == sampleId && r.Analyte == analyte);

    /// <summary>Short text of a set of qualifiers, e.g. "extrapolated, &lt;LOQ"; "-" for none.</summary>
    /// <param name="flags">The flags.</param>
    /// <returns>The text.</returns>
    public static string QualifierText(ResultQualifiers flags)
    {
        var parts = new List<string>();
        void Add(ResultQualifiers f, string text)
        {
            if ((flags & f) == f)
            {
                parts.Add(text);
            }
        }

        Add(ResultQualifiers.NotQuantified, "not quantified");
        Add(ResultQualifiers.MissingOrInvalidSignal, "signal missing/invalid");
        Add(ResultQualifiers.Extrapolated, "extrapolated");
        Add(ResultQualifiers.BelowLimitOfDetection, "<LOD");
        Add(ResultQualifiers.BelowLimitOfQuantitation, "<LOQ");
        Add(ResultQualifiers.InternalStandardRecoveryOutOfWindow, "IS recovery");
        Add(ResultQualifiers.QualityControlFailureInBracket, "QC bracket");
        Add(ResultQualifiers.CalibrationRejected, "calibration rejected");
        Add(ResultQualifiers.NonPositiveAnalyteSignal, "signal ≤ 0");
        Add(ResultQualifiers.DuplicateRpdExceeded, "RPD");
        Add(ResultQualifiers.SpikeRecoveryOutOfWindow, "spike recovery");
        Add(ResultQualifiers.SuspectReplicate, "suspect replicate");
        return parts.Count == 0 ? "-" : string.Join(", ", parts);
    }

    /// <summary>A readable report for the console: calibrations, results with the reported value and flags, QC checks,
    /// drift trends, the status of every injection and the notes (invariant culture).</summary>
    /// <returns>Multi-line text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append("Run '").Append(Run.Name).Append("' processed with method '").Append(Method.Name).AppendLine("'");
        sb.Append("IS recovery window: ").AppendLine(Method.RecoveryWindow.ToString());
        sb.AppendLine();
        sb.AppendLine("Calibrations");
        var cal = new List<string[]> { Header1 };
        foreach (AnalyteCalibration c in Calibrations)
        {
            cal.Add(new[]
            {
                c.Analyte,
                c.Method.InternalStandard,
                c.Calibration?.Model.ToString() ?? c.Method.Model.ToString(),
                c.Calibration is null ? "-" : Text.I(c.Calibration.PointCount),
                c.Calibration is null ? "FAILED: " + c.Failure : c.Verdict is null ? "no rule set" : (c.Verdict.Accepted ? "accepted" : "REJECTED") + " (" + c.Verdict.RuleSet.Name + ")",
            });
        }

        ResultText.AppendTable(sb, cal, Align1);
        sb.AppendLine();
        sb.Append("Results (").Append(Text.F(100 * Method.ConfidenceLevel, 0)).AppendLine(" % interval)");
        var res = new List<string[]> { Header2 };
        foreach (AnalyteResult r in Results)
        {
            res.Add(new[]
            {
                r.SampleId,
                r.Role.ToString(),
                r.Analyte,
                Conc(r.InMeasuredSolution),
                Interval(r.MeasuredLower, r.MeasuredUpper),
                Conc(r.InSample?.Value),
                Interval(r.SampleLower, r.SampleUpper),
                r.Reported?.ToString() ?? "n/a",
                QualifierText(r.Qualifiers),
            });
        }

        ResultText.AppendTable(sb, res, Align2);
        if (QualityControl.Count > 0)
        {
            sb.AppendLine();
            sb.AppendLine("Quality-control checks");
            var qc = new List<string[]> { Header3 };
            foreach (QualityControlCheck c in QualityControl)
            {
                qc.Add(new[] { Text.I(c.Injection.Order), c.Injection.Id, c.Analyte, Conc(c.Nominal), Conc(c.Found), Pct(c.RecoveryPercent), Verdict(c.Passed, c.Window?.ToString()) });
            }

            ResultText.AppendTable(sb, qc, Align3);
        }

        if (Duplicates.Count > 0)
        {
            sb.AppendLine();
            sb.AppendLine("Duplicates (original sample)");
            var d = new List<string[]> { Header4 };
            foreach (DuplicateCheck c in Duplicates)
            {
                d.Add(new[] { c.SampleId, c.DuplicateId, c.Analyte, Conc(c.Sample), Conc(c.Duplicate), Pct(c.RpdPercent), Verdict(c.Passed, c.Limit?.ToString()) });
            }

            ResultText.AppendTable(sb, d, Align4);
        }

        if (Spikes.Count > 0)
        {
            sb.AppendLine();
            sb.AppendLine("Spike recoveries (original sample)");
            var s = new List<string[]> { Header5 };
            foreach (SpikeCheck c in Spikes)
            {
                s.Add(new[] { c.SpikedId, c.ParentId, c.Analyte, Conc(c.Spiked), Conc(c.Unspiked), Conc(c.Added), Pct(c.RecoveryPercent), Verdict(c.Passed, c.Window?.ToString()) });
            }

            ResultText.AppendTable(sb, s, Align5);
        }

        if (Drift.Count > 0)
        {
            sb.AppendLine();
            sb.Append("Drift across injection order (").Append(Method.Drift).AppendLine(")");
            var d = new List<string[]> { Header7 };
            foreach (DriftCheck c in Drift)
            {
                DriftTrend? t = c.Trend;
                d.Add(new[]
                {
                    c.ToString(),
                    Text.I(c.InjectionOrders.Count),
                    t is null ? "-" : Text.G(t.Slope),
                    t is null ? "-" : "[" + Text.G(t.SlopeInterval.Lower) + ", " + Text.G(t.SlopeInterval.Upper) + "]",
                    t is null ? "-" : Text.F(t.DriftOverRunPercent, 1),
                    t is null ? "no trend: " + c.Failure : t.IsFlagged ? "DRIFT" : "not flagged",
                });
            }

            ResultText.AppendTable(sb, d, Align7);
        }

        sb.AppendLine();
        sb.AppendLine("Injections");
        var inj = new List<string[]> { Header6 };
        foreach (InjectionOutcome o in Injections)
        {
            inj.Add(new[]
            {
                Text.I(o.Injection.Order),
                o.Injection.Role.ToString(),
                o.Injection.Id,
                o.Status.ToString(),
                string.Join(" ", o.InternalStandardRecoveries.Select(x => x.InternalStandard + " " + (x.RecoveryPercent is double p ? Text.F(p, 1) + (x.WithinWindow == false ? "!" : string.Empty) : "n/a"))),
                o.Reasons.Count == 0 ? "-" : string.Join(" | ", o.Reasons),
            });
        }

        ResultText.AppendTable(sb, inj, Align6);
        sb.AppendLine("(! = IS recovery outside the window)");
        foreach (string note in Notes)
        {
            sb.Append("Note: ").AppendLine(note);
        }

        return sb.ToString();
    }

    private static string Conc(Concentration? c) => c is Concentration v ? v.ToString("G5", null) : "n/a";

    private static string Interval(Concentration? lo, Concentration? hi) =>
        lo is Concentration l && hi is Concentration h ? "[" + Text.G(l.Value) + ", " + Text.G(h.In(l.Unit)) + "]" : "-";

    private static string Pct(double? p) => p is double v ? Text.F(v, 1) : "n/a";

    private static string Verdict(bool? passed, string? criterion) =>
        passed is null ? "not judged" : (passed.Value ? "pass" : "FAIL") + " (" + criterion + ")";
}
