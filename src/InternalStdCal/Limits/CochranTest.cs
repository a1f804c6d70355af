using System;
using System.Collections.Generic;
using System.Collections.ObjectModel;
using System.Linq;
using InternalStdCal.Internal;

namespace InternalStdCal.Limits;

/// <summary>
/// Cochran's test for the largest of p variances, each from n replicates (equal n in every group), as used in
/// ISO 5725-2 for within-laboratory variances: C = s²_max/Σs²ᵢ against
/// C_crit = 1/(1 + (p − 1)/F(1 − α/p; n − 1, (p − 1)(n − 1))). Upper one-sided. Flags; never deletes.
/// </summary>
/// <remarks>
/// Cochran, Ann. Eugen. 11 (1941) 47–52; ISO 5725-2 use and classification (straggler above the 5 %, statistical
/// outlier above the 1 % critical value) from memory. The F form of the critical value is p times the tail of one
/// group's share: exact when C_crit ≥ 1/2 (two shares cannot both exceed ½), a slightly conservative bound below.
/// Unequal group sizes are not supported.
/// Caution: the library computes; the laboratory's validated method, its QA system, local regulations and licensed
/// practice decide what happens to a flagged group.
/// </remarks>
public static class CochranTest
{
    /// <summary>Tests replicate groups of equal size.</summary>
    /// <param name="groups">p ≥ 2 groups, each with the same number n ≥ 2 of finite values (any unit); not modified.</param>
    /// <param name="alpha">Significance level α, in (0, 0.5), e.g. 0.05.</param>
    /// <returns>C, its critical value and the group with the largest variance (sample variances, n − 1 denominator).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="groups"/> or one group is null.</exception>
    /// <exception cref="ArgumentException">Groups of different sizes (index and sizes named).</exception>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 2 groups or fewer than 2 values per group; a value NaN
    /// or ±∞ (group, index and value named); <paramref name="alpha"/> outside (0, 0.5).</exception>
    public static CochranTestResult Evaluate(IReadOnlyList<IReadOnlyList<double>> groups, double alpha)
    {
        (IReadOnlyList<IReadOnlyList<double>> copy, double[] variances, double[] scaledVariances) = Groups(groups, nameof(groups));
        return Compute(Array.AsReadOnly(variances), scaledVariances, copy[0].Count, alpha, copy);
    }

    /// <summary>Tests variances given directly, each from the same number of replicates.</summary>
    /// <param name="variances">p ≥ 2 sample variances s²ᵢ (n − 1 denominator; unit of the data squared), finite and ≥ 0; not modified.</param>
    /// <param name="replicatesPerGroup">n, the number of values behind every variance, at least 2.</param>
    /// <param name="alpha">Significance level α, in (0, 0.5).</param>
    /// <returns>C, its critical value and the group with the largest variance.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="variances"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 2 variances; a variance negative, NaN or ±∞ (index and
    /// value named); <paramref name="replicatesPerGroup"/> &lt; 2; <paramref name="alpha"/> outside (0, 0.5).</exception>
    public static CochranTestResult Evaluate(IReadOnlyList<double> variances, int replicatesPerGroup, double alpha)
    {
        ReadOnlyCollection<double> v = Variances(variances, nameof(variances));
        Guard.AtLeast(replicatesPerGroup, 2, nameof(replicatesPerGroup));
        return Compute(v, v, replicatesPerGroup, alpha, null);
    }

    /// <summary>Critical value C_crit = 1/(1 + (p − 1)/F(1 − α/p; n − 1, (p − 1)(n − 1))), e.g. 0.8413 for p = 5,
    /// n = 2, α = 0.05.</summary>
    /// <param name="groupCount">Number of groups p, at least 2.</param>
    /// <param name="replicatesPerGroup">Replicates per group n, at least 2.</param>
    /// <param name="alpha">Significance level α, in (0, 0.5).</param>
    /// <returns>The critical value, in (1/p, 1).</returns>
    /// <exception cref="ArgumentOutOfRangeException">A count below 2, or <paramref name="alpha"/> outside (0, 0.5).</exception>
    public static double CriticalValue(int groupCount, int replicatesPerGroup, double alpha)
    {
        Guard.AtLeast(groupCount, 2, nameof(groupCount));
        Guard.AtLeast(replicatesPerGroup, 2, nameof(replicatesPerGroup));
        OutlierInput.Alpha(alpha, nameof(alpha));
        double f = FQuantile.Quantile(1 - (alpha / groupCount), replicatesPerGroup - 1, (groupCount - 1) * (replicatesPerGroup - 1));
        return 1 / (1 + ((groupCount - 1) / f));
    }

    /// <summary>ISO 5725-2 classification of the largest variance: correct, straggler (C above the 5 % critical value)
    /// or statistical outlier (above the 1 % critical value).</summary>
    /// <param name="groups">As for <see cref="Evaluate(IReadOnlyList{IReadOnlyList{double}}, double)"/>.</param>
    /// <returns>The category with both tests.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="groups"/> or one group is null.</exception>
    /// <exception cref="ArgumentException">Groups of different sizes.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 2 groups or values per group; a value NaN or ±∞.</exception>
    public static CochranClassification Classify(IReadOnlyList<IReadOnlyList<double>> groups) =>
        new(Evaluate(groups, 0.05), Evaluate(groups, 0.01));

