using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>
/// Weights for a weighted least-squares calibration fit: none, an empirical scheme (1/x, 1/x², 1/y, 1/y²),
/// inverse variance (1/s²) or caller-supplied weights.
/// </summary>
/// <remarks>
/// <para>Weighted least squares minimises Σ wᵢ (yᵢ − ŷᵢ)². Only the ratios of the weights matter; the fit
/// normalises them so that Σw = n (Miller &amp; Miller / Harvey convention), which makes the weighted residual
/// standard deviation comparable with the unweighted one. Source: Harvey, "Modern Analytical Chemistry",
/// eqs 5.23–5.24; ISO 8466-1 uses the unweighted case.</para>
/// <para>1/x and 1/x² are undefined at x = 0 (a blank standard), 1/y and 1/y² at y ≤ 0: such points are
/// refused, never dropped silently. Instances are immutable; equality is exact (scheme and, for per-point
/// schemes, every value).</para>
/// </remarks>
public sealed class Weighting : IEquatable<Weighting>
{
    private readonly double[] _values;

    private Weighting(WeightingScheme scheme, double[] values)
    {
        Scheme = scheme;
        _values = values;
        PointValues = Array.AsReadOnly(values);
    }

    /// <summary>Unit weights (ordinary least squares).</summary>
    public static Weighting None { get; } = new(WeightingScheme.None, Array.Empty<double>());

    /// <summary>w = 1/x (needs every x &gt; 0).</summary>
    public static Weighting InverseX { get; } = new(WeightingScheme.InverseX, Array.Empty<double>());

    /// <summary>w = 1/x² (needs every x ≠ 0).</summary>
    public static Weighting InverseXSquared { get; } = new(WeightingScheme.InverseXSquared, Array.Empty<double>());

    /// <summary>w = 1/y (needs every y &gt; 0).</summary>
    public static Weighting InverseY { get; } = new(WeightingScheme.InverseY, Array.Empty<double>());

    /// <summary>w = 1/y² (needs every y &gt; 0).</summary>
    public static Weighting InverseYSquared { get; } = new(WeightingScheme.InverseYSquared, Array.Empty<double>());

    /// <summary>The scheme.</summary>
    public WeightingScheme Scheme { get; }

    /// <summary>
    /// True for <see cref="WeightingScheme.InverseVariance"/> and <see cref="WeightingScheme.Custom"/>: the
    /// weights are fixed per standard, so the weight of an unknown cannot be derived from the scheme and must be
    /// supplied by the caller where an interval for an unknown is computed.
    /// </summary>
    public bool IsPerPoint => Scheme is WeightingScheme.InverseVariance or WeightingScheme.Custom;

    /// <summary>
    /// Per-point values as given: the standard deviations for <see cref="WeightingScheme.InverseVariance"/>, the
    /// weights for <see cref="WeightingScheme.Custom"/>; empty for the other schemes.
    /// </summary>
    public IReadOnlyList<double> PointValues { get; }

    /// <summary>Short name of the scheme: "none", "1/x", "1/x²", "1/y", "1/y²", "1/s²" or "custom".</summary>
    public string Name => Scheme switch
    {
        WeightingScheme.None => "none",
        WeightingScheme.InverseX => "1/x",
        WeightingScheme.InverseXSquared => "1/x²",
        WeightingScheme.InverseY => "1/y",
        WeightingScheme.InverseYSquared => "1/y²",
        WeightingScheme.InverseVariance => "1/s²",
        _ => "custom",
    };

    /// <summary>Inverse-variance weights w = 1/s², one standard deviation per calibration point.</summary>
    /// <param name="standardDeviations">Standard deviation of the response at each standard, in response units;
    /// each finite and &gt; 0. The list is copied.</param>
    /// <returns>The weighting.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="standardDeviations"/> is null.</exception>
    /// <exception cref="ArgumentException">The list is empty, or an element is not finite or not &gt; 0
    /// (the message names the index and value).</exception>
    public static Weighting InverseVariance(IReadOnlyList<double> standardDeviations) =>
        new(WeightingScheme.InverseVariance, CopyPositive(standardDeviations, nameof(standardDeviations)));

    /// <summary>Caller-supplied weights, one per calibration point (only their ratios matter).</summary>
    /// <param name="weights">Weights; each finite and &gt; 0. The list is copied.</param>
    /// <returns>The weighting.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="weights"/> is null.</exception>
    /// <exception cref="ArgumentException">The list is empty, or an element is not finite or not &gt; 0
    /// (the message names the index and value).</exception>
    public static Weighting Custom(IReadOnlyList<double> weights) =>
        new(WeightingScheme.Custom, CopyPositive(weights, nameof(weights)));

    /// <summary>Raw (not normalised) weights of the calibration points.</summary>
    /// <param name="x">Concentrations of the standards; finite.</param>
    /// <param name="y">Responses of the standards; finite, same length as <paramref name="x"/>.</param>
    /// <returns>A new array of weights, each finite and &gt; 0.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="x"/> or <paramref name="y"/> is null.</exception>
    /// <exception cref="ArgumentException">Lengths differ; a per-point weighting has a different number of
    /// values than points; or the scheme is undefined at a point (1/x with x ≤ 0, 1/x² with x = 0, 1/y or 1/y²
    /// with y ≤ 0) — the message names the point index, the value and the reason.</exception>
    public double[] ComputeWeights(IReadOnlyList<double> x, IReadOnlyList<double> y)
    {
        Guard.NotNull(x, nameof(x));
        Guard.NotNull(y, nameof(y));
        Guard.SameLength(x.Count, y.Count, nameof(x), nameof(y));
        if (IsPerPoint && _values.Length != x.Count)
        {
            throw new ArgumentException(
                FormattableString.Invariant(
                    $"Weighting '{Name}' holds {_values.Length} values but '{nameof(x)}' has {x.Count} points; there must be one value per point."),
                nameof(x));
        }

        var w = new double[x.Count];
        for (int i = 0; i < w.Length; i++)
        {
            w[i] = PointWeight(i, x[i], y[i]);
        }

        return w;
    }

