using System;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Quantities;

/// <summary>How a standard uncertainty was obtained (JCGM 100:2008, GUM §4).</summary>
public enum UncertaintyEvaluation
{
    /// <summary>The value is taken as exact (zero uncertainty), e.g. a defined constant.</summary>
    Exact = 0,

    /// <summary>Type A: the standard deviation of the mean of repeated observations (GUM §4.2).</summary>
    TypeA,

    /// <summary>Type B from a ± tolerance a with a rectangular distribution: u = a/√3 (GUM §4.3.7).</summary>
    TypeBRectangular,

    /// <summary>Type B from a ± tolerance a with a triangular distribution: u = a/√6 (GUM §4.3.9).</summary>
    TypeBTriangular,

    /// <summary>Type B from an expanded uncertainty U and its coverage factor k: u = U/k (GUM §4.3.3), e.g. a certificate.</summary>
    TypeBExpanded,

    /// <summary>Type B given directly as a standard uncertainty.</summary>
    TypeBStandard,

    /// <summary>A combined standard uncertainty propagated from other components (GUM §5).</summary>
    Combined,
}

/// <summary>The distribution assumed for a ± tolerance when it is turned into a standard uncertainty.</summary>
public enum ToleranceDistribution
{
    /// <summary>Any value in ±a equally likely: u = a/√3 (GUM §4.3.7).</summary>
    Rectangular = 0,

    /// <summary>Values near the centre more likely: u = a/√6 (GUM §4.3.9; the EURACHEM/CITAC QUAM choice for glassware calibration).</summary>
    Triangular,
}

/// <summary>Factories for <see cref="Measured{T}"/>.</summary>
public static class Measured
{
    /// <summary>A value with zero uncertainty.</summary>
    /// <typeparam name="T">The quantity type.</typeparam>
    /// <param name="value">The value.</param>
    /// <returns>The measured value with u = 0.</returns>
    public static Measured<T> Exact<T>(T value)
        where T : struct, IQuantity<T> =>
        new(value, value.Scale(0), null, UncertaintyEvaluation.Exact);

    /// <summary>A Type A evaluation: the standard uncertainty is the standard deviation of the mean of n observations.</summary>
    /// <typeparam name="T">The quantity type.</typeparam>
    /// <param name="value">The mean.</param>
    /// <param name="standardUncertainty">s/√n, same kind as the value, ≥ 0.</param>
    /// <param name="degreesOfFreedom">n − 1; ≥ 1.</param>
    /// <returns>The measured value.</returns>
    /// <exception cref="ArgumentException">The uncertainty is negative or of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="degreesOfFreedom"/> &lt; 1 or not finite.</exception>
    public static Measured<T> TypeA<T>(T value, T standardUncertainty, double degreesOfFreedom)
        where T : struct, IQuantity<T> =>
        new(value, standardUncertainty, RequireDegreesOfFreedom(degreesOfFreedom), UncertaintyEvaluation.TypeA);

    /// <summary>A standard uncertainty given directly (Type B unless stated otherwise).</summary>
    /// <typeparam name="T">The quantity type.</typeparam>
    /// <param name="value">The value.</param>
    /// <param name="standardUncertainty">u, same kind as the value, ≥ 0.</param>
    /// <param name="degreesOfFreedom">Effective degrees of freedom, ≥ 1, or null for "infinite" (well known).</param>
    /// <param name="evaluation">How u was obtained.</param>
    /// <returns>The measured value.</returns>
    /// <exception cref="ArgumentException">The uncertainty is negative or of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="degreesOfFreedom"/> &lt; 1, NaN or ∞, or
    /// <paramref name="evaluation"/> is not defined.</exception>
    public static Measured<T> WithStandardUncertainty<T>(T value, T standardUncertainty, double? degreesOfFreedom = null, UncertaintyEvaluation evaluation = UncertaintyEvaluation.TypeBStandard)
        where T : struct, IQuantity<T>
    {
        if (evaluation < UncertaintyEvaluation.Exact || evaluation > UncertaintyEvaluation.Combined)
        {
            throw new ArgumentOutOfRangeException(nameof(evaluation), evaluation, $"Parameter 'evaluation' was {(int)evaluation}; it must be a defined UncertaintyEvaluation ({(int)UncertaintyEvaluation.Exact} to {(int)UncertaintyEvaluation.Combined}).");
        }

        return new(value, standardUncertainty, degreesOfFreedom is null ? null : RequireDegreesOfFreedom(degreesOfFreedom.Value), evaluation);
    }

