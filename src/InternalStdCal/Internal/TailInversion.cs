using System;

namespace InternalStdCal.Internal;

/// <summary>
/// Solves tail(q) = target for a strictly decreasing upper-tail probability on (0, ∞), using Newton steps
/// on the density inside a bisection bracket. Shared by the Student t and F quantiles. The distribution is
/// passed as a struct so that a call allocates nothing (no delegates or closures).
/// </summary>
internal static class TailInversion
{
    /// <param name="distribution">Upper tail P(X &gt; v), strictly decreasing in v on (0, ∞), and density.</param>
    /// <param name="target">Upper-tail probability sought, in (0, upperTail(0)).</param>
    /// <param name="guess">Starting value (any finite value &gt; 0; a poor one only costs iterations).</param>
    internal static double Solve<TDistribution>(TDistribution distribution, double target, double guess)
        where TDistribution : struct, ITailDistribution
    {
        double v = guess > 0 && !double.IsInfinity(guess) ? guess : 1.0;

        // Bracket [lo, hi] with upperTail(lo) >= target >= upperTail(hi).
        double lo = 0, hi = v;
        while (distribution.UpperTail(hi) > target)
        {
            lo = hi;
            hi *= 2;
            if (double.IsInfinity(hi))
            {
                throw new InvalidOperationException("Quantile search did not converge (upper bound overflow).");
            }
        }

        v = Math.Min(Math.Max(v, lo), hi);
        for (int iteration = 0; iteration < 200; iteration++)
        {
            double f = distribution.UpperTail(v) - target;
            if (f == 0)
            {
                return v;
            }

            if (f > 0)
            {
                lo = v;
            }
            else
            {
                hi = v;
            }

            double d = distribution.Density(v);
            double next = d > 0 ? v + (f / d) : double.NaN;
            if (!(next > lo && next < hi))
            {
                next = lo + ((hi - lo) / 2);
            }

            if (Math.Abs(next - v) <= 2e-16 * Math.Abs(next) || hi - lo <= 4e-16 * hi)
            {
                return next;
            }

            v = next;
        }

        return v;
    }
}

/// <summary>A continuous distribution on (0, ∞) as seen by <see cref="TailInversion"/>.</summary>
internal interface ITailDistribution
{
    /// <summary>P(X &gt; v).</summary>
    double UpperTail(double v);

    /// <summary>Probability density at v.</summary>
    double Density(double v);
}
