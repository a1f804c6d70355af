using System;
using System.Runtime.CompilerServices;
#if NET8_0_OR_GREATER
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;
#endif
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
/// (1983)). The slope is b = (Σw·Qxy − Sdx·Sdy)/(Σw·Qxx − Sdx²) = Sxy/Sxx (one division after the sums; the
/// first-order errors of Σw cancel in the quotient). Each sum is formed in four lanes combined pairwise
/// (<see cref="SumPath"/>), the same way on every target, so the netstandard2.0 and net8.0 builds agree bit for
/// bit.</para>
/// <para><b>Bound.</b> Each computed sum of n terms, each term carrying ≤ 4 roundings, errs by at most
/// γ·Σ|term| with γ = (n + 6)·u, u = 2⁻⁵³ (Higham, "Accuracy and Stability of Numerical Algorithms", 2nd ed.,
/// §3.1 and §4.2, first order in u): in four lanes a term passes through at most ⌈n/4⌉ + 1 additions, so at
/// least 3u of γ are left for the three roundings each of forming Σw·Sxx, Σw·Sxy and the slope. With Cauchy–Schwarz, Σw|dx·dy| ≤ √(Qxx·Qyy) and |Sdx·Sdy|/Σw ≤ √(Qxx·Qyy), so
/// |δb/b| ≤ E_b = γ·(2√(Qxx·Qyy)/|Sxy| + Qxx/Sxx). For a = (m − b·c) + (shiftY − b·shiftX):
/// |δa| ≤ E_b·|b·x̄w| + γ·√(2(Qyy + b²·Qxx)/Σw) (errors of the shifts Sdy/Σw and b·Sdx/Σw) + 4u·(|m| + |b·c| +
/// |shiftY| + |b·shiftX| + |a|) (the roundings of the formula). The coefficients are kept when sufficient
/// conditions for E_b ≤ τ and |δa| ≤ τ·|a| hold: each term at most its equal share of τ, compared squared (no
/// square roots), with a² and b² inside 1e-280…1e280 so that no product overflows or underflows; otherwise
/// the sums are formed again about the means (if the first centre was poor, Qxx &gt; 4·Sxx) and, if the bound
/// still fails, one refinement pass on residuals split exactly (TwoSum/TwoProduct) corrects a and b, and a is
/// formed with compensated arithmetic. τ = 2⁻⁴⁰ ≈ 9.1e-13: at least 12 correct significant digits of the
/// least-squares solution for the given doubles, the accuracy the NIST StRD checks of this library require.
/// Because γ grows with n (2γ·Qxx/Sxx ≤ τ needs n + 6 ≤ 4096), fits of more than ~4 000 points always take the
/// refinement pass.</para>
/// </remarks>
internal static class LineFitKernel
{
    /// <summary>τ = 2⁻⁴⁰: largest relative error bound accepted without refinement.</summary>
    private const double Tolerance = 9.094947017729282e-13;

    /// <summary>u/τ = 2⁻¹³ (unit roundoff u = 2⁻⁵³ over τ): γ/τ = (n + 6)·u/τ exactly.</summary>
    private const double RoundoffPerTolerance = 1.220703125e-4;

    private interface IPointWeight
    {
        /// <summary>Raw weight of point i (no check: an undefined weight gives ≤ 0, ±∞ or NaN, caught by the sums).</summary>
        double At(int index, double x, double y);
#if NET8_0_OR_GREATER

        /// <summary>Raw weights of points index … index + 3, each as <see cref="At(int, double, double)"/> gives it.</summary>
        Vector256<double> At(int index, Vector256<double> x, Vector256<double> y);

        /// <summary>Raw weights of points index and index + 1, each as <see cref="At(int, double, double)"/> gives it.</summary>
        Vector128<double> At(int index, Vector128<double> x, Vector128<double> y);
#endif
    }

    /// <summary>
    /// Fits y = a + b·x with raw weights multiplied by <paramref name="weightScale"/> (a power of 2). The caller
    /// has checked that the lengths agree, n ≥ 3 and a per-point weighting has n values. Returns the default value
    /// (<see cref="LineFit.Count"/> 0) for a non-finite value, an undefined weight, all x equal, or sums outside
    /// the safe range (1e-100 &lt; Σw &lt; 1e100, every sum finite); the caller then takes the checked path.
    /// Tests may force the 128-bit or scalar accumulation with a <see cref="SumPath"/> (same bits).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static LineFit Fit(ReadOnlySpan<double> x, ReadOnlySpan<double> y, Weighting weighting, double weightScale, SumPath path = SumPath.Widest) =>
        weighting.Scheme switch
        {
            WeightingScheme.None => Fit(x, y, default(UnitWeight), weighting, weightScale, path),
            WeightingScheme.InverseX => Fit(x, y, default(InverseXWeight), weighting, weightScale, path),
            WeightingScheme.InverseXSquared => Fit(x, y, default(InverseXSquaredWeight), weighting, weightScale, path),
            WeightingScheme.InverseY => Fit(x, y, default(InverseYWeight), weighting, weightScale, path),
            WeightingScheme.InverseYSquared => Fit(x, y, default(InverseYSquaredWeight), weighting, weightScale, path),
            WeightingScheme.InverseVariance => Fit(x, y, new InverseVarianceWeight(weighting.Values), weighting, weightScale, path),
            _ => Fit(x, y, new FixedWeight(weighting.Values), weighting, weightScale, path),
        };

