using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>
/// Critical value x_c and minimum detectable value x_d of the net concentration from a straight-line calibration
/// (ISO 11843-2, linear calibration with constant residual SD; formulas from memory, see remarks).
/// </summary>
/// <remarks>
/// <para>With I reference levels × J replicates (ν = I·J − 2 residual degrees of freedom), K replicate measurements of the
/// test sample, slope b, residual SD σ̂ and x̄, Σ(x − x̄)² over all I·J points:
/// x_c = t(1−α, ν)·(σ̂/b)·√(1/K + 1/(I·J) + x̄²/Σ(x − x̄)²) and x_d = δ(ν, α, β)·(σ̂/b)·√(same), δ the non-centrality of the
/// non-central t with P(T'(ν, δ) ≤ t(1−α, ν)) = β. These are the forms recalled in the project's field reference
/// (§3.4, not checked against the standard's text); x_c equals DIN 32645's x_NG for K = m.</para>
/// <para>Needs an unweighted straight line with intercept fitted to every injection (ReplicateHandling.EveryInjection)
/// with the same number J of points at each of the I levels (a blank level counts as a level).</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice decide.</para>
/// </remarks>
public static class Iso11843Limits
{
    /// <summary>Computes x_c and x_d in the calibration's unit.</summary>
    /// <param name="calibration">Unweighted straight line with intercept, every injection fitted, balanced I × J design, slope &gt; 0.</param>
    /// <param name="testSampleReplicates">K, replicate measurements of the test sample; ≥ 1. Default 1.</param>
    /// <param name="alpha">α in (0, 0.5); default 0.05.</param>
    /// <param name="beta">β in (0, 0.5); default 0.05.</param>
    /// <param name="internalStandardConcentration">IS concentration of the samples; required on the ratio axis (see
    /// <see cref="IchLimits.Compute(ResponseSigma, RegressionCalibration, Concentration?, double, double)"/>).</param>
    /// <returns>x_c, x_d and everything used.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="calibration"/> is null.</exception>
    /// <exception cref="ArgumentException">The calibration is not an unweighted straight line with intercept fitted to every
    /// injection, the design is unbalanced, s_y/x = 0, the slope ≤ 0, or the IS concentration is missing/of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException">K, α or β is out of range, or the IS concentration is ≤ 0.</exception>
    public static Iso11843Result Compute(RegressionCalibration calibration, int testSampleReplicates = 1, double alpha = 0.05, double beta = 0.05, Concentration? internalStandardConcentration = null)
    {
        RegressionFit fit = LimitCalibration.StraightLine(calibration, nameof(calibration), "ISO 11843-2", allowThroughOrigin: false, requireOrdinaryLeastSquares: true);
        Guard.AtLeast(testSampleReplicates, 1, nameof(testSampleReplicates));
        Guard.InOpenRange(alpha, 0, 0.5, nameof(alpha));
        Guard.InOpenRange(beta, 0, 0.5, nameof(beta));
        double factor = LimitCalibration.AxisFactor(calibration, internalStandardConcentration, nameof(internalStandardConcentration));
        (int levels, int replicates) = Design(fit, nameof(calibration));
        double s = fit.ResidualStandardDeviation;
        if (!(s > 0))
        {
            throw new ArgumentException("Parameter 'calibration' has s_y/x = 0 (a perfect fit); it gives no detection capability.", nameof(calibration));
        }

        int nu = fit.DegreesOfFreedom;
        double t = StudentTQuantile.OneSided(1 - alpha, nu);
        double delta = NoncentralT.Noncentrality(t, nu, beta);
        double xBar = fit.WeightedMeanX;
        double root = Math.Sqrt((1.0 / testSampleReplicates) + (1.0 / fit.Count) + (xBar * xBar / fit.WeightedSumOfSquaresX));
        double scale = s / fit.Slope * root;
        string formula = "x_c = t(1−α, ν)·(σ̂/b)·√(1/K + 1/(I·J) + x̄²/Σ(x − x̄)²), x_d = δ(ν, α, β)·(same); I = " + Text.I(levels)
            + ", J = " + Text.I(replicates) + ", K = " + Text.I(testSampleReplicates) + ", ν = " + Text.I(nu) + ", σ̂ = s_y/x = " + Text.G(s)
            + ", b = " + Text.G(fit.Slope) + ", x̄ = " + Text.G(xBar) + ", Σ(x − x̄)² = " + Text.G(fit.WeightedSumOfSquaresX)
            + ", t = " + Text.G(t) + ", δ = " + Text.G(delta) + (factor == 1 ? string.Empty : "; axis value × " + Text.G(factor) + " gives the concentration");
        return new Iso11843Result(
            Concentration.From(t * scale * factor, calibration.Unit),
            Concentration.From(delta * scale * factor, calibration.Unit),
            levels,
            replicates,
            testSampleReplicates,
            nu,
            alpha,
            beta,
            t,
            delta,
            s,
            formula);
    }

    private static (int Levels, int Replicates) Design(RegressionFit fit, string paramName)
    {
        var counts = new SortedDictionary<double, int>();
        foreach (double x in fit.X)
        {
            counts[x] = counts.TryGetValue(x, out int c) ? c + 1 : 1;
        }

        int j = -1;
        foreach (int c in counts.Values)
        {
            if (j >= 0 && c != j)
            {
                throw new ArgumentException(
                    $"Parameter '{paramName}' has an unbalanced design (points per level: {string.Join(", ", counts.Values)}); ISO 11843-2 uses I levels × J replicates with the same J at every level.",
                    paramName);
            }

            j = c;
        }

        return (counts.Count, j);
    }
}
