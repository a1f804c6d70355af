using System;
using System.Collections.Generic;
using System.Collections.ObjectModel;
using InternalStdCal.Internal;

namespace InternalStdCal.Limits;

/// <summary>Input checks and sample statistics shared by the outlier tests.</summary>
internal static class OutlierInput
{
    /// <summary>A read-only copy of <paramref name="values"/>; every element must be finite.</summary>
    /// <exception cref="ArgumentNullException"><paramref name="values"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An element is NaN or ±∞ (the message names its index and value).</exception>
    internal static ReadOnlyCollection<double> FiniteCopy(IReadOnlyList<double>? values, string paramName)
    {
        Guard.NotNull(values, paramName);
        double[] copy = new double[values!.Count];
        for (int i = 0; i < copy.Length; i++)
        {
            double v = values[i];
            if (double.IsNaN(v) || double.IsInfinity(v))
            {
                throw new ArgumentOutOfRangeException(
                    paramName,
                    v,
                    FormattableString.Invariant($"Parameter '{paramName}' has {Guard.Format(v)} at index {i}; every element must be a finite number (not NaN or infinity)."));
            }

            copy[i] = v;
        }

        return Array.AsReadOnly(copy);
    }

    /// <summary>Checks min ≤ values.Count ≤ max.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The count is outside [min, max] (the message names both).</exception>
    internal static void Count(IReadOnlyList<double> values, int min, int max, string paramName, string why)
    {
        if (values.Count < min || values.Count > max)
        {
            string range = max == int.MaxValue
                ? FormattableString.Invariant($"at least {min}")
                : FormattableString.Invariant($"from {min} to {max}");
            throw new ArgumentOutOfRangeException(
                paramName,
                values.Count,
                FormattableString.Invariant($"Parameter '{paramName}' has {values.Count} elements; {why} needs {range}."));
        }
    }

    /// <summary>Significance level α in the open interval (0, 0.5).</summary>
    internal static double Alpha(double alpha, string paramName) => Guard.InOpenRange(alpha, 0, 0.5, paramName);

    internal static OutlierSide Side(OutlierSide side, string paramName) =>
        side is OutlierSide.TwoSided or OutlierSide.High or OutlierSide.Low
            ? side
            : throw new ArgumentOutOfRangeException(paramName, side, $"Parameter '{paramName}' was {side}; it must be TwoSided, High or Low.");

    /// <summary>
    /// The values divided by the power of two 2^k ≥ max|xᵢ| (at most 2^1023) (exact except in the subnormal range), so that sums,
    /// differences and squares of the scaled values neither overflow nor underflow. The tests' statistics are
    /// scale-free, so they are computed on these.
    /// </summary>
    internal static (double[] Scaled, double Scale) ScaledByPowerOfTwo(IReadOnlyList<double> values)
    {
        double maxAbs = 0;
        for (int i = 0; i < values.Count; i++)
        {
            maxAbs = Math.Max(maxAbs, Math.Abs(values[i]));
        }

        // Largest power of two below double.MaxValue is 2^1023; then |scaled| < 2.
        const double MaxScale = 8.98846567431158E+307;
        double scale = 1;
        if (maxAbs > 0)
        {
            while (scale < maxAbs && scale < MaxScale)
            {
                scale *= 2;
            }

            while (scale / 2 >= maxAbs)
            {
                scale /= 2;
            }
        }

        double[] scaled = new double[values.Count];
        for (int i = 0; i < scaled.Length; i++)
        {
            scaled[i] = values[i] / scale;
        }

        return (scaled, scale);
    }

    /// <summary>Mean (compensated sum) and centred sum of squares Σ(x − x̄)².</summary>
    internal static (double Mean, double SumOfSquares) MeanAndSumOfSquares(IReadOnlyList<double> values)
    {
        var sum = default(CompensatedSum);
        for (int i = 0; i < values.Count; i++)
        {
            sum.Add(values[i]);
        }

        double mean = sum.Value / values.Count;
        var squares = default(CompensatedSum);
        for (int i = 0; i < values.Count; i++)
        {
            squares.AddProductOfSquare(1, values[i] - mean);
        }

        return (mean, squares.Value);
    }

    /// <summary>Index of the first largest (<paramref name="highest"/>) or first smallest value.</summary>
    internal static int IndexOfExtreme(IReadOnlyList<double> values, bool highest)
    {
        int best = 0;
        for (int i = 1; i < values.Count; i++)
        {
            if (highest ? values[i] > values[best] : values[i] < values[best])
            {
                best = i;
            }
        }

        return best;
    }
}
