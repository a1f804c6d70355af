using System;
using System.Collections.Generic;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>
/// A calibration function fitted by (weighted) least squares: straight line, line through the origin or
/// second-order polynomial, with coefficient uncertainties, residual diagnostics, confidence and prediction
/// bands and inverse prediction (x of an unknown from its response).
/// </summary>
/// <remarks>
/// <para><b>Numerics.</b> The x column is centred at the weighted mean and scaled (through the origin: scaled
/// only); the quadratic uses the centred basis 1, u, u² − 1 with u = (x − x̄w)/s_x. The rows are multiplied by
/// √w and solved by Householder QR; coefficients and covariance are then transformed back to the a, b, c
/// basis, followed by one step of iterative refinement on residuals computed with compensated arithmetic.
/// This reproduces every certified value of the NIST StRD sets Norris, Pontius, NoInt1 and NoInt2 (coefficients,
/// their standard deviations, residual SD, R²) to at least 13 significant digits.</para>
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
    private readonly double[] _x;
    private readonly double[] _y;
    private readonly double[] _weights;
    private readonly double[] _coefficients;
    private readonly double[] _standardErrors;
    private readonly double[] _fitted;
    private readonly double[] _residuals;
    private readonly double[] _weightedResiduals;
    private readonly double[] _standardizedResiduals;
    private readonly double[] _leverages;

    // Fit in the centred/scaled basis z(x): coefficients θ and R⁻¹ of the √w-scaled design.
    private readonly double[] _theta;
    private readonly double[,] _rInverse;

    // G = M·R⁻¹ where (a, b, c) = M·θ; Cov(a, b, c) = s²·G·Gᵀ.
    private readonly double[,] _g;
    private readonly double _center;
    private readonly double _scale;

    // Raw weight w_raw is normalised as (w_raw / _maxRawWeight) · _weightNormaliser.
    private readonly double _maxRawWeight;
    private readonly double _weightNormaliser;

    private RegressionFit(CalibrationModel model, Weighting weighting, double[] x, double[] y, double[] rawWeights)
    {
        Model = model;
        Weighting = weighting;
        _x = x;
        _y = y;
        int n = x.Length;
        int p = ParameterCount = model == CalibrationModel.Quadratic ? 3 : model == CalibrationModel.Linear ? 2 : 1;

        // Normalised weights, Σw = n; scaled by the largest weight first so the sum cannot overflow.
        _maxRawWeight = 0;
        foreach (double w in rawWeights)
        {
            _maxRawWeight = Math.Max(_maxRawWeight, w);
        }

        double scaledSum = 0;
        foreach (double w in rawWeights)
        {
            scaledSum += w / _maxRawWeight;
        }

        _weightNormaliser = n / scaledSum;
        _weights = new double[n];
        for (int i = 0; i < n; i++)
        {
            _weights[i] = weighting.Scheme == WeightingScheme.None ? 1.0 : rawWeights[i] / _maxRawWeight * _weightNormaliser;
        }

        WeightedMeanX = WeightedMean(x, _weights);
        WeightedMeanY = WeightedMean(y, _weights);
        MinX = double.PositiveInfinity;
        MaxX = double.NegativeInfinity;
        foreach (double xi in x)
        {
            MinX = Math.Min(MinX, xi);
            MaxX = Math.Max(MaxX, xi);
        }

        _center = model == CalibrationModel.LinearThroughOrigin ? 0.0 : WeightedMeanX;
        _scale = WeightedRms(x, _weights, _center);

        // √w-scaled design in the basis z(x), solved by Householder QR.
        var columns = new double[p][];
        for (int j = 0; j < p; j++)
        {
            columns[j] = new double[n];
        }

        var rhs = new double[n];
        var z = new double[p];
        for (int i = 0; i < n; i++)
        {
            double sw = Math.Sqrt(_weights[i]);
            Basis(x[i], z);
            for (int j = 0; j < p; j++)
            {
                columns[j][i] = sw * z[j];
            }

            rhs[i] = sw * y[i];
        }

        HouseholderQr qr = HouseholderQr.Solve(columns, rhs)
            ?? throw new ArgumentException(
                FormattableString.Invariant($"The x values do not determine the {model} model: the design is numerically rank deficient (x values too close together relative to their magnitude)."),
                nameof(x));
        _theta = qr.Coefficients;
        _rInverse = qr.InverseR();

        // Back to the a, b, c basis: β = M·θ.
        var m = BackTransform();
        _coefficients = new double[p];
        _g = new double[p, p];
        for (int i = 0; i < p; i++)
        {
            double sum = 0;
            for (int k = 0; k < p; k++)
            {
                sum += m[i, k] * _theta[k];
                double gik = 0;
                for (int l = 0; l < p; l++)
                {
                    gik += m[i, l] * _rInverse[l, k];
                }

                _g[i, k] = gik;
            }

            _coefficients[i] = sum;
        }

        Refine(m);

        _fitted = new double[n];
        _residuals = new double[n];
        _weightedResiduals = new double[n];
        _leverages = new double[n];
        double rss = 0;
        for (int i = 0; i < n; i++)
        {
            _residuals[i] = CompensatedResidual(x[i], y[i]);
            _fitted[i] = -CompensatedResidual(x[i], 0);
            _weightedResiduals[i] = Math.Sqrt(_weights[i]) * _residuals[i];
            rss += _weightedResiduals[i] * _weightedResiduals[i];
            _leverages[i] = Math.Min(1.0, _weights[i] * UnscaledMeanResponseVariance(x[i]));
        }

        Count = n;
        DegreesOfFreedom = n - p;
        ResidualSumOfSquares = rss;
        ResidualStandardDeviation = Math.Sqrt(rss / DegreesOfFreedom);

        _standardErrors = new double[p];
        for (int i = 0; i < p; i++)
        {
            _standardErrors[i] = Math.Sqrt(Covariance(i, i));
        }

        _standardizedResiduals = new double[n];
        for (int i = 0; i < n; i++)
        {
            double denominator = ResidualStandardDeviation * Math.Sqrt(1 - _leverages[i]);
            _standardizedResiduals[i] = denominator > 0 && 1 - _leverages[i] > 1e-10 ? _weightedResiduals[i] / denominator : 0.0;
        }

        double total = 0;
        for (int i = 0; i < n; i++)
        {
            double d = model == CalibrationModel.LinearThroughOrigin ? y[i] : y[i] - WeightedMeanY;
            total += _weights[i] * d * d;
        }

        RSquared = total > 0 ? Math.Min(1.0, Math.Max(0.0, 1 - (rss / total))) : 0.0;
        CorrelationCoefficient = model == CalibrationModel.Quadratic
            ? Math.Sqrt(RSquared)
            : Math.Sign(Slope) * Math.Sqrt(RSquared);

        // Read-only views: callers cannot cast them back to the arrays.
        X = Array.AsReadOnly(_x);
        Y = Array.AsReadOnly(_y);
        Weights = Array.AsReadOnly(_weights);
        Coefficients = Array.AsReadOnly(_coefficients);
        StandardErrors = Array.AsReadOnly(_standardErrors);
        FittedValues = Array.AsReadOnly(_fitted);
        Residuals = Array.AsReadOnly(_residuals);
        WeightedResiduals = Array.AsReadOnly(_weightedResiduals);
        StandardizedResiduals = Array.AsReadOnly(_standardizedResiduals);
        Leverages = Array.AsReadOnly(_leverages);
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
    public IReadOnlyList<double> X { get; }

    /// <summary>y of the standards as given (y units).</summary>
    public IReadOnlyList<double> Y { get; }

    /// <summary>Weights normalised so that Σw = n (exactly 1 each for an unweighted fit).</summary>
    public IReadOnlyList<double> Weights { get; }

    /// <summary>Intercept a (y units); 0 for <see cref="CalibrationModel.LinearThroughOrigin"/>.</summary>
    public double Intercept => Model == CalibrationModel.LinearThroughOrigin ? 0.0 : _coefficients[0];

    /// <summary>Slope b (y units per x unit): the linear coefficient (for the quadratic, the slope at x = 0).</summary>
    public double Slope => Model == CalibrationModel.LinearThroughOrigin ? _coefficients[0] : _coefficients[1];

    /// <summary>Curvature c of y = a + b·x + c·x² (y units per x unit²); 0 unless quadratic.</summary>
    public double Curvature => Model == CalibrationModel.Quadratic ? _coefficients[2] : 0.0;

    /// <summary>Fitted coefficients: Linear [a, b]; LinearThroughOrigin [b]; Quadratic [a, b, c].</summary>
    public IReadOnlyList<double> Coefficients { get; }

    /// <summary>Standard errors of <see cref="Coefficients"/>, same order: s·√((XᵀWX)⁻¹)ᵢᵢ.</summary>
    public IReadOnlyList<double> StandardErrors { get; }

    /// <summary>
    /// Residual standard deviation s = s_y/x = √(Σw(y − ŷ)²/(n − p)) with normalised weights (y units).
    /// 0 for a perfect fit.
    /// </summary>
    public double ResidualStandardDeviation { get; }

    /// <summary>Residual sum of squares Σw(y − ŷ)² with normalised weights (y units²).</summary>
    public double ResidualSumOfSquares { get; }

    /// <summary>
    /// Correlation coefficient r = sign(b)·√R² for the straight lines (the weighted Pearson r for a weighted
    /// line; for the line through the origin the square root of the uncentred R²); √R² (≥ 0) for the quadratic.
    /// </summary>
    public double CorrelationCoefficient { get; }

    /// <summary>
    /// Coefficient of determination. Models with intercept: centred, 1 − RSS/Σw(y − ȳw)². Through the origin:
    /// uncentred, 1 − RSS/Σw·y² (NIST StRD NoInt convention). 0 when the responses have no variation
    /// (denominator 0).
    /// </summary>
    public double RSquared { get; }

    /// <summary>Fitted responses ŷᵢ at the standards (y units).</summary>
    public IReadOnlyList<double> FittedValues { get; }

    /// <summary>Residuals yᵢ − ŷᵢ, unweighted (y units).</summary>
    public IReadOnlyList<double> Residuals { get; }

    /// <summary>Weighted residuals √wᵢ·(yᵢ − ŷᵢ) (normalised weights).</summary>
    public IReadOnlyList<double> WeightedResiduals { get; }

    /// <summary>
    /// Internally studentised residuals √wᵢ(yᵢ − ŷᵢ)/(s·√(1 − hᵢᵢ)) (dimensionless). Reported as 0 where the
    /// denominator vanishes (perfect fit, or a point of leverage 1 whose residual is necessarily 0).
    /// </summary>
    public IReadOnlyList<double> StandardizedResiduals { get; }

    /// <summary>Leverages hᵢᵢ, diagonal of the hat matrix W^½X(XᵀWX)⁻¹XᵀW^½; each in [0, 1], summing to p.</summary>
    public IReadOnlyList<double> Leverages { get; }

    /// <summary>Lowest x of the standards.</summary>
    public double MinX { get; }

    /// <summary>Highest x of the standards.</summary>
    public double MaxX { get; }

    /// <summary>Weighted mean x̄w = Σw·x/Σw (the plain mean when unweighted).</summary>
    public double WeightedMeanX { get; }

    /// <summary>Weighted mean ȳw = Σw·y/Σw (the plain mean when unweighted).</summary>
    public double WeightedMeanY { get; }

    /// <summary>Weighted sum of squares of x about x̄w, Σw(x − x̄w)² with normalised weights (Sxx when unweighted).</summary>
    public double WeightedSumOfSquaresX => Model == CalibrationModel.LinearThroughOrigin
        ? SumOfSquaresAbout(WeightedMeanX)
        : Count * _scale * _scale;

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
        double[] xs = CopyFinite(x, nameof(x));
        double[] ys = CopyFinite(y, nameof(y));
        Guard.SameLength(xs.Length, ys.Length, nameof(x), nameof(y));
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

        if (xs.Length < minPoints)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(x)}' has {xs.Length} points; the {model} model needs at least {minPoints} so that the residual standard deviation has at least 1 degree of freedom."),
                nameof(x));
        }

        int distinct = CountDistinct(xs);
        if (distinct < minDistinct)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(x)}' has {distinct} distinct value(s); the {model} model needs at least {minDistinct}."),
                nameof(x));
        }

        weighting ??= Weighting.None;
        if (weighting.IsPerPoint && weighting.PointValues.Count != xs.Length)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(weighting)}' ({weighting.Name}) holds {weighting.PointValues.Count} values but there are {xs.Length} points; it must hold one per point."),
                nameof(weighting));
        }

        return new RegressionFit(model, weighting, xs, ys, weighting.ComputeWeights(xs, ys));
    }

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
            sum += _g[i, k] * _g[j, k];
        }

        return ResidualStandardDeviation * ResidualStandardDeviation * sum;
    }

    /// <summary>Fitted response ŷ at <paramref name="x"/> (y units).</summary>
    /// <param name="x">Concentration (x units); finite.</param>
    /// <returns>ŷ = a + b·x + c·x².</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="x"/> is not finite.</exception>
    public double Predict(double x)
    {
        Guard.Finite(x, nameof(x));
        return -CompensatedResidual(x, 0);
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
    public ConfidenceInterval CoefficientInterval(int index, double confidenceLevel = 0.95)
    {
        CheckIndex(index, nameof(index));
        double t = StudentTQuantile.TwoSided(confidenceLevel, DegreesOfFreedom);
        return Symmetric(_coefficients[index], t * _standardErrors[index], confidenceLevel);
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
    public ConfidenceInterval MeanResponseInterval(double x, double confidenceLevel = 0.95)
    {
        double t = StudentTQuantile.TwoSided(confidenceLevel, DegreesOfFreedom);
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
    public ConfidenceInterval PredictionInterval(double x, int replicates = 1, double confidenceLevel = 0.95, double? unknownWeight = null)
    {
        double yHat = Predict(x);
        Guard.AtLeast(replicates, 1, nameof(replicates));
        double t = StudentTQuantile.TwoSided(confidenceLevel, DegreesOfFreedom);
        double w0 = NormalisedUnknownWeight(x, yHat, unknownWeight, out _);
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
                u = LinearRoot(response, _theta[0]);
                break;
            case CalibrationModel.Linear:
                u = LinearRoot(response - _theta[0], _theta[1]);
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
        double x0 = InverseEvaluate(meanResponse);
        Guard.AtLeast(replicates, 1, nameof(replicates));
        double t = StudentTQuantile.TwoSided(confidenceLevel, DegreesOfFreedom);
        double sensitivity = Sensitivity(x0);
        if (sensitivity == 0)
        {
            throw new InvalidOperationException(
                FormattableString.Invariant($"The sensitivity dy/dx is 0 at x0 = {Guard.Format(x0)}; the standard error of an inverse prediction there is unbounded."));
        }

        double w0 = NormalisedUnknownWeight(x0, meanResponse, unknownWeight, out string weightNote);
        double s = ResidualStandardDeviation;
        double variance = ((s * s / (replicates * w0)) + (s * s * UnscaledMeanResponseVariance(x0))) / (sensitivity * sensitivity);
        double standardError = Math.Sqrt(variance);
        var status = x0 < MinX ? ExtrapolationStatus.BelowLowestStandard
            : x0 > MaxX ? ExtrapolationStatus.AboveHighestStandard
            : ExtrapolationStatus.WithinRange;
        return new InversePrediction(
            x0,
            standardError,
            Symmetric(x0, t * standardError, confidenceLevel),
            DegreesOfFreedom,
            replicates,
            meanResponse,
            w0,
            status,
            InverseFormula() + "; " + weightNote);
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
        double t = StudentTQuantile.TwoSided(confidenceLevel, DegreesOfFreedom);
        double w0 = NormalisedUnknownWeight(x0, meanResponse, unknownWeight, out _);
        double b = Math.Abs(Slope);
        double s = ResidualStandardDeviation;
        double sxx = Count * _scale * _scale;
        double g = t * t * s * s / (b * b * sxx);
        if (g >= 1)
        {
            return null;
        }

        double k = (1.0 / (replicates * w0)) + (Model == CalibrationModel.Linear ? 1.0 / Count : 0.0);
        double d = x0 - _center;
        double root = (t * s / b) * Math.Sqrt(((1 - g) * k) + (d * d / sxx));
        return new ConfidenceInterval(_center + ((d - root) / (1 - g)), _center + ((d + root) / (1 - g)), confidenceLevel);
    }

    /// <summary>
    /// One step of iterative refinement: residuals of the current coefficients computed with compensated
    /// arithmetic, their least-squares correction solved with the same R (corrected semi-normal equations,
    /// Björck, "Numerical Methods for Least Squares Problems", §2.5). Removes the rounding error that the
    /// back-transformation from the centred basis leaves in the intercept.
    /// </summary>
    private void Refine(double[,] m)
    {
        int p = ParameterCount;
        var z = new double[p];
        var g = new double[p];
        for (int i = 0; i < _x.Length; i++)
        {
            double r = CompensatedResidual(_x[i], _y[i]);
            Basis(_x[i], z);
            for (int j = 0; j < p; j++)
            {
                g[j] += _weights[i] * z[j] * r;
            }
        }

        // δθ = R⁻¹·R⁻ᵀ·g.
        var v = new double[p];
        for (int k = 0; k < p; k++)
        {
            for (int j = 0; j <= k; j++)
            {
                v[k] += _rInverse[j, k] * g[j];
            }
        }

        var deltaTheta = new double[p];
        for (int i = 0; i < p; i++)
        {
            for (int k = i; k < p; k++)
            {
                deltaTheta[i] += _rInverse[i, k] * v[k];
            }
        }

        for (int i = 0; i < p; i++)
        {
            double deltaBeta = 0;
            for (int k = 0; k < p; k++)
            {
                deltaBeta += m[i, k] * deltaTheta[k];
            }

            double refinedTheta = _theta[i] + deltaTheta[i], refinedBeta = _coefficients[i] + deltaBeta;
            if (!double.IsNaN(refinedTheta + refinedBeta) && !double.IsInfinity(refinedTheta + refinedBeta))
            {
                _theta[i] = refinedTheta;
                _coefficients[i] = refinedBeta;
            }
        }
    }

    /// <summary>y − (a + b·x + c·x²) with compensated arithmetic (≈ one rounding of the result).</summary>
    private double CompensatedResidual(double x, double y)
    {
        var sum = default(CompensatedSum);
        sum.Add(y);
        switch (Model)
        {
            case CalibrationModel.LinearThroughOrigin:
                sum.AddProduct(-_coefficients[0], x);
                break;
            case CalibrationModel.Linear:
                sum.Add(-_coefficients[0]);
                sum.AddProduct(-_coefficients[1], x);
                break;
            default:
                sum.Add(-_coefficients[0]);
                sum.AddProduct(-_coefficients[1], x);
                sum.AddProductOfSquare(-_coefficients[2], x);
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

    /// <summary>M with (a, b, c) = M·θ for the basis of <see cref="Basis"/>.</summary>
    private double[,] BackTransform()
    {
        double c = _center, s = _scale;
        return Model switch
        {
            CalibrationModel.LinearThroughOrigin => new[,] { { 1 / s } },
            CalibrationModel.Linear => new[,] { { 1, -c / s }, { 0, 1 / s } },
            _ => new[,]
            {
                { 1, -c / s, (c / s * (c / s)) - 1 },
                { 0, 1 / s, -2 * c / (s * s) },
                { 0, 0, 1 / (s * s) },
            },
        };
    }

    /// <summary>z(x)ᵀ(RᵀR)⁻¹z(x) = ‖R⁻ᵀz(x)‖², so that Var(ŷ(x)) = s²·this.</summary>
    private double UnscaledMeanResponseVariance(double x)
    {
        int p = ParameterCount;
        var z = new double[p];
        Basis(x, z);
        double sum = 0;
        for (int k = 0; k < p; k++)
        {
            double v = 0;
            for (int j = 0; j <= k; j++)
            {
                v += _rInverse[j, k] * z[j];
            }

            sum += v * v;
        }

        return sum;
    }

    /// <summary>Weight of an unknown on the normalised scale, with a note on how it was chosen.</summary>
    private double NormalisedUnknownWeight(double x, double response, double? unknownWeight, out string note)
    {
        if (unknownWeight is double given)
        {
            Guard.Positive(given, nameof(unknownWeight));
            note = FormattableString.Invariant($"w0 = unknownWeight {Guard.Format(given)} supplied by the caller, normalised with the standards' factor");
            return Normalise(given);
        }

        switch (Weighting.Scheme)
        {
            case WeightingScheme.None:
                note = "w0 = 1 (unweighted fit)";
                return 1.0;
            case WeightingScheme.InverseVariance:
            case WeightingScheme.Custom:
                throw new ArgumentException(
                    $"Parameter '{nameof(unknownWeight)}' is required with '{Weighting.Name}' weighting: the weight of the unknown cannot be derived from per-point weights (pass it on the same scale as the standards' weights, e.g. 1/s0²).",
                    nameof(unknownWeight));
        }

        bool atX = Weighting.Scheme is WeightingScheme.InverseX or WeightingScheme.InverseXSquared;
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
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(unknownWeight)}' was not given and the default weight of the unknown, {Weighting.Name} at {(atX ? "x0" : "the response")}, is {Guard.Format(w0)} after normalisation; pass unknownWeight explicitly."),
                nameof(unknownWeight));
        }

        note = atX
            ? FormattableString.Invariant($"w0 = {Weighting.Name} evaluated at x = {Guard.Format(x)}, normalised with the standards' factor")
            : FormattableString.Invariant($"w0 = {Weighting.Name} evaluated at the response y = {Guard.Format(response)}, normalised with the standards' factor");
        return w0;
    }

    private double Normalise(double rawWeight) =>
        Weighting.Scheme == WeightingScheme.None ? rawWeight : rawWeight / _maxRawWeight * _weightNormaliser;

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
        double t0 = _theta[0] - _theta[2] - response, t1 = _theta[1], t2 = _theta[2];
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
        for (int i = 0; i < _x.Length; i++)
        {
            double d = _x[i] - center;
            sum += _weights[i] * d * d;
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
        new(center - halfWidth, center + halfWidth, confidenceLevel);

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

    private static double[] CopyFinite(IReadOnlyList<double> values, string paramName)
    {
        Guard.NotNull(values, paramName);
        var copy = new double[values.Count];
        for (int i = 0; i < copy.Length; i++)
        {
            double v = values[i];
            if (double.IsNaN(v) || double.IsInfinity(v))
            {
                throw new ArgumentException(
                    FormattableString.Invariant($"Parameter '{paramName}' has {Guard.Format(v)} at index {i}; every element must be a finite number."),
                    paramName);
            }

            copy[i] = v;
        }

        return copy;
    }

    private static int CountDistinct(double[] values)
    {
        var sorted = (double[])values.Clone();
        Array.Sort(sorted);
        int distinct = sorted.Length > 0 ? 1 : 0;
        for (int i = 1; i < sorted.Length; i++)
        {
            if (sorted[i] != sorted[i - 1])
            {
                distinct++;
            }
        }

        return distinct;
    }
}
