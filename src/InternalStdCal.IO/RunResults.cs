using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Limits;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.IO;

/// <summary>
/// The results of a processed run as plain data: what <see cref="RunResultsJson"/> writes and reads back (equal values)
/// and <see cref="RunResultsCsv"/> writes. Made from a <see cref="RunReport"/> with <see cref="From"/>.
/// </summary>
/// <remarks>Value equality (lists compared element by element, numbers exactly). The library computes; the lab's
/// validated method, its QA system, local regulations and licensed practice decide what is reported.</remarks>
public sealed record RunResults
{
    /// <summary>The value of <see cref="Format"/> this version writes.</summary>
    public const string CurrentFormat = "internalstdcal.run-results/1";

    /// <summary>Schema tag of the JSON document.</summary>
    public string Format { get; init; } = CurrentFormat;

    /// <summary>Name of the run.</summary>
    public string RunName { get; init; } = string.Empty;

    /// <summary>Name of the method.</summary>
    public string MethodName { get; init; } = string.Empty;

    /// <summary>Confidence level of the intervals, in (0, 1).</summary>
    public double ConfidenceLevel { get; init; }

    /// <summary>The IS recovery window, as printed by the method.</summary>
    public string InternalStandardRecoveryWindow { get; init; } = string.Empty;

    /// <summary>IS name → reference IS signal of the recovery (null without a valid reference injection).</summary>
    public IReadOnlyDictionary<string, double?> InternalStandardReferences { get; init; } = new Dictionary<string, double?>();

    /// <summary>One calibration summary per analyte.</summary>
    public IReadOnlyList<CalibrationSummary> Calibrations { get; init; } = Array.Empty<CalibrationSummary>();

    /// <summary>One result per sample × analyte.</summary>
    public IReadOnlyList<SampleAnalyteResult> Results { get; init; } = Array.Empty<SampleAnalyteResult>();

    /// <summary>Quality-control recoveries.</summary>
    public IReadOnlyList<QualityControlResult> QualityControl { get; init; } = Array.Empty<QualityControlResult>();

    /// <summary>Duplicate RPDs.</summary>
    public IReadOnlyList<DuplicateResult> Duplicates { get; init; } = Array.Empty<DuplicateResult>();

    /// <summary>Spike recoveries.</summary>
    public IReadOnlyList<SpikeResult> Spikes { get; init; } = Array.Empty<SpikeResult>();

    /// <summary>One status row per input injection, in injection order.</summary>
    public IReadOnlyList<InjectionResult> Injections { get; init; } = Array.Empty<InjectionResult>();

    /// <summary>Drift checks across injection order (empty when the method sets no drift rule).</summary>
    public IReadOnlyList<DriftResult> Drift { get; init; } = Array.Empty<DriftResult>();

    /// <summary>Run-level notes of the report (e.g. drift flagged, calibration problems), in the report's order.</summary>
    public IReadOnlyList<string> Notes { get; init; } = Array.Empty<string>();