    // Not inlined: one compact body per weighting keeps the callers small and the code the JIT makes predictable.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static LineFit Fit<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, Weighting weighting, double weightScale, SumPath path)
        where TWeight : struct, IPointWeight
    {
        int n = x.Length;
        double c = x[0], m = y[0];
        Sums s = Accumulate(x, y, weights, weightScale, c, m, path);
        double minX = s.MinX, maxX = s.MaxX;
        double check = s.Sw + s.Sdx + s.Sdy + s.Qxx + s.Qxy + s.Qyy;

        // Every sum finite and every w > 0 imply every x, y and w finite (Qxx, Qyy, Σw are sums of terms ≥ 0).
        if (!(s.MinW > 0 && minX < maxX && check - check == 0 && s.Sw > 1e-100 && s.Sw < 1e100))
        {
            return default;
        }

        Solution line = Solve(s, n);
        if (!line.Valid)
        {
            return default;
        }

        if (!line.Accurate && s.Qxx > 4 * line.Sxx)
        {
            // The first point was a poor centre: centre again at the means.
            c += line.ShiftX;
            m += line.ShiftY;
            s = Accumulate(x, y, weights, weightScale, c, m, path);
            line = Solve(s, n);
            if (!line.Valid)
            {
                return default;
            }
        }

        double b = line.Slope, intercept = line.Intercept;
        bool refined = !line.Accurate;
        if (refined)
        {
            // a = m + α − b·c plus the refinement's corrections, compensated.
            (double deltaB, double deltaAlpha) = Refine(x, y, weights, weightScale, c, m, s.Sw, line, path);
            var a = default(CompensatedSum);
            a.Add(m);
            a.Add(line.ShiftY - (b * line.ShiftX) + deltaAlpha);
            a.AddProduct(-b, c);
            a.Add(-deltaB * c);
            intercept = a.Value;
            b += deltaB;
        }

        double normaliser = n * line.InverseSw;
        return new LineFit(
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
    }

    /// <summary>
    /// One pass: Σw, Σw·dx, Σw·dy, Σw·dx², Σw·dx·dy, Σw·dy² about (c, m), the smallest w and the x range, each in
    /// four lanes (see <see cref="SumPath"/>). Every path performs the same operations in the same order.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Sums Accumulate<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m, SumPath path)
        where TWeight : struct, IPointWeight
    {
#if NET8_0_OR_GREATER
        if (x.Length >= 4 && path != SumPath.Scalar)
        {
            if (Vector256.IsHardwareAccelerated && path == SumPath.Widest)
            {
                return Accumulate256(x, y, weights, weightScale, c, m);
            }

            if (Vector128.IsHardwareAccelerated)
            {
                return Accumulate128(x, y, weights, weightScale, c, m);
            }
        }
#endif
        return AccumulateScalar(x, y, weights, weightScale, c, m);
    }

    /// <summary>The four lanes one double at a time (netstandard2.0, no vector hardware, n = 3).</summary>
    private static Sums AccumulateScalar<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m)
        where TWeight : struct, IPointWeight
    {
        int n = x.Length, i = 0;
        Lane l0 = new(x[0]), l1 = l0, l2 = l0, l3 = l0;
        for (; i <= n - 4; i += 4)
        {
            l0.Add(x[i], y[i], weights.At(i, x[i], y[i]) * weightScale, c, m);
            l1.Add(x[i + 1], y[i + 1], weights.At(i + 1, x[i + 1], y[i + 1]) * weightScale, c, m);
            l2.Add(x[i + 2], y[i + 2], weights.At(i + 2, x[i + 2], y[i + 2]) * weightScale, c, m);
            l3.Add(x[i + 3], y[i + 3], weights.At(i + 3, x[i + 3], y[i + 3]) * weightScale, c, m);
        }

        // The r = n − i remaining points: point n − 4 + k goes to lane k (k ≥ 4 − r), as in the vector paths.
        int r = n - i;
        if (r == 3)
        {
            l1.Add(x[n - 3], y[n - 3], weights.At(n - 3, x[n - 3], y[n - 3]) * weightScale, c, m);
        }

        if (r >= 2)
        {
            l2.Add(x[n - 2], y[n - 2], weights.At(n - 2, x[n - 2], y[n - 2]) * weightScale, c, m);
        }

        if (r >= 1)
        {
            l3.Add(x[n - 1], y[n - 1], weights.At(n - 1, x[n - 1], y[n - 1]) * weightScale, c, m);
        }

        // Lanes combined as (l0 + l2) + (l1 + l3), the order of the vector paths.
        return new Sums(
            c,
            m,
            (l0.Sw + l2.Sw) + (l1.Sw + l3.Sw),
            (l0.Sdx + l2.Sdx) + (l1.Sdx + l3.Sdx),
            (l0.Sdy + l2.Sdy) + (l1.Sdy + l3.Sdy),
            (l0.Qxx + l2.Qxx) + (l1.Qxx + l3.Qxx),
            (l0.Qxy + l2.Qxy) + (l1.Qxy + l3.Qxy),
            (l0.Qyy + l2.Qyy) + (l1.Qyy + l3.Qyy),
            Lower(Lower(l0.MinW, l2.MinW), Lower(l1.MinW, l3.MinW)),
            Lower(Lower(l0.MinX, l2.MinX), Lower(l1.MinX, l3.MinX)),
            Higher(Higher(l0.MaxX, l2.MaxX), Higher(l1.MaxX, l3.MaxX)));
    }

