using System;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Quantities;

/// <summary>The molar mass of an analyte in g/mol; links mass and amount concentration.</summary>
/// <remarks>Immutable; finite and &gt; 0; exact equality. <c>default</c> (0 g/mol) is not a valid molar mass and is
/// refused by the conversions that use it.</remarks>
public readonly struct MolarMass : IEquatable<MolarMass>, IFormattable
{
    private MolarMass(double gramsPerMole) => GramsPerMole = gramsPerMole;

    /// <summary>The molar mass in g/mol.</summary>
    public double GramsPerMole { get; }

    /// <summary>Creates a molar mass.</summary>
    /// <param name="value">g/mol; finite and &gt; 0 (e.g. 112.414 for cadmium, IUPAC standard atomic weight).</param>
    /// <returns>The molar mass.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is ≤ 0, NaN or ±∞.</exception>
    public static MolarMass FromGramsPerMole(double value) => new(Guard.Positive(value, nameof(value)));

    /// <inheritdoc />
    public bool Equals(MolarMass other) => GramsPerMole.Equals(other.GramsPerMole);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is MolarMass other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => GramsPerMole.GetHashCode();

    /// <summary>Prints e.g. "112.414 g/mol" (invariant culture, round-trip precision).</summary>
    /// <returns>The text.</returns>
    public override string ToString() => ToString(null, null);

    /// <summary>Prints the value with a numeric format followed by "g/mol".</summary>
    /// <param name="format">Numeric format, or null for round-trip.</param>
    /// <param name="formatProvider">Culture; null means invariant.</param>
    /// <returns>The text.</returns>
    public string ToString(string? format, IFormatProvider? formatProvider) =>
        QuantityText.Format(GramsPerMole, "g/mol", format, formatProvider ?? CultureInfo.InvariantCulture);

    /// <summary>Exact equality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(MolarMass left, MolarMass right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(MolarMass left, MolarMass right) => !left.Equals(right);
}
