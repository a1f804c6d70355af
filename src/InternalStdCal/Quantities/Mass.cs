using System;
using InternalStdCal.Internal;

namespace InternalStdCal.Quantities;

/// <summary>Units of <see cref="Mass"/>.</summary>
public enum MassUnit
{
    /// <summary>kg.</summary>
    Kilogram = 0,

    /// <summary>g.</summary>
    Gram,

    /// <summary>mg.</summary>
    Milligram,

    /// <summary>µg.</summary>
    Microgram
}

/// <summary>
/// A mass: a finite, non-negative number in a <see cref="MassUnit"/>.
/// </summary>
/// <remarks>
/// Immutable; the value is kept in the unit it was created in so that printing and parsing round-trip exactly.
/// Conversions use exact powers of ten (one rounding). Equality is exact on the value in grams
/// (values created in different units may differ in the last bit). <c>default</c> is 0 grams.
/// </remarks>
public readonly struct Mass : IQuantity<Mass>, IComparable
{
    private Mass(double value, MassUnit unit)
    {
        Value = value;
        Unit = unit;
    }

    /// <summary>The number in <see cref="Unit"/>.</summary>
    public double Value { get; }

    /// <summary>The unit the value is expressed in.</summary>
    public MassUnit Unit { get; }

    /// <summary>The mass in kg.</summary>
    public double Kilograms => In(MassUnit.Kilogram);

    /// <summary>The mass in g.</summary>
    public double Grams => In(MassUnit.Gram);

    /// <summary>The mass in mg.</summary>
    public double Milligrams => In(MassUnit.Milligram);

    /// <summary>The mass in µg.</summary>
    public double Micrograms => In(MassUnit.Microgram);

    /// <summary>Creates a mass.</summary>
    /// <param name="value">The number; finite and ≥ 0.</param>
    /// <param name="unit">A defined unit.</param>
    /// <returns>The mass.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative, NaN or ±∞, or <paramref name="unit"/> is not defined.</exception>
    public static Mass From(double value, MassUnit unit)
    {
        int exponent = UnitTable.Exponent(unit);
        Guard.NonNegative(value, nameof(value));
        PowerOfTen.ScaleChecked(value, exponent, UnitTable.Symbol(unit), "g", nameof(value));
        return new Mass(value, unit);
    }

    /// <summary>Creates a mass in kg.</summary>
    /// <param name="value">Number of kg; finite and ≥ 0.</param>
    /// <returns>The mass.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative, NaN or ±∞.</exception>
    public static Mass FromKilograms(double value) => From(value, MassUnit.Kilogram);

    /// <summary>Creates a mass in g.</summary>
    /// <param name="value">Number of g; finite and ≥ 0.</param>
    /// <returns>The mass.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative, NaN or ±∞.</exception>
    public static Mass FromGrams(double value) => From(value, MassUnit.Gram);

    /// <summary>Creates a mass in mg.</summary>
    /// <param name="value">Number of mg; finite and ≥ 0.</param>
    /// <returns>The mass.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative, NaN or ±∞.</exception>
    public static Mass FromMilligrams(double value) => From(value, MassUnit.Milligram);

    /// <summary>Creates a mass in µg.</summary>
    /// <param name="value">Number of µg; finite and ≥ 0.</param>
    /// <returns>The mass.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative, NaN or ±∞.</exception>
    public static Mass FromMicrograms(double value) => From(value, MassUnit.Microgram);

    /// <summary>The number expressed in another unit (exact power-of-ten factor, one rounding).</summary>
    /// <param name="unit">A defined unit.</param>
    /// <returns>The value in <paramref name="unit"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined, or the value overflows when expressed in it.</exception>
    public double In(MassUnit unit) =>
        PowerOfTen.ScaleChecked(Value, UnitTable.Exponent(Unit) - UnitTable.Exponent(unit), UnitTable.Symbol(Unit), UnitTable.Symbol(unit), nameof(unit));

    /// <summary>The same mass expressed in another unit.</summary>
    /// <param name="unit">A defined unit.</param>
    /// <returns>The converted mass.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined, or the value overflows when expressed in it.</exception>
    public Mass ConvertTo(MassUnit unit) => new(In(unit), unit);

    /// <inheritdoc />
    public Mass InUnitOf(Mass reference) => ConvertTo(reference.Unit);

    /// <inheritdoc />
    public double RatioTo(Mass denominator)
    {
        if (denominator.Value == 0)
        {
            throw new ArgumentException("Parameter 'denominator' is zero; a ratio needs a non-zero denominator.", nameof(denominator));
        }

        return Guard.FiniteResult(Value / denominator.In(Unit), denominator, nameof(denominator), "the ratio");
    }

    /// <summary>The mass multiplied by a non-negative factor, in the same unit.</summary>
    /// <param name="factor">Finite and ≥ 0 (a mass cannot be negative).</param>
    /// <returns>The scaled mass.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="factor"/> is negative, NaN or ±∞, or the product overflows.</exception>
    public Mass Scale(double factor) => From(Value * Guard.FiniteProduct(Guard.NonNegative(factor, nameof(factor)), Math.Max(Value, Grams), nameof(factor)), Unit);

    /// <summary>Parses the printed form "&lt;number&gt; &lt;unit&gt;" (invariant culture), e.g. "100.28 mg".</summary>
    /// <param name="text">The text; the micro prefix may be written µ, μ or u.</param>
    /// <returns>The mass.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="FormatException">The text is not a finite non-negative number followed by kg, g, mg, µg, or it
    /// overflows when expressed in g.</exception>
    public static Mass Parse(string text)
    {
        UnitTable.SplitValueAndUnit(text, nameof(text), out double value, out string symbol);
        if (!UnitTable.TryParseMassUnit(symbol, out MassUnit unit))
        {
            throw new FormatException($"'{symbol}' in '{text}' is not a mass unit; known units: kg, g, mg, µg.");
        }

        if (value < 0)
        {
            throw new FormatException($"'{text}' is negative; a mass must be >= 0.");
        }

        if (double.IsInfinity(PowerOfTen.Scale(value, UnitTable.Exponent(unit))))
        {
            throw new FormatException($"'{text}' is out of range: expressed in g it overflows the range of a double.");
        }

        return new Mass(value, unit);
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
    public bool Equals(Mass other) => BaseValue.Equals(other.BaseValue);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Mass other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => BaseValue.GetHashCode();

    /// <inheritdoc />
    public int CompareTo(Mass other) => BaseValue.CompareTo(other.BaseValue);

    int IComparable.CompareTo(object? obj) => obj switch
    {
        null => 1,
        Mass other => CompareTo(other),
        _ => throw new ArgumentException($"Parameter 'obj' is a {obj.GetType().Name}; it must be a Mass.", nameof(obj)),
    };

    /// <summary>Exact equality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(Mass left, Mass right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(Mass left, Mass right) => !left.Equals(right);

    /// <summary>Less than.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether left &lt; right.</returns>
    public static bool operator <(Mass left, Mass right) => left.CompareTo(right) < 0;

    /// <summary>Greater than.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether left &gt; right.</returns>
    public static bool operator >(Mass left, Mass right) => left.CompareTo(right) > 0;

    /// <summary>Less than or equal.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether left ≤ right.</returns>
    public static bool operator <=(Mass left, Mass right) => left.CompareTo(right) <= 0;

    /// <summary>Greater than or equal.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether left ≥ right.</returns>
    public static bool operator >=(Mass left, Mass right) => left.CompareTo(right) >= 0;

    // Value in grams; +0 for zero so that hashing matches equality.
    private double BaseValue
    {
        get
        {
            double v = PowerOfTen.Scale(Value, UnitTable.Exponent(Unit));
            return v == 0 ? 0 : v;
        }
    }
}
