using System;
using System.Runtime.CompilerServices;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>
/// The weighted straight-line fit shared by <see cref="RegressionFit.FitLine"/> and <see cref="RegressionFit.Fit"/>:
/// one pass that checks the data and forms weighted sums about the first point, the coefficients from the
/// corrected sums, and more passes only when a first-order rounding-error bound says the coefficients could be
/// less accurate than <see cref="Tolerance"/>. Weights are computed per point (never stored).
/// </summary>
/// <remarks>
/// <para><b>Sums.</b> With provisional centre (c, m), dx = x − c, dy = y − m: Sdx = Σw·dx, Qxx = Σw·dx², …;
/// Sxx = Qxx − Sdx²/Σw, Sxy = Qxy − Sdx·Sdy/Σw (exact for any centre; the corrected two-pass algorithm when the
/// centre is the mean: Chan, Golub &amp; LeVeque, "Algorithms for computing the sample variance", Am. Stat. 37
/// (1983)).</para>
/// <para><b>Bound.</b> Each computed sum of n terms, each term carrying ≤ 4 roundings, errs by at most
/// γ·Σ|term| with γ = (n + 6)·u, u = 2⁻⁵³ (Higham, "Accuracy and Stability of Numerical Algorithms", 2nd ed.,
/// §3.1, first order in u). With Cauchy–Schwarz, Σw|dx·dy| ≤ √(Qxx·Qyy) and |Sdx·Sdy|/Σw ≤ √(Qxx·Qyy), so
/// |δb/b| ≤ E_b = γ·(2√(Qxx·Qyy)/|Sxy| + Qxx/Sxx). For a = (m − b·c) + (shiftY − b·shiftX):
/// |δa| ≤ E_b·|b·x̄w| + γ·√(2(Qyy + b²·Qxx)/Σw) (errors of the shifts Sdy/Σw and b·Sdx/Σw) + 4u·(|m| + |b·c| +
/// |shiftY| + |b·shiftX| + |a|) (the roundings of the formula). The coefficients are kept when sufficient
/// conditions for E_b ≤ τ and |δa| ≤ τ·|a| hold: each term at most its equal share of τ, compared squared (no
/// square roots), with a² and b² inside 1e-280…1e280 so that no product overflows or underflows; otherwise
/// the sums are formed again about the means (if the first centre was poor, Qxx &gt; 4·Sxx) and, if the bound
/// still fails, one refinement pass on residuals split exactly (TwoSum/TwoProduct) corrects a and b, and a is
/// formed with compensated arithmetic. τ = 2⁻⁴⁰ ≈ 9.1e-13: at least 12 correct significant digits of the
/// least-squares solution for the given doubles, the accuracy the NIST StRD checks of this library require.
/// Because γ grows with n, fits of more than ~8 000 points always take the refinement pass.</para>
/// </remarks>
internal static class LineFitKernel
{
    /// <summary>τ = 2⁻⁴⁰: largest relative error bound accepted without refinement.</summary>
    private const double Tolerance = 9.094947017729282e-13;

    /// <summary>Unit roundoff u = 2⁻⁵³.</summary>
    private const double UnitRoundoff = 1.1102230246251565e-16;

    private interface IPointWeight
    {
        /// <summary>Raw weight of point i (no check: an undefined weight gives ≤ 0, ±∞ or NaN, caught by the sums).</summary>
        double At(int index, double x, double y);
    }

    /// <summary>
    /// Fits y = a + b·x with raw weights multiplied by <paramref name="weightScale"/> (a power of 2). The caller
    /// has checked that the lengths agree, n ≥ 3 and a per-point weighting has n values. Returns false, with
    /// <paramref name="fit"/> undefined, for a non-finite value, an undefined weight, all x equal, or sums outside
    /// the safe range (1e-100 &lt; Σw &lt; 1e100, every sum finite); the caller then takes the checked path.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static bool TryFit(ReadOnlySpan<double> x, ReadOnlySpan<double> y, Weighting weighting, double weightScale, out LineFit fit) =>
        weighting.Scheme switch
        {
            WeightingScheme.None => TryFit(x, y, default(UnitWeight), weighting, weightScale, out fit),
            WeightingScheme.InverseX => TryFit(x, y, default(InverseXWeight), weighting, weightScale, out fit),
            WeightingScheme.InverseXSquared => TryFit(x, y, default(InverseXSquaredWeight), weighting, weightScale, out fit),
            WeightingScheme.InverseY => TryFit(x, y, default(InverseYWeight), weighting, weightScale, out fit),
            WeightingScheme.InverseYSquared => TryFit(x, y, default(InverseYSquaredWeight), weighting, weightScale, out fit),
            WeightingScheme.InverseVariance => TryFit(x, y, new InverseVarianceWeight(weighting.Values), weighting, weightScale, out fit),
            _ => TryFit(x, y, new FixedWeight(weighting.Values), weighting, weightScale, out fit),
        };

