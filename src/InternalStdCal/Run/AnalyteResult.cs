using System;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
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
    private readonly IResultSource? _source;
    private QuantitationResult? _quantitation;
    private SampleResult? _sampleCalculation;

    internal AnalyteResult(
        string sampleId,
        InjectionRole role,
        string analyte,
        IReadOnlyList<int> injectionOrders,
        Concentration? inMeasuredSolution,
        Concentration? measuredLower,
        Concentration? measuredUpper,
        Concentration? sampleLower,
        Concentration? sampleUpper,
        ReportedValue? reported,
        ResultQualifiers qualifiers,
        IReadOnlyList<string> notes,
        IResultSource? source)
    {
        SampleId = sampleId;
        Role = role;
        Analyte = analyte;
        InjectionOrders = injectionOrders;
        InMeasuredSolution = inMeasuredSolution;
        MeasuredLower = measuredLower;
        MeasuredUpper = measuredUpper;
        SampleLower = sampleLower;
        SampleUpper = sampleUpper;
        Reported = reported;
        Qualifiers = qualifiers;
        Notes = notes;
        _source = source;
    }

    /// <summary>Builds the quantitation and the back-calculation of a result on first use (same numbers as the
    /// values the result was made with).</summary>
    internal interface IResultSource
    {
        QuantitationResult? Quantitation();

        SampleResult? SampleCalculation(QuantitationResult quantitation);
    }

    /// <summary>Id of the sample.</summary>
    public string SampleId { get; }

    /// <summary>Role of the sample's rows.</summary>
    public InjectionRole Role { get; }

    /// <summary>Analyte name.</summary>
    public string Analyte { get; }

    /// <summary>Injection orders of the sample's rows (all of them, used or set aside).</summary>
    public IReadOnlyList<int> InjectionOrders { get; }

    /// <summary>The quantitation in the measured solution (calibration unit); null when not quantified.</summary>
    /// <remarks>Built on first use (thread-safe; every caller sees the same instance).</remarks>
    public QuantitationResult? Quantitation =>
        Volatile.Read(ref _quantitation) ?? (_source?.Quantitation() is QuantitationResult q ? Interlocked.CompareExchange(ref _quantitation, q, null) ?? q : null);

    /// <summary>Concentration in the measured solution (calibration unit); null when not quantified.</summary>
    public Concentration? InMeasuredSolution { get; }

    /// <summary>Lower confidence limit in the measured solution; null without an interval.</summary>
    public Concentration? MeasuredLower { get; }

    /// <summary>Upper confidence limit in the measured solution; null without an interval.</summary>
    public Concentration? MeasuredUpper { get; }

    /// <summary>The back-calculation to the original sample (dilutions, digest, sample mass) with its uncertainty
    /// budget; null when not quantified or when the preparation does not fit the result's kind (see <see cref="Notes"/>).</summary>
    /// <remarks>Built on first use (thread-safe; every caller sees the same instance).</remarks>
    public SampleResult? SampleCalculation =>
        Volatile.Read(ref _sampleCalculation)
        ?? (Quantitation is QuantitationResult q && _source!.SampleCalculation(q) is SampleResult s ? Interlocked.CompareExchange(ref _sampleCalculation, s, null) ?? s : null);

    /// <summary>Concentration in the original sample with its standard uncertainty (calibration standard error
    /// and preparation terms combined, see <see cref="SampleResult"/>); null as <see cref="SampleCalculation"/>.</summary>
    public Measured<Concentration>? InSample => SampleCalculation?.Result;

    /// <summary>Lower confidence limit of the measured solution carried to the original sample (the back-calculation is
    /// linear); null without an interval.</summary>
    public Concentration? SampleLower { get; }

    /// <summary>Upper confidence limit carried to the original sample; null without an interval.</summary>
    public Concentration? SampleUpper { get; }

    /// <summary>
    /// The original-sample result as reported against the analyte's <see cref="AnalyteMethod.Limits"/>: quantified,
    /// "&lt; LOQ" or "&lt; LOD" (not detected), always keeping the raw estimate (<see cref="ReportedValue.Estimate"/>,
    /// equal to <see cref="InSample"/>'s value). Without limits the value is reported as quantified. Null when there is
    /// no result in the original sample, or when the limits are of another kind than that result (see
    /// <see cref="Notes"/>).
    /// </summary>
    /// <remarks>The limits are the method's LOD/LOQ in the original sample (common practice), so a diluted sample is
    /// judged after its dilution factor is applied, not in the measured solution.</remarks>
    public ReportedValue? Reported { get; }

    /// <summary>The qualifier flags of the result.</summary>
    public ResultQualifiers Qualifiers { get; }

    /// <summary>The trail: what was used, what was set aside and why, what each qualifier refers to.</summary>
    public IReadOnlyList<string> Notes { get; }

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
}
