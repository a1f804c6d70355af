using System;

namespace InternalStdCal.Calibration;

/// <summary>
/// Least-squares solution of a small dense system (n rows, p ≤ a few columns) by Householder QR
/// (Golub &amp; Van Loan, "Matrix Computations", §5.2 and §5.3).
/// </summary>
internal sealed class HouseholderQr
{
    private HouseholderQr(double[,] r, double[] coefficients)
    {
        R = r;
        Coefficients = coefficients;
    }

    /// <summary>Upper-triangular factor R (p × p).</summary>
    internal double[,] R { get; }

    /// <summary>Least-squares coefficients, R⁻¹·(Qᵀb)[0..p).</summary>
    internal double[] Coefficients { get; }

    /// <summary>Factorises <paramref name="columns"/> (p columns of length n; overwritten) and solves for <paramref name="rhs"/> (overwritten).</summary>
    /// <returns>The factorisation, or null when a column is (numerically) a combination of the previous ones.</returns>
    internal static HouseholderQr? Solve(double[][] columns, double[] rhs)
    {
        int p = columns.Length;
        var r = new double[p, p];
        for (int k = 0; k < p; k++)
        {
            double[] a = columns[k];
            double originalNorm = Norm(a, 0);
            double norm = Norm(a, k);
            if (!(norm > 1e-13 * originalNorm))
            {
                return null;
            }

            double alpha = a[k] > 0 ? -norm : norm;

            // v = a[k..] − alpha·e1, stored in place; H = I − 2vvᵀ/(vᵀv), vᵀv = 2·norm·(norm + |a_k|).
            a[k] -= alpha;
            double vtv = 2 * norm * (norm + Math.Abs(a[k] + alpha));
            for (int j = k + 1; j < p; j++)
            {
                Reflect(a, columns[j], k, vtv);
            }

            Reflect(a, rhs, k, vtv);
            r[k, k] = alpha;
            for (int j = k + 1; j < p; j++)
            {
                r[k, j] = columns[j][k];
            }
        }

        var coefficients = new double[p];
        for (int i = p - 1; i >= 0; i--)
        {
            double sum = rhs[i];
            for (int j = i + 1; j < p; j++)
            {
                sum -= r[i, j] * coefficients[j];
            }

            coefficients[i] = sum / r[i, i];
        }

        return new HouseholderQr(r, coefficients);
    }

    /// <summary>Inverse of the upper-triangular R (also upper-triangular).</summary>
    internal double[,] InverseR()
    {
        int p = R.GetLength(0);
        var inv = new double[p, p];
        for (int j = 0; j < p; j++)
        {
            inv[j, j] = 1 / R[j, j];
            for (int i = j - 1; i >= 0; i--)
            {
                double sum = 0;
                for (int k = i + 1; k <= j; k++)
                {
                    sum += R[i, k] * inv[k, j];
                }

                inv[i, j] = -sum / R[i, i];
            }
        }

        return inv;
    }

    private static void Reflect(double[] v, double[] target, int start, double vtv)
    {
        double dot = 0;
        for (int i = start; i < v.Length; i++)
        {
            dot += v[i] * target[i];
        }

        double factor = 2 * dot / vtv;
        for (int i = start; i < v.Length; i++)
        {
            target[i] -= factor * v[i];
        }
    }

    private static double Norm(double[] a, int start)
    {
        double scale = 0;
        for (int i = start; i < a.Length; i++)
        {
            scale = Math.Max(scale, Math.Abs(a[i]));
        }

        if (scale == 0)
        {
            return 0;
        }

        double sum = 0;
        for (int i = start; i < a.Length; i++)
        {
            double t = a[i] / scale;
            sum += t * t;
        }

        return scale * Math.Sqrt(sum);
    }
}
