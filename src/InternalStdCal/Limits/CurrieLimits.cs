using System;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using MathNet.Numerics.Distributions;

namespace InternalStdCal.Limits;

/// <summary>
/// Critical level L_C, detection limit L_D and quantification limit L_Q (L. A. Currie, "Nomenclature in evaluation of
/// analytical methods including detection and quantification capabilities", IUPAC Recommendations 1995, Pure Appl.
/// Chem. 67 (1995) 1699–1723), for normally distributed net signals (or concentrations) with constant σ.
/// </summary>
/// <remarks>
/// <para>Known σ0: L_C = z(1−α)·σ0, L_D = (z(1−α) + z(1−β))·σ0. Estimated s0 with ν degrees of freedom:
/// L_C = t(1−α, ν)·s0, L_D = δ(α, β, ν)·s0 with δ the non-centrality of the non-central t for which
/// P(T'(ν, δ) ≤ t(1−α, ν)) = β (solved exactly), together with the approximation (t(1−α, ν) + t(1−β, ν))·s0
/// (= 2t·s0 when α = β). L_Q = k_Q·σ_Q, k_Q = 10 by default (10 % relative SD at L_Q); σ_Q = σ0 unless given.</para>
/// <para>All results are in the units of σ0 (signal or concentration domain, as the caller's σ0 is). Paired blank
/// subtraction is the caller's choice of σ0 (σ0 = √2·σ_B).</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice decide.</para>
/// </remarks>
public static class CurrieLimits
{
    /// <summary>Limits for a known σ0 (normal quantiles z).</summary>
    /// <param name="sigma0">SD of the net signal (or concentration) when the true value is 0; finite, &gt; 0.</param>
    /// <param name="alpha">False-positive probability α in (0, 0.5); default 0.05.</param>
    /// <param name="beta">False-negative probability β in (0, 0.5); default 0.05.</param>
    /// <param name="quantificationFactor">k_Q of L_Q = k_Q·σ_Q; finite, &gt; 0; default 10.</param>
    /// <param name="quantificationSigma">σ_Q, the SD at the level of L_Q; null for σ0 (constant σ); finite, &gt; 0.</param>
    /// <returns>L_C, L_D, L_Q with factors, formula and source.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range (α and β also ≥ 1.2E-16).</exception>
    public static CurrieLimitResult ForKnownSigma(double sigma0, double alpha = 0.05, double beta = 0.05, double quantificationFactor = 10, double? quantificationSigma = null)
    {
        Guard.Positive(sigma0, nameof(sigma0));
        CheckCommon(alpha, beta, quantificationFactor, quantificationSigma);
        double zA = Normal.InvCDF(0, 1, 1 - alpha), zB = Normal.InvCDF(0, 1, 1 - beta);
        double sQ = quantificationSigma ?? sigma0;
        string formula = "L_C = z(1−α)·σ0 = " + Text.G(zA) + "·σ0; L_D = (z(1−α) + z(1−β))·σ0 = " + Text.G(zA + zB)
            + "·σ0; L_Q = k_Q·σ_Q = " + Text.G(quantificationFactor) + "·" + Text.G(sQ) + "; σ0 = " + Text.G(sigma0) + " (known)";
        return new CurrieLimitResult(sigma0, null, alpha, beta, zA, zA + zB, zA * sigma0, (zA + zB) * sigma0, null, quantificationFactor, sQ, quantificationFactor * sQ, formula);
    }

    /// <summary>Limits for σ estimated as s0 with ν degrees of freedom (Student t and the exact non-central-t δ).</summary>
    /// <param name="s0">Estimated SD of the net signal (or concentration) at 0; finite, &gt; 0.</param>
    /// <param name="degreesOfFreedom">ν of s0; ≥ 1.</param>
    /// <param name="alpha">α in (0, 0.5); default 0.05.</param>
    /// <param name="beta">β in (0, 0.5); default 0.05.</param>
    /// <param name="quantificationFactor">k_Q; finite, &gt; 0; default 10.</param>
    /// <param name="quantificationSigma">σ_Q; null for s0; finite, &gt; 0.</param>
    /// <returns>L_C, L_D (exact δ and the t-sum approximation), L_Q.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range (α and β also ≥ 1.2E-16).</exception>
    public static CurrieLimitResult ForEstimatedSigma(double s0, int degreesOfFreedom, double alpha = 0.05, double beta = 0.05, double quantificationFactor = 10, double? quantificationSigma = null)
    {
        Guard.Positive(s0, nameof(s0));
        Guard.AtLeast(degreesOfFreedom, 1, nameof(degreesOfFreedom));
        CheckCommon(alpha, beta, quantificationFactor, quantificationSigma);
        double tA = StudentTQuantile.OneSided(1 - alpha, degreesOfFreedom);
        double tB = StudentTQuantile.OneSided(1 - beta, degreesOfFreedom);
        double delta = NoncentralT.Noncentrality(tA, degreesOfFreedom, beta);
        double sQ = quantificationSigma ?? s0;
        string formula = "L_C = t(1−α, ν)·s0 = " + Text.G(tA) + "·s0; L_D = δ(α, β, ν)·s0 = " + Text.G(delta)
            + "·s0 (non-central t; approximation (t(1−α, ν) + t(1−β, ν))·s0 = " + Text.G(tA + tB) + "·s0); L_Q = k_Q·σ_Q = "
            + Text.G(quantificationFactor) + "·" + Text.G(sQ) + "; s0 = " + Text.G(s0) + ", ν = " + Text.I(degreesOfFreedom);
        return new CurrieLimitResult(s0, degreesOfFreedom, alpha, beta, tA, delta, tA * s0, delta * s0, (tA + tB) * s0, quantificationFactor, sQ, quantificationFactor * sQ, formula);
    }

    private static void CheckCommon(double alpha, double beta, double quantificationFactor, double? quantificationSigma)
    {
        Guard.InOpenRange(alpha, 0, 0.5, nameof(alpha));
        Guard.InOpenRange(beta, 0, 0.5, nameof(beta));
        if (1 - alpha == 1 || 1 - beta == 1)
        {
            // z(1 − α) needs 1 − α < 1 in binary64 (common practice: the quantile of 1 is infinite).
            bool a = 1 - alpha == 1;
            throw Guard.OutOfRange(a ? nameof(alpha) : nameof(beta), a ? alpha : beta, "at least 1.2E-16, so that 1 − " + (a ? "α" : "β") + " is below 1 in double precision");
        }
        Guard.Positive(quantificationFactor, nameof(quantificationFactor));
        if (quantificationSigma is double q)
        {
            Guard.Positive(q, nameof(quantificationSigma));
        }
    }
}