    /// <summary>Type B from a ± tolerance (e.g. a class A glassware tolerance): u = a/√3 or a/√6 (JCGM 100:2008 §4.3.7, §4.3.9).</summary>
    /// <typeparam name="T">The quantity type.</typeparam>
    /// <param name="value">The nominal value.</param>
    /// <param name="halfWidth">The tolerance a (half-width), ≥ 0, same kind as the value.</param>
    /// <param name="distribution">The assumed distribution.</param>
    /// <returns>The measured value with infinite degrees of freedom.</returns>
    /// <exception cref="ArgumentException">The half-width is negative or of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="distribution"/> is not defined.</exception>
    public static Measured<T> FromTolerance<T>(T value, T halfWidth, ToleranceDistribution distribution)
        where T : struct, IQuantity<T>
    {
        (double divisor, UncertaintyEvaluation evaluation) = Tolerances.Divisor(distribution, nameof(distribution));
        RequireNonNegative(halfWidth, value, nameof(halfWidth));
        return new(value, halfWidth.Scale(1 / divisor), null, evaluation);
    }

    /// <summary>Type B from an expanded uncertainty and its coverage factor, e.g. a certificate: u = U/k (JCGM 100:2008 §4.3.3).</summary>
    /// <typeparam name="T">The quantity type.</typeparam>
    /// <param name="value">The certified value.</param>
    /// <param name="expandedUncertainty">U, ≥ 0, same kind as the value.</param>
    /// <param name="coverageFactor">k, &gt; 0 (usually 2).</param>
    /// <returns>The measured value with infinite degrees of freedom.</returns>
    /// <exception cref="ArgumentException">U is negative or of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="coverageFactor"/> ≤ 0 or not finite, or so small that U/k overflows.</exception>
    public static Measured<T> FromExpandedUncertainty<T>(T value, T expandedUncertainty, double coverageFactor)
        where T : struct, IQuantity<T>
    {
        Guard.Positive(coverageFactor, nameof(coverageFactor));
        RequireNonNegative(expandedUncertainty, value, nameof(expandedUncertainty));
        T standardUncertainty;
        try
        {
            standardUncertainty = expandedUncertainty.Scale(1 / coverageFactor);
        }
        catch (ArgumentOutOfRangeException)
        {
            // u = U/k must be a finite quantity (common practice: never return ∞ silently).
            throw Guard.OutOfRange(nameof(coverageFactor), coverageFactor, $"large enough that U/k stays finite (U = {expandedUncertainty})");
        }

        return new(value, standardUncertainty, null, UncertaintyEvaluation.TypeBExpanded);
    }

    internal static void RequireNonNegative<T>(T uncertainty, T value, string paramName)
        where T : struct, IQuantity<T>
    {
        T converted;
        try
        {
            converted = uncertainty.InUnitOf(value);
        }
        catch (ArgumentException ex) when (ex is not ArgumentOutOfRangeException)
        {
            throw new ArgumentException($"Parameter '{paramName}' ({uncertainty}) must be of the same kind as the value ({value}).", paramName, ex);
        }

        if (converted.Value < 0)
        {
            throw new ArgumentOutOfRangeException(paramName, uncertainty.Value, $"Parameter '{paramName}' was {uncertainty}; an uncertainty must be >= 0.");
        }
    }

    private static double RequireDegreesOfFreedom(double value)
    {
        if (!(value >= 1) || double.IsInfinity(value))
        {
            throw Guard.OutOfRange("degreesOfFreedom", value, "a finite number >= 1 (use null for infinite degrees of freedom)");
        }

        return value;
    }
}

