using System;
using System.Collections.Generic;

namespace InternalStdCal.Internal;

/// <summary>
/// Shared GUM arithmetic (JCGM 100:2008): root-sum-of-squares of contributions, Welch–Satterthwaite effective
/// degrees of freedom and the Student-t coverage factor. Used by the preparation budgets and the general
/// uncertainty evaluation.
/// </summary>
internal static class Propagation
{
    /// <summary>Degrees of freedom above which the coverage factor is the normal quantile (there (t − z)/z &lt; 1.3e-6 at p = 0.95).</summary>
    internal const double NormalLimit = 1e6;

    /// <summary>√Σ cᵢ², scaled by the largest |cᵢ| so that squares neither overflow nor underflow.</summary>
    internal static double RootSumSquares(IReadOnlyList<double> values)
    {
        double max = 0;
        for (int i = 0; i < values.Count; i++)
        {
            max = Math.Max(max, Math.Abs(values[i]));
        }

        if (max == 0)
        {
            return 0;
        }

        var sum = default(CompensatedSum);
        for (int i = 0; i < values.Count; i++)
        {
            double r = values[i] / max;
            sum.Add(r * r);
        }

        return max * Math.Sqrt(sum.Value);
    }

    /// <summary>
    /// ν_eff = u_c⁴ / Σ uᵢ⁴/νᵢ (JCGM 100:2008 eq. G.2b); terms with νᵢ = +∞ or uᵢ = 0 drop out.
    /// </summary>
    /// <param name="contributions">|cᵢ|·u(xᵢ), in the unit of the result.</param>
    /// <param name="degreesOfFreedom">νᵢ ≥ 1, or +∞.</param>
    /// <param name="combined">u_c &gt; 0 (0 gives +∞).</param>
    /// <returns>ν_eff ≥ min νᵢ, or +∞ when no finite term contributes.</returns>
    internal static double WelchSatterthwaite(IReadOnlyList<double> contributions, IReadOnlyList<double> degreesOfFreedom, double combined)
    {
        if (combined == 0)
        {
            return double.PositiveInfinity;
        }

        double denominator = 0;
        double smallest = double.PositiveInfinity;
        for (int i = 0; i < contributions.Count; i++)
        {
            double nu = degreesOfFreedom[i];
            double r = contributions[i] / combined;
            if (!double.IsPositiveInfinity(nu) && r != 0)
            {
                double r2 = r * r;
                denominator += r2 * r2 / nu;
                smallest = Math.Min(smallest, nu);
            }
        }

        // ν_eff ≥ min νᵢ holds exactly for uncorrelated terms; the bound only absorbs rounding.
        return denominator > 0 ? Math.Max(1 / denominator, smallest) : double.PositiveInfinity;
    }

    /// <summary>
    /// Coverage factor k = t_p(ν) for a two-sided coverage probability p, with ν_eff truncated to the next lower
    /// integer (JCGM 100:2008 §G.4.1 note / G.6.4); the normal quantile when ν is +∞ or above <see cref="NormalLimit"/>.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">p outside (0, 1) or ν &lt; 1 or NaN.</exception>
    internal static double CoverageFactor(double coverageProbability, double degreesOfFreedom, string paramName)
    {
        Guard.InOpenRange(coverageProbability, 0, 1, paramName);
        if (!(degreesOfFreedom >= 1))
        {
            throw Guard.OutOfRange(nameof(degreesOfFreedom), degreesOfFreedom, "a number >= 1 or +infinity");
        }

        if (degreesOfFreedom > NormalLimit)
        {
            return MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, 0.5 + (coverageProbability / 2));
        }

        return StudentTQuantile.TwoSided(coverageProbability, (int)Math.Floor(degreesOfFreedom));
    }
}