    /// <summary>Copies a report into plain data.</summary>
    /// <param name="report">The report of <see cref="RunProcessor.Process"/>.</param>
    /// <returns>The results.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="report"/> is null.</exception>
    public static RunResults From(RunReport report)
    {
        Guard.NotNull(report, nameof(report));
        return new RunResults
        {
            RunName = report.Run.Name,
            MethodName = report.Method.Name,
            ConfidenceLevel = report.Method.ConfidenceLevel,
            InternalStandardRecoveryWindow = report.Method.RecoveryWindow.ToString(),
            InternalStandardReferences = new SortedDictionary<string, double?>(report.InternalStandardReferences.ToDictionary(p => p.Key, p => p.Value, StringComparer.Ordinal), StringComparer.Ordinal),
            Calibrations = report.Calibrations.Select(c => new CalibrationSummary
            {
                Analyte = c.Analyte,
                InternalStandard = c.Method.InternalStandard,
                Model = c.Calibration?.Model ?? c.Method.Model,
                PointCount = c.Calibration?.PointCount,
                Accepted = c.IsAccepted,
                RuleSet = c.Verdict?.RuleSet.Name,
                Failure = c.Failure,
                InjectionOrders = c.InjectionOrders.ToArray(),
            }).ToArray(),
            Results = report.Results.Select(r => new SampleAnalyteResult
            {
                SampleId = r.SampleId,
                Role = r.Role,
                Analyte = r.Analyte,
                InjectionOrders = r.InjectionOrders.ToArray(),
                Measured = r.InMeasuredSolution,
                MeasuredLower = r.MeasuredLower,
                MeasuredUpper = r.MeasuredUpper,
                InSample = r.InSample?.Value,
                InSampleStandardUncertainty = r.InSample?.StandardUncertainty,
                SampleLower = r.SampleLower,
                SampleUpper = r.SampleUpper,
                ReportedStatus = r.Reported?.Status,
                ReportingLimit = r.Reported?.Limit,
                ReportedText = r.Reported?.ToString(),
                Qualifiers = r.Qualifiers,
                Notes = r.Notes.ToArray(),
            }).ToArray(),
            QualityControl = report.QualityControl.Select(c => new QualityControlResult
            {
                Order = c.Injection.Order,
                Id = c.Injection.Id,
                Analyte = c.Analyte,
                Nominal = c.Nominal,
                Found = c.Found,
                RecoveryPercent = c.RecoveryPercent,
                Window = c.Window?.ToString(),
                Passed = c.Passed,
                Notes = c.Notes.ToArray(),
            }).ToArray(),
            Duplicates = report.Duplicates.Select(c => new DuplicateResult
            {
                Analyte = c.Analyte,
                SampleId = c.SampleId,
                DuplicateId = c.DuplicateId,
                Sample = c.Sample,
                Duplicate = c.Duplicate,
                RpdPercent = c.RpdPercent,
                Limit = c.Limit?.ToString(),
                Passed = c.Passed,
                Notes = c.Notes.ToArray(),
            }).ToArray(),
            Spikes = report.Spikes.Select(c => new SpikeResult
            {
                Analyte = c.Analyte,
                SpikedId = c.SpikedId,
                ParentId = c.ParentId,
                Spiked = c.Spiked,
                Unspiked = c.Unspiked,
                Added = c.Added,
                RecoveryPercent = c.RecoveryPercent,
                Window = c.Window?.ToString(),
                Passed = c.Passed,
                Notes = c.Notes.ToArray(),
            }).ToArray(),
            Injections = report.Injections.Select(o => new InjectionResult
            {
                Order = o.Injection.Order,
                Role = o.Injection.Role,
                Id = o.Injection.Id,
                Status = o.Status,
                AnalyteStatuses = new SortedDictionary<string, InjectionStatus>(o.AnalyteStatuses.ToDictionary(p => p.Key, p => p.Value, StringComparer.Ordinal), StringComparer.Ordinal),
                InternalStandardRecoveries = o.InternalStandardRecoveries.Select(x => new InternalStandardRecoveryResult
                {
                    InternalStandard = x.InternalStandard,
                    Signal = x.Signal,
                    ReferenceSignal = x.ReferenceSignal,
                    RecoveryPercent = x.RecoveryPercent,
                    WithinWindow = x.WithinWindow,
                }).ToArray(),
                Reasons = o.Reasons.ToArray(),
            }).ToArray(),
            Drift = report.Drift.Select(DriftResult.From).ToArray(),
            Notes = report.Notes.ToArray(),
        };
    }

    /// <inheritdoc />
    public bool Equals(RunResults? other) =>
        other is not null && Format == other.Format && RunName == other.RunName && MethodName == other.MethodName
        && ConfidenceLevel.Equals(other.ConfidenceLevel) && InternalStandardRecoveryWindow == other.InternalStandardRecoveryWindow
        && Same.Map(InternalStandardReferences, other.InternalStandardReferences)
        && Same.List(Calibrations, other.Calibrations) && Same.List(Results, other.Results)
        && Same.List(QualityControl, other.QualityControl) && Same.List(Duplicates, other.Duplicates)
        && Same.List(Spikes, other.Spikes) && Same.List(Injections, other.Injections)
        && Same.List(Drift, other.Drift) && Same.List(Notes, other.Notes);

    /// <inheritdoc />
    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(RunName) ^ (Results?.Count ?? 0);
}

/// <summary>The calibration of one analyte in <see cref="RunResults"/>.</summary>
public sealed record CalibrationSummary
{
    /// <summary>Analyte name.</summary>
    public string Analyte { get; init; } = string.Empty;

    /// <summary>Name of the correcting IS.</summary>
    public string InternalStandard { get; init; } = string.Empty;

    /// <summary>Calibration function.</summary>
    public RatioModel Model { get; init; }

