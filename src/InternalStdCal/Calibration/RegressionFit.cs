using System;
using System.Collections.Generic;
using System.Threading;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>
/// A calibration function fitted by (weighted) least squares: straight line, line through the origin or
/// second-order polynomial, with coefficient uncertainties, residual diagnostics, confidence and prediction
/// bands and inverse prediction (x of an unknown from its response).
/// </summary>
/// <remarks>
/// <para><b>Numerics.</b> Straight lines: the computation of <see cref="FitLine"/> (one checking pass of weighted
/// sums about the first point, weights computed per point; a pass about the means and one refinement pass on
/// residuals split exactly with TwoSum/TwoProduct only when a rounding-error bound asks for them, see
/// <see cref="LineFit.IsRefined"/>); the fit keeps only copies of x and y.
/// Quadratic: the centred basis 1, u, u² − 1 with u = (x − x̄w)/s_x, rows multiplied by √w
/// and solved by Householder QR, coefficients and covariance transformed back to the a, b, c basis, followed
/// by one step of iterative refinement on residuals computed with compensated arithmetic (the lines fall back
/// to this path if a sum overflows or underflows). Residual statistics and the list properties are computed on
/// first use. This reproduces every certified value of the NIST StRD sets Norris, Pontius, NoInt1 and NoInt2
/// (coefficients, their standard deviations, residual SD, R²) to at least 12 significant digits (13–15 measured).</para>
/// <para><b>Formulas.</b> Ordinary and weighted least squares as in ISO 8466-1/-2 and Miller &amp; Miller,
/// "Statistics and Chemometrics for Analytical Chemistry", ch. 5 (weighted form: Harvey, "Modern Analytical
/// Chemistry", eqs 5.23–5.24). Weights are normalised to Σw = n; every statistic is invariant to rescaling all
/// weights.</para>
/// <para><b>Minimum data.</b> Linear: 3 points and 2 distinct x; through the origin: 2 points and 2 distinct x;
/// quadratic: 4 points and 3 distinct x — so the residual standard deviation always has ≥ 1 degree of
/// freedom.</para>
/// <para>Immutable and thread-safe. No member returns NaN or infinity: degenerate cases are documented per
/// member.</para>
/// </remarks>
public sealed class RegressionFit
{
    // x and y of the standards (copies; below the large-object threshold up to ~10⁴ points). Weights are
    // computed per point when needed (W), never stored.
    private readonly double[] _x;
    private readonly double[] _y;

    // Assigned during construction only (the constructor's helper methods set them): coefficients in the
    // order of Coefficients; θ and the upper-triangular R⁻¹ of the √w-scaled design in the basis z(x) (see
    // Basis), with (a, b, c) = M·θ and Cov(a, b, c) = s²·G·Gᵀ, G = M·R⁻¹.
    private double _beta0, _beta1, _beta2;
    private double _theta0, _theta1, _theta2;
    private double _r00, _r01, _r02, _r11, _r12, _r22;
    private double _center;
    private double _scale;
    private double _meanX, _meanY;

    // Σw(x − c)² with normalised weights about the basis centre c (x̄w; 0 through the origin).
    private double _sxx;

    // Raw weight w_raw is normalised as w_raw · _weightScale · _weightNormaliser (_weightScale a power of 2).
    private readonly double _weightScale;
    private readonly double _weightNormaliser;

    // Whether the straight line needed a refinement pass (always true for the QR path, which refines).
    private readonly bool _refined = true;

    // Residual statistics and list views, computed on first use (benign race: every thread computes the same
    // values; the flag or reference is published last).
    private int _statisticsReady;
    private double _residualSumOfSquares, _residualStandardDeviation, _rSquared, _correlation;
    private Views? _views;

    // t((1 + 0.95)/2, n − p), computed on first use; 0 until then.
    private double _t95;

    private RegressionFit(CalibrationModel model, Weighting weighting, double[] x, double[] y, double minX, double maxX)
    {
        Model = model;
        Weighting = weighting;
        _x = x;
        _y = y;
        Count = x.Length;
        MinX = minX;
        MaxX = maxX;
        ParameterCount = model == CalibrationModel.Quadratic ? 3 : model == CalibrationModel.Linear ? 2 : 1;
        DegreesOfFreedom = Count - ParameterCount;
    }

    /// <summary>A straight line from the shared kernel (<see cref="LineFitKernel"/>); x and y are the fitted copies.</summary>
    private RegressionFit(double[] x, double[] y, in LineFit line)
        : this(CalibrationModel.Linear, line.Weighting, x, y, line.MinX, line.MaxX)
    {
        _weightScale = line.WeightScale;
        _weightNormaliser = line.WeightNormaliser;
        _refined = line.IsRefined;
        _beta0 = line.Intercept;
        _beta1 = line.Slope;
        _meanX = line.WeightedMeanX;
        _meanY = line.WeightedMeanY;

        // Basis (1, u), u = (x − x̄w)/s with s² = Sxx,w/Σw, Σw = n: the design is orthogonal and R = √n·I.
        _sxx = line.WeightedSumOfSquaresX;
        _center = _meanX;
        _scale = Math.Sqrt(_sxx / Count);
        var theta0 = default(CompensatedSum);
        theta0.Add(_beta0);
        theta0.AddProduct(_beta1, _center);
        _theta0 = theta0.Value;
        _theta1 = _beta1 * _scale;
        _r00 = _r11 = 1 / Math.Sqrt(Count);
    }

    /// <summary>Line through the origin, quadratic, or a straight line the kernel could not fit (QR); data checked,
    /// raw weights scaled by <paramref name="weightScale"/> (a power of 2).</summary>
    private RegressionFit(CalibrationModel model, Weighting weighting, double[] x, double[] y, double minX, double maxX, double weightScale)
        : this(model, weighting, x, y, minX, maxX)
    {
        int n = Count;
        double sw = 0, swx = 0, swy = 0;
        for (int i = 0; i < n; i++)
        {
            double w = weighting.PointWeightOrNaN(i, x[i], y[i]) * weightScale;
            sw += w;
            swx += w * x[i];
            swy += w * y[i];
        }

        // Normalised weights, Σw = n (see W).
        _weightScale = weightScale;
        _weightNormaliser = weighting.Scheme == WeightingScheme.None ? 1.0 : n / sw;
        if (model == CalibrationModel.LinearThroughOrigin)
        {
            FitThroughOrigin(swx / sw, swy / sw);
        }
        else
        {
            FitQr();
        }
    }

    /// <summary>Line through the origin, b = Σw·x·y/Σw·x²; falls back to Householder QR if a sum overflows or underflows.</summary>
    private void FitThroughOrigin(double c, double m)
    {
        double[] xs = _x, ys = _y;
        int n = Count;
        double sw = 0, sdx = 0, sdy = 0, sxx = 0, sxy = 0;
        for (int i = 0; i < n; i++)
        {
            double w = W(i);
            double x = xs[i], y = ys[i], wx = w * x;
            sw += w;
            sdx += w * (x - c);
            sdy += w * (y - m);
            sxx += wx * x;
            sxy += wx * y;
        }

        double scale = Math.Sqrt(sxx / sw);
        double b = sxy / sxx;
        if (!(scale > 0) || double.IsInfinity(sxx) || double.IsNaN(b) || double.IsInfinity(b))
        {
            FitQr();
            return;
        }

        // Basis x/s with s² = Σw·x²/Σw: R = √Σw.
        _meanX = c + (sdx / sw);
        _meanY = m + (sdy / sw);
        _scale = scale;
        _sxx = sxx;
        _beta0 = b;
        _theta0 = b * scale;
        _r00 = 1 / Math.Sqrt(sw);
    }

