using System;

namespace InternalStdCal.Internal;

/// <summary>
/// Sum of doubles and exact products kept as an unevaluated pair (hi + lo), using the error-free
/// transformations TwoSum (Knuth) and TwoProduct (Dekker/Veltkamp split; no fused multiply-add needed).
/// Accurate to about one rounding of the final result for sums with heavy cancellation (Ogita, Rump &amp;
/// Oishi, "Accurate sum and dot product", SIAM J. Sci. Comput. 26 (2005)). Valid for |values| below ~1e300.
/// </summary>
internal struct CompensatedSum
{
    private const double Splitter = 134217729.0; // 2^27 + 1
    private double _hi;
    private double _lo;

    /// <summary>The sum rounded to a double; ±∞ once a partial sum overflowed (the error term is then NaN).</summary>
    internal readonly double Value => double.IsInfinity(_hi) ? _hi : _hi + _lo;

    internal void Add(double value)
    {
        double s = _hi + value;
        double bb = s - _hi;
        _lo += (_hi - (s - bb)) + (value - bb);
        _hi = s;
    }

    /// <summary>Adds the exact product a·b.</summary>
    internal void AddProduct(double a, double b)
    {
        double p = a * b;
        Add(p);
        _lo += ProductError(a, b, p);
    }

    /// <summary>Adds c·x² with x² taken exactly.</summary>
    internal void AddProductOfSquare(double c, double x)
    {
        double h = x * x;
        double l = ProductError(x, x, h);
        AddProduct(c, h);
        _lo += c * l;
    }

    /// <summary>The exact rounding error a·b − p of p = fl(a·b) (TwoProduct: fused multiply-add where the
    /// target has it, else Dekker's split; both exact barring overflow or underflow).</summary>
    internal static double ProductError(double a, double b, double p)
    {
#if NET
        return Math.FusedMultiplyAdd(a, b, -p);
#else
        (double ah, double al) = Split(a);
        (double bh, double bl) = Split(b);
        return (((ah * bh) - p) + (ah * bl) + (al * bh)) + (al * bl);
#endif
    }

    /// <summary>The exact rounding error (a + b) − s of s = fl(a + b) (Knuth's TwoSum).</summary>
    internal static double SumError(double a, double b, double s)
    {
        double bb = s - a;
        return (a - (s - bb)) + (b - bb);
    }

#if !NET
    // Above 2^996 the product Splitter·a would overflow: split a·2^-28 and scale back (exact, powers of two).
    private const double SplitLimit = 6.69692879491417e299; // 2^996
    private const double Down = 3.7252902984619140625e-9; // 2^-28
    private const double Up = 268435456.0; // 2^28

    private static (double High, double Low) Split(double a)
    {
        if (Math.Abs(a) > SplitLimit)
        {
            double scaled = a * Down;
            double cs = Splitter * scaled;
            double hs = cs - (cs - scaled);
            return (hs * Up, (scaled - hs) * Up);
        }

        double c = Splitter * a;
        double high = c - (c - a);
        return (high, a - high);
    }
#endif
}
