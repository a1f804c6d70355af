using System;
using System.Collections.Generic;

namespace InternalStdCal.Internal;

/// <summary>
/// Mean and sample standard deviation with compensated, centred (two-pass) sums: the one implementation the
/// calibration, limits, decisions and run code share.
/// </summary>
internal static class SampleStatistics
{
    /// <summary>Arithmetic mean of at least one value (compensated sum).</summary>
    internal static double Mean(IReadOnlyList<double> values)
    {
        var sum = default(CompensatedSum);
        for (int i = 0; i < values.Count; i++)
        {
            sum.Add(values[i]);
        }

        return sum.Value / values.Count;
    }

    /// <summary>Σ(x − mean)², compensated, never negative.</summary>
    internal static double CentredSumOfSquares(IReadOnlyList<double> values, double mean)
    {
        var sum = default(CompensatedSum);
        for (int i = 0; i < values.Count; i++)
        {
            sum.AddProductOfSquare(1, values[i] - mean);
        }

        return Math.Max(0, sum.Value);
    }

    /// <summary>Sample standard deviation s (n − 1 in the denominator) of at least two values about <paramref name="mean"/>.</summary>
    internal static double StandardDeviation(IReadOnlyList<double> values, double mean)
    {
        double s = Math.Sqrt(CentredSumOfSquares(values, mean) / (values.Count - 1));
        return double.IsNaN(s) || double.IsInfinity(s) ? ScaledStandardDeviation(values, mean) : s;
    }

    // Deviations scaled by the largest one, so that squares of huge values do not overflow (common practice).
    private static double ScaledStandardDeviation(IReadOnlyList<double> values, double mean)
    {
        double max = 0;
        for (int i = 0; i < values.Count; i++)
        {
            max = Math.Max(max, Math.Abs(values[i] - mean));
        }

        if (max == 0 || double.IsInfinity(max))
        {
            return max;
        }

        var sum = default(CompensatedSum);
        for (int i = 0; i < values.Count; i++)
        {
            double r = (values[i] - mean) / max;
            sum.Add(r * r);
        }

        return max * Math.Sqrt(sum.Value / (values.Count - 1));
    }

    /// <summary>Sample standard deviation s of at least two values.</summary>
    internal static double StandardDeviation(IReadOnlyList<double> values) => StandardDeviation(values, Mean(values));
}
