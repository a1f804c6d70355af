using System;
using InternalStdCal.Internal;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>
/// The detection limit (optional) and quantification limit a result is reported against: below the LOD "not detected"
/// (&lt; LOD), below the LOQ "&lt; LOQ", otherwise the number. The raw estimate is always kept
/// (<see cref="ReportedValue.Estimate"/>).
/// </summary>
/// <remarks>
/// <para>Immutable; validated at creation: both limits &gt; 0, of the same kind, LOD ≤ LOQ. Equality is exact (the
/// concentrations compare with <see cref="Concentration.Equals(Concentration)"/>).</para>
/// <para>A result exactly at a limit counts as at or above it (common practice: "less than" is strict).</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice decide
/// which limits apply and how censored results are reported.</para>
/// </remarks>
public sealed class ReportingLimits : IEquatable<ReportingLimits>
{
    /// <summary>Limits with a detection and a quantification limit.</summary>
    /// <param name="detectionLimit">LOD, &gt; 0.</param>
    /// <param name="quantificationLimit">LOQ, &gt; 0, same kind as the LOD, ≥ LOD.</param>
    /// <exception cref="ArgumentOutOfRangeException">A limit is ≤ 0.</exception>
    /// <exception cref="ArgumentException">The kinds differ, or LOQ &lt; LOD.</exception>
    public ReportingLimits(Concentration detectionLimit, Concentration quantificationLimit)
    {
        Guard.PositiveQuantity(detectionLimit, nameof(detectionLimit), "a detection limit");
        Guard.PositiveQuantity(quantificationLimit, nameof(quantificationLimit), "a quantification limit");
        if (detectionLimit.Kind != quantificationLimit.Kind)
        {
            throw new ArgumentException(
                $"Parameter '{nameof(quantificationLimit)}' was {quantificationLimit} ({quantificationLimit.Kind}); it must be of the detection limit's kind ({detectionLimit.Kind}).",
                nameof(quantificationLimit));
        }

        if (quantificationLimit < detectionLimit)
        {
            throw new ArgumentException(
                $"Parameter '{nameof(quantificationLimit)}' was {quantificationLimit}; it must be >= the detection limit {detectionLimit}.",
                nameof(quantificationLimit));
        }

        DetectionLimit = detectionLimit;
        QuantificationLimit = quantificationLimit;
    }

    private ReportingLimits(Concentration quantificationLimit)
    {
        QuantificationLimit = quantificationLimit;
    }

    /// <summary>LOD; null when only a quantification limit is used.</summary>
    public Concentration? DetectionLimit { get; }

    /// <summary>LOQ.</summary>
    public Concentration QuantificationLimit { get; }

    /// <summary>Limits with a quantification limit only: results below it are "&lt; LOQ", none is "not detected".</summary>
    /// <param name="quantificationLimit">LOQ, &gt; 0.</param>
    /// <returns>The limits.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The limit is ≤ 0.</exception>
    public static ReportingLimits QuantificationOnly(Concentration quantificationLimit) =>
        new(Guard.PositiveQuantity(quantificationLimit, nameof(quantificationLimit), "a quantification limit"));

    /// <summary>Reports an estimate against the limits.</summary>
    /// <param name="estimate">The raw estimate (any finite value, negative included), of the limits' kind; kept as given.</param>
    /// <returns>Quantified, &lt; LOQ or not detected, with the raw estimate and the limit used.</returns>
    /// <exception cref="ArgumentException"><paramref name="estimate"/> is of another kind than the limits.</exception>
    public ReportedValue Apply(Concentration estimate)
    {
        if (estimate.Kind != QuantificationLimit.Kind)
        {
            throw new ArgumentException(
                $"Parameter '{nameof(estimate)}' was {estimate} ({estimate.Kind}); it must be of the limits' kind ({QuantificationLimit.Kind}).",
                nameof(estimate));
        }

        ReportedStatus status = Classify(estimate);
        return new ReportedValue(estimate, status, LimitFor(status));
    }

    /// <summary>The status <see cref="Apply(Concentration)"/> gives an estimate of the limits' kind (checked by the caller).</summary>
    internal ReportedStatus Classify(Concentration estimate) =>
        DetectionLimit is Concentration lod && estimate < lod ? ReportedStatus.NotDetected
        : estimate < QuantificationLimit ? ReportedStatus.BelowQuantificationLimit
        : ReportedStatus.Quantified;

    /// <summary>The limit a value of this status fell below; null when quantified.</summary>
    internal Concentration? LimitFor(ReportedStatus status) => status switch
    {
        ReportedStatus.NotDetected => DetectionLimit,
        ReportedStatus.BelowQuantificationLimit => QuantificationLimit,
        _ => null,
    };

    /// <summary>Reports the concentration of a quantitation result against the limits.</summary>
    /// <param name="result">The result; its <see cref="QuantitationResult.Concentration"/> is the estimate.</param>
    /// <returns>As <see cref="Apply(Concentration)"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="result"/> is null.</exception>
    /// <exception cref="ArgumentException">The result is of another kind than the limits.</exception>
    public ReportedValue Apply(QuantitationResult result)
    {
        Guard.NotNull(result, nameof(result));
        try
        {
            return Apply(result.Concentration);
        }
        catch (ArgumentException e) when (e.ParamName == "estimate")
        {
            throw new ArgumentException(e.Message.Replace("Parameter 'estimate'", "Parameter 'result'"), nameof(result), e);
        }
    }

    /// <inheritdoc />
    public bool Equals(ReportingLimits? other) =>
        other is not null && Nullable.Equals(DetectionLimit, other.DetectionLimit) && QuantificationLimit.Equals(other.QuantificationLimit);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as ReportingLimits);

    /// <inheritdoc />
    public override int GetHashCode() => (DetectionLimit, QuantificationLimit).GetHashCode();

    /// <summary>Prints "LOD 0.15 µg/L, LOQ 0.5 µg/L" (round-trip numbers).</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        (DetectionLimit is Concentration lod ? "LOD " + lod + ", " : string.Empty) + "LOQ " + QuantificationLimit;
}
