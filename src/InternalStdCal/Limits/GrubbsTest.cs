using System;
using System.Collections.Generic;
using System.Collections.ObjectModel;
using InternalStdCal.Internal;

namespace InternalStdCal.Limits;

/// <summary>
/// Grubbs' test for a single outlier in a sample from a normal population: G = max|xᵢ − x̄|/s (two-sided),
/// (x_max − x̄)/s (high end) or (x̄ − x_min)/s (low end), s with n − 1 degrees of freedom. Flags; never deletes.
/// </summary>
/// <remarks>
/// Grubbs, Ann. Math. Stat. 21 (1950) 27–58; Technometrics 11 (1969) 1–21. Exact critical value from Student's t
/// (from memory; it reproduces the printed tables): G_crit = ((n − 1)/√n)·√(t²/(n − 2 + t²)) with
/// t = t(1 − α/(2n); n − 2) two-sided and t(1 − α/n; n − 2) one-sided. Tests one value; repeating it after removal
/// changes the error rate. Caution: the library computes; the laboratory's validated method, its QA system, local
/// regulations and licensed practice decide what happens to a flagged value.
/// </remarks>
public static class GrubbsTest
{
    private const string Source = "Grubbs, Ann. Math. Stat. 21 (1950) 27–58 and Technometrics 11 (1969) 1–21; "
        + "G_crit = ((n − 1)/√n)·√(t²/(n − 2 + t²)) from Student's t";

    /// <summary>Tests the most extreme value (two-sided) or the value at the chosen end.</summary>
    /// <param name="values">The replicate values, any unit, at least 3, all finite; not modified.</param>
    /// <param name="alpha">Significance level α, in (0, 0.5), e.g. 0.05.</param>
    /// <param name="alternative">TwoSided (the value farthest from the mean), High or Low.</param>
    /// <returns>Statistic, critical value and suspect; when all values are equal, G = 0 and nothing is flagged (with a note).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="values"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 3 values; a value NaN or ±∞ (index and value named);
    /// <paramref name="alpha"/> outside (0, 0.5); <paramref name="alternative"/> undefined.</exception>
    public static OutlierTestResult Evaluate(IReadOnlyList<double> values, double alpha, OutlierSide alternative)
    {
        ReadOnlyCollection<double> x = OutlierInput.FiniteCopy(values, nameof(values));
        int n = x.Count;
        OutlierInput.Count(x, 3, int.MaxValue, nameof(values), "Grubbs' test");
        double critical = CriticalValue(n, alpha, alternative);

        int high = OutlierInput.IndexOfExtreme(x, highest: true);
        int low = OutlierInput.IndexOfExtreme(x, highest: false);
        var notes = new List<string>();
        if (x[high] == x[low])
        {
            notes.Add("All values are equal (s = 0): G is defined as 0 and no value is flagged; the first value is reported as the suspect.");
            return Result(x, 0, critical, alpha, alternative, alternative == OutlierSide.Low ? low : high, alternative == OutlierSide.Low ? OutlierSide.Low : OutlierSide.High, notes);
        }

        (double[] y, _) = OutlierInput.ScaledByPowerOfTwo(x);
        (double mean, double sumOfSquares) = OutlierInput.MeanAndSumOfSquares(y);
        double s = Math.Sqrt(sumOfSquares / (n - 1));
        double gHigh = (y[high] - mean) / s;
        double gLow = (mean - y[low]) / s;
        switch (alternative)
        {
            case OutlierSide.High:
                return Result(x, gHigh, critical, alpha, alternative, high, OutlierSide.High, notes);
            case OutlierSide.Low:
                return Result(x, gLow, critical, alpha, alternative, low, OutlierSide.Low, notes);
            default:
                if (gHigh == gLow)
                {
                    notes.Add("The lowest and the highest value are equally far from the mean; the one first in input order is reported.");
                    bool highFirst = high < low;
                    return Result(x, gHigh, critical, alpha, alternative, highFirst ? high : low, highFirst ? OutlierSide.High : OutlierSide.Low, notes);
                }

                return gHigh > gLow
                    ? Result(x, gHigh, critical, alpha, alternative, high, OutlierSide.High, notes)
                    : Result(x, gLow, critical, alpha, alternative, low, OutlierSide.Low, notes);
        }
    }

    /// <summary>Critical value G_crit(α, n) = ((n − 1)/√n)·√(t²/(n − 2 + t²)), t = t(1 − α/(2n); n − 2) two-sided,
    /// t(1 − α/n; n − 2) one-sided; e.g. 2.1266 for n = 8, α = 0.05, two-sided. Always below (n − 1)/√n.</summary>
    /// <param name="count">Number of values n, at least 3.</param>
    /// <param name="alpha">Significance level α, in (0, 0.5).</param>
    /// <param name="alternative">TwoSided, High or Low (High and Low give the same value).</param>
    /// <returns>The critical value (dimensionless).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="count"/> &lt; 3; <paramref name="alpha"/> outside
    /// (0, 0.5); <paramref name="alternative"/> undefined.</exception>
    public static double CriticalValue(int count, double alpha, OutlierSide alternative)
    {
        Guard.AtLeast(count, 3, nameof(count));
        OutlierInput.Alpha(alpha, nameof(alpha));
        OutlierInput.Side(alternative, nameof(alternative));
        double tail = alternative == OutlierSide.TwoSided ? alpha / (2.0 * count) : alpha / count;
        double t = StudentTQuantile.OneSided(1 - tail, count - 2);
        double t2 = t * t;
        return (count - 1) / Math.Sqrt(count) * Math.Sqrt(t2 / (count - 2 + t2));
    }

    private static OutlierTestResult Result(IReadOnlyList<double> x, double g, double critical, double alpha, OutlierSide alternative, int index, OutlierSide end, IReadOnlyList<string> notes) =>
        new(
            "Grubbs",
            x,
            g,
            critical,
            alpha,
            alternative,
            alternative == OutlierSide.TwoSided
                ? "two-sided: α is the probability that the more extreme of the lowest and highest value exceeds the critical value; t = t(1 − α/(2n); n − 2)"
                : "one-sided: α applies to the end chosen in advance; t = t(1 − α/n; n − 2)",
            index,
            end,
            Source,
            notes);
}
