using System;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;

namespace InternalStdCal.Run;

/// <summary>What the internal-standard (IS) signal of an injection is compared with.</summary>
public enum RecoveryReference
{
    /// <summary>The mean IS signal of the calibration-standard injections.</summary>
    CalibrationStandardsMean = 0,

    /// <summary>The mean IS signal of the calibration-blank injections.</summary>
    CalibrationBlankMean,
}

/// <summary>
/// The acceptance window of the internal-standard (IS) recovery, held as data: recovery % = 100 · IS signal of the
/// injection / reference IS signal, acceptable when <see cref="LowerPercent"/> ≤ recovery ≤ <see cref="UpperPercent"/>.
/// </summary>
/// <remarks>
/// <para>Use a preset named after its published source, or <see cref="Custom"/> with your method's numbers and
/// source. The library computes; the lab's validated method, its QA system, local regulations and licensed
/// practice decide what an out-of-window recovery means (re-run, dilute, reject).</para>
/// <para>Immutable.</para>
/// </remarks>
public sealed class InternalStandardRecoveryWindow
{
    private InternalStandardRecoveryWindow(string name, string source, double lowerPercent, double upperPercent, RecoveryReference reference)
    {
        Name = name;
        Source = source;
        LowerPercent = lowerPercent;
        UpperPercent = upperPercent;
        Reference = reference;
    }

    /// <summary>
    /// US EPA Method 200.8 (ICP-MS, Rev. 5.4): the absolute IS response of each injection within 60–125 % of its
    /// response in the calibration blank.
    /// </summary>
    /// <remarks>FROM MEMORY (field-reference §4.3: the method text exists, the clause itself was not retrieved). Check
    /// it against the method before relying on it.</remarks>
    public static InternalStandardRecoveryWindow UsEpa200Point8 { get; } = new(
        "US EPA 200.8 IS recovery",
        "US EPA Method 200.8 Rev. 5.4: IS response 60–125 % of the calibration blank — from memory (field-reference §4.3), verify against the method text",
        60,
        125,
        RecoveryReference.CalibrationBlankMean);

    /// <summary>Name printed in reports.</summary>
    public string Name { get; }

    /// <summary>Where the numbers come from, with provenance.</summary>
    public string Source { get; }

    /// <summary>Lowest acceptable recovery, in % (≥ 0).</summary>
    public double LowerPercent { get; }

    /// <summary>Highest acceptable recovery, in % (&gt; <see cref="LowerPercent"/>).</summary>
    public double UpperPercent { get; }

    /// <summary>What the recovery is relative to.</summary>
    public RecoveryReference Reference { get; }

    /// <summary>A window of your own.</summary>
    /// <param name="name">Name printed in reports; not blank.</param>
    /// <param name="source">Where the numbers come from (SOP, method clause, "common practice"); not blank.</param>
    /// <param name="lowerPercent">Lowest acceptable recovery, % — finite, ≥ 0.</param>
    /// <param name="upperPercent">Highest acceptable recovery, % — finite, &gt; <paramref name="lowerPercent"/>.</param>
    /// <param name="reference">What the recovery is relative to.</param>
    /// <returns>The window.</returns>
    /// <exception cref="ArgumentNullException">A text is null.</exception>
    /// <exception cref="ArgumentException">A text is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A limit is out of range or <paramref name="reference"/> is not defined.</exception>
    public static InternalStandardRecoveryWindow Custom(string name, string source, double lowerPercent, double upperPercent, RecoveryReference reference)
    {
        Guard.NotBlank(name, nameof(name));
        Guard.NotBlank(source, nameof(source));
        Guard.NonNegative(lowerPercent, nameof(lowerPercent));
        Guard.Finite(upperPercent, nameof(upperPercent));
        if (!(upperPercent > lowerPercent))
        {
            throw Guard.OutOfRange(nameof(upperPercent), upperPercent, "a number > lowerPercent (" + Guard.Format(lowerPercent) + ")");
        }

        if (reference is not (RecoveryReference.CalibrationStandardsMean or RecoveryReference.CalibrationBlankMean))
        {
            throw new ArgumentOutOfRangeException(nameof(reference), reference, $"Parameter 'reference' was {reference}; it must be a defined RecoveryReference.");
        }

        return new InternalStandardRecoveryWindow(name, source, lowerPercent, upperPercent, reference);
    }

    /// <summary>Whether a recovery lies in the closed window.</summary>
    /// <param name="recoveryPercent">Recovery in %.</param>
    /// <returns>True when LowerPercent ≤ recovery ≤ UpperPercent (false for NaN).</returns>
    public bool Contains(double recoveryPercent) => recoveryPercent >= LowerPercent && recoveryPercent <= UpperPercent;

    /// <summary>Prints "US EPA 200.8 IS recovery: 60–125 % of the calibration blank mean".</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        Name + ": " + Text.G(LowerPercent) + "–" + Text.G(UpperPercent) + " % of the "
        + (Reference == RecoveryReference.CalibrationBlankMean ? "calibration blank mean" : "calibration standards mean");
}