    /// <inheritdoc/>
    public bool Equals(Weighting? other)
    {
        if (other is null || other.Scheme != Scheme || other._values.Length != _values.Length)
        {
            return false;
        }

        for (int i = 0; i < _values.Length; i++)
        {
            if (!_values[i].Equals(other._values[i]))
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as Weighting);

    /// <inheritdoc/>
    public override int GetHashCode() => (Scheme, _values.Length).GetHashCode();

    /// <summary>The <see cref="Name"/>, with the number of values for per-point schemes, e.g. "1/s² (6 values)".</summary>
    /// <returns>Text for display.</returns>
    public override string ToString() =>
        IsPerPoint ? string.Format(CultureInfo.InvariantCulture, "{0} ({1} values)", Name, _values.Length) : Name;

    /// <summary>The per-point values as stored (not copied): standard deviations (1/s²) or weights (custom).</summary>
    internal double[] Values => _values;

    /// <summary>Raw weight of standard <paramref name="index"/> (any scheme), or NaN where the scheme is undefined
    /// (the caller checks finite and &gt; 0; <see cref="PointWeight"/> gives the message).</summary>
    internal double PointWeightOrNaN(int index, double x, double y) => Scheme switch
    {
        WeightingScheme.None => 1.0,
        WeightingScheme.InverseX => x > 0 ? 1.0 / x : double.NaN,
        WeightingScheme.InverseXSquared => x != 0 ? 1.0 / (x * x) : double.NaN,
        WeightingScheme.InverseY => y > 0 ? 1.0 / y : double.NaN,
        WeightingScheme.InverseYSquared => y > 0 ? 1.0 / (y * y) : double.NaN,
        WeightingScheme.InverseVariance => 1.0 / (_values[index] * _values[index]),
        _ => _values[index],
    };

    /// <summary>Raw weight of standard <paramref name="index"/> (any scheme), checked finite and &gt; 0.</summary>
    /// <exception cref="ArgumentException">The weight is undefined, not finite or not &gt; 0 (names parameter x).</exception>
    internal double PointWeight(int index, double x, double y)
    {
        double w = Scheme switch
        {
            WeightingScheme.None => 1.0,
            WeightingScheme.InverseVariance => 1.0 / (_values[index] * _values[index]),
            WeightingScheme.Custom => _values[index],
            _ => RawWeight(x, y, index),
        };
        if (!(w > 0) || double.IsInfinity(w))
        {
            throw new ArgumentException(
                FormattableString.Invariant(
                    $"Weighting '{Name}' gives weight {Guard.Format(w)} at point {index}; weights must be finite and > 0 (the per-point value is too small or too large)."),
                nameof(x));
        }

        return w;
    }

    /// <summary>
    /// Raw weight of one point for the x/y-based schemes (None, 1/x, 1/x², 1/y, 1/y²).
    /// <paramref name="index"/> &lt; 0 means "the unknown", for messages.
    /// </summary>
    internal double RawWeight(double x, double y, int index)
    {
        switch (Scheme)
        {
            case WeightingScheme.None:
                return 1.0;
            case WeightingScheme.InverseX:
                if (!(x > 0))
                {
                    throw Undefined(index, "x", x, "1/x needs x > 0", nameof(x));
                }

                return 1.0 / x;
            case WeightingScheme.InverseXSquared:
                if (x == 0)
                {
                    throw Undefined(index, "x", x, "1/x² needs x ≠ 0", nameof(x));
                }

                return 1.0 / (x * x);
            case WeightingScheme.InverseY:
                if (!(y > 0))
                {
                    throw Undefined(index, "y", y, "1/y needs y > 0", nameof(y));
                }

                return 1.0 / y;
            case WeightingScheme.InverseYSquared:
                if (!(y > 0))
                {
                    throw Undefined(index, "y", y, "1/y² needs y > 0", nameof(y));
                }

                return 1.0 / (y * y);
            default:
                throw new InvalidOperationException($"Weighting '{Name}' has fixed per-point weights; the weight of another point cannot be derived from it.");
        }
    }

    private ArgumentException Undefined(int index, string variable, double value, string why, string paramName) =>
        new(
            FormattableString.Invariant(
                $"Weighting '{Name}' is undefined at {(index >= 0 ? FormattableString.Invariant($"point {index}") : "the unknown")}: {variable} = {Guard.Format(value)} ({why}). Exclude or offset that point, or choose another weighting."),
            paramName);

    private static double[] CopyPositive(IReadOnlyList<double> values, string paramName)
    {
        Guard.NotEmpty(values, paramName);
        var copy = new double[values.Count];
        for (int i = 0; i < copy.Length; i++)
        {
            double v = values[i];
            if (!(v > 0) || double.IsInfinity(v))
            {
                throw new ArgumentException(
                    FormattableString.Invariant(
                        $"Parameter '{paramName}' has {Guard.Format(v)} at index {i}; every element must be a finite number > 0."),
                    paramName);
            }

            copy[i] = v;
        }

        return copy;
    }
}