    /// <summary>Normalised weight of standard <paramref name="i"/> (Σw = n; 1 when unweighted).</summary>
    private double W(int i) => Weighting.PointWeightOrNaN(i, _x[i], _y[i]) * _weightScale * _weightNormaliser;

    /// <summary>
    /// General fit for every model: the √w-scaled design in the basis z(x) solved by Householder QR, transformed
    /// back to (a, b, c), then one step of iterative refinement. Expects normalised weights.
    /// </summary>
    private void FitQr()
    {
        int n = Count, p = ParameterCount;
        double[] x = _x, y = _y;
        var weights = new double[n];
        for (int i = 0; i < n; i++)
        {
            weights[i] = W(i);
        }

        _meanX = WeightedMean(x, weights);
        _meanY = WeightedMean(y, weights);
        _center = Model == CalibrationModel.LinearThroughOrigin ? 0.0 : _meanX;
        _scale = WeightedRms(x, weights, _center);
        _sxx = n * _scale * _scale;

        var columns = new double[p][];
        for (int j = 0; j < p; j++)
        {
            columns[j] = new double[n];
        }

        var rhs = new double[n];
        var z = new double[p];
        for (int i = 0; i < n; i++)
        {
            double sw = Math.Sqrt(weights[i]);
            Basis(x[i], z);
            for (int j = 0; j < p; j++)
            {
                columns[j][i] = sw * z[j];
            }

            rhs[i] = sw * y[i];
        }

        HouseholderQr qr = HouseholderQr.Solve(columns, rhs)
            ?? throw new ArgumentException(
                FormattableString.Invariant($"The x values do not determine the {Model} model: the design is numerically rank deficient (x values too close together relative to their magnitude)."),
                nameof(x));
        double[,] rInverse = qr.InverseR();
        _r00 = rInverse[0, 0];
        if (p > 1)
        {
            _r01 = rInverse[0, 1];
            _r11 = rInverse[1, 1];
        }

        if (p > 2)
        {
            _r02 = rInverse[0, 2];
            _r12 = rInverse[1, 2];
            _r22 = rInverse[2, 2];
        }

        // Back to the a, b, c basis: β = M·θ.
        double[] theta = qr.Coefficients;
        var beta = new double[p];
        for (int i = 0; i < p; i++)
        {
            for (int k = 0; k < p; k++)
            {
                beta[i] += M(i, k) * theta[k];
            }
        }

        Refine(theta, beta, weights);
        SetTheta(theta);
        SetBeta(beta);
    }

    /// <summary>Model fitted.</summary>
    public CalibrationModel Model { get; }

    /// <summary>Weighting used.</summary>
    public Weighting Weighting { get; }

    /// <summary>Number of calibration points n.</summary>
    public int Count { get; }

    /// <summary>Number of fitted parameters p: 2 (linear), 1 (through origin), 3 (quadratic).</summary>
    public int ParameterCount { get; }

    /// <summary>Residual degrees of freedom n − p (≥ 1).</summary>
    public int DegreesOfFreedom { get; }

    /// <summary>x of the standards as given (x units).</summary>
    public IReadOnlyList<double> X => GetViews().X;

    /// <summary>y of the standards as given (y units).</summary>
    public IReadOnlyList<double> Y => GetViews().Y;

    /// <summary>Weights normalised so that Σw = n (exactly 1 each for an unweighted fit).</summary>
    public IReadOnlyList<double> Weights => GetViews().Weights;

    /// <summary>Intercept a (y units); 0 for <see cref="CalibrationModel.LinearThroughOrigin"/>.</summary>
    public double Intercept => Model == CalibrationModel.LinearThroughOrigin ? 0.0 : _beta0;

    /// <summary>Slope b (y units per x unit): the linear coefficient (for the quadratic, the slope at x = 0).</summary>
    public double Slope => Model == CalibrationModel.LinearThroughOrigin ? _beta0 : _beta1;

    /// <summary>Curvature c of y = a + b·x + c·x² (y units per x unit²); 0 unless quadratic.</summary>
    public double Curvature => Model == CalibrationModel.Quadratic ? _beta2 : 0.0;

    /// <summary>Fitted coefficients: Linear [a, b]; LinearThroughOrigin [b]; Quadratic [a, b, c].</summary>
    public IReadOnlyList<double> Coefficients => GetViews().Coefficients;

    /// <summary>Standard errors of <see cref="Coefficients"/>, same order: s·√((XᵀWX)⁻¹)ᵢᵢ.</summary>
    public IReadOnlyList<double> StandardErrors => GetViews().StandardErrors;

    /// <summary>
    /// Residual standard deviation s = s_y/x = √(Σw(y − ŷ)²/(n − p)) with normalised weights (y units).
    /// 0 for a perfect fit.
    /// </summary>
    public double ResidualStandardDeviation => Statistics()._residualStandardDeviation;

    /// <summary>Residual sum of squares Σw(y − ŷ)² with normalised weights (y units²); +∞ only when the sum exceeds
    /// the double range (residuals beyond ~1e154), while <see cref="ResidualStandardDeviation"/> and
    /// <see cref="RSquared"/> stay finite.</summary>
    public double ResidualSumOfSquares => Statistics()._residualSumOfSquares;

    /// <summary>
    /// Correlation coefficient r = sign(b)·√R² for the straight lines (the weighted Pearson r for a weighted
    /// line; for the line through the origin the square root of the uncentred R²); √R² (≥ 0) for the quadratic.
    /// </summary>
    public double CorrelationCoefficient => Statistics()._correlation;

    /// <summary>
    /// Coefficient of determination. Models with intercept: centred, 1 − RSS/Σw(y − ȳw)². Through the origin:
    /// uncentred, 1 − RSS/Σw·y² (NIST StRD NoInt convention). 0 when the responses have no variation
    /// (denominator 0).
    /// </summary>
    public double RSquared => Statistics()._rSquared;

    /// <summary>Fitted responses ŷᵢ at the standards (y units).</summary>
    public IReadOnlyList<double> FittedValues => GetViews().FittedValues;

    /// <summary>Residuals yᵢ − ŷᵢ, unweighted (y units).</summary>
    public IReadOnlyList<double> Residuals => GetViews().Residuals;

    /// <summary>Weighted residuals √wᵢ·(yᵢ − ŷᵢ) (normalised weights).</summary>
    public IReadOnlyList<double> WeightedResiduals => GetViews().WeightedResiduals;

    /// <summary>
    /// Internally studentised residuals √wᵢ(yᵢ − ŷᵢ)/(s·√(1 − hᵢᵢ)) (dimensionless). Reported as 0 where the
    /// denominator vanishes (perfect fit, or a point of leverage 1 whose residual is necessarily 0).
    /// </summary>
    public IReadOnlyList<double> StandardizedResiduals => GetViews().StandardizedResiduals;

    /// <summary>Leverages hᵢᵢ, diagonal of the hat matrix W^½X(XᵀWX)⁻¹XᵀW^½; each in [0, 1], summing to p.</summary>
    public IReadOnlyList<double> Leverages => GetViews().Leverages;

    /// <summary>Lowest x of the standards.</summary>
    public double MinX { get; }

    /// <summary>Highest x of the standards.</summary>
    public double MaxX { get; }

    /// <summary>Weighted mean x̄w = Σw·x/Σw (the plain mean when unweighted).</summary>
    public double WeightedMeanX => _meanX;

    /// <summary>Weighted mean ȳw = Σw·y/Σw (the plain mean when unweighted).</summary>
    public double WeightedMeanY => _meanY;

    /// <summary>Weighted sum of squares of x about x̄w, Σw(x − x̄w)² with normalised weights (Sxx when unweighted).</summary>
    public double WeightedSumOfSquaresX => Model == CalibrationModel.LinearThroughOrigin
        ? SumOfSquaresAbout(WeightedMeanX)
        : _sxx;

