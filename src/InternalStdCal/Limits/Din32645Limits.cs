using System;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>
/// Decision limit x_NG (Nachweisgrenze), detection capability x_EG (Erfassungsgrenze) and quantification limit x_BG
/// (Bestimmungsgrenze) by the calibration-curve method of DIN 32645 (formulas from memory, see remarks).
/// </summary>
/// <remarks>
/// <para>With s_x0 = s_y/x/b, n calibration points, m measurements of the sample, x̄ and Q_x = Σ(x − x̄)²:
/// x_NG = s_x0·t(1−α, n−2)·√(1/m + 1/n + x̄²/Q_x); x_EG = 2·x_NG (α = β); x_BG solves
/// x_BG = k·s_x0·t(1−α/2, n−2)·√(1/m + 1/n + (x_BG − x̄)²/Q_x), k = 3 by default (33 % relative uncertainty at x_BG). The
/// equation is solved by fixed-point iteration from k·x_NG until two iterates agree to 1e-12 relative; k·x_NG is also
/// reported as the quick estimate. These are the forms recalled in the project's field reference (§3.5).</para>
/// <para>Needs an unweighted straight line with intercept fitted to every injection.</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice decide.</para>
/// </remarks>
public static class Din32645Limits
{
    private const int MaxIterations = 1_000_000;

    /// <summary>Computes x_NG, x_EG and x_BG in the calibration's unit.</summary>
    /// <param name="calibration">Unweighted straight line with intercept, every injection fitted, slope &gt; 0, s_y/x &gt; 0.</param>
    /// <param name="sampleReplicates">m, measurements of the sample averaged; ≥ 1. Default 1.</param>
    /// <param name="alpha">α in (0, 0.5); default 0.05 (x_BG uses the two-sided t(1−α/2)).</param>
    /// <param name="k">k = 1/(relative uncertainty at x_BG); finite, &gt; 0; default 3.</param>
    /// <param name="internalStandardConcentration">IS concentration of the samples; required on the ratio axis (see
    /// <see cref="IchLimits.Compute(ResponseSigma, RegressionCalibration, Concentration?, double, double)"/>).</param>
    /// <returns>The limits and everything used.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="calibration"/> is null.</exception>
    /// <exception cref="ArgumentException">The calibration is not an unweighted straight line with intercept fitted to every
    /// injection, its slope ≤ 0 or s_y/x = 0, the calibration is so imprecise that x_BG has no solution
    /// (k²·s_x0²·t²/Q_x ≥ 1), or the IS concentration is missing/of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException">m, α or k is out of range, or the IS concentration is ≤ 0.</exception>
    /// <exception cref="InvalidOperationException">The iteration (a contraction with rate ≤ k·s_x0·t/√Q_x &lt; 1) needs more
    /// than 10⁶ steps, i.e. that rate is within about 3e-5 of 1.</exception>
    public static Din32645Result Compute(RegressionCalibration calibration, int sampleReplicates = 1, double alpha = 0.05, double k = 3, Concentration? internalStandardConcentration = null)
    {
        RegressionFit fit = LimitCalibration.StraightLine(calibration, nameof(calibration), "DIN 32645", allowThroughOrigin: false, requireOrdinaryLeastSquares: true);
        Guard.AtLeast(sampleReplicates, 1, nameof(sampleReplicates));
        Guard.InOpenRange(alpha, 0, 0.5, nameof(alpha));
        Guard.Positive(k, nameof(k));
        double factor = LimitCalibration.AxisFactor(calibration, internalStandardConcentration, nameof(internalStandardConcentration));
        double s = fit.ResidualStandardDeviation;
        if (!(s > 0))
        {
            throw new ArgumentException("Parameter 'calibration' has s_y/x = 0 (a perfect fit); it gives no limits.", nameof(calibration));
        }

        int n = fit.Count, nu = fit.DegreesOfFreedom;
        double sx0 = s / fit.Slope;
        double xBar = fit.WeightedMeanX, qx = fit.WeightedSumOfSquaresX;
        double a = (1.0 / sampleReplicates) + (1.0 / n);
        double tOne = StudentTQuantile.OneSided(1 - alpha, nu);
        double tTwo = StudentTQuantile.OneSided(1 - (alpha / 2), nu);
        double xNg = sx0 * tOne * Math.Sqrt(a + (xBar * xBar / qx));
        double c = k * sx0 * tTwo;
        if (!(c * c / qx < 1))
        {
            throw new ArgumentException(
                $"Parameter 'calibration' is too imprecise for x_BG with k = {Guard.Format(k)}: k²·s_x0²·t²/Q_x = {Guard.Format(c * c / qx)} ≥ 1, so the defining equation has no solution.",
                nameof(calibration));
        }

        double x = k * xNg;
        int iterations = 0;
        while (true)
        {
            double d = x - xBar;
            double next = c * Math.Sqrt(a + (d * d / qx));
            iterations++;
            bool done = Math.Abs(next - x) <= 1e-12 * Math.Abs(next);
            x = next;
            if (done)
            {
                break;
            }

            if (iterations >= MaxIterations)
            {
                throw new InvalidOperationException(
                    FormattableString.Invariant($"The x_BG iteration did not reach 1e-12 relative in {MaxIterations} steps: its rate k·s_x0·t/√Q_x = {c / Math.Sqrt(qx)} is too close to 1."));
            }
        }

        string formula = "x_NG = s_x0·t(1−α, n−2)·√(1/m + 1/n + x̄²/Q_x); x_EG = 2·x_NG; x_BG = k·s_x0·t(1−α/2, n−2)·√(1/m + 1/n + (x_BG − x̄)²/Q_x) (iterated, "
            + Text.I(iterations) + " steps); n = " + Text.I(n) + ", m = " + Text.I(sampleReplicates) + ", k = " + Text.G(k) + ", s_y/x = " + Text.G(s)
            + ", b = " + Text.G(fit.Slope) + ", s_x0 = " + Text.G(sx0) + ", x̄ = " + Text.G(xBar) + ", Q_x = " + Text.G(qx)
            + ", t(1−α) = " + Text.G(tOne) + ", t(1−α/2) = " + Text.G(tTwo) + (factor == 1 ? string.Empty : "; axis value × " + Text.G(factor) + " gives the concentration");
        ConcentrationUnit unit = calibration.Unit;
        return new Din32645Result(
            Concentration.From(xNg * factor, unit),
            Concentration.From(2 * xNg * factor, unit),
            Concentration.From(x * factor, unit),
            Concentration.From(k * xNg * factor, unit),
            iterations,
            sampleReplicates,
            alpha,
            k,
            s,
            Concentration.From(sx0 * factor, unit),
            formula);
    }
}