    /// <summary>a &lt; b ? a : b, the vector paths' lane-wise choice (a NaN a is never chosen).</summary>
    private static double Lower(double a, double b) => a < b ? a : b;

    /// <summary>a &gt; b ? a : b, the vector paths' lane-wise choice (a NaN a is never chosen).</summary>
    private static double Higher(double a, double b) => a > b ? a : b;

#if NET8_0_OR_GREATER
    /// <summary>The four lanes in one 256-bit vector per sum.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Sums Accumulate256<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m)
        where TWeight : struct, IPointWeight
    {
        int n = x.Length, i = 0;
        ref double xs = ref MemoryMarshal.GetReference(x);
        ref double ys = ref MemoryMarshal.GetReference(y);
        Vector256<double> vc = Vector256.Create(c), vm = Vector256.Create(m), scale = Vector256.Create(weightScale);
        Vector256<double> sw = Vector256<double>.Zero, sdx = sw, sdy = sw, qxx = sw, qxy = sw, qyy = sw;
        Vector256<double> minW = Vector256.Create(double.MaxValue), minX = Vector256.Create(xs), maxX = minX;
        for (; i <= n - 4; i += 4)
        {
            Vector256<double> xi = Vector256.LoadUnsafe(ref xs, (nuint)i), yi = Vector256.LoadUnsafe(ref ys, (nuint)i);
            Vector256<double> w = weights.At(i, xi, yi) * scale;
            Vector256<double> dx = xi - vc, dy = yi - vm, wdx = w * dx, wdy = w * dy;
            minW = Lower(w, minW);
            minX = Lower(xi, minX);
            maxX = Higher(xi, maxX);
            sw += w;
            sdx += wdx;
            sdy += wdy;
            qxx += wdx * dx;
            qxy += wdx * dy;
            qyy += wdy * dy;
        }

        if (i < n)
        {
            // The last four points with those already added masked out: point n − 4 + k goes to lane k.
            int start = n - 4;
            Vector256<double> take = Vector256.GreaterThanOrEqual(Vector256.Create(0L, 1L, 2L, 3L), Vector256.Create((long)(i - start))).AsDouble();
            Vector256<double> xi = Vector256.LoadUnsafe(ref xs, (nuint)start), yi = Vector256.LoadUnsafe(ref ys, (nuint)start);
            Vector256<double> w = weights.At(start, xi, yi) * scale;
            Vector256<double> dx = xi - vc, dy = yi - vm, wdx = w * dx, wdy = w * dy;
            minW = Vector256.ConditionalSelect(take, Lower(w, minW), minW);
            minX = Vector256.ConditionalSelect(take, Lower(xi, minX), minX);
            maxX = Vector256.ConditionalSelect(take, Higher(xi, maxX), maxX);
            sw = Vector256.ConditionalSelect(take, sw + w, sw);
            sdx = Vector256.ConditionalSelect(take, sdx + wdx, sdx);
            sdy = Vector256.ConditionalSelect(take, sdy + wdy, sdy);
            qxx = Vector256.ConditionalSelect(take, qxx + (wdx * dx), qxx);
            qxy = Vector256.ConditionalSelect(take, qxy + (wdx * dy), qxy);
            qyy = Vector256.ConditionalSelect(take, qyy + (wdy * dy), qyy);
        }

        return new Sums(
            c,
            m,
            Sum(sw.GetLower(), sw.GetUpper()),
            Sum(sdx.GetLower(), sdx.GetUpper()),
            Sum(sdy.GetLower(), sdy.GetUpper()),
            Sum(qxx.GetLower(), qxx.GetUpper()),
            Sum(qxy.GetLower(), qxy.GetUpper()),
            Sum(qyy.GetLower(), qyy.GetUpper()),
            Lowest(minW.GetLower(), minW.GetUpper()),
            Lowest(minX.GetLower(), minX.GetUpper()),
            Highest(maxX.GetLower(), maxX.GetUpper()));
    }