    /// <summary>ISO 5725-2 classification of the largest of the given variances (see
    /// <see cref="Classify(IReadOnlyList{IReadOnlyList{double}})"/>).</summary>
    /// <param name="variances">As for <see cref="Evaluate(IReadOnlyList{double}, int, double)"/>.</param>
    /// <param name="replicatesPerGroup">n, at least 2.</param>
    /// <returns>The category with both tests.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="variances"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 2 variances; a variance negative, NaN or ±∞;
    /// <paramref name="replicatesPerGroup"/> &lt; 2.</exception>
    public static CochranClassification Classify(IReadOnlyList<double> variances, int replicatesPerGroup) =>
        new(Evaluate(variances, replicatesPerGroup, 0.05), Evaluate(variances, replicatesPerGroup, 0.01));

    // variances: reported; scaled: the same times one common positive factor (kept in range), used for C.
    private static CochranTestResult Compute(ReadOnlyCollection<double> variances, IReadOnlyList<double> scaled, int n, double alpha, IReadOnlyList<IReadOnlyList<double>>? groups)
    {
        int p = variances.Count;
        double critical = CriticalValue(p, n, alpha);
        int largest = OutlierInput.IndexOfExtreme(scaled, highest: true);
        var notes = new List<string>();
        double c;
        if (scaled[largest] == 0)
        {
            notes.Add("All variances are 0: C is defined as 1/p (the value for equal variances) and no group is flagged.");
            c = 1.0 / p;
        }
        else
        {
            // C = 1/Σ(s²ᵢ/s²_max): every term is in [0, 1], so the sum cannot overflow.
            var sum = default(CompensatedSum);
            for (int i = 0; i < p; i++)
            {
                sum.Add(scaled[i] / scaled[largest]);
            }

            c = 1 / sum.Value;
        }

        return new CochranTestResult(groups, variances, n, c, critical, alpha, largest, notes);
    }

    private static ReadOnlyCollection<double> Variances(IReadOnlyList<double>? variances, string paramName)
    {
        ReadOnlyCollection<double> v = OutlierInput.FiniteCopy(variances, paramName);
        OutlierInput.Count(v, 2, int.MaxValue, paramName, "Cochran's test");
        for (int i = 0; i < v.Count; i++)
        {
            if (v[i] < 0)
            {
                throw new ArgumentOutOfRangeException(
                    paramName,
                    v[i],
                    FormattableString.Invariant($"Parameter '{paramName}' has {Guard.Format(v[i])} at index {i}; every variance must be >= 0."));
            }
        }

        return v;
    }

    /// <summary>Validated copy, variances, and variances of the data divided by one common power of two (for C).</summary>
    private static (IReadOnlyList<IReadOnlyList<double>> Copy, double[] Variances, double[] ScaledVariances) Groups(IReadOnlyList<IReadOnlyList<double>>? groups, string paramName)
    {
        Guard.NotNull(groups, paramName);
        if (groups!.Count < 2)
        {
            throw new ArgumentOutOfRangeException(
                paramName,
                groups.Count,
                FormattableString.Invariant($"Parameter '{paramName}' has {groups.Count} groups; Cochran's test needs at least 2."));
        }

        var copy = new ReadOnlyCollection<double>[groups.Count];
        for (int g = 0; g < groups.Count; g++)
        {
            string name = FormattableString.Invariant($"{paramName}[{g}]");
            ReadOnlyCollection<double> group = OutlierInput.FiniteCopy(groups[g], name);
            OutlierInput.Count(group, 2, int.MaxValue, name, "a replicate group");
            if (g > 0 && group.Count != copy[0].Count)
            {
                throw new ArgumentException(
                    FormattableString.Invariant($"Parameter '{name}' has {group.Count} values but group 0 has {copy[0].Count}; Cochran's test needs the same number of replicates in every group."),
                    paramName);
            }

            copy[g] = group;
        }

        (double[] all, double scale) = OutlierInput.ScaledByPowerOfTwo(copy.SelectMany(c => c).ToArray());
        int n = copy[0].Count;
        double[] variances = new double[copy.Length];
        double[] scaledVariances = new double[copy.Length];
        for (int g = 0; g < copy.Length; g++)
        {
            (_, double sumOfSquares) = OutlierInput.MeanAndSumOfSquares(new ArraySegment<double>(all, g * n, n));
            scaledVariances[g] = sumOfSquares / (n - 1);
            variances[g] = scaledVariances[g] * scale * scale;
            if (double.IsInfinity(variances[g]))
            {
                string name = FormattableString.Invariant($"{paramName}[{g}]");
                throw new ArgumentOutOfRangeException(
                    name,
                    FormattableString.Invariant($"Parameter '{name}' has a variance beyond the range of a double; express the data in a larger unit."));
            }
        }

        return (Array.AsReadOnly(copy), variances, scaledVariances);
    }
}
