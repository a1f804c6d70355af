using System;
using System.Globalization;

namespace InternalStdCal.Uncertainty;

/// <summary>A coverage interval [low, high] for the output quantity with its coverage probability p (JCGM 101:2008 §3.12).</summary>
/// <remarks>Immutable; exact equality.</remarks>
public readonly struct CoverageInterval : IEquatable<CoverageInterval>
{
    internal CoverageInterval(double lower, double upper, double probability)
    {
        Lower = lower;
        Upper = upper;
        Probability = probability;
    }

    /// <summary>Lower end, in the unit of the output.</summary>
    public double Lower { get; }

    /// <summary>Upper end, in the unit of the output.</summary>
    public double Upper { get; }

    /// <summary>Coverage probability p, in (0, 1).</summary>
    public double Probability { get; }

    /// <summary>Upper − Lower.</summary>
    public double Length => Upper - Lower;

    /// <summary>Half the length.</summary>
    public double HalfWidth => (Upper - Lower) / 2;

    /// <summary>Exact equality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(CoverageInterval left, CoverageInterval right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(CoverageInterval left, CoverageInterval right) => !left.Equals(right);

    /// <inheritdoc />
    public bool Equals(CoverageInterval other) =>
        Lower.Equals(other.Lower) && Upper.Equals(other.Upper) && Probability.Equals(other.Probability);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is CoverageInterval other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => (Lower.GetHashCode() * 397) ^ Upper.GetHashCode() ^ Probability.GetHashCode();

    /// <summary>Prints e.g. "[9.8, 10.2] (95 %)" (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString() => ToString(string.Empty);

    /// <summary>Prints "[lower, upper] unit (p %)"; an empty unit prints as <see cref="ToString()"/>.</summary>
    internal string ToString(string unit) =>
        "[" + Lower.ToString("G6", CultureInfo.InvariantCulture) + ", " + Upper.ToString("G6", CultureInfo.InvariantCulture) + "]"
        + (unit.Length > 0 ? " " + unit : string.Empty) + " (" + (100 * Probability).ToString("G4", CultureInfo.InvariantCulture) + " %)";
}