    /// <summary>The four lanes in two 128-bit vectors per sum (lanes 0–1 and 2–3).</summary>
    private static Sums Accumulate128<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m)
        where TWeight : struct, IPointWeight
    {
        int n = x.Length, i = 0;
        ref double xs = ref MemoryMarshal.GetReference(x);
        ref double ys = ref MemoryMarshal.GetReference(y);
        Vector128<double> vc = Vector128.Create(c), vm = Vector128.Create(m), scale = Vector128.Create(weightScale);
        var low = new Lanes128(Vector128.Create(xs));
        Lanes128 high = low;
        for (; i <= n - 4; i += 4)
        {
            Vector128<double> xa = Vector128.LoadUnsafe(ref xs, (nuint)i), ya = Vector128.LoadUnsafe(ref ys, (nuint)i);
            Vector128<double> xb = Vector128.LoadUnsafe(ref xs, (nuint)(i + 2)), yb = Vector128.LoadUnsafe(ref ys, (nuint)(i + 2));
            low.Add(xa, ya, weights.At(i, xa, ya) * scale, vc, vm);
            high.Add(xb, yb, weights.At(i + 2, xb, yb) * scale, vc, vm);
        }

        if (i < n)
        {
            // The last four points with those already added masked out: point n − 4 + k goes to lane k.
            int start = n - 4;
            Vector128<long> first = Vector128.Create((long)(i - start));
            Vector128<double> xa = Vector128.LoadUnsafe(ref xs, (nuint)start), ya = Vector128.LoadUnsafe(ref ys, (nuint)start);
            Vector128<double> xb = Vector128.LoadUnsafe(ref xs, (nuint)(start + 2)), yb = Vector128.LoadUnsafe(ref ys, (nuint)(start + 2));
            low.Add(xa, ya, weights.At(start, xa, ya) * scale, vc, vm, Vector128.GreaterThanOrEqual(Vector128.Create(0L, 1L), first).AsDouble());
            high.Add(xb, yb, weights.At(start + 2, xb, yb) * scale, vc, vm, Vector128.GreaterThanOrEqual(Vector128.Create(2L, 3L), first).AsDouble());
        }

        return new Sums(
            c,
            m,
            Sum(low.Sw, high.Sw),
            Sum(low.Sdx, high.Sdx),
            Sum(low.Sdy, high.Sdy),
            Sum(low.Qxx, high.Qxx),
            Sum(low.Qxy, high.Qxy),
            Sum(low.Qyy, high.Qyy),
            Lowest(low.MinW, high.MinW),
            Lowest(low.MinX, high.MinX),
            Highest(low.MaxX, high.MaxX));
    }

    /// <summary>a &lt; b ? a : b lane by lane (one MINPD on x86, whose rule this is).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector256<double> Lower(Vector256<double> a, Vector256<double> b) =>
        Avx.IsSupported ? Avx.Min(a, b) : Vector256.ConditionalSelect(Vector256.LessThan(a, b), a, b);

    /// <summary>a &gt; b ? a : b lane by lane (one MAXPD on x86, whose rule this is).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector256<double> Higher(Vector256<double> a, Vector256<double> b) =>
        Avx.IsSupported ? Avx.Max(a, b) : Vector256.ConditionalSelect(Vector256.GreaterThan(a, b), a, b);

    /// <summary>a &lt; b ? a : b lane by lane (one MINPD on x86, whose rule this is).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector128<double> Lower(Vector128<double> a, Vector128<double> b) =>
        Sse2.IsSupported ? Sse2.Min(a, b) : Vector128.ConditionalSelect(Vector128.LessThan(a, b), a, b);

    /// <summary>a &gt; b ? a : b lane by lane (one MAXPD on x86, whose rule this is).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector128<double> Higher(Vector128<double> a, Vector128<double> b) =>
        Sse2.IsSupported ? Sse2.Max(a, b) : Vector128.ConditionalSelect(Vector128.GreaterThan(a, b), a, b);

    /// <summary>(l0 + l2) + (l1 + l3) from lanes (l0, l1) and (l2, l3).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Sum(Vector128<double> low, Vector128<double> high)
    {
        Vector128<double> pairs = low + high;
        return pairs.ToScalar() + pairs.GetElement(1);
    }

    /// <summary>Lower(Lower(l0, l2), Lower(l1, l3)) from lanes (l0, l1) and (l2, l3).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Lowest(Vector128<double> low, Vector128<double> high)
    {
        Vector128<double> pairs = Lower(low, high);
        return Lower(pairs.ToScalar(), pairs.GetElement(1));
    }

    /// <summary>Higher(Higher(l0, l2), Higher(l1, l3)) from lanes (l0, l1) and (l2, l3).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Highest(Vector128<double> low, Vector128<double> high)
    {
        Vector128<double> pairs = Higher(low, high);
        return Higher(pairs.ToScalar(), pairs.GetElement(1));
    }