    /// <summary>Number of calibration points; null when no calibration was made.</summary>
    public int? PointCount { get; init; }

    /// <summary>True when a calibration exists and no rule set rejected it.</summary>
    public bool Accepted { get; init; }

    /// <summary>Name of the acceptance rule set applied; null for none.</summary>
    public string? RuleSet { get; init; }

    /// <summary>Why no calibration was made; null when it was.</summary>
    public string? Failure { get; init; }

    /// <summary>Injection orders given to the calibration.</summary>
    public IReadOnlyList<int> InjectionOrders { get; init; } = Array.Empty<int>();

    /// <inheritdoc />
    public bool Equals(CalibrationSummary? other) =>
        other is not null && Analyte == other.Analyte && InternalStandard == other.InternalStandard && Model == other.Model
        && PointCount == other.PointCount && Accepted == other.Accepted && RuleSet == other.RuleSet && Failure == other.Failure
        && Same.List(InjectionOrders, other.InjectionOrders);

    /// <inheritdoc />
    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Analyte);
}

/// <summary>The result of one sample for one analyte in <see cref="RunResults"/>.</summary>
public sealed record SampleAnalyteResult
{
    /// <summary>Sample id.</summary>
    public string SampleId { get; init; } = string.Empty;

    /// <summary>Role of the sample's rows.</summary>
    public InjectionRole Role { get; init; }

    /// <summary>Analyte name.</summary>
    public string Analyte { get; init; } = string.Empty;

    /// <summary>Injection orders of the sample's rows.</summary>
    public IReadOnlyList<int> InjectionOrders { get; init; } = Array.Empty<int>();

    /// <summary>Concentration in the measured solution; null when not quantified.</summary>
    public Concentration? Measured { get; init; }

    /// <summary>Lower confidence limit in the measured solution; null without an interval.</summary>
    public Concentration? MeasuredLower { get; init; }

    /// <summary>Upper confidence limit in the measured solution; null without an interval.</summary>
    public Concentration? MeasuredUpper { get; init; }

    /// <summary>Concentration in the original sample; null when not carried to the sample.</summary>
    public Concentration? InSample { get; init; }

    /// <summary>Standard uncertainty of <see cref="InSample"/>.</summary>
    public Concentration? InSampleStandardUncertainty { get; init; }

    /// <summary>Lower confidence limit in the original sample; null without an interval.</summary>
    public Concentration? SampleLower { get; init; }

    /// <summary>Upper confidence limit in the original sample; null without an interval.</summary>
    public Concentration? SampleUpper { get; init; }

    /// <summary>How the result is reported against the analyte's reporting limits (not detected, below the
    /// quantification limit, quantified); null when the result has no reported value (not quantified, or not carried
    /// to the original sample, or reporting limits of another concentration kind than the result).</summary>
    public ReportedStatus? ReportedStatus { get; init; }

    /// <summary>The limit a censored result is reported against (the LOD for not detected, the LOQ for below the
    /// quantification limit), in the original sample and in its own unit; null for a quantified result or without a
    /// reported value.</summary>
    public Concentration? ReportingLimit { get; init; }

    /// <summary>The reported value as text, e.g. <c>&lt; 0.15 µg/L (LOQ)</c> or <c>0.613 µg/L</c>
    /// (<see cref="ReportedValue.ToString()"/>); null without a reported value.</summary>
    public string? ReportedText { get; init; }

    /// <summary>Qualifier flags.</summary>
    public ResultQualifiers Qualifiers { get; init; }

    /// <summary>The trail of what was computed from what.</summary>
    public IReadOnlyList<string> Notes { get; init; } = Array.Empty<string>();

    /// <inheritdoc />
    public bool Equals(SampleAnalyteResult? other) =>
        other is not null && SampleId == other.SampleId && Role == other.Role && Analyte == other.Analyte
        && Same.List(InjectionOrders, other.InjectionOrders) && Same.Exact(Measured, other.Measured)
        && Same.Exact(MeasuredLower, other.MeasuredLower) && Same.Exact(MeasuredUpper, other.MeasuredUpper)
        && Same.Exact(InSample, other.InSample) && Same.Exact(InSampleStandardUncertainty, other.InSampleStandardUncertainty)
        && Same.Exact(SampleLower, other.SampleLower) && Same.Exact(SampleUpper, other.SampleUpper)
        && ReportedStatus == other.ReportedStatus && Same.Exact(ReportingLimit, other.ReportingLimit) && ReportedText == other.ReportedText
        && Qualifiers == other.Qualifiers && Same.List(Notes, other.Notes);

