using System;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Uncertainty;

/// <summary>
/// The correlation coefficient r(xᵢ, xⱼ) = u(xᵢ, xⱼ)/(u(xᵢ)·u(xⱼ)) between two named inputs of a
/// <see cref="MeasurementModel"/> (JCGM 100:2008 §5.2.2), e.g. two volumes delivered with the same pipette.
/// </summary>
/// <remarks>Immutable; exact equality on names (ordinal) and coefficient. <c>default</c> has null names and is
/// rejected by the model.</remarks>
public readonly struct InputCorrelation : IEquatable<InputCorrelation>
{
    /// <summary>Creates a correlation.</summary>
    /// <param name="firstInput">Name of one input, not blank.</param>
    /// <param name="secondInput">Name of another input, not blank, different from <paramref name="firstInput"/>.</param>
    /// <param name="coefficient">r in [−1, 1].</param>
    /// <exception cref="ArgumentNullException">A name is null.</exception>
    /// <exception cref="ArgumentException">A name is blank, or both names are the same.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="coefficient"/> is outside [−1, 1] or NaN.</exception>
    public InputCorrelation(string firstInput, string secondInput, double coefficient)
    {
        Guard.NotBlank(firstInput, nameof(firstInput));
        Guard.NotBlank(secondInput, nameof(secondInput));
        if (string.Equals(firstInput, secondInput, StringComparison.Ordinal))
        {
            throw new ArgumentException($"Parameter 'secondInput' was '{secondInput}', the same as 'firstInput'; a correlation links two different inputs.", nameof(secondInput));
        }

        FirstInput = firstInput;
        SecondInput = secondInput;
        Coefficient = Guard.InClosedRange(coefficient, -1, 1, nameof(coefficient));
    }

    /// <summary>Name of one input.</summary>
    public string FirstInput { get; }

    /// <summary>Name of the other input.</summary>
    public string SecondInput { get; }

    /// <summary>The correlation coefficient r, in [−1, 1].</summary>
    public double Coefficient { get; }

    /// <summary>Exact equality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(InputCorrelation left, InputCorrelation right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(InputCorrelation left, InputCorrelation right) => !left.Equals(right);

    /// <inheritdoc />
    public bool Equals(InputCorrelation other) =>
        string.Equals(FirstInput, other.FirstInput, StringComparison.Ordinal)
        && string.Equals(SecondInput, other.SecondInput, StringComparison.Ordinal)
        && Coefficient.Equals(other.Coefficient);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is InputCorrelation other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => (FirstInput, SecondInput, Coefficient).GetHashCode();

    /// <summary>Prints e.g. "r(V1, V2) = 0.5" (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "r(" + FirstInput + ", " + SecondInput + ") = " + Coefficient.ToString("G6", CultureInfo.InvariantCulture);
}
