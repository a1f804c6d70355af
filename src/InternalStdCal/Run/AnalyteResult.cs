using System;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Preparation;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using InternalStdCal.Uncertainty;

namespace InternalStdCal.Run;

/// <summary>
/// The result of one sample (or duplicate, spiked sample, method blank) for one analyte: the concentration in the
/// measured solution and in the original sample, the interval, the flags and the trail of what was computed.
/// </summary>
/// <remarks>Reporting limits apply in the original sample (<see cref="Reported"/>); values below a limit are kept
/// (flagged). A result without a value carries <see cref="ResultQualifiers.NotQuantified"/> and the reason in
/// <see cref="Notes"/>.</remarks>
public sealed class AnalyteResult
{
    // Stand-ins for the two notes every quantified result has, formatted on first read of Notes.
    private static readonly string UsedInjectionsNoteMarker = new('\u0001', 1);
    private static readonly string OriginalSampleNoteMarker = new('\u0002', 1);

    // The usual notes, shared until a result gets another note (then it copies them into its own array).
    private static readonly string[] UsualNotes = { UsedInjectionsNoteMarker, OriginalSampleNoteMarker };
    private static readonly IReadOnlyList<string> NoNotes = Array.AsReadOnly(Array.Empty<string>());

    private readonly AnalyteContext _context;
    private IReadOnlyList<RunInjection>? _used;
    private string[]? _noteEntries;
    private int _noteCount;
    private Flags _flags;
    private double _meanRatio;
    private double _measured;
    private double _measuredLower;
    private double _measuredUpper;
    private double _sample;
    private double _sampleLower;
    private double _sampleUpper;
    private ConcentrationUnit _sampleUnit;
    private Deferred? _deferred;

    // Rows of one sample (all analytes share the array and the orders) for one analyte; filled in by RunProcessor
    // before the report is returned, read-only afterwards. The quantitation, back-calculation, reported value and
    // notes are built from these values on first read.
    internal AnalyteResult(AnalyteContext context, RunInjection[] rows, IReadOnlyList<int> injectionOrders)
    {
        _context = context;
        Rows = rows;
        InjectionOrders = injectionOrders;
    }

    [Flags]
    private enum Flags : byte
    {
        None = 0,
        Quantified = 1,
        MeasuredLower = 2,
        MeasuredUpper = 4,
        InSample = 8,
        SampleInterval = 16,
        Reported = 32,
    }

    /// <summary>Id of the sample.</summary>
    public string SampleId => Rows[0].Id;

    /// <summary>Role of the sample's rows.</summary>
    public InjectionRole Role => Rows[0].Role;

    /// <summary>Analyte name.</summary>
    public string Analyte => _context.Analyte;

    /// <summary>Injection orders of the sample's rows (all of them, used or set aside).</summary>
    public IReadOnlyList<int> InjectionOrders { get; }

    /// <summary>The quantitation in the measured solution (calibration unit); null when not quantified.</summary>
    /// <remarks>Built on first use (thread-safe; every caller sees the same instance).</remarks>
    public QuantitationResult? Quantitation =>
        IsQuantified ? Volatile.Read(ref Parts.Quantitation) ?? Interlocked.CompareExchange(ref Parts.Quantitation, Quantify(), null) ?? Parts.Quantitation! : null;

    /// <summary>Concentration in the measured solution (calibration unit); null when not quantified.</summary>
    public Concentration? InMeasuredSolution => IsQuantified ? InMeasuredUnit(_measured) : null;

    /// <summary>Lower confidence limit in the measured solution; null without an interval.</summary>
    public Concentration? MeasuredLower => (_flags & Flags.MeasuredLower) != 0 ? InMeasuredUnit(_measuredLower) : null;

    /// <summary>Upper confidence limit in the measured solution; null without an interval.</summary>
    public Concentration? MeasuredUpper => (_flags & Flags.MeasuredUpper) != 0 ? InMeasuredUnit(_measuredUpper) : null;