    /// <summary>Fits a calibration function by (weighted) least squares.</summary>
    /// <param name="x">Concentrations (or concentration ratios) of the standards; finite.</param>
    /// <param name="y">Responses (or response ratios) of the standards; finite, same length as x.</param>
    /// <param name="model">Functional form.</param>
    /// <param name="weighting">Weighting; null means <see cref="Weighting.None"/>.</param>
    /// <returns>The fit.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="x"/> or <paramref name="y"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="model"/> is not a defined value.</exception>
    /// <exception cref="ArgumentException">Lengths differ; a value is NaN or infinite (the message names the
    /// index); too few points or distinct x for the model; a per-point weighting has the wrong count; the
    /// weighting is undefined at a point (e.g. 1/x at x = 0); or the x values are numerically degenerate.</exception>
    public static RegressionFit Fit(IReadOnlyList<double> x, IReadOnlyList<double> y, CalibrationModel model, Weighting? weighting = null)
    {
        weighting ??= Weighting.None;
        if (model == CalibrationModel.Linear && x is double[] xa && y is double[] ya && xa.Length == ya.Length && xa.Length >= 3
            && (!weighting.IsPerPoint || weighting.PointValues.Count == xa.Length))
        {
            // Copies (the fit keeps them) and one checked pass of the shared kernel; anything unusual goes on below.
            var xc = (double[])xa.Clone();
            var yc = (double[])ya.Clone();
            LineFit fast = LineFitKernel.Fit(xc, yc, weighting, 1.0);
            if (fast.Count != 0)
            {
                return new RegressionFit(xc, yc, fast);
            }
        }

        Guard.NotNull(x, nameof(x));
        int n = x.Count;
        var xs = new double[n];
        var ys = new double[n];
        CopyFinite(x, xs, nameof(x));
        Guard.NotNull(y, nameof(y));
        if (y.Count == n)
        {
            CopyFinite(y, ys, nameof(y));
        }
        else
        {
            CopyFinite(y, new double[y.Count], nameof(y));
            Guard.SameLength(n, y.Count, nameof(x), nameof(y));
        }

        int minPoints, minDistinct;
        switch (model)
        {
            case CalibrationModel.Linear:
                (minPoints, minDistinct) = (3, 2);
                break;
            case CalibrationModel.LinearThroughOrigin:
                (minPoints, minDistinct) = (2, 2);
                break;
            case CalibrationModel.Quadratic:
                (minPoints, minDistinct) = (4, 3);
                break;
            default:
                throw new ArgumentOutOfRangeException(nameof(model), model, $"Parameter '{nameof(model)}' was {model}; it must be a defined {nameof(CalibrationModel)} value.");
        }

        if (n < minPoints)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(x)}' has {n} points; the {model} model needs at least {minPoints} so that the residual standard deviation has at least 1 degree of freedom."),
                nameof(x));
        }

        int distinct = CountDistinct(xs, minDistinct);
        if (distinct < minDistinct)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(x)}' has {distinct} distinct value(s); the {model} model needs at least {minDistinct}."),
                nameof(x));
        }

        if (weighting.IsPerPoint && weighting.PointValues.Count != n)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(weighting)}' ({weighting.Name}) holds {weighting.PointValues.Count} values but there are {n} points; it must hold one per point."),
                nameof(weighting));
        }

        // Raw weights (checked), their maximum and the x range in one pass.
        double maxRawWeight = 0, minX = double.PositiveInfinity, maxX = double.NegativeInfinity;
        for (int i = 0; i < n; i++)
        {
            double xi = xs[i];
            maxRawWeight = Math.Max(maxRawWeight, weighting.PointWeight(i, xi, ys[i]));
            minX = Math.Min(minX, xi);
            maxX = Math.Max(maxX, xi);
        }

        // Weights scaled exactly by the power of 2 that brings the largest into [1, 2): the sums cannot overflow.
        double scale = weighting.Scheme == WeightingScheme.None ? 1.0 : PowerOfTwoScale(maxRawWeight);
        if (model == CalibrationModel.Linear)
        {
            LineFit line = LineFitKernel.Fit(xs, ys, weighting, scale);
            if (line.Count != 0)
            {
                return new RegressionFit(xs, ys, line);
            }
        }

        return new RegressionFit(model, weighting, xs, ys, minX, maxX, scale);
    }

    /// <summary>
    /// Fits the straight line y = a + b·x by weighted least squares without copying the data or allocating:
    /// the same numbers as <see cref="Fit"/> with <see cref="CalibrationModel.Linear"/>, bit for bit (both use
    /// one computation), returned as a <see cref="LineFit"/> value.
    /// </summary>
    /// <remarks>
    /// <para>One pass checks every value and forms weighted sums about the first point (weights computed per
    /// point); a second pass about the means, and a refinement pass on residuals split exactly
    /// (TwoSum/TwoProduct), run only when a first-order rounding-error bound of the coefficients exceeds 2⁻⁴⁰
    /// relative (at least 12 correct significant digits, the NIST StRD accuracy this library is tested to; see
    /// <see cref="LineFit.IsRefined"/>). Formulas: Miller &amp; Miller, "Statistics and Chemometrics for Analytical
    /// Chemistry", ch. 5; weighted form Harvey, "Modern Analytical Chemistry", eqs 5.23–5.24.</para>
    /// <para>Allocates nothing for valid data whose weighted sums stay within 1e-100…1e100 (Σw) and finite; other
    /// data (and invalid data, to report it) go through <see cref="Fit"/> on copies, with exactly scaled weights or
    /// Householder QR.</para>
    /// </remarks>
    /// <param name="x">Concentrations (or concentration ratios) of the standards; finite, at least 2 distinct.</param>
    /// <param name="y">Responses (or response ratios); finite, same length as x (at least 3 points).</param>
    /// <param name="weighting">Weighting; null means <see cref="Weighting.None"/>. Per-point weightings must hold
    /// one value per point.</param>
    /// <returns>The fitted line.</returns>
    /// <exception cref="ArgumentException">Lengths differ; a value is NaN or infinite (the message names the
    /// parameter, index and value); fewer than 3 points or 2 distinct x; a per-point weighting has the wrong count;
    /// the weighting is undefined at a point (e.g. 1/x at x ≤ 0); or the x values are numerically degenerate.</exception>
    public static LineFit FitLine(ReadOnlySpan<double> x, ReadOnlySpan<double> y, Weighting? weighting = null)
    {
        weighting ??= Weighting.None;
        if (x.Length == y.Length && x.Length >= 3 && (!weighting.IsPerPoint || weighting.Values.Length == x.Length))
        {
            LineFit line = LineFitKernel.Fit(x, y, weighting, 1.0);
            if (line.Count != 0)
            {
                return line;
            }
        }

        return Fit(x.ToArray(), y.ToArray(), CalibrationModel.Linear, weighting).ToLineFit();
    }

    /// <summary>This straight-line fit as a <see cref="LineFit"/> (the same numbers).</summary>
    internal LineFit ToLineFit() =>
        new(Weighting, Count, _weightScale, _weightNormaliser, _meanX, _meanY, _sxx, _beta0, _beta1, MinX, MaxX, _refined);

    /// <summary>Covariance of two coefficients, s²·(XᵀWX)⁻¹ in the order of <see cref="Coefficients"/>.</summary>
    /// <param name="i">Index of the first coefficient, 0 ≤ i &lt; <see cref="ParameterCount"/>.</param>
    /// <param name="j">Index of the second coefficient, 0 ≤ j &lt; <see cref="ParameterCount"/>.</param>
    /// <returns>The covariance (product of the coefficients' units).</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is outside [0, ParameterCount).</exception>
    public double Covariance(int i, int j)
    {
        CheckIndex(i, nameof(i));
        CheckIndex(j, nameof(j));
        double sum = 0;
        for (int k = 0; k < ParameterCount; k++)
        {
            sum += G(i, k) * G(j, k);
        }

        return ResidualStandardDeviation * ResidualStandardDeviation * sum;
    }

    /// <summary>Fitted response ŷ at <paramref name="x"/> (y units).</summary>
    /// <param name="x">Concentration (x units); finite.</param>
    /// <returns>ŷ = a + b·x + c·x².</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="x"/> is not finite, or ŷ overflows.</exception>
    public double Predict(double x)
    {
        Guard.Finite(x, nameof(x));
        double y = -CompensatedResidual(x, 0);
        return double.IsNaN(y) || double.IsInfinity(y) ? throw Guard.OutOfRange(nameof(x), x, "small enough in magnitude that the fitted response is finite") : y;
    }

    /// <summary>Sensitivity dy/dx = b + 2c·x at <paramref name="x"/> (y units per x unit; ISO 8466-2's E(x)).</summary>
    /// <param name="x">Concentration (x units); finite.</param>
    /// <returns>The slope of the calibration function at x.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="x"/> is not finite.</exception>
    public double Sensitivity(double x)
    {
        Guard.Finite(x, nameof(x));
        return Slope + (2 * Curvature * x);
    }

    /// <summary>Standard error of the fitted mean response at <paramref name="x"/>, s·√(z(x)ᵀ(XᵀWX)⁻¹z(x)) (y units).</summary>
    /// <param name="x">Concentration (x units); finite.</param>
    /// <returns>For the unweighted line: s·√(1/n + (x − x̄)²/Sxx).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="x"/> is not finite.</exception>
    public double MeanResponseStandardError(double x)
    {
        Guard.Finite(x, nameof(x));
        return ResidualStandardDeviation * Math.Sqrt(UnscaledMeanResponseVariance(x));
    }

    /// <summary>Confidence interval of a coefficient, βᵢ ± t((1 + P)/2, n − p)·SE(βᵢ).</summary>
    /// <param name="index">Coefficient index in <see cref="Coefficients"/>.</param>
    /// <param name="confidenceLevel">Confidence level P in (0, 1).</param>
    /// <returns>The interval (coefficient units).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="index"/> outside [0, ParameterCount) or
    /// <paramref name="confidenceLevel"/> outside (0, 1).</exception>
    /// <exception cref="InvalidOperationException">A bound overflows.</exception>
    public ConfidenceInterval CoefficientInterval(int index, double confidenceLevel = 0.95)
    {
        CheckIndex(index, nameof(index));
        double t = TwoSidedT(confidenceLevel);
        return Symmetric(Beta(index), t * Math.Sqrt(Covariance(index, index)), confidenceLevel);
    }

    /// <summary>
    /// Confidence interval of the mean response at x (confidence band), ŷ ± t·s·√(z(x)ᵀ(XᵀWX)⁻¹z(x)); for the
    /// unweighted line ŷ ± t·s·√(1/n + (x − x̄)²/Sxx) (Miller &amp; Miller ch. 5).
    /// </summary>
    /// <param name="x">Concentration (x units); finite.</param>
    /// <param name="confidenceLevel">Confidence level P in (0, 1).</param>
    /// <returns>The interval (y units).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="x"/> not finite or
    /// <paramref name="confidenceLevel"/> outside (0, 1).</exception>
    /// <exception cref="InvalidOperationException">A bound overflows.</exception>
    public ConfidenceInterval MeanResponseInterval(double x, double confidenceLevel = 0.95)
    {
        double t = TwoSidedT(confidenceLevel);
        return Symmetric(Predict(x), t * MeanResponseStandardError(x), confidenceLevel);
    }

    /// <summary>
    /// Prediction interval for the mean of m new responses at x, ŷ ± t·s·√(1/(m·w0) + z(x)ᵀ(XᵀWX)⁻¹z(x));
    /// for the unweighted line ŷ ± t·s·√(1/m + 1/n + (x − x̄)²/Sxx).
    /// </summary>
    /// <param name="x">Concentration (x units); finite.</param>
    /// <param name="replicates">Number m of new responses averaged; ≥ 1.</param>
    /// <param name="confidenceLevel">Confidence level P in (0, 1).</param>
    /// <param name="unknownWeight">Weight of the new responses on the raw scale of the fit's weighting (the scale
    /// <see cref="Weighting.ComputeWeights"/> returns, e.g. 1/s0² for 1/s² weighting); normalised with the
    /// standards' factor. Null: 1 when unweighted; the scheme evaluated at x (1/x, 1/x²) or at ŷ(x) (1/y, 1/y²);
    /// required for 1/s² and custom weighting.</param>
    /// <returns>The interval (y units).</returns>
    /// <exception cref="ArgumentOutOfRangeException">x not finite, replicates &lt; 1, confidenceLevel outside
    /// (0, 1), or unknownWeight not finite and &gt; 0.</exception>
    /// <exception cref="ArgumentException"><paramref name="unknownWeight"/> is null but the weighting is per-point
    /// or undefined at x / ŷ(x).</exception>
    /// <exception cref="InvalidOperationException">A bound overflows.</exception>
    public ConfidenceInterval PredictionInterval(double x, int replicates = 1, double confidenceLevel = 0.95, double? unknownWeight = null)
    {
        double yHat = Predict(x);
        Guard.AtLeast(replicates, 1, nameof(replicates));
        double t = TwoSidedT(confidenceLevel);
        double w0 = NormalisedUnknownWeight(x, yHat, unknownWeight);
        double s = ResidualStandardDeviation;
        double halfWidth = t * s * Math.Sqrt((1.0 / (replicates * w0)) + UnscaledMeanResponseVariance(x));
        return Symmetric(yHat, halfWidth, confidenceLevel);
    }

    /// <summary>
    /// x at which the calibration function gives <paramref name="response"/>: (y − a)/b for the lines; for the
    /// quadratic the root of a + b·x + c·x² = y inside the standards' range, else the root closest to it (ISO
    /// 8466-2). When both roots lie inside the range (the curve turns within it), the root on the branch whose
    /// sensitivity has the sign of the overall trend ŷ(MaxX) − ŷ(MinX) is taken.
    /// </summary>
    /// <param name="response">Response (y units); finite.</param>
    /// <returns>x (x units).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="response"/> is not finite, or (quadratic)
    /// the fitted parabola never reaches it (no real root).</exception>
    /// <exception cref="InvalidOperationException">The fitted straight line has slope 0 (or so close to 0 that x
    /// overflows), so no x corresponds to a response.</exception>
    public double InverseEvaluate(double response)
    {
        Guard.Finite(response, nameof(response));
        double u;
        switch (Model)
        {
            case CalibrationModel.LinearThroughOrigin:
                u = LinearRoot(response, _theta0);
                break;
            case CalibrationModel.Linear:
                u = LinearRoot(response - _theta0, _theta1);
                break;
            default:
                u = QuadraticRoot(response);
                break;
        }

        double x = _center + (_scale * u);
        if (double.IsInfinity(x) || double.IsNaN(x))
        {
            throw new InvalidOperationException("The fitted slope is too close to 0: the x for this response overflows.");
        }

        return x;
    }

    /// <summary>
    /// Inverse prediction: x0 of an unknown from the mean ȳ0 of m replicate responses, with the standard error
    /// from first-order propagation (delta method) and a t interval.
    /// </summary>
    /// <remarks>
    /// <para>s_x0² = [s²/(m·w0) + Var(ŷ(x0))]/E(x0)², E = dy/dx at x0. This is, in closed form: unweighted line
    /// s_x0 = (s/|b|)·√(1/m + 1/n + (ȳ0 − ȳ)²/(b²·Sxx)) (Miller &amp; Miller ch. 5; ISO 8466-1); weighted line
    /// s_x0 = (s_w/|b|)·√(1/(m·w0) + 1/Σw + (ȳ0 − ȳw)²/(b²·Σw(x − x̄w)²)); through the origin
    /// s_x0 = (s/|b|)·√(1/(m·w0) + ȳ0²/(b²·Σw·x²)); quadratic, Var(ŷ(x0)) = gᵀ·Cov(a,b,c)·g with g = (1, x0, x0²),
    /// identical to the ISO 8466-2 closed form. Interval: x0 ± t((1 + P)/2, n − p)·s_x0.</para>
    /// <para>Weight of the unknown w0: see <paramref name="unknownWeight"/>; <see cref="InversePrediction.Method"/>
    /// states the formula and the weight used.</para>
    /// </remarks>
    /// <param name="meanResponse">Mean response ȳ0 of the unknown (y units); finite.</param>
    /// <param name="replicates">Number m of responses averaged into ȳ0; ≥ 1.</param>
    /// <param name="confidenceLevel">Confidence level P in (0, 1).</param>
    /// <param name="unknownWeight">Weight of the unknown on the raw scale of the fit's weighting (the scale
    /// <see cref="Weighting.ComputeWeights"/> returns, e.g. 1/s0² for 1/s² weighting); it is normalised with
    /// the standards' factor. Null: 1 when unweighted; the scheme evaluated at x0 (1/x, 1/x²) or at ȳ0
    /// (1/y, 1/y²); required for 1/s² and custom weighting.</param>
    /// <returns>The prediction.</returns>
    /// <exception cref="ArgumentOutOfRangeException">meanResponse not finite or (quadratic) not reached by the
    /// curve; replicates &lt; 1; confidenceLevel outside (0, 1); unknownWeight not finite and &gt; 0.</exception>
    /// <exception cref="ArgumentException"><paramref name="unknownWeight"/> is null but the weighting is per-point
    /// or undefined at x0 / ȳ0 (e.g. 1/x with x0 ≤ 0).</exception>
    /// <exception cref="InvalidOperationException">The sensitivity at x0 is 0 (zero slope, or the vertex of the
    /// parabola): the standard error is unbounded.</exception>
    public InversePrediction InversePredict(double meanResponse, int replicates = 1, double confidenceLevel = 0.95, double? unknownWeight = null)
    {
        InverseEstimate e = EstimateInverse(meanResponse, replicates, confidenceLevel, unknownWeight);
        return new InversePrediction(
            e,
            InverseFormula() + "; " + WeightNote(e.Value, meanResponse, unknownWeight));
    }

    /// <summary>
    /// The same inverse prediction as <see cref="InversePredict"/> — identical numbers, bit for bit — returned
    /// as a struct without the <see cref="InversePrediction.Method"/> text, so that a call allocates nothing
    /// (for high-throughput quantitation; the t quantile for P = 0.95 is computed once per fit and reused).
    /// </summary>
    /// <remarks>Formulas, weight of the unknown and interval as documented on <see cref="InversePredict"/>.</remarks>
    /// <param name="meanResponse">Mean response ȳ0 of the unknown (y units); finite.</param>
    /// <param name="replicates">Number m of responses averaged into ȳ0; ≥ 1.</param>
    /// <param name="confidenceLevel">Confidence level P in (0, 1).</param>
    /// <param name="unknownWeight">As for <see cref="InversePredict"/>.</param>
    /// <returns>The prediction (x units).</returns>
    /// <exception cref="ArgumentOutOfRangeException">meanResponse not finite or (quadratic) not reached by the
    /// curve; replicates &lt; 1; confidenceLevel outside (0, 1); unknownWeight not finite and &gt; 0.</exception>
    /// <exception cref="ArgumentException"><paramref name="unknownWeight"/> is null but the weighting is per-point
    /// or undefined at x0 / ȳ0 (e.g. 1/x with x0 ≤ 0).</exception>
    /// <exception cref="InvalidOperationException">The sensitivity at x0 is 0 (zero slope, or the vertex of the
    /// parabola): the standard error is unbounded.</exception>
    public InverseEstimate EstimateInverse(double meanResponse, int replicates = 1, double confidenceLevel = 0.95, double? unknownWeight = null)
    {
        double x0 = InverseEvaluate(meanResponse);
        Guard.AtLeast(replicates, 1, nameof(replicates));
        double t = TwoSidedT(confidenceLevel);
        double sensitivity = Sensitivity(x0);
        if (sensitivity == 0)
        {
            throw new InvalidOperationException(
                FormattableString.Invariant($"The sensitivity dy/dx is 0 at x0 = {Guard.Format(x0)}; the standard error of an inverse prediction there is unbounded."));
        }

        double w0 = NormalisedUnknownWeight(x0, meanResponse, unknownWeight);
        double s = ResidualStandardDeviation;
        double variance = ((s * s / (replicates * w0)) + (s * s * UnscaledMeanResponseVariance(x0))) / (sensitivity * sensitivity);
        double standardError = Math.Sqrt(variance);
        var status = x0 < MinX ? ExtrapolationStatus.BelowLowestStandard
            : x0 > MaxX ? ExtrapolationStatus.AboveHighestStandard
            : ExtrapolationStatus.WithinRange;
        return new InverseEstimate(
            x0,
            standardError,
            Symmetric(x0, t * standardError, confidenceLevel),
            DegreesOfFreedom,
            replicates,
            meanResponse,
            w0,
            status);
    }

    /// <summary>
    /// Fieller's interval for x0 from the mean ȳ0 of m responses (straight lines only): the exact set of x whose
    /// fitted response is compatible with ȳ0 at level P, not symmetric about x0.
    /// </summary>
    /// <remarks>
    /// With g = t²s²/(b²·Sxx,w): limits = c + [(x0 − c) ± (t·s/|b|)·√((1 − g)·k + (x0 − c)²/Sxx,w)]/(1 − g), where
    /// for the line with intercept c = x̄w, Sxx,w = Σw(x − x̄w)², k = 1/(m·w0) + 1/Σw; through the origin c = 0,
    /// Sxx,w = Σw·x², k = 1/(m·w0) (field reference §1.1; Fieller 1954). Returns null when g ≥ 1: the slope is then
    /// not significantly different from 0 at level P and the set is unbounded.
    /// </remarks>
    /// <param name="meanResponse">Mean response ȳ0 (y units); finite.</param>
    /// <param name="replicates">Number m of responses averaged; ≥ 1.</param>
    /// <param name="confidenceLevel">Confidence level P in (0, 1).</param>
    /// <param name="unknownWeight">As for <see cref="InversePredict"/>.</param>
    /// <returns>The interval (x units), or null when it is unbounded (g ≥ 1).</returns>
    /// <exception cref="ArgumentOutOfRangeException">meanResponse not finite, replicates &lt; 1, confidenceLevel
    /// outside (0, 1), or unknownWeight not finite and &gt; 0.</exception>
    /// <exception cref="ArgumentException">As for <see cref="InversePredict"/>.</exception>
    /// <exception cref="InvalidOperationException">The model is quadratic, or the slope is 0.</exception>
    public ConfidenceInterval? FiellerInterval(double meanResponse, int replicates = 1, double confidenceLevel = 0.95, double? unknownWeight = null)
    {
        if (Model == CalibrationModel.Quadratic)
        {
            throw new InvalidOperationException("Fieller's interval is implemented for the straight-line models only; use InversePredict for the quadratic.");
        }

        double x0 = InverseEvaluate(meanResponse);
        Guard.AtLeast(replicates, 1, nameof(replicates));
        double t = TwoSidedT(confidenceLevel);
        double w0 = NormalisedUnknownWeight(x0, meanResponse, unknownWeight);
        double b = Math.Abs(Slope);
        double s = ResidualStandardDeviation;
        double sxx = _sxx;
        double g = t * t * s * s / (b * b * sxx);
        if (g >= 1)
        {
            return null;
        }

        double k = (1.0 / (replicates * w0)) + (Model == CalibrationModel.Linear ? 1.0 / Count : 0.0);
        double d = x0 - _center;
        double root = (t * s / b) * Math.Sqrt(((1 - g) * k) + (d * d / sxx));
        return new ConfidenceInterval(Bound(_center + ((d - root) / (1 - g))), Bound(_center + ((d + root) / (1 - g))), confidenceLevel);
    }

    /// <summary>
    /// One step of iterative refinement: residuals of the current coefficients computed with compensated
    /// arithmetic, their least-squares correction solved with the same R (corrected semi-normal equations,
    /// Björck, "Numerical Methods for Least Squares Problems", §2.5). Removes the rounding error that the
    /// back-transformation from the centred basis leaves in the intercept. Updates θ and β in place.
    /// </summary>
    private void Refine(double[] theta, double[] beta, double[] weights)
    {
        SetBeta(beta);
        int n = Count, p = ParameterCount;
        var z = new double[p];
        var g = new double[p];
        for (int i = 0; i < n; i++)
        {
            double xi = _x[i];
            double r = CompensatedResidual(xi, _y[i]);
            Basis(xi, z);
            for (int j = 0; j < p; j++)
            {
                g[j] += weights[i] * z[j] * r;
            }
        }

        // δθ = R⁻¹·R⁻ᵀ·g.
        var v = new double[p];
        for (int k = 0; k < p; k++)
        {
            for (int j = 0; j <= k; j++)
            {
                v[k] += RInverse(j, k) * g[j];
            }
        }

        var deltaTheta = new double[p];
        for (int i = 0; i < p; i++)
        {
            for (int k = i; k < p; k++)
            {
                deltaTheta[i] += RInverse(i, k) * v[k];
            }
        }

        for (int i = 0; i < p; i++)
        {
            double deltaBeta = 0;
            for (int k = 0; k < p; k++)
            {
                deltaBeta += M(i, k) * deltaTheta[k];
            }

            double refinedTheta = theta[i] + deltaTheta[i], refinedBeta = beta[i] + deltaBeta;
            if (!double.IsNaN(refinedTheta + refinedBeta) && !double.IsInfinity(refinedTheta + refinedBeta))
            {
                theta[i] = refinedTheta;
                beta[i] = refinedBeta;
            }
        }
    }

    private void SetBeta(double[] beta)
    {
        _beta0 = beta[0];
        _beta1 = beta.Length > 1 ? beta[1] : 0;
        _beta2 = beta.Length > 2 ? beta[2] : 0;
    }

    private void SetTheta(double[] theta)
    {
        _theta0 = theta[0];
        _theta1 = theta.Length > 1 ? theta[1] : 0;
        _theta2 = theta.Length > 2 ? theta[2] : 0;
    }

    /// <summary>Coefficient <paramref name="index"/> in the order of <see cref="Coefficients"/>.</summary>
    private double Beta(int index) => index == 0 ? _beta0 : index == 1 ? _beta1 : _beta2;

    /// <summary>y − (a + b·x + c·x²) with compensated arithmetic (≈ one rounding of the result).</summary>
    private double CompensatedResidual(double x, double y)
    {
        var sum = default(CompensatedSum);
        sum.Add(y);
        switch (Model)
        {
            case CalibrationModel.LinearThroughOrigin:
                sum.AddProduct(-_beta0, x);
                break;
            case CalibrationModel.Linear:
                return LineFit.Residual(_beta0, _beta1, x, y);
            default:
                sum.Add(-_beta0);
                sum.AddProduct(-_beta1, x);
                sum.AddProductOfSquare(-_beta2, x);
                break;
        }

        return sum.Value;
    }

    /// <summary>Basis functions z(x): Linear (1, u); Quadratic (1, u, u² − 1); through origin (x/s); u = (x − c)/s.</summary>
    private void Basis(double x, double[] z)
    {
        double u = (x - _center) / _scale;
        switch (Model)
        {
            case CalibrationModel.LinearThroughOrigin:
                z[0] = u;
                break;
            case CalibrationModel.Linear:
                z[0] = 1;
                z[1] = u;
                break;
            default:
                z[0] = 1;
                z[1] = u;
                z[2] = (u * u) - 1;
                break;
        }
    }

    /// <summary>Entry (i, k) of M with (a, b, c) = M·θ for the basis of <see cref="Basis"/>.</summary>
    private double M(int i, int k)
    {
        double c = _center, s = _scale;
        switch (Model)
        {
            case CalibrationModel.LinearThroughOrigin:
                return 1 / s;
            case CalibrationModel.Linear:
                return i == 0 ? (k == 0 ? 1 : -c / s) : (k == 0 ? 0 : 1 / s);
            default:
                return (i, k) switch
                {
                    (0, 0) => 1,
                    (0, 1) => -c / s,
                    (0, 2) => (c / s * (c / s)) - 1,
                    (1, 1) => 1 / s,
                    (1, 2) => -2 * c / (s * s),
                    (2, 2) => 1 / (s * s),
                    _ => 0,
                };
        }
    }

    /// <summary>Entry (j, k) of the upper-triangular R⁻¹.</summary>
    private double RInverse(int j, int k) => (j, k) switch
    {
        (0, 0) => _r00,
        (0, 1) => _r01,
        (0, 2) => _r02,
        (1, 1) => _r11,
        (1, 2) => _r12,
        (2, 2) => _r22,
        _ => 0,
    };

    /// <summary>Entry (i, k) of G = M·R⁻¹, so that Cov(a, b, c) = s²·G·Gᵀ.</summary>
    private double G(int i, int k)
    {
        double sum = 0;
        for (int l = 0; l <= k; l++)
        {
            sum += M(i, l) * RInverse(l, k);
        }

        return sum;
    }

    /// <summary>z(x)ᵀ(RᵀR)⁻¹z(x) = ‖R⁻ᵀz(x)‖², so that Var(ŷ(x)) = s²·this. Allocates nothing.</summary>
    private double UnscaledMeanResponseVariance(double x)
    {
        double u = (x - _center) / _scale;
        switch (Model)
        {
            case CalibrationModel.LinearThroughOrigin:
                {
                    double v0 = _r00 * u;
                    return v0 * v0;
                }

            case CalibrationModel.Linear:
                {
                    double v0 = _r00, v1 = _r01 + (_r11 * u);
                    return (v0 * v0) + (v1 * v1);
                }

            default:
                {
                    double z2 = (u * u) - 1;
                    double v0 = _r00, v1 = _r01 + (_r11 * u), v2 = _r02 + (_r12 * u) + (_r22 * z2);
                    return (v0 * v0) + (v1 * v1) + (v2 * v2);
                }
        }
    }

    /// <summary>Residual statistics, computed on the first call (compensated residuals of the final coefficients).</summary>
    private RegressionFit Statistics()
    {
        if (Volatile.Read(ref _statisticsReady) != 0)
        {
            return this;
        }

        (double rss, double total) = ResidualSums(1.0);
        _residualSumOfSquares = rss;
        _residualStandardDeviation = Math.Sqrt(rss / DegreesOfFreedom);
        if (double.IsInfinity(rss) || double.IsInfinity(total))
        {
            // Residuals beyond ~1e154: the sums of squares overflow, so s and R² come from residuals scaled by 2^-600
            // (exact); Σw·r² itself stays +∞ (documented on ResidualSumOfSquares).
            (double scaledRss, double scaledTotal) = ResidualSums(PowerOfTwoDown);
            _residualStandardDeviation = Math.Sqrt(scaledRss / DegreesOfFreedom) * PowerOfTwoUp;
            rss = scaledRss;
            total = scaledTotal;
        }

        _rSquared = total > 0 ? Math.Min(1.0, Math.Max(0.0, 1 - (rss / total))) : 0.0;
        _correlation = Model == CalibrationModel.Quadratic ? Math.Sqrt(_rSquared) : Math.Sign(Slope) * Math.Sqrt(_rSquared);
        Volatile.Write(ref _statisticsReady, 1);
        return this;
    }

    private const double PowerOfTwoDown = 2.409919865102884e-181; // 2^-600
    private const double PowerOfTwoUp = 4.149515568880993e180; // 2^600

    /// <summary>Σw·(c·r)² and Σw·(c·(y − ȳw))² with normalised weights, for a scale c (1, or a power of two).</summary>
    private (double Rss, double Total) ResidualSums(double scale)
    {
        double rss = 0, total = 0;
        if (Model == CalibrationModel.Linear)
        {
            ToLineFit().ResidualSums(_x, _y, scale, out rss, out total);
            return (rss, total);
        }

        bool origin = Model == CalibrationModel.LinearThroughOrigin;
        for (int i = 0; i < Count; i++)
        {
            double x = _x[i], y = _y[i], w = W(i);
            double weighted = Math.Sqrt(w) * CompensatedResidual(x, y) * scale;
            rss += weighted * weighted;
            double d = (origin ? y : y - _meanY) * scale;
            total += w * d * d;
        }

        return (rss, total);
    }

    /// <summary>t((1 + P)/2, n − p); the value for P = 0.95 is kept after its first use.</summary>
    private double TwoSidedT(double confidenceLevel)
    {
        if (confidenceLevel != 0.95)
        {
            Guard.InOpenRange(confidenceLevel, 0, 1, nameof(confidenceLevel));
            return StudentTQuantile.TwoSided(confidenceLevel, DegreesOfFreedom);
        }

        double t = Volatile.Read(ref _t95);
        if (t == 0)
        {
            t = StudentTQuantile.TwoSided(confidenceLevel, DegreesOfFreedom);
            Volatile.Write(ref _t95, t);
        }

        return t;
    }

    private Views GetViews()
    {
        Views? views = Volatile.Read(ref _views);
        if (views is null)
        {
            views = new Views(this);
            views = Interlocked.CompareExchange(ref _views, views, null) ?? views;
        }

        return views;
    }


    /// <summary>Weight of an unknown on the normalised scale (see <see cref="WeightNote"/> for how it is chosen).</summary>
    private double NormalisedUnknownWeight(double x, double response, double? unknownWeight)
    {
        if (unknownWeight is double given)
        {
            Guard.Positive(given, nameof(unknownWeight));
            return Normalise(given);
        }

        switch (Weighting.Scheme)
        {
            case WeightingScheme.None:
                return 1.0;
            case WeightingScheme.InverseVariance:
            case WeightingScheme.Custom:
                throw new ArgumentException(
                    $"Parameter '{nameof(unknownWeight)}' is required with '{Weighting.Name}' weighting: the weight of the unknown cannot be derived from per-point weights (pass it on the same scale as the standards' weights, e.g. 1/s0²).",
                    nameof(unknownWeight));
        }

        double raw;
        try
        {
            raw = Weighting.RawWeight(x, response, -1);
        }
        catch (ArgumentException e)
        {
            throw new ArgumentException(
                $"Parameter '{nameof(unknownWeight)}' was not given and the default weight of the unknown cannot be used: {e.Message}",
                nameof(unknownWeight),
                e);
        }

        double w0 = Normalise(raw);
        if (!(w0 > 0) || double.IsInfinity(w0))
        {
            bool atX = Weighting.Scheme is WeightingScheme.InverseX or WeightingScheme.InverseXSquared;
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(unknownWeight)}' was not given and the default weight of the unknown, {Weighting.Name} at {(atX ? "x0" : "the response")}, is {Guard.Format(w0)} after normalisation; pass unknownWeight explicitly."),
                nameof(unknownWeight));
        }

        return w0;
    }

    /// <summary>How <see cref="NormalisedUnknownWeight"/> chose the weight (for <see cref="InversePrediction.Method"/>).</summary>
    private string WeightNote(double x, double response, double? unknownWeight)
    {
        if (unknownWeight is double given)
        {
            return FormattableString.Invariant($"w0 = unknownWeight {Guard.Format(given)} supplied by the caller, normalised with the standards' factor");
        }

        if (Weighting.Scheme == WeightingScheme.None)
        {
            return "w0 = 1 (unweighted fit)";
        }

        return Weighting.Scheme is WeightingScheme.InverseX or WeightingScheme.InverseXSquared
            ? FormattableString.Invariant($"w0 = {Weighting.Name} evaluated at x = {Guard.Format(x)}, normalised with the standards' factor")
            : FormattableString.Invariant($"w0 = {Weighting.Name} evaluated at the response y = {Guard.Format(response)}, normalised with the standards' factor");
    }

    private double Normalise(double rawWeight) =>
        Weighting.Scheme == WeightingScheme.None ? rawWeight : rawWeight * _weightScale * _weightNormaliser;

    /// <summary>The power of 2 that scales <paramref name="max"/> (finite, &gt; 0) into [1, 2) — exact scaling.</summary>
    private static double PowerOfTwoScale(double max)
    {
        long biasedExponent = (BitConverter.DoubleToInt64Bits(max) >> 52) & 0x7FF;

        // Subnormal maximum: 2^1000 keeps every scaled weight below 1 and exact; largest binade: 2^-1022 ([2, 4)).
        long exponent = biasedExponent == 0 ? 2023L : biasedExponent == 2046 ? 1L : 2046L - biasedExponent;
        return BitConverter.Int64BitsToDouble(exponent << 52);
    }

    private string InverseFormula() => Model switch
    {
        CalibrationModel.Linear => "straight line: s_x0 = (s/|b|)·√(1/(m·w0) + 1/Σw + (ȳ0 − ȳw)²/(b²·Σw(x − x̄w)²))",
        CalibrationModel.LinearThroughOrigin => "line through origin: s_x0 = (s/|b|)·√(1/(m·w0) + ȳ0²/(b²·Σw·x²))",
        _ => "quadratic, delta method: s_x0 = √(s²/(m·w0) + gᵀ·Cov(a,b,c)·g)/|b + 2c·x0|, g = (1, x0, x0²)",
    };

    private double LinearRoot(double numerator, double slope)
    {
        if (slope == 0)
        {
            throw new InvalidOperationException($"The fitted slope is 0 ({Model} model): no x corresponds to a given response.");
        }

        return numerator / slope;
    }

    /// <summary>Root u of θ2·u² + θ1·u + (θ0 − θ2 − y) = 0 chosen as documented in <see cref="InverseEvaluate"/>.</summary>
    private double QuadraticRoot(double response)
    {
        double t0 = _theta0 - _theta2 - response, t1 = _theta1, t2 = _theta2;
        if (t2 == 0)
        {
            return LinearRoot(-t0, t1);
        }

        double discriminant = (t1 * t1) - (4 * t2 * t0);
        if (discriminant < 0)
        {
            double uVertex = -t1 / (2 * t2);
            double xVertex = _center + (_scale * uVertex);
            throw new ArgumentOutOfRangeException(
                nameof(response),
                response,
                FormattableString.Invariant($"Parameter 'response' was {Guard.Format(response)}; the fitted parabola never reaches it (no real root). It must be {(t2 > 0 ? ">=" : "<=")} the curve's extreme value {Guard.Format(Predict(xVertex))} at x = {Guard.Format(xVertex)}."));
        }

        // Numerically stable pair of roots.
        double q = -0.5 * (t1 + ((t1 >= 0 ? 1 : -1) * Math.Sqrt(discriminant)));
        if (q == 0)
        {
            return 0;
        }

        double u1 = q / t2, u2 = t0 / q;
        double d1 = DistanceToRange(u1), d2 = DistanceToRange(u2);
        if (d1 != d2)
        {
            return d1 < d2 ? u1 : u2;
        }

        // Both inside the range: take the branch that follows the overall trend of the standards.
        double trend = Math.Sign(Predict(MaxX) - Predict(MinX));
        double lower = Math.Min(u1, u2), upper = Math.Max(u1, u2);
        return Math.Sign(Sensitivity(_center + (_scale * upper))) == trend && Math.Sign(Sensitivity(_center + (_scale * lower))) != trend
            ? upper
            : lower;
    }

    private double DistanceToRange(double u)
    {
        double x = _center + (_scale * u);
        return double.IsNaN(x) ? double.PositiveInfinity
            : x < MinX ? MinX - x
            : x > MaxX ? x - MaxX
            : 0;
    }

    private double SumOfSquaresAbout(double center)
    {
        double sum = 0;
        int n = Count;
        for (int i = 0; i < n; i++)
        {
            double d = _x[i] - center;
            sum += W(i) * d * d;
        }

        return sum;
    }

    private void CheckIndex(int index, string paramName)
    {
        if (index < 0 || index >= ParameterCount)
        {
            throw new ArgumentOutOfRangeException(
                paramName,
                index,
                FormattableString.Invariant($"Parameter '{paramName}' was {index}; it must be in [0, {ParameterCount}) for the {Model} model."));
        }
    }

    private static ConfidenceInterval Symmetric(double center, double halfWidth, double confidenceLevel) =>
        new(Bound(center - halfWidth), Bound(center + halfWidth), confidenceLevel);

    // An interval bound that overflows is refused, never returned as ∞ (common practice).
    private static double Bound(double value) =>
        double.IsNaN(value) || double.IsInfinity(value)
            ? throw new InvalidOperationException("An interval bound overflows the range of a double; the value is too far from the calibration for an interval.")
            : value;

    /// <summary>Σw·v/Σw with one correction pass (weights sum to n).</summary>
    private static double WeightedMean(double[] values, double[] weights)
    {
        double sw = 0, sum = 0;
        for (int i = 0; i < values.Length; i++)
        {
            sw += weights[i];
            sum += weights[i] * values[i];
        }

        double mean = sum / sw;
        double correction = 0;
        for (int i = 0; i < values.Length; i++)
        {
            correction += weights[i] * (values[i] - mean);
        }

        return mean + (correction / sw);
    }

    /// <summary>√(Σw(x − c)²/n), computed without overflow or underflow.</summary>
    private static double WeightedRms(double[] x, double[] weights, double center)
    {
        double max = 0;
        foreach (double v in x)
        {
            max = Math.Max(max, Math.Abs(v - center));
        }

        double sum = 0;
        for (int i = 0; i < x.Length; i++)
        {
            double d = (x[i] - center) / max;
            sum += weights[i] * d * d;
        }

        return max * Math.Sqrt(sum / x.Length);
    }

    /// <summary>Copies <paramref name="values"/> into <paramref name="target"/>, refusing NaN and ±∞.</summary>
    private static void CopyFinite(IReadOnlyList<double> values, double[] target, string paramName)
    {
        if (values is double[] array)
        {
            for (int i = 0; i < array.Length; i++)
            {
                target[i] = CheckFinite(array[i], i, paramName);
            }
        }
        else
        {
            int count = values.Count;
            for (int i = 0; i < count; i++)
            {
                target[i] = CheckFinite(values[i], i, paramName);
            }
        }
    }

    private static double CheckFinite(double v, int index, string paramName)
    {
        if (double.IsNaN(v) || double.IsInfinity(v))
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{paramName}' has {Guard.Format(v)} at index {index}; every element must be a finite number."),
                paramName);
        }

        return v;
    }

    /// <summary>Number of distinct values, counted up to <paramref name="cap"/> (≤ 3; exact below it).</summary>
    private static int CountDistinct(double[] values, int cap)
    {
        int n = values.Length;
        if (n == 0)
        {
            return 0;
        }

        double first = values[0], second = 0;
        int distinct = 1;
        for (int i = 1; i < n && distinct < cap; i++)
        {
            double v = values[i];
            if (v == first || (distinct == 2 && v == second))
            {
                continue;
            }

            if (distinct == 1)
            {
                second = v;
            }

            distinct++;
        }

        return distinct;
    }

    /// <summary>Read-only list views of the standards and their per-point diagnostics, built on first use.</summary>
    private sealed class Views
    {
        internal Views(RegressionFit fit)
        {
            int n = fit.Count, p = fit.ParameterCount;
            var x = (double[])fit._x.Clone();
            var y = (double[])fit._y.Clone();
            var weights = new double[n];
            for (int i = 0; i < n; i++)
            {
                weights[i] = fit.W(i);
            }

            var coefficients = new double[p];
            var standardErrors = new double[p];
            for (int i = 0; i < p; i++)
            {
                coefficients[i] = fit.Beta(i);
                standardErrors[i] = Math.Sqrt(fit.Covariance(i, i));
            }

            var fitted = new double[n];
            var residuals = new double[n];
            var weightedResiduals = new double[n];
            var standardized = new double[n];
            var leverages = new double[n];
            double s = fit.ResidualStandardDeviation;
            for (int i = 0; i < n; i++)
            {
                residuals[i] = fit.CompensatedResidual(x[i], y[i]);
                fitted[i] = -fit.CompensatedResidual(x[i], 0);
                weightedResiduals[i] = Math.Sqrt(weights[i]) * residuals[i];
                leverages[i] = Math.Min(1.0, weights[i] * fit.UnscaledMeanResponseVariance(x[i]));
                double denominator = s * Math.Sqrt(1 - leverages[i]);
                standardized[i] = denominator > 0 && 1 - leverages[i] > 1e-10 ? weightedResiduals[i] / denominator : 0.0;
            }

            // Read-only views: callers cannot cast them back to the arrays.
            X = Array.AsReadOnly(x);
            Y = Array.AsReadOnly(y);
            Weights = Array.AsReadOnly(weights);
            Coefficients = Array.AsReadOnly(coefficients);
            StandardErrors = Array.AsReadOnly(standardErrors);
            FittedValues = Array.AsReadOnly(fitted);
            Residuals = Array.AsReadOnly(residuals);
            WeightedResiduals = Array.AsReadOnly(weightedResiduals);
            StandardizedResiduals = Array.AsReadOnly(standardized);
            Leverages = Array.AsReadOnly(leverages);
        }

        internal IReadOnlyList<double> X { get; }

        internal IReadOnlyList<double> Y { get; }

        internal IReadOnlyList<double> Weights { get; }

        internal IReadOnlyList<double> Coefficients { get; }

        internal IReadOnlyList<double> StandardErrors { get; }

        internal IReadOnlyList<double> FittedValues { get; }

        internal IReadOnlyList<double> Residuals { get; }

        internal IReadOnlyList<double> WeightedResiduals { get; }

        internal IReadOnlyList<double> StandardizedResiduals { get; }

        internal IReadOnlyList<double> Leverages { get; }
    }
}
