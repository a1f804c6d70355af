using System;

namespace InternalStdCal.Quantities;

/// <summary>
/// A scalar physical quantity held as a number in a unit. Implemented by <see cref="Concentration"/>,
/// <see cref="Volume"/> and <see cref="Mass"/>; lets <see cref="Measured{T}"/> carry an uncertainty of any of them.
/// </summary>
/// <typeparam name="T">The implementing quantity type.</typeparam>
public interface IQuantity<T> : IEquatable<T>, IComparable<T>, IFormattable
    where T : struct, IQuantity<T>
{
    /// <summary>The number, expressed in the quantity's own unit.</summary>
    double Value { get; }

    /// <summary>The dimensionless ratio this / <paramref name="denominator"/>.</summary>
    /// <param name="denominator">A non-zero quantity of the same kind.</param>
    /// <returns>The ratio of the two quantities, independent of their units.</returns>
    /// <exception cref="ArgumentException">The quantities are of different kinds, or the denominator is zero.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The denominator is so small that the ratio overflows.</exception>
    double RatioTo(T denominator);

    /// <summary>The quantity multiplied by a dimensionless factor, in the same unit.</summary>
    /// <param name="factor">Any finite number.</param>
    /// <returns>A new quantity of the same kind and unit.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="factor"/> is not finite, or the result is invalid for the type.</exception>
    T Scale(double factor);

    /// <summary>The same amount expressed in the unit of <paramref name="reference"/>.</summary>
    /// <param name="reference">A quantity of the same kind whose unit is wanted.</param>
    /// <returns>The converted quantity.</returns>
    /// <exception cref="ArgumentException">The quantities are of different kinds.</exception>
    T InUnitOf(T reference);
}
