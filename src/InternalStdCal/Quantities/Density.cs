using System;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Quantities;

/// <summary>The density of a solution or sample in g/mL (= kg/L); links mass fraction and mass concentration
/// and turns masses into volumes in gravimetric preparation.</summary>
/// <remarks>Immutable; finite and &gt; 0; exact equality.</remarks>
public readonly struct Density : IEquatable<Density>, IFormattable
{
    private Density(double gramsPerMillilitre) => GramsPerMillilitre = gramsPerMillilitre;

    /// <summary>The density in g/mL.</summary>
    public double GramsPerMillilitre { get; }

    /// <summary>The density in kg/L (numerically equal to g/mL).</summary>
    public double KilogramsPerLitre => GramsPerMillilitre;

    /// <summary>Creates a density.</summary>
    /// <param name="value">g/mL; finite and &gt; 0 (dilute aqueous solutions at 20 °C: about 0.998).</param>
    /// <returns>The density.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is ≤ 0, NaN or ±∞.</exception>
    public static Density FromGramsPerMillilitre(double value) => new(Guard.Positive(value, nameof(value)));

    /// <summary>The volume occupied by a mass of this density: V = m / ρ.</summary>
    /// <param name="mass">The mass.</param>
    /// <returns>The volume in mL.</returns>
    /// <exception cref="InvalidOperationException">This is <c>default</c> (zero density).</exception>
    /// <exception cref="ArgumentOutOfRangeException">m / ρ overflows.</exception>
    public Volume VolumeOf(Mass mass)
    {
        if (GramsPerMillilitre == 0)
        {
            throw new InvalidOperationException("A default(Density) is zero; create densities with FromGramsPerMillilitre.");
        }

        double millilitres = mass.Grams / GramsPerMillilitre;
        if (double.IsInfinity(millilitres))
        {
            throw new ArgumentOutOfRangeException(nameof(mass), $"Parameter 'mass' was {mass}; at {this} it must be small enough that m / ρ stays finite.");
        }

        return Volume.FromMillilitres(millilitres);
    }

    /// <inheritdoc />
    public bool Equals(Density other) => GramsPerMillilitre.Equals(other.GramsPerMillilitre);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Density other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => GramsPerMillilitre.GetHashCode();

    /// <summary>Prints e.g. "0.9982 g/mL" (invariant culture, round-trip precision).</summary>
    /// <returns>The text.</returns>
    public override string ToString() => ToString(null, null);

    /// <summary>Prints the value with a numeric format followed by "g/mL".</summary>
    /// <param name="format">Numeric format, or null for round-trip.</param>
    /// <param name="formatProvider">Culture; null means invariant.</param>
    /// <returns>The text.</returns>
    public string ToString(string? format, IFormatProvider? formatProvider) =>
        QuantityText.Format(GramsPerMillilitre, "g/mL", format, formatProvider ?? CultureInfo.InvariantCulture);

    /// <summary>Exact equality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(Density left, Density right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(Density left, Density right) => !left.Equals(right);
}