/// <summary>
/// A value of a quantity with its standard uncertainty (JCGM 100:2008), optionally its degrees of freedom, and how
/// the uncertainty was obtained. Create it with the factories of <see cref="Measured"/>.
/// </summary>
/// <typeparam name="T">The quantity type (<see cref="Concentration"/>, <see cref="Volume"/>, <see cref="Mass"/>).</typeparam>
/// <remarks>
/// Immutable; the uncertainty is held in the unit of the value. Equality is exact on value, uncertainty, degrees
/// of freedom and evaluation. <c>default</c> is a zero value with zero uncertainty.
/// </remarks>
public readonly struct Measured<T> : IEquatable<Measured<T>>, IFormattable
    where T : struct, IQuantity<T>
{
    internal Measured(T value, T standardUncertainty, double? degreesOfFreedom, UncertaintyEvaluation evaluation)
    {
        Measured.RequireNonNegative(standardUncertainty, value, nameof(standardUncertainty));
        Value = value;
        StandardUncertainty = standardUncertainty.InUnitOf(value);
        DegreesOfFreedom = degreesOfFreedom;
        Evaluation = evaluation;
    }

    /// <summary>The value (best estimate).</summary>
    public T Value { get; }

    /// <summary>The standard uncertainty u, in the unit of <see cref="Value"/>.</summary>
    public T StandardUncertainty { get; }

    /// <summary>Degrees of freedom of u; null means infinite (a well-known Type B component).</summary>
    public double? DegreesOfFreedom { get; }

    /// <summary>How the uncertainty was obtained.</summary>
    public UncertaintyEvaluation Evaluation { get; }

    /// <summary>u / |value|, dimensionless.</summary>
    /// <exception cref="InvalidOperationException">The value is zero, so a relative uncertainty is undefined, or
    /// u / |value| overflows.</exception>
    public double RelativeStandardUncertainty
    {
        get
        {
            if (Value.Value == 0)
            {
                throw new InvalidOperationException($"The value is zero ({Value}); a relative uncertainty is undefined.");
            }

            double relative = StandardUncertainty.Value / Math.Abs(Value.Value);
            if (double.IsInfinity(relative))
            {
                throw new InvalidOperationException($"u / |value| = {StandardUncertainty} / {Value} overflows; a relative uncertainty must be finite.");
            }

            return relative;
        }
    }

    /// <summary>Expanded uncertainty U = k·u (JCGM 100:2008 §6.2).</summary>
    /// <param name="coverageFactor">k, &gt; 0 (2 gives about 95 % coverage for a normal distribution).</param>
    /// <returns>U in the unit of the value.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="coverageFactor"/> ≤ 0 or not finite, or so large that k·u overflows.</exception>
    public T ExpandedUncertainty(double coverageFactor)
    {
        Guard.Positive(coverageFactor, nameof(coverageFactor));
        try
        {
            return StandardUncertainty.Scale(coverageFactor);
        }
        catch (ArgumentOutOfRangeException)
        {
            // U = k·u must be a finite quantity (common practice: never return ∞ silently).
            throw Guard.OutOfRange(nameof(coverageFactor), coverageFactor, $"small enough that k·u stays finite (u = {StandardUncertainty})");
        }
    }

    /// <summary>Prints e.g. "10 mg/L, u = 0.05 mg/L (TypeA, ν = 9)", invariant culture.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => ToString(null, null);

    /// <summary>Prints value and standard uncertainty with a numeric format.</summary>
    /// <param name="format">Numeric format applied to both numbers (e.g. "G4"); null for round-trip.</param>
    /// <param name="formatProvider">Culture; null means invariant.</param>
    /// <returns>The text.</returns>
    public string ToString(string? format, IFormatProvider? formatProvider)
    {
        IFormatProvider provider = formatProvider ?? CultureInfo.InvariantCulture;
        string dof = DegreesOfFreedom is double nu ? ", ν = " + nu.ToString("G6", provider) : string.Empty;
        return $"{Value.ToString(format, provider)}, u = {StandardUncertainty.ToString(format, provider)} ({Evaluation}{dof})";
    }

    /// <inheritdoc />
    public bool Equals(Measured<T> other) =>
        Value.Equals(other.Value) && StandardUncertainty.Equals(other.StandardUncertainty)
        && Nullable.Equals(DegreesOfFreedom, other.DegreesOfFreedom) && Evaluation == other.Evaluation;

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Measured<T> other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => (Value, StandardUncertainty, Evaluation).GetHashCode();

    /// <summary>Exact equality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(Measured<T> left, Measured<T> right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(Measured<T> left, Measured<T> right) => !left.Equals(right);
}