#endif

    /// <summary>Slope, shifts, corrected Sxx and the plain intercept from the sums, and whether the bound of the
    /// remarks is met (tested without square roots or further divisions).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Solution Solve(in Sums s, int n)
    {
        // Σw·Sxx and Σw·Sxy formed directly, so that the slope waits for one division, not two in a row.
        double inverseSw = 1 / s.Sw;
        double shiftX = s.Sdx * inverseSw, shiftY = s.Sdy * inverseSw;
        double swSxx = (s.Qxx * s.Sw) - (s.Sdx * s.Sdx);
        double swSxy = (s.Qxy * s.Sw) - (s.Sdx * s.Sdy);
        double b = swSxy / swSxx, inverseSxx = s.Sw / swSxx, sxx = swSxx * inverseSw;
        bool valid = swSxx > 0 && swSxx < double.PositiveInfinity && sxx > 0 && b - b == 0;

        // a = (m − b·c) + α, α = shiftY − b·shiftX: the value when no refinement is needed.
        double bc = b * s.CenterX, bShift = b * shiftX;
        double alpha = shiftY - bShift;
        double intercept = (s.CenterY - bc) + alpha;

        // Sufficient conditions for E_b ≤ τ and |δa| ≤ τ·|a| (remarks), τ split equally between the terms, both
        // sides divided by τ (g = γ/τ) and squared: K = Qxx/Sxx, P²·b² = K·Qyy/Sxx; evaluated without branches.
        // The guards on a² and b² keep every product clear of overflow and of underflow that could hide an
        // error; anything else (NaN, ∞) fails and leads to refinement.
        double k = s.Qxx * inverseSxx, kyy = k * s.Qyy * inverseSxx;
        double meanX = s.CenterX + shiftX, a2 = intercept * intercept, b2 = b * b;
        double rounding = Math.Abs(s.CenterY) + Math.Abs(bc) + Math.Abs(shiftY) + Math.Abs(bShift) + Math.Abs(intercept);
        double g = (n + 6) * RoundoffPerTolerance, gk = g * k, g2kyy = g * g * kyy, absA = Math.Abs(intercept);
        bool accurate = (a2 > 1e-280) & (a2 < 1e280) & (b2 > 1e-280) & (b2 < 1e280)
            & (2 * gk <= 1)
            & (16 * g2kyy <= b2)
            & (6 * gk * Math.Abs(b * meanX) <= absA)
            & (144 * g2kyy * meanX * meanX <= a2)
            & (18 * g * g * (s.Qyy + (b2 * s.Qxx)) * inverseSw <= a2)
            & (12 * RoundoffPerTolerance * rounding <= absA);
        return new Solution(b, intercept, shiftX, shiftY, sxx, inverseSw, valid, accurate);
    }

    /// <summary>
    /// One step of iterative refinement in closed form: residuals about the provisional line ŷ − m = α + b·(x − c)
    /// with x − c and y − m split exactly (TwoSum) and b·(x − c) taken exactly (TwoProduct), so each residual
    /// carries one rounding; returns their least-squares correction (δb, δα). Σw·r and Σw·r·dx are formed in the
    /// four lanes of <see cref="SumPath"/> (TwoProduct's error term is exact on every target, so all agree).
    /// </summary>
    private static (double DeltaB, double DeltaAlpha) Refine<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m, double sw, in Solution line, SumPath path)
        where TWeight : struct, IPointWeight
    {
        double b = line.Slope, alpha = line.ShiftY - (b * line.ShiftX);
#if NET8_0_OR_GREATER
        (double swr, double swdxr) = x.Length >= 4 && path == SumPath.Widest && Vector256.IsHardwareAccelerated && Fma.IsSupported
            ? Residuals256(x, y, weights, weightScale, c, m, b, alpha)
            : ResidualsScalar(x, y, weights, weightScale, c, m, b, alpha);
#else
        (double swr, double swdxr) = ResidualsScalar(x, y, weights, weightScale, c, m, b, alpha);
#endif
        double deltaB = (swdxr - (line.ShiftX * swr)) / line.Sxx;
        return (deltaB, (swr / sw) - (line.ShiftX * deltaB));
    }

    /// <summary>Σw·r and Σw·r·dx of the refinement, four lanes one double at a time.</summary>
    private static (double Swr, double Swdxr) ResidualsScalar<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m, double b, double alpha)
        where TWeight : struct, IPointWeight
    {
        int n = x.Length, i = 0;
        double r0 = 0, r1 = 0, r2 = 0, r3 = 0, d0 = 0, d1 = 0, d2 = 0, d3 = 0;
        for (; i <= n - 4; i += 4)
        {
            AddResidual(ref r0, ref d0, i, x, y, weights, weightScale, c, m, b, alpha);
            AddResidual(ref r1, ref d1, i + 1, x, y, weights, weightScale, c, m, b, alpha);
            AddResidual(ref r2, ref d2, i + 2, x, y, weights, weightScale, c, m, b, alpha);
            AddResidual(ref r3, ref d3, i + 3, x, y, weights, weightScale, c, m, b, alpha);
        }

        // The r = n − i remaining points: point n − 4 + k goes to lane k (k ≥ 4 − r), as in Accumulate.
        int r = n - i;
        if (r == 3)
        {
            AddResidual(ref r1, ref d1, n - 3, x, y, weights, weightScale, c, m, b, alpha);
        }

        if (r >= 2)
        {
            AddResidual(ref r2, ref d2, n - 2, x, y, weights, weightScale, c, m, b, alpha);
        }

        if (r >= 1)
        {
            AddResidual(ref r3, ref d3, n - 1, x, y, weights, weightScale, c, m, b, alpha);
        }

        return ((r0 + r2) + (r1 + r3), (d0 + d2) + (d1 + d3));
    }

    /// <summary>Adds w·r and w·r·dx of point <paramref name="i"/> to one lane.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void AddResidual<TWeight>(ref double swr, ref double swdxr, int i, ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m, double b, double alpha)
        where TWeight : struct, IPointWeight
    {
        double xi = x[i], yi = y[i];
        double w = weights.At(i, xi, yi) * weightScale;
        double dx = xi - c, dy = yi - m, bdx = b * dx;
        double res = (dy - bdx) - CompensatedSum.ProductError(b, dx, bdx)
            + CompensatedSum.SumError(yi, -m, dy) - (b * CompensatedSum.SumError(xi, -c, dx)) - alpha;
        double wr = w * res;
        swr += wr;
        swdxr += wr * dx;
    }

