using System;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;

namespace InternalStdCal.Run;

/// <summary>
/// An acceptance window for a recovery in % (quality-control check standards, spiked samples), held as data with
/// its source.
/// </summary>
/// <remarks>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide the window and what a failure means. Immutable.</remarks>
public sealed class RecoveryWindow
{
    /// <summary>Creates a window.</summary>
    /// <param name="name">Name printed in reports; not blank.</param>
    /// <param name="source">Where the numbers come from (SOP, method clause, "common practice"); not blank.</param>
    /// <param name="lowerPercent">Lowest acceptable recovery, % — finite, ≥ 0.</param>
    /// <param name="upperPercent">Highest acceptable recovery, % — finite, &gt; <paramref name="lowerPercent"/>.</param>
    /// <exception cref="ArgumentNullException">A text is null.</exception>
    /// <exception cref="ArgumentException">A text is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A limit is out of range.</exception>
    public RecoveryWindow(string name, string source, double lowerPercent, double upperPercent)
    {
        Name = Guard.NotBlank(name, nameof(name));
        Source = Guard.NotBlank(source, nameof(source));
        LowerPercent = Guard.NonNegative(lowerPercent, nameof(lowerPercent));
        Guard.Finite(upperPercent, nameof(upperPercent));
        if (!(upperPercent > lowerPercent))
        {
            throw Guard.OutOfRange(nameof(upperPercent), upperPercent, "a number > lowerPercent (" + Guard.Format(lowerPercent) + ")");
        }

        UpperPercent = upperPercent;
    }

    /// <summary>Name printed in reports.</summary>
    public string Name { get; }

    /// <summary>Where the numbers come from, with provenance.</summary>
    public string Source { get; }

    /// <summary>Lowest acceptable recovery, %.</summary>
    public double LowerPercent { get; }

    /// <summary>Highest acceptable recovery, %.</summary>
    public double UpperPercent { get; }

    /// <summary>Whether a recovery lies in the closed window.</summary>
    /// <param name="recoveryPercent">Recovery in %.</param>
    /// <returns>True when LowerPercent ≤ recovery ≤ UpperPercent (false for NaN).</returns>
    public bool Contains(double recoveryPercent) => recoveryPercent >= LowerPercent && recoveryPercent <= UpperPercent;

    /// <summary>Prints "name: 90–110 %".</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Name + ": " + Text.G(LowerPercent) + "–" + Text.G(UpperPercent) + " %";
}

/// <summary>
/// The largest acceptable relative percent difference (RPD) of a sample and its duplicate,
/// RPD = |a − b| / ((a + b)/2) · 100 (common practice), held as data with its source.
/// </summary>
/// <remarks>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide the limit and what a failure means. Immutable.</remarks>
public sealed class RpdLimit
{
    /// <summary>Creates a limit.</summary>
    /// <param name="name">Name printed in reports; not blank.</param>
    /// <param name="source">Where the number comes from; not blank.</param>
    /// <param name="maxPercent">Largest acceptable RPD, % — finite, &gt; 0.</param>
    /// <exception cref="ArgumentNullException">A text is null.</exception>
    /// <exception cref="ArgumentException">A text is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="maxPercent"/> is not finite or ≤ 0.</exception>
    public RpdLimit(string name, string source, double maxPercent)
    {
        Name = Guard.NotBlank(name, nameof(name));
        Source = Guard.NotBlank(source, nameof(source));
        MaxPercent = Guard.Positive(maxPercent, nameof(maxPercent));
    }

    /// <summary>Name printed in reports.</summary>
    public string Name { get; }

    /// <summary>Where the number comes from, with provenance.</summary>
    public string Source { get; }

    /// <summary>Largest acceptable RPD, %.</summary>
    public double MaxPercent { get; }

    /// <summary>Prints "name: RPD ≤ 20 %".</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Name + ": RPD ≤ " + Text.G(MaxPercent) + " %";
}
