using System;
using System.Collections.Generic;
using System.Collections.ObjectModel;
using System.Linq;

namespace InternalStdCal.Limits;

/// <summary>
/// Dixon's Q test (ratio r10) for a single outlier in 3 to 10 values: Q = gap/range, where the gap is the distance
/// from the suspect (lowest or highest value) to its nearest neighbour. Both ends are tested and the end with the
/// larger Q is reported. Flags; never deletes.
/// </summary>
/// <remarks>
/// Critical values: Rorabacher, Anal. Chem. 63 (1991) 139–146, for α = 0.10, 0.05, 0.04, 0.02 and 0.01 exactly as
/// printed there. α convention (two-sided): α is the probability, for normal data without outlier, that Q at either
/// end exceeds the critical value, so the more extreme end is tested; a test of one end chosen in advance has half
/// this α. Another table circulates that prints the same numbers one α column to the right (its "0.05" equals the
/// 0.10 here), i.e. a one-sided reading; do not mix the two. For more than 10 values Dixon's r11, r21 and r22
/// ratios apply; they are not offered here. Caution: the library computes; the laboratory's validated method, its
/// QA system, local regulations and licensed practice decide what happens to a flagged value.
/// </remarks>
public static class DixonQTest
{
    private const string Source = "Dixon's r10 ratio (Dean & Dixon, Anal. Chem. 23 (1951) 636–638); critical values from Rorabacher, Anal. Chem. 63 (1991) 139–146";

    private const string Convention = "two-sided as printed by Rorabacher (1991): α is the probability that Q at either end exceeds the critical value "
        + "(the more extreme end is tested); a pre-chosen single end has α/2. Tables shifting these numbers one α column are one-sided.";

    private static readonly double[] Alphas = [0.10, 0.05, 0.04, 0.02, 0.01];

    // Rows n = 3…10, columns as Alphas (Rorabacher 1991, r10 two-sided).
    private static readonly double[][] Table =
    [
        [0.941, 0.970, 0.976, 0.988, 0.994],
        [0.765, 0.829, 0.846, 0.889, 0.926],
        [0.642, 0.710, 0.729, 0.780, 0.821],
        [0.560, 0.625, 0.644, 0.698, 0.740],
        [0.507, 0.568, 0.586, 0.637, 0.680],
        [0.468, 0.526, 0.543, 0.590, 0.634],
        [0.437, 0.493, 0.510, 0.555, 0.598],
        [0.412, 0.466, 0.483, 0.527, 0.568],
    ];

    /// <summary>The significance levels offered: 0.10, 0.05, 0.04, 0.02, 0.01 (two-sided, as printed by Rorabacher).</summary>
    public static IReadOnlyList<double> SignificanceLevels { get; } = Array.AsReadOnly(Alphas);

    /// <summary>Tests the lowest and the highest value and reports the end with the larger Q.</summary>
    /// <param name="values">3 to 10 replicate values, any unit, all finite; not modified.</param>
    /// <param name="alpha">Two-sided significance level, exactly one of 0.10, 0.05, 0.04, 0.02, 0.01.</param>
    /// <returns>Q, the tabulated critical value and the suspect. Equal Q at both ends: the highest value is reported
    /// (with a note). All values equal (range 0): Q is defined as 0 and nothing is flagged (with a note).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="values"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 3 or more than 10 values; a value NaN or ±∞ (index
    /// and value named); <paramref name="alpha"/> not one of the tabulated levels.</exception>
    public static OutlierTestResult Evaluate(IReadOnlyList<double> values, double alpha)
    {
        ReadOnlyCollection<double> x = OutlierInput.FiniteCopy(values, nameof(values));
        OutlierInput.Count(x, 3, 10, nameof(values), "Dixon's r10 test with the Rorabacher table");
        double critical = CriticalValue(x.Count, alpha);

        double[] sorted = OutlierInput.ScaledByPowerOfTwo(x).Scaled.OrderBy(v => v).ToArray();
        int n = sorted.Length;
        int high = OutlierInput.IndexOfExtreme(x, highest: true);
        int low = OutlierInput.IndexOfExtreme(x, highest: false);
        double range = sorted[n - 1] - sorted[0];
        var notes = new List<string>();
        if (range == 0)
        {
            notes.Add("All values are equal (range 0): Q is defined as 0 and no value is flagged; the first value is reported as the suspect.");
            return Result(x, 0, critical, alpha, high, OutlierSide.High, notes);
        }

        double qHigh = (sorted[n - 1] - sorted[n - 2]) / range;
        double qLow = (sorted[1] - sorted[0]) / range;
        if (qHigh == qLow)
        {
            notes.Add("Both ends give the same Q; the highest value is reported as the suspect.");
        }

        return qHigh >= qLow
            ? Result(x, qHigh, critical, alpha, high, OutlierSide.High, notes)
            : Result(x, qLow, critical, alpha, low, OutlierSide.Low, notes);
    }

    /// <summary>Tabulated critical Q (r10) from Rorabacher (1991), e.g. 0.710 for n = 5, α = 0.05 (two-sided).</summary>
    /// <param name="count">Number of values n, 3 to 10.</param>
    /// <param name="alpha">Two-sided significance level, exactly one of 0.10, 0.05, 0.04, 0.02, 0.01.</param>
    /// <returns>The critical value as printed (3 decimals).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="count"/> outside 3–10, or <paramref name="alpha"/>
    /// not a tabulated level (the message lists the allowed values).</exception>
    public static double CriticalValue(int count, double alpha)
    {
        if (count < 3 || count > 10)
        {
            throw new ArgumentOutOfRangeException(
                nameof(count),
                count,
                FormattableString.Invariant($"Parameter '{nameof(count)}' was {count}; Dixon's r10 critical values are tabulated here for n = 3 to 10."));
        }

        int column = Array.IndexOf(Alphas, alpha);
        if (column < 0)
        {
            throw new ArgumentOutOfRangeException(
                nameof(alpha),
                alpha,
                $"Parameter '{nameof(alpha)}' was {Internal.Guard.Format(alpha)}; it must be one of 0.10, 0.05, 0.04, 0.02, 0.01 (two-sided, Rorabacher 1991).");
        }

        return Table[count - 3][column];
    }

    private static OutlierTestResult Result(IReadOnlyList<double> x, double q, double critical, double alpha, int index, OutlierSide end, IReadOnlyList<string> notes) =>
        new("Dixon Q (r10)", x, q, critical, alpha, OutlierSide.TwoSided, Convention, index, end, Source, notes);
}