#if NET8_0_OR_GREATER
    /// <summary>Σw·r and Σw·r·dx of the refinement in 256-bit vectors (TwoProduct's error by fused multiply-add).</summary>
    private static (double Swr, double Swdxr) Residuals256<TWeight>(ReadOnlySpan<double> x, ReadOnlySpan<double> y, TWeight weights, double weightScale, double c, double m, double b, double alpha)
        where TWeight : struct, IPointWeight
    {
        int n = x.Length, i = 0;
        ref double xs = ref MemoryMarshal.GetReference(x);
        ref double ys = ref MemoryMarshal.GetReference(y);
        Vector256<double> vc = Vector256.Create(c), vm = Vector256.Create(m), negC = Vector256.Create(-c), negM = Vector256.Create(-m);
        Vector256<double> vb = Vector256.Create(b), va = Vector256.Create(alpha), scale = Vector256.Create(weightScale);
        Vector256<double> swr = Vector256<double>.Zero, swdxr = swr;
        for (; i <= n - 4; i += 4)
        {
            Vector256<double> xi = Vector256.LoadUnsafe(ref xs, (nuint)i), yi = Vector256.LoadUnsafe(ref ys, (nuint)i);
            (Vector256<double> wr, Vector256<double> wrdx) = WeightedResidual(xi, yi, weights.At(i, xi, yi) * scale, vc, vm, negC, negM, vb, va);
            swr += wr;
            swdxr += wrdx;
        }

        if (i < n)
        {
            int start = n - 4;
            Vector256<double> take = Vector256.GreaterThanOrEqual(Vector256.Create(0L, 1L, 2L, 3L), Vector256.Create((long)(i - start))).AsDouble();
            Vector256<double> xi = Vector256.LoadUnsafe(ref xs, (nuint)start), yi = Vector256.LoadUnsafe(ref ys, (nuint)start);
            (Vector256<double> wr, Vector256<double> wrdx) = WeightedResidual(xi, yi, weights.At(start, xi, yi) * scale, vc, vm, negC, negM, vb, va);
            swr = Vector256.ConditionalSelect(take, swr + wr, swr);
            swdxr = Vector256.ConditionalSelect(take, swdxr + wrdx, swdxr);
        }

        return (Sum(swr.GetLower(), swr.GetUpper()), Sum(swdxr.GetLower(), swdxr.GetUpper()));
    }

    /// <summary>w·r and w·r·dx lane by lane, the operations of <see cref="AddResidual"/> in its order.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static (Vector256<double> Wr, Vector256<double> WrDx) WeightedResidual(
        Vector256<double> x, Vector256<double> y, Vector256<double> w, Vector256<double> c, Vector256<double> m, Vector256<double> negC, Vector256<double> negM, Vector256<double> b, Vector256<double> alpha)
    {
        Vector256<double> dx = x - c, dy = y - m, bdx = b * dx;
        Vector256<double> productError = Fma.MultiplyAdd(b, dx, -bdx);
        Vector256<double> byy = dy - y, sumErrorY = (y - (dy - byy)) + (negM - byy);
        Vector256<double> bxx = dx - x, sumErrorX = (x - (dx - bxx)) + (negC - bxx);
        Vector256<double> res = ((((dy - bdx) - productError) + sumErrorY) - (b * sumErrorX)) - alpha;
        Vector256<double> wr = w * res;
        return (wr, wr * dx);
    }
