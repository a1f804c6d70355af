using System;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>
/// A weighted straight line y = a + b·x fitted by <see cref="RegressionFit.FitLine"/>: the coefficients and the
/// weighted summaries that the usual statistics need (n, x̄w, ȳw, Σw(x − x̄w)² with weights normalised to Σw = n),
/// without a copy of the data. The residual standard deviation is computed on demand from the same data.
/// </summary>
/// <remarks>
/// <para>The numbers are those of <see cref="RegressionFit.Fit"/> with <see cref="CalibrationModel.Linear"/> on
/// the same data and weighting, bit for bit (one shared computation). With s from
/// <see cref="ResidualStandardDeviation"/>: SE(b) = s/√Sxx,w, SE(a) = s·√(1/n + x̄w²/Sxx,w) (Miller &amp; Miller,
/// "Statistics and Chemometrics for Analytical Chemistry", ch. 5; weighted form Harvey, "Modern Analytical
/// Chemistry", eqs 5.23–5.24). For intervals, diagnostics and inverse prediction use <see cref="RegressionFit"/>.</para>
/// <para>Immutable; the default value (Count 0) is not a fit.</para>
/// </remarks>
public readonly struct LineFit
{
    private readonly double _weightScale;
    private readonly double _weightNormaliser;

    internal LineFit(Weighting weighting, int count, double weightScale, double weightNormaliser, double meanX, double meanY, double sxx, double intercept, double slope, double minX, double maxX, bool refined)
    {
        Weighting = weighting;
        Count = count;
        _weightScale = weightScale;
        _weightNormaliser = weightNormaliser;
        WeightedMeanX = meanX;
        WeightedMeanY = meanY;
        WeightedSumOfSquaresX = sxx;
        Intercept = intercept;
        Slope = slope;
        MinX = minX;
        MaxX = maxX;
        IsRefined = refined;
    }

    /// <summary>Intercept a (y units).</summary>
    public double Intercept { get; }

    /// <summary>Slope b (y units per x unit).</summary>
    public double Slope { get; }

    /// <summary>Number of points n (≥ 3).</summary>
    public int Count { get; }

    /// <summary>Residual degrees of freedom n − 2.</summary>
    public int DegreesOfFreedom => Count - 2;

    /// <summary>Weighting used.</summary>
    public Weighting Weighting { get; }

    /// <summary>Weighted mean x̄w = Σw·x/Σw (x units).</summary>
    public double WeightedMeanX { get; }

    /// <summary>Weighted mean ȳw = Σw·y/Σw (y units).</summary>
    public double WeightedMeanY { get; }

    /// <summary>Σw(x − x̄w)² with weights normalised to Σw = n (x units²).</summary>
    public double WeightedSumOfSquaresX { get; }

    /// <summary>Lowest x of the points.</summary>
    public double MinX { get; }

    /// <summary>Highest x of the points.</summary>
    public double MaxX { get; }

    /// <summary>
    /// True when the fit needed its refinement pass (residuals split exactly with TwoSum/TwoProduct) because the
    /// rounding-error bound of the closed form exceeded 2⁻⁴⁰ relative (e.g. |b·x̄w| ≫ |a|); false when the closed
    /// form alone was accurate enough. For information; the coefficients meet the same accuracy either way.
    /// </summary>
    public bool IsRefined { get; }

    internal double WeightScale => _weightScale;

    internal double WeightNormaliser => _weightNormaliser;

    /// <summary>Fitted response a + b·x, with compensated arithmetic (y units).</summary>
    /// <param name="x">Concentration (x units); finite.</param>
    /// <returns>ŷ(x).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="x"/> is not finite, or ŷ overflows.</exception>
    public double Predict(double x)
    {
        Guard.Finite(x, nameof(x));
        double y = -Residual(Intercept, Slope, x, 0);
        return double.IsNaN(y) || double.IsInfinity(y) ? throw Guard.OutOfRange(nameof(x), x, "small enough in magnitude that the fitted response is finite") : y;
    }

    /// <summary>
    /// Residual standard deviation s = √(Σw(y − ŷ)²/(n − 2)) with weights normalised to Σw = n (y units), from the
    /// data the line was fitted to (equal to <see cref="RegressionFit.ResidualStandardDeviation"/>; not
    /// meaningful for other data). One pass, no allocation.
    /// </summary>
    /// <param name="x">The x values the line was fitted to.</param>
    /// <param name="y">The y values the line was fitted to.</param>
    /// <returns>s; 0 for a perfect fit.</returns>
    /// <exception cref="ArgumentException"><paramref name="x"/> or <paramref name="y"/> does not have
    /// <see cref="Count"/> elements.</exception>
    /// <exception cref="InvalidOperationException">This is the default value, not a fit.</exception>
    public double ResidualStandardDeviation(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        if (Count < 3)
        {
            throw new InvalidOperationException("This LineFit is the default value, not a fit; obtain one from RegressionFit.FitLine.");
        }

        Guard.SameLength(Count, x.Length, nameof(Count), nameof(x));
        Guard.SameLength(Count, y.Length, nameof(Count), nameof(y));
        ResidualSums(x, y, 1.0, out double rss, out _);
        return Math.Sqrt(rss / DegreesOfFreedom);
    }

    /// <summary>y − (a + b·x) with compensated arithmetic (≈ one rounding of the result).</summary>
    internal static double Residual(double intercept, double slope, double x, double y)
    {
        var sum = default(CompensatedSum);
        sum.Add(y);
        sum.Add(-intercept);
        sum.AddProduct(-slope, x);
        return sum.Value;
    }

    /// <summary>Normalised weight of point <paramref name="index"/> (raw weight × scale × n/Σw).</summary>
    internal double NormalisedWeight(int index, double x, double y) =>
        Weighting.PointWeightOrNaN(index, x, y) * _weightScale * _weightNormaliser;

    /// <summary>Σw(y − ŷ)² (compensated residuals) and Σw(y − ȳw)², normalised weights; the data are the fit's.</summary>
    internal void ResidualSums(ReadOnlySpan<double> x, ReadOnlySpan<double> y, double scale, out double residualSumOfSquares, out double totalSumOfSquares)
    {
        double rss = 0, total = 0;
        for (int i = 0; i < x.Length; i++)
        {
            double xi = x[i], yi = y[i], w = NormalisedWeight(i, xi, yi);
            double weighted = Math.Sqrt(w) * Residual(Intercept, Slope, xi, yi) * scale;
            rss += weighted * weighted;
            double d = (yi - WeightedMeanY) * scale;
            total += w * d * d;
        }

        residualSumOfSquares = rss;
        totalSumOfSquares = total;
    }
}