    /// <inheritdoc />
    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(SampleId) ^ StringComparer.Ordinal.GetHashCode(Analyte);
}

/// <summary>A quality-control recovery in <see cref="RunResults"/>.</summary>
public sealed record QualityControlResult
{
    /// <summary>Injection order of the QC row.</summary>
    public int Order { get; init; }

    /// <summary>QC id.</summary>
    public string Id { get; init; } = string.Empty;

    /// <summary>Analyte name.</summary>
    public string Analyte { get; init; } = string.Empty;

    /// <summary>Nominal concentration.</summary>
    public Concentration Nominal { get; init; }

    /// <summary>Concentration found; null when not quantified.</summary>
    public Concentration? Found { get; init; }

    /// <summary>Recovery in %; null when not computable.</summary>
    public double? RecoveryPercent { get; init; }

    /// <summary>The window applied, as printed; null = not judged.</summary>
    public string? Window { get; init; }

    /// <summary>Pass/fail; null without a window.</summary>
    public bool? Passed { get; init; }

    /// <summary>Notes.</summary>
    public IReadOnlyList<string> Notes { get; init; } = Array.Empty<string>();

    /// <inheritdoc />
    public bool Equals(QualityControlResult? other) =>
        other is not null && Order == other.Order && Id == other.Id && Analyte == other.Analyte && Same.Exact(Nominal, other.Nominal)
        && Same.Exact(Found, other.Found) && Nullable.Equals(RecoveryPercent, other.RecoveryPercent) && Window == other.Window
        && Passed == other.Passed && Same.List(Notes, other.Notes);

    /// <inheritdoc />
    public override int GetHashCode() => Order ^ StringComparer.Ordinal.GetHashCode(Analyte);
}

/// <summary>A duplicate RPD in <see cref="RunResults"/>.</summary>
public sealed record DuplicateResult
{
    /// <summary>Analyte name.</summary>
    public string Analyte { get; init; } = string.Empty;

    /// <summary>Parent sample id.</summary>
    public string SampleId { get; init; } = string.Empty;

    /// <summary>Duplicate id.</summary>
    public string DuplicateId { get; init; } = string.Empty;

    /// <summary>Parent result in the original sample; null when not quantified.</summary>
    public Concentration? Sample { get; init; }

    /// <summary>Duplicate result in the original sample; null when not quantified.</summary>
    public Concentration? Duplicate { get; init; }

    /// <summary>RPD in %; null when not computable.</summary>
    public double? RpdPercent { get; init; }

    /// <summary>The limit applied, as printed; null = not judged.</summary>
    public string? Limit { get; init; }

    /// <summary>Pass/fail; null without a limit.</summary>
    public bool? Passed { get; init; }

    /// <summary>Notes.</summary>
    public IReadOnlyList<string> Notes { get; init; } = Array.Empty<string>();

    /// <inheritdoc />
    public bool Equals(DuplicateResult? other) =>
        other is not null && Analyte == other.Analyte && SampleId == other.SampleId && DuplicateId == other.DuplicateId
        && Same.Exact(Sample, other.Sample) && Same.Exact(Duplicate, other.Duplicate) && Nullable.Equals(RpdPercent, other.RpdPercent)
        && Limit == other.Limit && Passed == other.Passed && Same.List(Notes, other.Notes);

    /// <inheritdoc />
    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(DuplicateId);
}

/// <summary>A spike recovery in <see cref="RunResults"/>.</summary>
public sealed record SpikeResult
{
    /// <summary>Analyte name.</summary>
    public string Analyte { get; init; } = string.Empty;

    /// <summary>Spiked sample id.</summary>
    public string SpikedId { get; init; } = string.Empty;

    /// <summary>Unspiked parent id.</summary>
    public string ParentId { get; init; } = string.Empty;

    /// <summary>Spiked result in the original sample; null when not quantified.</summary>
    public Concentration? Spiked { get; init; }

    /// <summary>Parent result; null when not quantified.</summary>
    public Concentration? Unspiked { get; init; }

    /// <summary>Amount added, as a concentration in the original sample.</summary>
    public Concentration Added { get; init; }

