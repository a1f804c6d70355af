namespace InternalStdCal.Internal;

/// <summary>Scaling by exact powers of ten with a single rounding.</summary>
internal static class PowerOfTen
{
    // 10^0 … 10^22 are exactly representable in binary64.
    private static readonly double[] Exact =
    {
        1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22,
    };

    /// <summary>value · 10^exponent, multiplying or dividing by an exact power so only one rounding occurs.</summary>
    internal static double Scale(double value, int exponent) =>
        exponent >= 0 ? value * Exact[exponent] : value / Exact[-exponent];

    /// <summary>Like <see cref="Scale"/>, but a result that overflows to ±∞ throws instead of being returned.</summary>
    /// <exception cref="System.ArgumentOutOfRangeException">value · 10^exponent is outside the range of a double.</exception>
    internal static double ScaleChecked(double value, int exponent, string fromSymbol, string toSymbol, string paramName)
    {
        double result = Scale(value, exponent);
        if (double.IsInfinity(result))
        {
            throw new System.ArgumentOutOfRangeException(
                paramName,
                value,
                $"Parameter '{paramName}' was {Guard.Format(value)} {fromSymbol}; expressed in {toSymbol} it overflows the range of a double (it must be at most {Guard.Format(Scale(double.MaxValue, -exponent))} {fromSymbol} in magnitude).");
        }

        return result;
    }
}