    /// <summary>The back-calculation to the original sample (dilutions, digest, sample mass) with its uncertainty
    /// budget; null when not quantified or when the preparation does not fit the result's kind (see <see cref="Notes"/>).</summary>
    /// <remarks>Built on first use (thread-safe; every caller sees the same instance).</remarks>
    public SampleResult? SampleCalculation =>
        (_flags & Flags.InSample) != 0 && Quantitation is QuantitationResult q
            ? Volatile.Read(ref Parts.SampleCalculation)
                ?? Interlocked.CompareExchange(ref Parts.SampleCalculation, Rows[0].Preparation.ToSample(q.AsMeasured() ?? Measured.Exact(q.Concentration)), null)
                ?? Parts.SampleCalculation!
            : null;

    /// <summary>Concentration in the original sample with its standard uncertainty (calibration standard error
    /// and preparation terms combined, see <see cref="SampleResult"/>); null as <see cref="SampleCalculation"/>.</summary>
    public Measured<Concentration>? InSample => SampleCalculation?.Result;

    /// <summary>Lower confidence limit of the measured solution carried to the original sample (the back-calculation is
    /// linear); null without an interval.</summary>
    public Concentration? SampleLower => (_flags & Flags.SampleInterval) != 0 ? Concentration.From(_sampleLower, _sampleUnit) : null;

    /// <summary>Upper confidence limit carried to the original sample; null without an interval.</summary>
    public Concentration? SampleUpper => (_flags & Flags.SampleInterval) != 0 ? Concentration.From(_sampleUpper, _sampleUnit) : null;

    /// <summary>
    /// The original-sample result as reported against the analyte's <see cref="AnalyteMethod.Limits"/>: quantified,
    /// "&lt; LOQ" or "&lt; LOD" (not detected), always keeping the raw estimate (<see cref="ReportedValue.Estimate"/>,
    /// equal to <see cref="InSample"/>'s value). Without limits the value is reported as quantified. Null when there is
    /// no result in the original sample, or when the limits are of another kind than that result (see
    /// <see cref="Notes"/>).
    /// </summary>
    /// <remarks>The limits are the method's LOD/LOQ in the original sample (common practice), so a diluted sample is
    /// judged after its dilution factor is applied, not in the measured solution.</remarks>
    /// <remarks>Built on first use (thread-safe; every caller sees the same instance).</remarks>
    public ReportedValue? Reported =>
        (_flags & Flags.Reported) != 0 ? Volatile.Read(ref Parts.Reported) ?? Interlocked.CompareExchange(ref Parts.Reported, Report(), null) ?? Parts.Reported! : null;

    /// <summary>The qualifier flags of the result.</summary>
    public ResultQualifiers Qualifiers { get; internal set; }

    /// <summary>The trail: what was used, what was set aside and why, what each qualifier refers to.</summary>
    /// <remarks>Formatted on first use (thread-safe; every caller sees the same instance).</remarks>
    public IReadOnlyList<string> Notes => Volatile.Read(ref Parts.Notes) ?? Interlocked.CompareExchange(ref Parts.Notes, FormatNotes(), null) ?? Parts.Notes!;

    /// <summary>The sample's rows (all of them, used or set aside), in injection order.</summary>
    internal RunInjection[] Rows { get; }

    /// <summary>True when the result has a value in the measured solution.</summary>
    internal bool IsQuantified => (_flags & Flags.Quantified) != 0;

    /// <summary>The value in the original sample (without its uncertainty budget); null without one.</summary>
    internal Concentration? SampleValue => (_flags & Flags.InSample) != 0 ? Concentration.From(_sample, _sampleUnit) : null;

    /// <summary>True when <paramref name="flag"/> is set.</summary>
    /// <param name="flag">A flag.</param>
    /// <returns>Whether every bit of <paramref name="flag"/> is set.</returns>
    public bool Has(ResultQualifiers flag) => (Qualifiers & flag) == flag;

