using System;
using System.Collections.Generic;
using System.Globalization;

namespace InternalStdCal.Internal;

/// <summary>
/// Argument checks shared by the whole library. Every failure is a BCL argument exception whose message
/// names the parameter, the offending value and the allowed range, formatted with the invariant culture.
/// </summary>
internal static class Guard
{
    internal static T NotNull<T>(T? value, string paramName)
        where T : class
    {
        if (value is null)
        {
            throw new ArgumentNullException(paramName, $"Parameter '{paramName}' must not be null.");
        }

        return value;
    }

    /// <summary>Finite: not NaN, not ±∞.</summary>
    internal static double Finite(double value, string paramName)
    {
        if (double.IsNaN(value) || double.IsInfinity(value))
        {
            throw OutOfRange(paramName, value, "a finite number (not NaN or infinity)");
        }

        return value;
    }

    internal static double Positive(double value, string paramName)
    {
        if (!(value > 0) || double.IsPositiveInfinity(value))
        {
            throw OutOfRange(paramName, value, "a finite number > 0");
        }

        return value;
    }

    internal static double NonNegative(double value, string paramName)
    {
        if (!(value >= 0) || double.IsPositiveInfinity(value))
        {
            throw OutOfRange(paramName, value, "a finite number >= 0");
        }

        return value;
    }

    /// <summary>Open interval (min, max); also rejects NaN.</summary>
    internal static double InOpenRange(double value, double min, double max, string paramName)
    {
        if (!(value > min && value < max))
        {
            throw OutOfRange(paramName, value, $"a number in the open interval ({Format(min)}, {Format(max)})");
        }

        return value;
    }

    /// <summary>Half-open interval (min, max]; also rejects NaN.</summary>
    internal static double InLeftOpenRange(double value, double min, double max, string paramName)
    {
        if (!(value > min && value <= max))
        {
            throw OutOfRange(paramName, value, $"a number in the interval ({Format(min)}, {Format(max)}]");
        }

        return value;
    }

    /// <summary>Closed interval [min, max]; also rejects NaN.</summary>
    internal static double InClosedRange(double value, double min, double max, string paramName)
    {
        if (!(value >= min && value <= max))
        {
            throw OutOfRange(paramName, value, $"a number in the interval [{Format(min)}, {Format(max)}]");
        }

        return value;
    }

    /// <summary>A scale factor whose product with a number of this magnitude (the larger of the quantity's number
    /// in its own unit and in the base unit) stays finite; call after the factor's own range check.</summary>
    internal static double FiniteProduct(double factor, double magnitude, string paramName)
    {
        if (double.IsInfinity(factor * magnitude))
        {
            throw OutOfRange(paramName, factor, $"a factor whose product with {Format(magnitude)} stays finite (at most {Format(double.MaxValue / magnitude)} in magnitude)");
        }

        return factor;
    }

    /// <summary>A computed number that overflowed names the argument that drives it (common practice: never
    /// return NaN or ∞ silently).</summary>
    internal static double FiniteResult<T>(double result, T argument, string paramName, string what)
        where T : IFormattable
    {
        if (double.IsNaN(result) || double.IsInfinity(result))
        {
            throw new ArgumentOutOfRangeException(paramName, $"Parameter '{paramName}' was {argument.ToString(null, CultureInfo.InvariantCulture)}; it must keep {what} finite (it overflows).");
        }

        return result;
    }

    internal static int AtLeast(int value, int min, string paramName)
    {
        if (value < min)
        {
            throw new ArgumentOutOfRangeException(
                paramName,
                value,
                $"Parameter '{paramName}' was {value.ToString(CultureInfo.InvariantCulture)}; it must be >= {min.ToString(CultureInfo.InvariantCulture)}.");
        }

        return value;
    }

    internal static IReadOnlyList<T> NotEmpty<T>(IReadOnlyList<T>? values, string paramName)
    {
        NotNull(values, paramName);
        if (values!.Count == 0)
        {
            throw new ArgumentException($"Parameter '{paramName}' is empty; at least one element is required.", paramName);
        }

        return values;
    }

    internal static void SameLength(int expected, int actual, string expectedName, string paramName)
    {
        if (expected != actual)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{paramName}' has {actual} elements; it must have as many as '{expectedName}' ({expected})."),
                paramName);
        }
    }

    /// <summary>A quantity whose number is &gt; 0 (quantities are finite by construction).</summary>
    internal static T PositiveQuantity<T>(T value, string paramName, string what)
        where T : struct, InternalStdCal.Quantities.IQuantity<T>
    {
        if (!(value.Value > 0))
        {
            throw new ArgumentOutOfRangeException(paramName, value.Value, $"Parameter '{paramName}' was {value}; it must be {what} > 0.");
        }

        return value;
    }

    /// <summary>Not null, not empty, not only white space.</summary>
    internal static string NotBlank(string? value, string paramName)
    {
        NotNull(value, paramName);
        if (value!.Trim().Length == 0)
        {
            throw new ArgumentException($"Parameter '{paramName}' was '{value}'; it must contain at least one non-blank character.", paramName);
        }

        return value;
    }

    internal static ArgumentOutOfRangeException OutOfRange(string paramName, double value, string allowed) =>
        new(paramName, value, $"Parameter '{paramName}' was {Format(value)}; it must be {allowed}.");

    internal static string Format(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
