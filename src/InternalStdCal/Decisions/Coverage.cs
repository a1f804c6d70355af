using System;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Decisions;

/// <summary>
/// How the expanded uncertainty U = k·u of a result is formed (JCGM 100:2008 §6): either a stated coverage factor k,
/// or a coverage probability from which k is derived.
/// </summary>
/// <remarks>
/// With a coverage probability p, k = z((1 + p)/2) for a normal distribution (no degrees of freedom given), or
/// k = t((1 + p)/2, ν) with ν the degrees of freedom of u (rounded down to an integer, JCGM 100:2008 G.6.4).
/// Immutable; equality is exact.
/// </remarks>
public sealed class Coverage : IEquatable<Coverage>
{
    private Coverage(double? factor, double? probability)
    {
        Factor = factor;
        Probability = probability;
    }

    /// <summary>The stated coverage factor k; null when a coverage probability was given.</summary>
    public double? Factor { get; }

    /// <summary>The stated coverage probability p in (0, 1); null when a coverage factor was given.</summary>
    public double? Probability { get; }

    /// <summary>A stated coverage factor, e.g. 2.</summary>
    /// <param name="k">k &gt; 0, finite.</param>
    /// <returns>The coverage.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="k"/> ≤ 0 or not finite.</exception>
    public static Coverage WithFactor(double k) => new(Guard.Positive(k, nameof(k)), null);

    /// <summary>A coverage probability (level of confidence), e.g. 0.95; k follows from the normal or t distribution.</summary>
    /// <param name="probability">p in (0, 1).</param>
    /// <returns>The coverage.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="probability"/> outside (0, 1), or so close to 1
    /// that (1 + p)/2 rounds to 1.</exception>
    public static Coverage WithProbability(double probability)
    {
        Guard.InOpenRange(probability, 0, 1, nameof(probability));
        if ((1 + probability) / 2 == 1)
        {
            // The two-sided quantile of (1 + p)/2 = 1 is infinite (common practice: never return ∞ silently).
            throw Guard.OutOfRange(nameof(probability), probability, "a number in (0, 1) with (1 + p)/2 below 1 in double precision (p <= 1 − 2.3E-16)");
        }

        return new(null, probability);
    }

    /// <summary>The coverage factor for a standard uncertainty with the given degrees of freedom.</summary>
    /// <param name="degreesOfFreedom">ν ≥ 1 (rounded down), or null for a normal distribution.</param>
    /// <returns>k &gt; 0.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="degreesOfFreedom"/> &lt; 1 or not finite.</exception>
    public double FactorFor(double? degreesOfFreedom)
    {
        int? whole = degreesOfFreedom is double nu ? DecisionMath.WholeDegreesOfFreedom(nu, nameof(degreesOfFreedom)) : null;
        if (Factor is double k)
        {
            return k;
        }

        double p = (1 + Probability!.Value) / 2;
        return whole is int df
            ? StudentTQuantile.OneSided(p, df)
            : MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, p);
    }

    /// <summary>Prints "k = 2" or "p = 0.95".</summary>
    /// <returns>The text (invariant culture).</returns>
    public override string ToString() => Factor is double k
        ? "k = " + k.ToString("G6", CultureInfo.InvariantCulture)
        : "p = " + Probability!.Value.ToString("G6", CultureInfo.InvariantCulture);

    /// <inheritdoc />
    public bool Equals(Coverage? other) => other is not null && Nullable.Equals(Factor, other.Factor) && Nullable.Equals(Probability, other.Probability);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as Coverage);

    /// <inheritdoc />
    public override int GetHashCode() => (Factor, Probability).GetHashCode();
}