    /// <summary>
    /// The uncertainty budget of this result in the original sample, in one call: <see cref="Quantitation"/> (x₀ with
    /// its standard error from the calibration), the dilution steps, digest and sample amounts of the sample's
    /// <see cref="SamplePreparation"/> (through <see cref="SampleCalculation"/>) and optional caller components,
    /// evaluated by <see cref="ResultUncertaintyBudget.Create"/> (JCGM 100:2008 law of propagation).
    /// </summary>
    /// <remarks>
    /// <para>A censored result (&lt; LOQ, &lt; LOD) has a budget: that of its raw estimate. The IS concentration is not
    /// entered: one IS addition common to standards and samples cancels in the ratio (common practice; see
    /// <see cref="ResultUncertaintyBudget.Create"/> for building a budget with it).</para>
    /// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
    /// decide which components belong in the budget.</para>
    /// </remarks>
    /// <param name="factors">Optional caller components, e.g. recovery (exponent −1) or a matrix factor of value 1.</param>
    /// <param name="factorExponents">Exponents of <paramref name="factors"/>; null means +1 for each.</param>
    /// <param name="addReplicateRepeatability">Adds the spread of the sample's injections as a separate factor (see
    /// <see cref="ResultUncertaintyBudget.Create"/> for when this is appropriate).</param>
    /// <param name="coverageProbability">p of the GUM evaluation, in (0, 1); default 0.95.</param>
    /// <param name="correlations">Optional correlations between budget inputs by name (same pipette or stock used
    /// twice); see <see cref="ResultUncertaintyBudget.Create"/>.</param>
    /// <returns>The budget, in the unit of <see cref="InSample"/>.</returns>
    /// <exception cref="InvalidOperationException">The result has no quantitation (missing or invalid signals, no
    /// calibration, response not readable off the calibration) or no result in the original sample (the preparation did
    /// not fit); the message gives the reason from <see cref="Notes"/>.</exception>
    /// <exception cref="ArgumentNullException">An item of <paramref name="factors"/> is null.</exception>
    /// <exception cref="ArgumentException">As <see cref="ResultUncertaintyBudget.Create"/>: exponents of another length,
    /// duplicate names, a bad factor value, or the replicate term asked for with fewer than two injections or x₀ = 0.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="coverageProbability"/> or an exponent is out of range.</exception>
    public ResultUncertaintyBudget UncertaintyBudget(
        IReadOnlyList<UncertainInput>? factors = null,
        IReadOnlyList<double>? factorExponents = null,
        bool addReplicateRepeatability = false,
        double coverageProbability = 0.95,
        IReadOnlyList<InputCorrelation>? correlations = null)
    {
        if (Quantitation is not QuantitationResult q)
        {
            throw new InvalidOperationException(
                "Result '" + SampleId + "' / " + Analyte + " has no quantitation, so it has no uncertainty budget: "
                + string.Join(" ", Notes.Where(n => n.StartsWith("Not quantified", StringComparison.Ordinal) || n.StartsWith("Injection ", StringComparison.Ordinal))));
        }

        if (SampleCalculation is not SampleResult prep)
        {
            throw new InvalidOperationException(
                "Result '" + SampleId + "' / " + Analyte + " has no result in the original sample, so it has no uncertainty budget there: "
                + string.Join(" ", Notes.Where(n => n.StartsWith("No result in the original sample", StringComparison.Ordinal))));
        }

        return ResultUncertaintyBudget.Create(q, prep, null, factors, factorExponents, addReplicateRepeatability, coverageProbability, correlations);
    }

    /// <summary>Adds a note (while the run is processed).</summary>
    internal void AddNote(string text)
    {
        if (_noteEntries is null || ReferenceEquals(_noteEntries, UsualNotes) || _noteCount == _noteEntries.Length)
        {
            string[] grown = new string[Math.Max(4, 2 * _noteCount)];
            if (_noteEntries is not null)
            {
                Array.Copy(_noteEntries, grown, _noteCount);
            }

            _noteEntries = grown;
        }

        _noteEntries[_noteCount++] = text;
    }

    /// <summary>Records the value read off the calibration (<paramref name="used"/> null: every row was used) and
    /// adds the "Injections used" note.</summary>
    internal void Quantified(IReadOnlyList<RunInjection>? used, double meanRatio, Concentration value, Concentration? lower, Concentration? upper)
    {
        _used = used;
        _meanRatio = meanRatio;
        _measured = value.Value;
        _flags |= Flags.Quantified;
        if (lower is Concentration lo)
        {
            _measuredLower = lo.Value;
            _flags |= Flags.MeasuredLower;
        }

        if (upper is Concentration hi)
        {
            _measuredUpper = hi.Value;
            _flags |= Flags.MeasuredUpper;
        }

        if (_noteCount == 0)
        {
            _noteEntries = UsualNotes;
            _noteCount = 1;
        }
        else
        {
            AddNote(UsedInjectionsNoteMarker);
        }
    }

