using System.Collections.Generic;
using InternalStdCal.Preparation;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>
/// The result of one sample (or duplicate, spiked sample, method blank) for one analyte: the concentration in the
/// measured solution and in the original sample, the interval, the flags and the trail of what was computed.
/// </summary>
/// <remarks>Values below a reporting limit are kept (flagged). A result without a value carries
/// <see cref="ResultQualifiers.NotQuantified"/> and the reason in <see cref="Notes"/>.</remarks>
public sealed class AnalyteResult
{
    internal AnalyteResult(
        string sampleId,
        InjectionRole role,
        string analyte,
        IReadOnlyList<int> injectionOrders,
        QuantitationResult? quantitation,
        SampleResult? inSample,
        Concentration? sampleLower,
        Concentration? sampleUpper,
        ResultQualifiers qualifiers,
        IReadOnlyList<string> notes)
    {
        SampleId = sampleId;
        Role = role;
        Analyte = analyte;
        InjectionOrders = injectionOrders;
        Quantitation = quantitation;
        SampleCalculation = inSample;
        SampleLower = sampleLower;
        SampleUpper = sampleUpper;
        Qualifiers = qualifiers;
        Notes = notes;
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
    public QuantitationResult? Quantitation { get; }

    /// <summary>Concentration in the measured solution (calibration unit); null when not quantified.</summary>
    public Concentration? InMeasuredSolution => Quantitation?.Concentration;

    /// <summary>Lower confidence limit in the measured solution; null without an interval.</summary>
    public Concentration? MeasuredLower => Quantitation?.Lower;

    /// <summary>Upper confidence limit in the measured solution; null without an interval.</summary>
    public Concentration? MeasuredUpper => Quantitation?.Upper;

    /// <summary>The back-calculation to the original sample (dilutions, digest, sample mass) with its uncertainty
    /// budget; null when not quantified or when the preparation does not fit the result's kind (see <see cref="Notes"/>).</summary>
    public SampleResult? SampleCalculation { get; }

    /// <summary>Concentration in the original sample with its standard uncertainty (calibration standard error
    /// and preparation terms combined, see <see cref="SampleResult"/>); null as <see cref="SampleCalculation"/>.</summary>
    public Measured<Concentration>? InSample => SampleCalculation?.Result;

    /// <summary>Lower confidence limit of the measured solution carried to the original sample (the back-calculation is
    /// linear); null without an interval.</summary>
    public Concentration? SampleLower { get; }

    /// <summary>Upper confidence limit carried to the original sample; null without an interval.</summary>
    public Concentration? SampleUpper { get; }

    /// <summary>The qualifier flags of the result.</summary>
    public ResultQualifiers Qualifiers { get; }

    /// <summary>The trail: what was used, what was set aside and why, what each qualifier refers to.</summary>
    public IReadOnlyList<string> Notes { get; }

    /// <summary>True when <paramref name="flag"/> is set.</summary>
    /// <param name="flag">A flag.</param>
    /// <returns>Whether every bit of <paramref name="flag"/> is set.</returns>
    public bool Has(ResultQualifiers flag) => (Qualifiers & flag) == flag;
}