#endif

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
        internal Solution(double slope, double intercept, double shiftX, double shiftY, double sxx, double inverseSw, bool valid, bool accurate)
        {
            InverseSw = inverseSw;
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

        internal double InverseSw { get; }

        internal bool Valid { get; }

        internal bool Accurate { get; }
    }

    /// <summary>One lane of the scalar path: its six sums, smallest weight and x range.</summary>
    private struct Lane
    {
        internal double Sw, Sdx, Sdy, Qxx, Qxy, Qyy, MinW, MinX, MaxX;

        internal Lane(double x0)
        {
            Sw = Sdx = Sdy = Qxx = Qxy = Qyy = 0;
            MinW = double.MaxValue;
            MinX = MaxX = x0;
        }

        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        internal void Add(double x, double y, double w, double c, double m)
        {
            double dx = x - c, dy = y - m, wdx = w * dx, wdy = w * dy;
            MinW = Lower(w, MinW);
            MinX = Lower(x, MinX);
            MaxX = Higher(x, MaxX);
            Sw += w;
            Sdx += wdx;
            Sdy += wdy;
            Qxx += wdx * dx;
            Qxy += wdx * dy;
            Qyy += wdy * dy;
        }
    }

#if NET8_0_OR_GREATER
    /// <summary>Two lanes of the 128-bit path: the operations of <see cref="Lane.Add"/> on each.</summary>
    private struct Lanes128
    {
        internal Vector128<double> Sw, Sdx, Sdy, Qxx, Qxy, Qyy, MinW, MinX, MaxX;

        internal Lanes128(Vector128<double> x0)
        {
            Sw = Sdx = Sdy = Qxx = Qxy = Qyy = Vector128<double>.Zero;
            MinW = Vector128.Create(double.MaxValue);
            MinX = MaxX = x0;
        }

        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        internal void Add(Vector128<double> x, Vector128<double> y, Vector128<double> w, Vector128<double> c, Vector128<double> m)
        {
            Vector128<double> dx = x - c, dy = y - m, wdx = w * dx, wdy = w * dy;
            MinW = Lower(w, MinW);
            MinX = Lower(x, MinX);
            MaxX = Higher(x, MaxX);
            Sw += w;
            Sdx += wdx;
            Sdy += wdy;
            Qxx += wdx * dx;
            Qxy += wdx * dy;
            Qyy += wdy * dy;
        }

        /// <summary><see cref="Add(Vector128{double}, Vector128{double}, Vector128{double}, Vector128{double}, Vector128{double})"/>
        /// on the lanes selected by <paramref name="take"/> only; the others keep their bits.</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        internal void Add(Vector128<double> x, Vector128<double> y, Vector128<double> w, Vector128<double> c, Vector128<double> m, Vector128<double> take)
        {
            Vector128<double> dx = x - c, dy = y - m, wdx = w * dx, wdy = w * dy;
            MinW = Vector128.ConditionalSelect(take, Lower(w, MinW), MinW);
            MinX = Vector128.ConditionalSelect(take, Lower(x, MinX), MinX);
            MaxX = Vector128.ConditionalSelect(take, Higher(x, MaxX), MaxX);
            Sw = Vector128.ConditionalSelect(take, Sw + w, Sw);
            Sdx = Vector128.ConditionalSelect(take, Sdx + wdx, Sdx);
            Sdy = Vector128.ConditionalSelect(take, Sdy + wdy, Sdy);
            Qxx = Vector128.ConditionalSelect(take, Qxx + (wdx * dx), Qxx);
            Qxy = Vector128.ConditionalSelect(take, Qxy + (wdx * dy), Qxy);
            Qyy = Vector128.ConditionalSelect(take, Qyy + (wdy * dy), Qyy);
        }
    }