    /// <summary>Records the value carried to the original sample (the interval ends carried with it, or none) and adds
    /// the "Original sample" note.</summary>
    internal void InOriginalSample(Concentration value, Concentration? lower, Concentration? upper)
    {
        _sample = value.Value;
        _sampleUnit = value.Unit;
        _flags |= Flags.InSample;
        if (lower is Concentration lo && upper is Concentration hi)
        {
            _sampleLower = lo.Value; // same preparation and input unit as the value, so the same unit
            _sampleUpper = hi.Value;
            _flags |= Flags.SampleInterval;
        }

        if (ReferenceEquals(_noteEntries, UsualNotes) && _noteCount == 1)
        {
            _noteCount = 2;
        }
        else
        {
            AddNote(OriginalSampleNoteMarker);
        }
    }

    /// <summary>Records that the value in the original sample is reported against the analyte's limits (or as
    /// quantified without limits); the <see cref="ReportedValue"/> is made on first read.</summary>
    internal void MarkReported() => _flags |= Flags.Reported;

    // The parts built on first read, in one object made on the first such read.
    private Deferred Parts => Volatile.Read(ref _deferred) ?? Interlocked.CompareExchange(ref _deferred, new Deferred(), null) ?? _deferred!;

    private Concentration InMeasuredUnit(double value) => Concentration.From(value, _context.Calibration.Calibration!.Unit);

    // The rows whose ratios were averaged.
    private IReadOnlyList<RunInjection> Used => _used ?? Rows;

    private QuantitationResult Quantify()
    {
        AnalyteContext c = _context;
        IReadOnlyList<RunInjection> used = Used;
        var injections = new Injection[used.Count];
        string internalStandard = c.Method.InternalStandard;
        for (int i = 0; i < injections.Length; i++)
        {
            InjectionSignals signals = used[i].Signals;
            injections[i] = new Injection(signals.Analyte(c.Analyte)!.Value, signals.InternalStandard(internalStandard)!.Value);
        }

        UnknownSample sample = UnknownSample.Create(SampleId, c.InternalStandardConcentration, injections);
        return SampleQuantitation.Quantify(c.Calibration.Calibration!, sample, c.RunMethod.ConfidenceLevel, c.RunMethod.IntervalMethod);
    }

    private ReportedValue Report()
    {
        Concentration value = SampleValue!.Value;
        return _context.Method.Limits is ReportingLimits limits ? limits.Apply(value) : new ReportedValue(value, ReportedStatus.Quantified, null);
    }

    private IReadOnlyList<string> FormatNotes()
    {
        if (_noteCount == 0)
        {
            return NoNotes;
        }

        string[] texts = new string[_noteCount];
        for (int i = 0; i < texts.Length; i++)
        {
            string entry = _noteEntries![i];
            texts[i] = ReferenceEquals(entry, UsedInjectionsNoteMarker) ? UsedInjectionsNote()
                : ReferenceEquals(entry, OriginalSampleNoteMarker) ? OriginalSampleNote()
                : entry;
        }

        return Array.AsReadOnly(texts);
    }

    private string UsedInjectionsNote() =>
        "Injections used: " + string.Join(", ", Used.Select(r => Text.I(r.Order))) + "; mean ratio " + Text.G(_meanRatio) + " → "
        + InMeasuredUnit(_measured).ToString("G6", null) + " in the measured solution.";

    private string OriginalSampleNote() => "Original sample: " + Rows[0].Preparation + " → " + SampleValue!.Value.ToString("G6", null) + ".";

    // Fields so that each part can be published with Interlocked.CompareExchange.
    private sealed class Deferred
    {
        internal QuantitationResult? Quantitation;
        internal SampleResult? SampleCalculation;
        internal ReportedValue? Reported;
        internal IReadOnlyList<string>? Notes;
    }
}
