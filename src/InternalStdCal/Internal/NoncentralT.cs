using System;
using MathNet.Numerics;
using MathNet.Numerics.RootFinding;

namespace InternalStdCal.Internal;

/// <summary>
/// The non-central t distribution: cumulative probability and the non-centrality that puts a given
/// probability below a critical value. Used for Currie's detection limit with estimated σ and for the power of
/// one-sided t tests (replicates planner).
/// </summary>
/// <remarks>
/// For t ≥ 0, with x = t²/(t² + ν) and λ = δ²/2 (Lenth, "Cumulative distribution function of the non-central t
/// distribution", Applied Statistics 38 (1989) 185–189, algorithm AS 243):
/// P(T ≤ t) = Φ(−δ) + ½·Σ_j [p_j·I_x(j + ½, ν/2) + q_j·I_x(j + 1, ν/2)],
/// p_j = e^(−λ)·λ^j/j!, q_j = δ·e^(−λ)·λ^j/(√2·Γ(j + 3/2)); for t &lt; 0, P(T ≤ t; ν, δ) = 1 − P(T ≤ −t; ν, −δ).
/// The weights are formed in log space and summed outward from the Poisson mode, so large δ neither
/// underflows nor loses terms. I_x is MathNet's regularised incomplete beta.
/// </remarks>
internal static class NoncentralT
{
    private const int MaxTerms = 100_000;

    /// <summary>Largest |δ| accepted: the series then needs a few thousand terms around its mode.</summary>
    internal const double MaxAbsNoncentrality = 1000;

    /// <summary>P(T ≤ t) for T non-central t with <paramref name="df"/> degrees of freedom and non-centrality δ.</summary>
    /// <exception cref="ArgumentOutOfRangeException">t not finite, |δ| &gt; <see cref="MaxAbsNoncentrality"/>, df not positive and finite.</exception>
    internal static double Cdf(double t, double df, double delta)
    {
        Guard.Finite(t, nameof(t));
        Guard.InClosedRange(delta, -MaxAbsNoncentrality, MaxAbsNoncentrality, nameof(delta));
        Guard.Positive(df, nameof(df));
        if (double.IsInfinity(df))
        {
            throw Guard.OutOfRange(nameof(df), df, "finite and > 0");
        }

        double p = t >= 0 ? LowerForNonNegative(t, df, delta) : 1 - LowerForNonNegative(-t, df, -delta);
        return Math.Min(1, Math.Max(0, p));
    }

    /// <summary>P(T &gt; t) = 1 − <see cref="Cdf"/>.</summary>
    internal static double UpperTail(double t, double df, double delta) => 1 - Cdf(t, df, delta);

    /// <summary>
    /// The non-centrality δ with P(T ≤ <paramref name="criticalValue"/>; ν, δ) = <paramref name="probability"/>,
    /// e.g. Currie's δ(α, β, ν) with criticalValue = t(1 − α, ν) and probability = β.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">probability outside (0, 1), criticalValue not finite, df not positive.</exception>
    internal static double Noncentrality(double criticalValue, double df, double probability)
    {
        Guard.Finite(criticalValue, nameof(criticalValue));
        Guard.InOpenRange(probability, 0, 1, nameof(probability));

        // Cdf decreases in δ; the normal limit δ ≈ t − z(p) starts the bracket.
        double guess = criticalValue - MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, probability);
        double lo = guess - 1, hi = guess + 1;
        while (Cdf(criticalValue, df, lo) < probability)
        {
            lo -= 2 * (hi - lo);
        }

        while (Cdf(criticalValue, df, hi) > probability)
        {
            hi += 2 * (hi - lo);
        }

        return Brent.FindRoot(d => Cdf(criticalValue, df, d) - probability, lo, hi, 1e-13, 500);
    }

    private static double LowerForNonNegative(double t, double df, double delta)
    {
        double normalPart = 0.5 * SpecialFunctions.Erfc(delta / Constants.Sqrt2);
        if (t == 0)
        {
            return normalPart;
        }

        double x = t * t / ((t * t) + df);
        double halfDf = df / 2;
        double lambda = delta * delta / 2;
        int mode = (int)Math.Floor(lambda);
        double logLambda = lambda > 0 ? Math.Log(lambda) : double.NegativeInfinity;
        double logAbsDelta = delta != 0 ? Math.Log(Math.Abs(delta)) : double.NegativeInfinity;
        double sign = Math.Sign(delta);

        double Term(int j, out double weight)
        {
            double logPoisson = -lambda + (j == 0 ? 0 : j * logLambda) - SpecialFunctions.GammaLn(j + 1);
            double pj = Math.Exp(logPoisson);
            double qj = delta == 0
                ? 0
                : sign * Math.Exp(logAbsDelta - lambda + (j == 0 ? 0 : j * logLambda) - (0.5 * Math.Log(2)) - SpecialFunctions.GammaLn(j + 1.5));
            weight = pj + Math.Abs(qj);
            return (pj * SpecialFunctions.BetaRegularized(j + 0.5, halfDf, x)) + (qj * SpecialFunctions.BetaRegularized(j + 1, halfDf, x));
        }

        var sum = new CompensatedSum();
        for (int j = mode; j < mode + MaxTerms; j++)
        {
            sum.Add(Term(j, out double weight));
            if (j > mode && weight < 1e-17)
            {
                break;
            }
        }

        for (int j = mode - 1; j >= 0; j--)
        {
            sum.Add(Term(j, out double weight));
            if (weight < 1e-17)
            {
                break;
            }
        }

        return normalPart + (0.5 * sum.Value);
    }
}
