using System;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>A closed interval [<see cref="Lower"/>, <see cref="Upper"/>] with its confidence level.</summary>
/// <remarks>
/// Bounds are in the units of the quantity the interval is for (a coefficient, a response, a concentration).
/// Equality is exact on all three fields (no tolerance). <c>default</c> is the degenerate interval [0, 0] with
/// confidence level 0; it is never produced by this library.
/// </remarks>
public readonly struct ConfidenceInterval : IEquatable<ConfidenceInterval>
{
    /// <summary>Creates an interval.</summary>
    /// <param name="lower">Lower bound; finite.</param>
    /// <param name="upper">Upper bound; finite and ≥ <paramref name="lower"/>.</param>
    /// <param name="confidenceLevel">Confidence level, in the open interval (0, 1), e.g. 0.95.</param>
    /// <exception cref="ArgumentOutOfRangeException">A bound is not finite, <paramref name="upper"/> &lt;
    /// <paramref name="lower"/>, or <paramref name="confidenceLevel"/> is outside (0, 1).</exception>
    public ConfidenceInterval(double lower, double upper, double confidenceLevel)
    {
        Guard.Finite(lower, nameof(lower));
        Guard.Finite(upper, nameof(upper));
        if (upper < lower)
        {
            throw Guard.OutOfRange(nameof(upper), upper, $"a number >= lower ({Guard.Format(lower)})");
        }

        Guard.InOpenRange(confidenceLevel, 0, 1, nameof(confidenceLevel));
        Lower = lower;
        Upper = upper;
        ConfidenceLevel = confidenceLevel;
    }

    /// <summary>Lower bound.</summary>
    public double Lower { get; }

    /// <summary>Upper bound.</summary>
    public double Upper { get; }

    /// <summary>Confidence level in (0, 1), e.g. 0.95 for 95 %.</summary>
    public double ConfidenceLevel { get; }

    /// <summary>Half the width, (Upper − Lower)/2. For a symmetric interval this is the usual "±" value.</summary>
    public double HalfWidth => (Upper - Lower) / 2;

    /// <summary>Width, Upper − Lower.</summary>
    public double Width => Upper - Lower;

    /// <summary>Midpoint, (Lower + Upper)/2 (equals the estimate only for symmetric intervals).</summary>
    public double Midpoint => Lower + ((Upper - Lower) / 2);

    /// <summary>Equality operator (exact).</summary>
    /// <param name="left">First interval.</param>
    /// <param name="right">Second interval.</param>
    /// <returns>True when bounds and levels are identical.</returns>
    public static bool operator ==(ConfidenceInterval left, ConfidenceInterval right) => left.Equals(right);

    /// <summary>Inequality operator (exact).</summary>
    /// <param name="left">First interval.</param>
    /// <param name="right">Second interval.</param>
    /// <returns>True when any bound or the level differs.</returns>
    public static bool operator !=(ConfidenceInterval left, ConfidenceInterval right) => !left.Equals(right);

    /// <summary>Whether <paramref name="value"/> lies in the closed interval.</summary>
    /// <param name="value">Value to test; NaN gives false.</param>
    /// <returns>True when Lower ≤ value ≤ Upper.</returns>
    public bool Contains(double value) => value >= Lower && value <= Upper;

    /// <inheritdoc/>
    public bool Equals(ConfidenceInterval other) =>
        Lower.Equals(other.Lower) && Upper.Equals(other.Upper) && ConfidenceLevel.Equals(other.ConfidenceLevel);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is ConfidenceInterval other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() => (Lower, Upper, ConfidenceLevel).GetHashCode();

    /// <summary>Invariant-culture text such as <c>[1.25, 1.75] (95%)</c>.</summary>
    /// <returns>The interval as text.</returns>
    public override string ToString() =>
        string.Format(
            CultureInfo.InvariantCulture,
            "[{0}, {1}] ({2})",
            Lower.ToString("R", CultureInfo.InvariantCulture),
            Upper.ToString("R", CultureInfo.InvariantCulture),
            ConfidenceLevel.ToString("0.######%", CultureInfo.InvariantCulture));
}
