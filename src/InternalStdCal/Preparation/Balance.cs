using System;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>
/// A balance described by its performance figures, turning readings into masses with standard uncertainties.
/// </summary>
/// <remarks>
/// One reading has u² = (L/√3)² + s_r² + (d/(2√3))²: linearity ±L as a rectangular distribution
/// (JCGM 100:2008 §4.3.7), repeatability as a standard deviation s_r, and the resolution d of the display as a
/// rectangular distribution of half-width d/2 (JCGM 100:2008 §F.2.2.1). Weighing by difference (gross − tare)
/// takes two independent readings, so every term counts twice (common practice; QUAM counts the linearity term
/// twice for a tared weighing, from memory). Immutable; reference equality.
/// </remarks>
public sealed class Balance
{
    /// <summary>Describes a balance.</summary>
    /// <param name="linearityLimit">Linearity (maximum deviation from a straight response) ±L, ≥ 0.</param>
    /// <param name="repeatabilityStandardDeviation">Standard deviation of repeated readings, ≥ 0.</param>
    /// <param name="readability">Resolution of the display (scale interval) d, ≥ 0.</param>
    public Balance(Mass linearityLimit, Mass repeatabilityStandardDeviation, Mass readability)
    {
        LinearityLimit = linearityLimit;
        RepeatabilityStandardDeviation = repeatabilityStandardDeviation;
        Readability = readability;
        double linearity = linearityLimit.Grams / Tolerances.RootThree;
        double repeatability = repeatabilityStandardDeviation.Grams;
        double resolution = readability.Grams / (2 * Tolerances.RootThree);
        double u = Math.Sqrt((linearity * linearity) + (repeatability * repeatability) + (resolution * resolution));
        if (double.IsInfinity(u))
        {
            // Squares of huge masses overflow; the scaled root sum of squares does not (common practice).
            u = Propagation.RootSumSquares(new[] { linearity, repeatability, resolution });
        }

        SingleReadingStandardUncertainty = Mass.FromGrams(u);
    }

    /// <summary>Linearity ±L.</summary>
    public Mass LinearityLimit { get; }

    /// <summary>Repeatability standard deviation s_r.</summary>
    public Mass RepeatabilityStandardDeviation { get; }

    /// <summary>Display resolution d.</summary>
    public Mass Readability { get; }

    /// <summary>u of one reading: √((L/√3)² + s_r² + (d/(2√3))²), in g.</summary>
    public Mass SingleReadingStandardUncertainty { get; }

    /// <summary>A mass from one reading (balance zeroed with nothing on the pan).</summary>
    /// <param name="reading">The reading; &gt; 0.</param>
    /// <returns>The mass with u = <see cref="SingleReadingStandardUncertainty"/>, in the unit of <paramref name="reading"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="reading"/> is 0.</exception>
    public Measured<Mass> Weigh(Mass reading)
    {
        Guard.PositiveQuantity(reading, nameof(reading), "a mass");
        return Measured.WithStandardUncertainty(reading, SingleReadingStandardUncertainty, null, UncertaintyEvaluation.Combined);
    }

    /// <summary>A mass weighed by difference (gross − tare): two readings, u = √2 · <see cref="SingleReadingStandardUncertainty"/>.</summary>
    /// <param name="netMass">The net mass (gross − tare); &gt; 0.</param>
    /// <returns>The mass with its standard uncertainty, in the unit of <paramref name="netMass"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="netMass"/> is 0.</exception>
    public Measured<Mass> WeighByDifference(Mass netMass)
    {
        Guard.PositiveQuantity(netMass, nameof(netMass), "a mass");
        return Measured.WithStandardUncertainty(netMass, SingleReadingStandardUncertainty.Scale(Math.Sqrt(2)), null, UncertaintyEvaluation.Combined);
    }

    /// <summary>Prints e.g. "Balance: linearity ±0.2 mg, repeatability s_r = 0.1 mg, readability 0.1 mg; one reading
    /// u = 0.1443 mg" (invariant culture; the u of one reading in the unit of the readability, 4 significant digits).</summary>
    /// <returns>The text.</returns>
    public override string ToString() => string.Format(
        CultureInfo.InvariantCulture,
        "Balance: linearity ±{0}, repeatability s_r = {1}, readability {2}; one reading u = {3}",
        LinearityLimit,
        RepeatabilityStandardDeviation,
        Readability,
        SingleReadingStandardUncertainty.ConvertTo(Readability.Unit).ToString("G4", CultureInfo.InvariantCulture));
}
