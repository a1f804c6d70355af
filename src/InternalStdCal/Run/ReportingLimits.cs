using System;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>
/// Limits of detection and quantitation of one analyte, as concentrations in the measured solution, applied to run
/// results as flags ("below LOQ", "below LOD"); the value itself is always kept and reported.
/// </summary>
/// <remarks>
/// <para>A result below the LOD is flagged below LOD only (not also below LOQ). How the limits were estimated is the
/// caller's business (see the detection-limit methods of the library).</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide how a result below a limit is reported. Immutable.</para>
/// </remarks>
public sealed class ReportingLimits
{
    /// <summary>Creates the limits; at least one must be given.</summary>
    /// <param name="limitOfDetection">LOD in the measured solution, &gt; 0; null if none.</param>
    /// <param name="limitOfQuantitation">LOQ in the measured solution, &gt; 0 and ≥ the LOD; null if none.</param>
    /// <exception cref="ArgumentException">Both are null, or they are of different kinds.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A limit is ≤ 0, or the LOQ is below the LOD.</exception>
    public ReportingLimits(Concentration? limitOfDetection, Concentration? limitOfQuantitation)
    {
        if (limitOfDetection is null && limitOfQuantitation is null)
        {
            throw new ArgumentException("Parameters 'limitOfDetection' and 'limitOfQuantitation' are both null; give at least one limit.", nameof(limitOfDetection));
        }

        if (limitOfDetection is Concentration lod && !(lod.Value > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(limitOfDetection), lod.Value, $"Parameter 'limitOfDetection' was {lod}; it must be > 0.");
        }

        if (limitOfQuantitation is Concentration loq && !(loq.Value > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(limitOfQuantitation), loq.Value, $"Parameter 'limitOfQuantitation' was {loq}; it must be > 0.");
        }

        if (limitOfDetection is Concentration d && limitOfQuantitation is Concentration q)
        {
            if (d.Kind != q.Kind)
            {
                throw new ArgumentException($"Parameter 'limitOfQuantitation' is {q} ({q.Kind}) but the LOD is {d} ({d.Kind}); the kinds must match.", nameof(limitOfQuantitation));
            }

            if (q < d)
            {
                throw new ArgumentOutOfRangeException(nameof(limitOfQuantitation), q.Value, $"Parameter 'limitOfQuantitation' was {q}; it must be >= the LOD ({d}).");
            }
        }

        LimitOfDetection = limitOfDetection;
        LimitOfQuantitation = limitOfQuantitation;
    }

    /// <summary>LOD in the measured solution; null if none.</summary>
    public Concentration? LimitOfDetection { get; }

    /// <summary>LOQ in the measured solution; null if none.</summary>
    public Concentration? LimitOfQuantitation { get; }

    /// <summary>Prints "LOD 0.1 µg/L, LOQ 0.3 µg/L".</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        (LimitOfDetection is Concentration d ? "LOD " + d : string.Empty)
        + (LimitOfDetection is not null && LimitOfQuantitation is not null ? ", " : string.Empty)
        + (LimitOfQuantitation is Concentration q ? "LOQ " + q : string.Empty);
}