    /// <summary>Recovery in %; null when not computable.</summary>
    public double? RecoveryPercent { get; init; }

    /// <summary>The window applied, as printed; null = not judged.</summary>
    public string? Window { get; init; }

    /// <summary>Pass/fail; null without a window.</summary>
    public bool? Passed { get; init; }

    /// <summary>Notes.</summary>
    public IReadOnlyList<string> Notes { get; init; } = Array.Empty<string>();

    /// <inheritdoc />
    public bool Equals(SpikeResult? other) =>
        other is not null && Analyte == other.Analyte && SpikedId == other.SpikedId && ParentId == other.ParentId
        && Same.Exact(Spiked, other.Spiked) && Same.Exact(Unspiked, other.Unspiked) && Same.Exact(Added, other.Added)
        && Nullable.Equals(RecoveryPercent, other.RecoveryPercent) && Window == other.Window && Passed == other.Passed
        && Same.List(Notes, other.Notes);

    /// <inheritdoc />
    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(SpikedId);
}

/// <summary>The status of one input injection in <see cref="RunResults"/>.</summary>
public sealed record InjectionResult
{
    /// <summary>Injection order.</summary>
    public int Order { get; init; }

    /// <summary>Role.</summary>
    public InjectionRole Role { get; init; }

    /// <summary>Id.</summary>
    public string Id { get; init; } = string.Empty;

    /// <summary>Overall status.</summary>
    public InjectionStatus Status { get; init; }

    /// <summary>Status per analyte.</summary>
    public IReadOnlyDictionary<string, InjectionStatus> AnalyteStatuses { get; init; } = new Dictionary<string, InjectionStatus>();

    /// <summary>IS recoveries, in the run's IS order.</summary>
    public IReadOnlyList<InternalStandardRecoveryResult> InternalStandardRecoveries { get; init; } = Array.Empty<InternalStandardRecoveryResult>();

    /// <summary>Why the row was set aside or flagged.</summary>
    public IReadOnlyList<string> Reasons { get; init; } = Array.Empty<string>();

    /// <inheritdoc />
    public bool Equals(InjectionResult? other) =>
        other is not null && Order == other.Order && Role == other.Role && Id == other.Id && Status == other.Status
        && Same.Map(AnalyteStatuses, other.AnalyteStatuses) && Same.List(InternalStandardRecoveries, other.InternalStandardRecoveries)
        && Same.List(Reasons, other.Reasons);

    /// <inheritdoc />
    public override int GetHashCode() => Order;
}

/// <summary>The IS recovery of one injection in <see cref="RunResults"/>.</summary>
public sealed record InternalStandardRecoveryResult
{
    /// <summary>IS name.</summary>
    public string InternalStandard { get; init; } = string.Empty;

    /// <summary>IS signal; null when not recorded.</summary>
    public double? Signal { get; init; }

    /// <summary>Reference IS signal; null without a reference.</summary>
    public double? ReferenceSignal { get; init; }

    /// <summary>Recovery in %; null when not computable.</summary>
    public double? RecoveryPercent { get; init; }

    /// <summary>Whether the recovery is in the window; null without a recovery.</summary>
    public bool? WithinWindow { get; init; }
}

/// <summary>
/// A drift check across injection order in <see cref="RunResults"/>: the straight-line trend of one series (IS signal
/// or QC recovery %) against injection order (<see cref="DriftTrend"/>). Trend members are null when no trend was
/// fitted (see <see cref="Failure"/>).
/// </summary>
/// <remarks>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide what a flagged drift means for the run.</remarks>
public sealed record DriftResult
{
    /// <summary>Which kind of series was checked.</summary>
    public DriftSeriesKind Kind { get; init; }

    /// <summary>IS name (IS signal) or analyte name (QC recovery).</summary>
    public string Name { get; init; } = string.Empty;

    /// <summary>Injection orders of the points in the series.</summary>
    public IReadOnlyList<int> InjectionOrders { get; init; } = Array.Empty<int>();

    /// <summary>The drift rule applied, as printed; null when no trend was fitted.</summary>
    public string? Rule { get; init; }

    /// <summary>Number of points in the trend; null when no trend was fitted.</summary>
    public int? Count { get; init; }

    /// <summary>Mean of the series (signal, or recovery in %); null when no trend was fitted.</summary>
    public double? Mean { get; init; }