#endif

    private readonly struct UnitWeight : IPointWeight
    {
        public double At(int index, double x, double y) => 1.0;
#if NET8_0_OR_GREATER

        public Vector256<double> At(int index, Vector256<double> x, Vector256<double> y) => Vector256<double>.One;

        public Vector128<double> At(int index, Vector128<double> x, Vector128<double> y) => Vector128<double>.One;
#endif
    }

    private readonly struct InverseXWeight : IPointWeight
    {
        public double At(int index, double x, double y) => 1.0 / x;
#if NET8_0_OR_GREATER

        public Vector256<double> At(int index, Vector256<double> x, Vector256<double> y) => Vector256<double>.One / x;

        public Vector128<double> At(int index, Vector128<double> x, Vector128<double> y) => Vector128<double>.One / x;
#endif
    }

    private readonly struct InverseXSquaredWeight : IPointWeight
    {
        public double At(int index, double x, double y) => 1.0 / (x * x);
#if NET8_0_OR_GREATER

        public Vector256<double> At(int index, Vector256<double> x, Vector256<double> y) => Vector256<double>.One / (x * x);

        public Vector128<double> At(int index, Vector128<double> x, Vector128<double> y) => Vector128<double>.One / (x * x);
#endif
    }

    private readonly struct InverseYWeight : IPointWeight
    {
        public double At(int index, double x, double y) => 1.0 / y;
#if NET8_0_OR_GREATER

        public Vector256<double> At(int index, Vector256<double> x, Vector256<double> y) => Vector256<double>.One / y;

        public Vector128<double> At(int index, Vector128<double> x, Vector128<double> y) => Vector128<double>.One / y;
#endif
    }

    private readonly struct InverseYSquaredWeight : IPointWeight
    {
        public double At(int index, double x, double y) => y > 0 ? 1.0 / (y * y) : double.NaN;
#if NET8_0_OR_GREATER

        public Vector256<double> At(int index, Vector256<double> x, Vector256<double> y) =>
            Vector256.ConditionalSelect(Vector256.GreaterThan(y, Vector256<double>.Zero), Vector256<double>.One / (y * y), Vector256.Create(double.NaN));

        public Vector128<double> At(int index, Vector128<double> x, Vector128<double> y) =>
            Vector128.ConditionalSelect(Vector128.GreaterThan(y, Vector128<double>.Zero), Vector128<double>.One / (y * y), Vector128.Create(double.NaN));
#endif
    }

    private readonly struct InverseVarianceWeight : IPointWeight
    {
        private readonly double[] _standardDeviations;

        internal InverseVarianceWeight(double[] standardDeviations) => _standardDeviations = standardDeviations;

        public double At(int index, double x, double y) => 1.0 / (_standardDeviations[index] * _standardDeviations[index]);
#if NET8_0_OR_GREATER

        public Vector256<double> At(int index, Vector256<double> x, Vector256<double> y)
        {
            Vector256<double> s = Vector256.Create(_standardDeviations.AsSpan(index, 4));
            return Vector256<double>.One / (s * s);
        }

        public Vector128<double> At(int index, Vector128<double> x, Vector128<double> y)
        {
            Vector128<double> s = Vector128.Create(_standardDeviations.AsSpan(index, 2));
            return Vector128<double>.One / (s * s);
        }
#endif
    }

    private readonly struct FixedWeight : IPointWeight
    {
        private readonly double[] _weights;

        internal FixedWeight(double[] weights) => _weights = weights;

        public double At(int index, double x, double y) => _weights[index];
#if NET8_0_OR_GREATER

        public Vector256<double> At(int index, Vector256<double> x, Vector256<double> y) => Vector256.Create(_weights.AsSpan(index, 4));

        public Vector128<double> At(int index, Vector128<double> x, Vector128<double> y) => Vector128.Create(_weights.AsSpan(index, 2));
#endif
    }
}

/// <summary>
/// Which accumulation <see cref="LineFitKernel"/> uses. Every sum is formed in four lanes, point i of the full
/// blocks of four going to lane i mod 4 and, when n is not a multiple of 4, the last r points to lanes 4 − r … 3
/// (point n − 4 + k to lane k); the lanes are combined as (l0 + l2) + (l1 + l3), smallest and largest values by
/// a &lt; b ? a : b and a &gt; b ? a : b in the same order, with no fused multiply-add in any sum (the refinement's
/// TwoProduct error term is exact on every target, by FMA or Dekker's split). So the vector paths and the scalar
/// path (the netstandard2.0 build) give the same bits.
/// </summary>
internal enum SumPath
{
    /// <summary>The widest accelerated vectors (256 or 128 bits; scalar without vector hardware or for n = 3).</summary>
    Widest,

    /// <summary>128-bit vectors where accelerated (for tests), else scalar.</summary>
    Vector128,

    /// <summary>One double at a time (for tests; what netstandard2.0 always does).</summary>
    Scalar,
}
