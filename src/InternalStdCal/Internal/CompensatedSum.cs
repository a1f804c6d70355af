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

    /// <summary>The sum rounded to a double.</summary>
    internal readonly double Value => _hi + _lo;

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
        (double ah, double al) = Split(a);
        (double bh, double bl) = Split(b);
        Add(p);
        _lo += (((ah * bh) - p) + (ah * bl) + (al * bh)) + (al * bl);
    }

    /// <summary>Adds c·x² with x² taken exactly.</summary>
    internal void AddProductOfSquare(double c, double x)
    {
        double h = x * x;
        (double xh, double xl) = Split(x);
        double l = (((xh * xh) - h) + (2 * xh * xl)) + (xl * xl);
        AddProduct(c, h);
        _lo += c * l;
    }

    private static (double High, double Low) Split(double a)
    {
        double c = Splitter * a;
        double high = c - (c - a);
        return (high, a - high);
    }
}
