using System;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>
/// The purity of a weighed substance as a mass fraction (g of analyte per g of material) with its standard
/// uncertainty, as used in c = m·P/V (EURACHEM/CITAC QUAM example A1).
/// </summary>
/// <remarks>
/// Immutable; the mass fraction lies in (0, 1] and the standard uncertainty is finite and ≥ 0. Equality is exact
/// on both numbers and the evaluation. <c>default</c> has a mass fraction of 0, which is not a valid purity and is
/// refused by the methods that use it.
/// </remarks>
public readonly struct Purity : IEquatable<Purity>
{
    private Purity(double massFraction, double standardUncertainty, UncertaintyEvaluation evaluation)
    {
        MassFraction = massFraction;
        StandardUncertainty = standardUncertainty == 0 ? 0 : standardUncertainty; // −0 → +0, so hashing matches equality
        Evaluation = evaluation;
    }

    /// <summary>The purity as a mass fraction, in (0, 1] (g/g; 0.9999 = 99.99 %).</summary>
    public double MassFraction { get; }

    /// <summary>The standard uncertainty of <see cref="MassFraction"/>, in g/g, ≥ 0.</summary>
    public double StandardUncertainty { get; }

    /// <summary>How <see cref="StandardUncertainty"/> was obtained.</summary>
    public UncertaintyEvaluation Evaluation { get; }

    /// <summary>u(P)/P, dimensionless.</summary>
    /// <exception cref="InvalidOperationException">This is <c>default</c> (mass fraction 0).</exception>
    public double RelativeStandardUncertainty =>
        MassFraction > 0
            ? StandardUncertainty / MassFraction
            : throw new InvalidOperationException("A default(Purity) has mass fraction 0; create purities with Purity.FromMassFraction or Purity.FromTolerance.");

    /// <summary>A purity with a standard uncertainty given directly (Type B, e.g. from a certificate's u).</summary>
    /// <param name="massFraction">Mass fraction in (0, 1].</param>
    /// <param name="standardUncertainty">Standard uncertainty in g/g, finite and ≥ 0.</param>
    /// <returns>The purity.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="massFraction"/> is outside (0, 1] or NaN, or
    /// <paramref name="standardUncertainty"/> is negative, NaN or ±∞.</exception>
    public static Purity FromMassFraction(double massFraction, double standardUncertainty) =>
        new(
            Guard.InLeftOpenRange(massFraction, 0, 1, nameof(massFraction)),
            Guard.NonNegative(standardUncertainty, nameof(standardUncertainty)),
            UncertaintyEvaluation.TypeBStandard);

    /// <summary>A purity stated as P ± a, converted with u = a/√3 (rectangular, JCGM 100:2008 §4.3.7) or
    /// u = a/√6 (triangular, §4.3.9). QUAM example A1 states 0.9999 ± 0.0001, rectangular: u = 0.000058.</summary>
    /// <param name="massFraction">Mass fraction in (0, 1].</param>
    /// <param name="halfWidth">The tolerance a in g/g, finite and ≥ 0.</param>
    /// <param name="distribution">The distribution assumed within ±a.</param>
    /// <returns>The purity.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="massFraction"/> is outside (0, 1] or NaN,
    /// <paramref name="halfWidth"/> is negative or not finite, or <paramref name="distribution"/> is not defined.</exception>
    public static Purity FromTolerance(double massFraction, double halfWidth, ToleranceDistribution distribution)
    {
        Guard.InLeftOpenRange(massFraction, 0, 1, nameof(massFraction));
        Guard.NonNegative(halfWidth, nameof(halfWidth));
        (double divisor, UncertaintyEvaluation evaluation) = Tolerances.Divisor(distribution, nameof(distribution));
        return new Purity(massFraction, halfWidth / divisor, evaluation);
    }

    /// <summary>Prints e.g. "0.9999 g/g, u = 5.7735E-05 g/g" (invariant culture, round-trip precision).</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        FormattableString.Invariant($"{MassFraction.ToString("R", CultureInfo.InvariantCulture)} g/g, u = {StandardUncertainty.ToString("R", CultureInfo.InvariantCulture)} g/g");

    /// <inheritdoc />
    public bool Equals(Purity other) =>
        MassFraction.Equals(other.MassFraction) && StandardUncertainty.Equals(other.StandardUncertainty) && Evaluation == other.Evaluation;

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Purity other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => (MassFraction, StandardUncertainty, Evaluation).GetHashCode();

    /// <summary>Exact equality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(Purity left, Purity right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(Purity left, Purity right) => !left.Equals(right);
}