    /// <summary>Least-squares slope per injection-order step, in the unit of the series; null when no trend was fitted.</summary>
    public double? Slope { get; init; }

    /// <summary>Standard error of <see cref="Slope"/>; null when no trend was fitted.</summary>
    public double? SlopeStandardError { get; init; }

    /// <summary>Lower confidence limit of the slope (level of the rule); null when no trend was fitted.</summary>
    public double? SlopeLower { get; init; }

    /// <summary>Upper confidence limit of the slope (level of the rule); null when no trend was fitted.</summary>
    public double? SlopeUpper { get; init; }

    /// <summary>Drift over the run span, in % of the mean; null when no trend was fitted.</summary>
    public double? DriftOverRunPercent { get; init; }

    /// <summary>Lower confidence limit of <see cref="DriftOverRunPercent"/>; null when no trend was fitted.</summary>
    public double? DriftOverRunPercentLower { get; init; }

    /// <summary>Upper confidence limit of <see cref="DriftOverRunPercent"/>; null when no trend was fitted.</summary>
    public double? DriftOverRunPercentUpper { get; init; }

    /// <summary>Whether the slope interval excludes 0; null when no trend was fitted.</summary>
    public bool? SlopeSignificant { get; init; }

    /// <summary>Why no trend was fitted; null when one was.</summary>
    public string? Failure { get; init; }

    /// <summary>True when the rule flags the trend as drift.</summary>
    public bool Flagged { get; init; }

    /// <inheritdoc />
    public bool Equals(DriftResult? other) =>
        other is not null && Kind == other.Kind && Name == other.Name && Same.List(InjectionOrders, other.InjectionOrders)
        && Rule == other.Rule && Count == other.Count && Nullable.Equals(Mean, other.Mean) && Nullable.Equals(Slope, other.Slope)
        && Nullable.Equals(SlopeStandardError, other.SlopeStandardError) && Nullable.Equals(SlopeLower, other.SlopeLower)
        && Nullable.Equals(SlopeUpper, other.SlopeUpper) && Nullable.Equals(DriftOverRunPercent, other.DriftOverRunPercent)
        && Nullable.Equals(DriftOverRunPercentLower, other.DriftOverRunPercentLower)
        && Nullable.Equals(DriftOverRunPercentUpper, other.DriftOverRunPercentUpper)
        && SlopeSignificant == other.SlopeSignificant && Failure == other.Failure && Flagged == other.Flagged;

    /// <inheritdoc />
    public override int GetHashCode() => (Kind, Name).GetHashCode();

    internal static DriftResult From(DriftCheck check)
    {
        DriftTrend? t = check.Trend;
        return new DriftResult
        {
            Kind = check.Kind,
            Name = check.Name,
            InjectionOrders = check.InjectionOrders.ToArray(),
            Rule = t?.Rule.ToString(),
            Count = t?.Count,
            Mean = t?.Mean,
            Slope = t?.Slope,
            SlopeStandardError = t?.SlopeStandardError,
            SlopeLower = t?.SlopeInterval.Lower,
            SlopeUpper = t?.SlopeInterval.Upper,
            DriftOverRunPercent = t?.DriftOverRunPercent,
            DriftOverRunPercentLower = t?.DriftOverRunPercentInterval.Lower,
            DriftOverRunPercentUpper = t?.DriftOverRunPercentInterval.Upper,
            SlopeSignificant = t?.IsSlopeSignificant,
            Failure = check.Failure,
            Flagged = check.IsFlagged,
        };
    }
}

/// <summary>Element-wise equality for the result records.</summary>
internal static class Same
{
    internal static bool List<T>(IReadOnlyList<T>? a, IReadOnlyList<T>? b) =>
        ReferenceEquals(a, b) || (a is not null && b is not null && a.SequenceEqual(b));

    internal static bool Map<T>(IReadOnlyDictionary<string, T>? a, IReadOnlyDictionary<string, T>? b) =>
        ReferenceEquals(a, b) || (a is not null && b is not null && a.Count == b.Count
            && a.All(p => b.TryGetValue(p.Key, out T? v) && EqualityComparer<T>.Default.Equals(p.Value, v)));

    /// <summary>Same number and same unit (a written value reads back in its own unit).</summary>
    internal static bool Exact(Concentration? a, Concentration? b) =>
        a is Concentration x ? b is Concentration y && x.Unit == y.Unit && x.Value.Equals(y.Value) : b is null;
}