    private static bool TryFit<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, Weighting weighting, double weightScale, out LineFit fit)
        where TWeight : struct, IPointWeight
    {
        fit = default;
        int n = x.Length;
        double c = x[0], m = y[0];
        Sums s = Accumulate(x, y, weights, weightScale, c, m);
        double minX = s.MinX, maxX = s.MaxX;
        double check = s.Sw + s.Sdx + s.Sdy + s.Qxx + s.Qxy + s.Qyy;

        // Every sum finite and every w > 0 imply every x, y and w finite (Qxx, Qyy, Σw are sums of terms ≥ 0).
        if (!(s.MinW > 0 && minX < maxX && check - check == 0 && s.Sw > 1e-100 && s.Sw < 1e100))
        {
            return false;
        }

        Solution line = Solve(s, n);
        if (!line.Valid)
        {
            return false;
        }

        if (!line.Accurate && s.Qxx > 4 * line.Sxx)
        {
            // The first point was a poor centre: centre again at the means.
            c += line.ShiftX;
            m += line.ShiftY;
            s = Accumulate(x, y, weights, weightScale, c, m);
            line = Solve(s, n);
            if (!line.Valid)
            {
                return false;
            }
        }

        double b = line.Slope, intercept = line.Intercept;
        bool refined = !line.Accurate;
        if (refined)
        {
            // a = m + α − b·c plus the refinement's corrections, compensated.
            (double deltaB, double deltaAlpha) = Refine(x, y, weights, weightScale, c, m, s.Sw, line);
            var a = default(CompensatedSum);
            a.Add(m);
            a.Add(line.ShiftY - (b * line.ShiftX) + deltaAlpha);
            a.AddProduct(-b, c);
            a.Add(-deltaB * c);
            intercept = a.Value;
            b += deltaB;
        }

        double normaliser = n * (1 / s.Sw);
        fit = new LineFit(
            weighting,
            n,
            weightScale,
            normaliser,
            c + line.ShiftX,
            m + line.ShiftY,
            line.Sxx * normaliser,
            intercept,
            b,
            minX,
            maxX,
            refined);
        return true;
    }

    /// <summary>One pass: Σw, Σw·dx, Σw·dy, Σw·dx², Σw·dx·dy, Σw·dy² about (c, m), the smallest w and the x range.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Sums Accumulate<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m)
        where TWeight : struct, IPointWeight
    {
        double sw = 0, sdx = 0, sdy = 0, qxx = 0, qxy = 0, qyy = 0;
        double minW = double.MaxValue, minX = x[0], maxX = minX;
        for (int i = 0; i < x.Length; i++)
        {
            double xi = x[i], yi = y[i];
            double w = weights.At(i, xi, yi) * weightScale;
            double dx = xi - c, dy = yi - m, wdx = w * dx, wdy = w * dy;
            minW = w < minW ? w : minW;
            minX = xi < minX ? xi : minX;
            maxX = xi > maxX ? xi : maxX;
            sw += w;
            sdx += wdx;
            sdy += wdy;
            qxx += wdx * dx;
            qxy += wdx * dy;
            qyy += wdy * dy;
        }

        return new Sums(c, m, sw, sdx, sdy, qxx, qxy, qyy, minW, minX, maxX);
    }

    /// <summary>Slope, shifts, corrected Sxx and the plain intercept from the sums, and whether the bound of the
    /// remarks is met (tested without square roots or further divisions).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Solution Solve(in Sums s, int n)
    {
        double inverseSw = 1 / s.Sw;
        double shiftX = s.Sdx * inverseSw, shiftY = s.Sdy * inverseSw;
        double sxx = s.Qxx - (s.Sdx * shiftX);
        double sxy = s.Qxy - (s.Sdx * shiftY);
        double inverseSxx = 1 / sxx;
        double b = sxy * inverseSxx;
        bool valid = sxx > 0 && b - b == 0;

        // a = (m − b·c) + α, α = shiftY − b·shiftX: the value when no refinement is needed.
        double bc = b * s.CenterX, bShift = b * shiftX;
        double alpha = shiftY - bShift;
        double intercept = (s.CenterY - bc) + alpha;

        // Sufficient conditions for E_b ≤ τ and |δa| ≤ τ·|a| (remarks), τ split equally between the terms and
        // squared: K = Qxx/Sxx, P²·b² = K·Qyy/Sxx. The guards on a² and b² keep every product clear of overflow
        // and of underflow that could hide an error; anything else (NaN, ∞) fails and leads to refinement.
        double gamma = (n + 6) * UnitRoundoff, gamma2 = gamma * gamma;
        double k = s.Qxx * inverseSxx, kyy = k * s.Qyy * inverseSxx;
        double meanX = s.CenterX + shiftX, a2 = intercept * intercept, b2 = b * b;
        double rounding = Math.Abs(s.CenterY) + Math.Abs(bc) + Math.Abs(shiftY) + Math.Abs(bShift) + Math.Abs(intercept);
        bool accurate = a2 > 1e-280 && a2 < 1e280 && b2 > 1e-280 && b2 < 1e280
            && 2 * gamma * k <= Tolerance
            && 16 * gamma2 * kyy <= Tolerance * Tolerance * b2
            && 6 * gamma * k * Math.Abs(b * meanX) <= Tolerance * Math.Abs(intercept)
            && 144 * gamma2 * kyy * meanX * meanX <= Tolerance * Tolerance * a2
            && 18 * gamma2 * (s.Qyy + (b2 * s.Qxx)) * inverseSw <= Tolerance * Tolerance * a2
            && 12 * UnitRoundoff * rounding <= Tolerance * Math.Abs(intercept);
        return new Solution(b, intercept, shiftX, shiftY, sxx, valid, accurate);
    }

    /// <summary>
    /// One step of iterative refinement in closed form: residuals about the provisional line ŷ − m = α + b·(x − c)
    /// with x − c and y − m split exactly (TwoSum) and b·(x − c) taken exactly (TwoProduct), so each residual
    /// carries one rounding; returns their least-squares correction (δb, δα).
    /// </summary>
    private static (double DeltaB, double DeltaAlpha) Refine<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m, double sw, in Solution line)
        where TWeight : struct, IPointWeight
    {
        double b = line.Slope, alpha = line.ShiftY - (b * line.ShiftX), swr = 0, swdxr = 0;
        for (int i = 0; i < x.Length; i++)
        {
            double xi = x[i], yi = y[i];
            double w = weights.At(i, xi, yi) * weightScale;
            double dx = xi - c, dy = yi - m, bdx = b * dx;
            double r = (dy - bdx) - CompensatedSum.ProductError(b, dx, bdx)
                + CompensatedSum.SumError(yi, -m, dy) - (b * CompensatedSum.SumError(xi, -c, dx)) - alpha;
            double wr = w * r;
            swr += wr;
            swdxr += wr * dx;
        }

        double deltaB = (swdxr - (line.ShiftX * swr)) / line.Sxx;
        return (deltaB, (swr / sw) - (line.ShiftX * deltaB));
    }

    private readonly struct Sums
    {
        internal Sums(double centerX, double centerY, double sw, double sdx, double sdy, double qxx, double qxy, double qyy, double minW, double minX, double maxX)
        {
            CenterX = centerX;
            CenterY = centerY;
            Sw = sw;
            Sdx = sdx;
            Sdy = sdy;
            Qxx = qxx;
            Qxy = qxy;
            Qyy = qyy;
            MinW = minW;
            MinX = minX;
            MaxX = maxX;
        }

        internal double CenterX { get; }

        internal double CenterY { get; }

        internal double Sw { get; }

        internal double Sdx { get; }

        internal double Sdy { get; }

        internal double Qxx { get; }

        internal double Qxy { get; }

        internal double Qyy { get; }

        internal double MinW { get; }

        internal double MinX { get; }

        internal double MaxX { get; }
    }

    private readonly struct Solution
    {
        internal Solution(double slope, double intercept, double shiftX, double shiftY, double sxx, bool valid, bool accurate)
        {
            Slope = slope;
            Intercept = intercept;
            ShiftX = shiftX;
            ShiftY = shiftY;
            Sxx = sxx;
            Valid = valid;
            Accurate = accurate;
        }

        internal double Slope { get; }

        internal double Intercept { get; }

        internal double ShiftX { get; }

        internal double ShiftY { get; }

        internal double Sxx { get; }

        internal bool Valid { get; }

        internal bool Accurate { get; }
    }

    private readonly struct UnitWeight : IPointWeight
    {
        public double At(int index, double x, double y) => 1.0;
    }

    private readonly struct InverseXWeight : IPointWeight
    {
        public double At(int index, double x, double y) => 1.0 / x;
    }

    private readonly struct InverseXSquaredWeight : IPointWeight
    {
        public double At(int index, double x, double y) => 1.0 / (x * x);
    }

    private readonly struct InverseYWeight : IPointWeight
    {
        public double At(int index, double x, double y) => 1.0 / y;
    }

    private readonly struct InverseYSquaredWeight : IPointWeight
    {
        public double At(int index, double x, double y) => y > 0 ? 1.0 / (y * y) : double.NaN;
    }

    private readonly struct InverseVarianceWeight : IPointWeight
    {
        private readonly double[] _standardDeviations;

        internal InverseVarianceWeight(double[] standardDeviations) => _standardDeviations = standardDeviations;

        public double At(int index, double x, double y) => 1.0 / (_standardDeviations[index] * _standardDeviations[index]);
    }

    private readonly struct FixedWeight : IPointWeight
    {
        private readonly double[] _weights;

        internal FixedWeight(double[] weights) => _weights = weights;

        public double At(int index, double x, double y) => _weights[index];
    }
}
