using System;

namespace InternalStdCal.Internal;

/// <summary>
/// Solves tail(q) = target for a strictly decreasing upper-tail probability on (0, ∞), using Newton steps
/// on the density inside a bisection bracket. Shared by the Student t and F quantiles.
/// </summary>
internal static class TailInversion
{
    /// <param name="upperTail">P(X &gt; v), strictly decreasing in v on (0, ∞).</param>
    /// <param name="density">Probability density at v.</param>
    /// <param name="target">Upper-tail probability sought, in (0, upperTail(0)).</param>
    /// <param name="guess">Starting value (any finite value &gt; 0; a poor one only costs iterations).</param>
    internal static double Solve(Func<double, double> upperTail, Func<double, double> density, double target, double guess)
    {
        double v = guess > 0 && !double.IsInfinity(guess) ? guess : 1.0;

        // Bracket [lo, hi] with upperTail(lo) >= target >= upperTail(hi).
        double lo = 0, hi = v;
        while (upperTail(hi) > target)
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
            double f = upperTail(v) - target;
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

            double d = density(v);
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
