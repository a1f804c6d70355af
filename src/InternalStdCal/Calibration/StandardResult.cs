using System.Collections.Generic;
using InternalStdCal.Quantities;

// A regression calibration's standardised residuals are read from its fit on first use (the fit computes its residual
// views lazily); other calibrations give the values.

namespace InternalStdCal.Calibration;

/// <summary>How one calibration standard came out of a calibration: its mean response, fitted response,
/// residual, back-calculated concentration and relative error, and the same for each of its injections.</summary>
/// <remarks>Responses are analyte/IS signal ratios (dimensionless). Concentrations are in the calibration's unit.</remarks>
public sealed class StandardResult
{
    private readonly double? _standardizedResidual;
    private readonly RegressionFit? _fit;
    private readonly int _point;

    // fit and point: the regression and fit-point index whose standardised residual this is (then standardizedResidual is unused).
    internal StandardResult(
        CalibrationStandard standard,
        bool included,
        double x,
        double meanResponse,
        double? responseStandardDeviation,
        double fittedResponse,
        double? standardizedResidual,
        Concentration? backCalculated,
        double? relativeErrorPercent,
        double? responseFactor,
        IReadOnlyList<InjectionResult> injections,
        RegressionFit? fit = null,
        int point = -1)
    {
        Standard = standard;
        Included = included;
        X = x;
        MeanResponse = meanResponse;
        ResponseStandardDeviation = responseStandardDeviation;
        FittedResponse = fittedResponse;
        _standardizedResidual = standardizedResidual;
        _fit = fit;
        _point = point;
        BackCalculated = backCalculated;
        RelativeErrorPercent = relativeErrorPercent;
        ResponseFactor = responseFactor;
        Injections = injections;
    }

    /// <summary>The standard as given.</summary>
    public CalibrationStandard Standard { get; }

    /// <summary>Label of the standard.</summary>
    public string Label => Standard.Label;

    /// <summary>True when the standard is a blank (nominal analyte concentration 0).</summary>
    public bool IsBlank => Standard.IsBlank;

    /// <summary>False when the standard was left out of the fit (a blank under <see cref="BlankHandling.Exclude"/>).</summary>
    public bool Included { get; }

    /// <summary>x of the standard on the calibration axis: the analyte concentration in the calibration unit, or the
    /// dimensionless ratio analyte/IS concentration (see <see cref="RatioCalibration.Axis"/>).</summary>
    public double X { get; }

    /// <summary>Mean response ratio (analyte/IS) of the injections, dimensionless.</summary>
    public double MeanResponse { get; }

    /// <summary>Standard deviation of the injection ratios (n − 1 denominator); null with a single injection.</summary>
    public double? ResponseStandardDeviation { get; }

    /// <summary>Response predicted by the calibration function at <see cref="X"/>.</summary>
    public double FittedResponse { get; }

    /// <summary>Mean response − fitted response (dimensionless ratio units).</summary>
    public double Residual => MeanResponse - FittedResponse;

    /// <summary>The standardised residual of this level's point when the fit used level means (see
    /// <see cref="ReplicateHandling.LevelMeans"/>); otherwise null (see the injections). For the response-factor
    /// model: the z-score (RF_i − mean RF)/SD of the level's response factor.</summary>
    public double? StandardizedResidual => _fit is null ? _standardizedResidual : _fit.StandardizedResiduals[_point];

    /// <summary>Concentration read back from the mean response through the calibration function; null when the
    /// function cannot be inverted at that response (e.g. a quadratic with no real root).</summary>
    public Concentration? BackCalculated { get; }

    /// <summary>Relative error of the back-calculated concentration, 100·(x' − x)/x in %; null for a blank
    /// (undefined at x = 0) or when there is no back-calculated value.</summary>
    public double? RelativeErrorPercent { get; }

    /// <summary>Relative response factor of the level, (A_x·C_is)/(A_is·C_x) from the mean ratio (SW-846 Method
    /// 8000C §11.4.3); null for a blank.</summary>
    public double? ResponseFactor { get; }

    /// <summary>Per-injection results, in the order of <see cref="CalibrationStandard.Injections"/>.</summary>
    public IReadOnlyList<InjectionResult> Injections { get; }
}

/// <summary>How one injection of a calibration standard came out of a calibration.</summary>
public sealed class InjectionResult
{
    private readonly double? _standardizedResidual;
    private readonly RegressionFit? _fit;
    private readonly int _point;

    // fit and point: as for StandardResult.
    internal InjectionResult(
        Injection injection,
        double fittedResponse,
        double? standardizedResidual,
        Concentration? backCalculated,
        double? relativeErrorPercent,
        double? responseFactor,
        RegressionFit? fit = null,
        int point = -1)
    {
        Injection = injection;
        FittedResponse = fittedResponse;
        _standardizedResidual = standardizedResidual;
        _fit = fit;
        _point = point;
        BackCalculated = backCalculated;
        RelativeErrorPercent = relativeErrorPercent;
        ResponseFactor = responseFactor;
    }

    /// <summary>The injection as given.</summary>
    public Injection Injection { get; }

    /// <summary>Response ratio analyte/IS of the injection.</summary>
    public double Response => Injection.Ratio;

    /// <summary>Response predicted by the calibration function at the standard's x.</summary>
    public double FittedResponse { get; }

    /// <summary>Response − fitted response.</summary>
    public double Residual => Response - FittedResponse;

    /// <summary>Standardised residual when every injection was a fit point (see
    /// <see cref="ReplicateHandling.EveryInjection"/>), otherwise null. For the response-factor model: the z-score
    /// (RF_ij − mean RF)/SD.</summary>
    public double? StandardizedResidual => _fit is null ? _standardizedResidual : _fit.StandardizedResiduals[_point];

    /// <summary>Concentration read back from this injection's response; null when not invertible.</summary>
    public Concentration? BackCalculated { get; }

    /// <summary>100·(x' − x)/x in %; null for a blank or when there is no back-calculated value.</summary>
    public double? RelativeErrorPercent { get; }

    /// <summary>Relative response factor of this injection; null for a blank.</summary>
    public double? ResponseFactor { get; }
}
