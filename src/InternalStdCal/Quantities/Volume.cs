using System;
using InternalStdCal.Internal;

namespace InternalStdCal.Quantities;

/// <summary>Units of <see cref="Volume"/>.</summary>
public enum VolumeUnit
{
    /// <summary>L.</summary>
    Litre = 0,

    /// <summary>mL.</summary>
    Millilitre,

    /// <summary>µL.</summary>
    Microlitre
}

/// <summary>
/// A volume: a finite, non-negative number in a <see cref="VolumeUnit"/>.
/// </summary>
/// <remarks>
/// Immutable; the value is kept in the unit it was created in so that printing and parsing round-trip exactly.
/// Conversions use exact powers of ten (one rounding). Equality is exact on the value in litres
/// (values created in different units may differ in the last bit). <c>default</c> is 0 litres.
/// </remarks>
public readonly struct Volume : IQuantity<Volume>, IComparable
{
    private Volume(double value, VolumeUnit unit)
    {
        Value = value;
        Unit = unit;
    }

    /// <summary>The number in <see cref="Unit"/>.</summary>
    public double Value { get; }

    /// <summary>The unit the value is expressed in.</summary>
    public VolumeUnit Unit { get; }

    /// <summary>The volume in L.</summary>
    public double Litres => In(VolumeUnit.Litre);

    /// <summary>The volume in mL.</summary>
    public double Millilitres => In(VolumeUnit.Millilitre);

    /// <summary>The volume in µL.</summary>
    public double Microlitres => In(VolumeUnit.Microlitre);

    /// <summary>Creates a volume.</summary>
    /// <param name="value">The number; finite and ≥ 0.</param>
    /// <param name="unit">A defined unit.</param>
    /// <returns>The volume.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative, NaN or ±∞, or <paramref name="unit"/> is not defined.</exception>
    public static Volume From(double value, VolumeUnit unit)
    {
        int exponent = UnitTable.Exponent(unit);
        Guard.NonNegative(value, nameof(value));
        PowerOfTen.ScaleChecked(value, exponent, UnitTable.Symbol(unit), "L", nameof(value));
        return new Volume(value, unit);
    }

    /// <summary>Creates a volume in L.</summary>
    /// <param name="value">Number of L; finite and ≥ 0.</param>
    /// <returns>The volume.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative, NaN or ±∞.</exception>
    public static Volume FromLitres(double value) => From(value, VolumeUnit.Litre);

    /// <summary>Creates a volume in mL.</summary>
    /// <param name="value">Number of mL; finite and ≥ 0.</param>
    /// <returns>The volume.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative, NaN or ±∞.</exception>
    public static Volume FromMillilitres(double value) => From(value, VolumeUnit.Millilitre);

    /// <summary>Creates a volume in µL.</summary>
    /// <param name="value">Number of µL; finite and ≥ 0.</param>
    /// <returns>The volume.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative, NaN or ±∞.</exception>
    public static Volume FromMicrolitres(double value) => From(value, VolumeUnit.Microlitre);

    /// <summary>The number expressed in another unit (exact power-of-ten factor, one rounding).</summary>
    /// <param name="unit">A defined unit.</param>
    /// <returns>The value in <paramref name="unit"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined, or the value overflows when expressed in it.</exception>
    public double In(VolumeUnit unit) =>
        PowerOfTen.ScaleChecked(Value, UnitTable.Exponent(Unit) - UnitTable.Exponent(unit), UnitTable.Symbol(Unit), UnitTable.Symbol(unit), nameof(unit));

    /// <summary>The same volume expressed in another unit.</summary>
    /// <param name="unit">A defined unit.</param>
    /// <returns>The converted volume.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined, or the value overflows when expressed in it.</exception>
    public Volume ConvertTo(VolumeUnit unit) => new(In(unit), unit);

    /// <inheritdoc />
    public Volume InUnitOf(Volume reference) => ConvertTo(reference.Unit);

    /// <inheritdoc />
    public double RatioTo(Volume denominator)
    {
        if (denominator.Value == 0)
        {
            throw new ArgumentException("Parameter 'denominator' is zero; a ratio needs a non-zero denominator.", nameof(denominator));
        }

        return Guard.FiniteResult(Value / denominator.In(Unit), denominator, nameof(denominator), "the ratio");
    }

    /// <summary>The volume multiplied by a non-negative factor, in the same unit.</summary>
    /// <param name="factor">Finite and ≥ 0 (a volume cannot be negative).</param>
    /// <returns>The scaled volume.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="factor"/> is negative, NaN or ±∞, or the product overflows.</exception>
    public Volume Scale(double factor) => From(Value * Guard.FiniteProduct(Guard.NonNegative(factor, nameof(factor)), Math.Max(Value, BaseValue), nameof(factor)), Unit);

    /// <summary>Parses the printed form "&lt;number&gt; &lt;unit&gt;" (invariant culture), e.g. "100 µL".</summary>
    /// <param name="text">The text; the micro prefix may be written µ, μ or u.</param>
    /// <returns>The volume.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="FormatException">The text is not a finite non-negative number followed by L, mL, µL.</exception>
    public static Volume Parse(string text)
    {
        UnitTable.SplitValueAndUnit(text, nameof(text), out double value, out string symbol);
        if (!UnitTable.TryParseVolumeUnit(symbol, out VolumeUnit unit))
        {
            throw new FormatException($"'{symbol}' in '{text}' is not a volume unit; known units: L, mL, µL.");
        }

        if (value < 0)
        {
            throw new FormatException($"'{text}' is negative; a volume must be >= 0.");
        }

        return new Volume(value, unit);
    }

    /// <summary>Prints "&lt;value&gt; &lt;unit&gt;" with the invariant culture and round-trip precision.</summary>
    /// <returns>The text; <see cref="Parse"/> reads it back exactly.</returns>
    public override string ToString() => ToString(null, null);

    /// <summary>Prints the value with a numeric format followed by the unit symbol.</summary>
    /// <param name="format">A numeric format for the value (e.g. "F2"); null for round-trip.</param>
    /// <param name="formatProvider">Culture for the number; null means the invariant culture.</param>
    /// <returns>The text.</returns>
    public string ToString(string? format, IFormatProvider? formatProvider) =>
        QuantityText.Format(Value, UnitTable.Symbol(Unit), format, formatProvider);

    /// <inheritdoc />
    public bool Equals(Volume other) => BaseValue.Equals(other.BaseValue);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Volume other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => BaseValue.GetHashCode();

    /// <inheritdoc />
    public int CompareTo(Volume other) => BaseValue.CompareTo(other.BaseValue);

    int IComparable.CompareTo(object? obj) => obj switch
    {
        null => 1,
        Volume other => CompareTo(other),
        _ => throw new ArgumentException($"Parameter 'obj' is a {obj.GetType().Name}; it must be a Volume.", nameof(obj)),
    };

    /// <summary>Exact equality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(Volume left, Volume right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(Volume left, Volume right) => !left.Equals(right);

    /// <summary>Less than.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether left &lt; right.</returns>
    public static bool operator <(Volume left, Volume right) => left.CompareTo(right) < 0;

    /// <summary>Greater than.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether left &gt; right.</returns>
    public static bool operator >(Volume left, Volume right) => left.CompareTo(right) > 0;

    /// <summary>Less than or equal.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether left ≤ right.</returns>
    public static bool operator <=(Volume left, Volume right) => left.CompareTo(right) <= 0;

    /// <summary>Greater than or equal.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether left ≥ right.</returns>
    public static bool operator >=(Volume left, Volume right) => left.CompareTo(right) >= 0;

    // Value in litres; +0 for zero so that hashing matches equality.
    private double BaseValue
    {
        get
        {
            double v = PowerOfTen.Scale(Value, UnitTable.Exponent(Unit));
            return v == 0 ? 0 : v;
        }
    }
}
