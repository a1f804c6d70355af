using System;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>
/// Detection and quantitation limits from the standard deviation of the response and the slope, ICH Q2(R2):
/// LOD = 3.3·σ/S, LOQ = 10·σ/S.
/// </summary>
/// <remarks>
/// <para>σ is chosen by the caller (<see cref="ResponseSigma"/>); S is the slope of a straight-line
/// <see cref="RegressionCalibration"/> or a given number. ICH Q2(R2) asks for the estimate to be confirmed with samples at
/// or near the limit.</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice decide
/// which limit is reported.</para>
/// </remarks>
public static class IchLimits
{
    /// <summary>Factor 3.3 of LOD = 3.3·σ/S (ICH Q2(R2)).</summary>
    public const double DefaultDetectionFactor = 3.3;

    /// <summary>Factor 10 of LOQ = 10·σ/S (ICH Q2(R2)).</summary>
    public const double DefaultQuantificationFactor = 10;

    /// <summary>LOD and LOQ with S = the slope of a straight-line calibration, in the calibration's unit.</summary>
    /// <param name="sigma">σ of the response, in the calibration's response-ratio units.</param>
    /// <param name="calibration">A straight line (with intercept or through the origin), weighted or not, slope &gt; 0.</param>
    /// <param name="internalStandardConcentration">IS concentration of the samples the limits are for: required on the
    /// concentration-ratio axis (x·C_is is the concentration); on the concentration axis optional (default: the
    /// calibration's IS concentration; a different one scales the limits by C_is/C_is,cal).</param>
    /// <param name="detectionFactor">k_D of LOD = k_D·σ/S; default 3.3 (ICH). Other factors (e.g. 3 for "blank + 3s")
    /// are named in the result's formula as not the ICH default. Finite, &gt; 0.</param>
    /// <param name="quantificationFactor">k_Q of LOQ = k_Q·σ/S; default 10 (ICH); finite, ≥ <paramref name="detectionFactor"/>.</param>
    /// <returns>The limits with σ, its source, S and the formula.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="sigma"/> or <paramref name="calibration"/> is null.</exception>
    /// <exception cref="ArgumentException">The calibration is not a straight line or its slope is ≤ 0; the IS concentration
    /// is missing on the ratio axis or of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A factor is out of range, the IS concentration is ≤ 0, or
    /// k_Q·σ/S overflows.</exception>
    public static IchLimitResult Compute(ResponseSigma sigma, RegressionCalibration calibration, Concentration? internalStandardConcentration = null, double detectionFactor = DefaultDetectionFactor, double quantificationFactor = DefaultQuantificationFactor)
    {
        Guard.NotNull(sigma, nameof(sigma));
        RegressionFit fit = LimitCalibration.StraightLine(calibration, nameof(calibration), "the σ/S method", allowThroughOrigin: true, requireOrdinaryLeastSquares: false);
        CheckFactors(detectionFactor, quantificationFactor);
        double factor = LimitCalibration.AxisFactor(calibration, internalStandardConcentration, nameof(internalStandardConcentration));
        string slopeText = "S = slope of the calibration, " + Text.G(fit.Slope) + " per " + calibration.AxisUnitSymbol
            + (factor == 1 ? string.Empty : "; axis value × " + Text.G(factor) + " gives the concentration");
        return Create(sigma, fit.Slope, factor, calibration.Unit, detectionFactor, quantificationFactor, slopeText);
    }

    /// <summary>LOD and LOQ with a given slope S.</summary>
    /// <param name="sigma">σ of the response (response units).</param>
    /// <param name="slope">S in response units per <paramref name="unit"/>; finite, &gt; 0.</param>
    /// <param name="unit">Concentration unit the slope refers to; the limits are in it.</param>
    /// <param name="detectionFactor">As for the calibration overload.</param>
    /// <param name="quantificationFactor">As for the calibration overload.</param>
    /// <returns>The limits.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="sigma"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The slope or a factor is out of range, the unit is not defined,
    /// or k_Q·σ/S overflows.</exception>
    public static IchLimitResult ComputeForSlope(ResponseSigma sigma, double slope, ConcentrationUnit unit, double detectionFactor = DefaultDetectionFactor, double quantificationFactor = DefaultQuantificationFactor)
    {
        Guard.NotNull(sigma, nameof(sigma));
        Guard.Positive(slope, nameof(slope));
        string symbol = Concentration.SymbolOf(unit);
        CheckFactors(detectionFactor, quantificationFactor);
        return Create(sigma, slope, 1.0, unit, detectionFactor, quantificationFactor, "S = " + Text.G(slope) + " per " + symbol + " (given)");
    }

    private static void CheckFactors(double detectionFactor, double quantificationFactor)
    {
        Guard.Positive(detectionFactor, nameof(detectionFactor));
        if (!(quantificationFactor >= detectionFactor) || double.IsInfinity(quantificationFactor))
        {
            throw Guard.OutOfRange(nameof(quantificationFactor), quantificationFactor, "finite and >= detectionFactor (" + Guard.Format(detectionFactor) + ")");
        }
    }

    private static IchLimitResult Create(ResponseSigma sigma, double slope, double axisFactor, ConcentrationUnit unit, double kd, double kq, string slopeText)
    {
        double perSlope = sigma.Value / slope * axisFactor;
        Guard.FiniteResult(kq * perSlope, sigma.Value, nameof(sigma), "k_Q·σ/S"); // LOD and LOQ must be finite (common practice)
        bool ich = kd == DefaultDetectionFactor && kq == DefaultQuantificationFactor;
        string formula = "LOD = " + Text.G(kd) + "·σ/S, LOQ = " + Text.G(kq) + "·σ/S; " + sigma + "; " + slopeText;
        string source = ich
            ? "ICH Q2(R2), detection and quantitation limits based on the standard deviation of the response and the slope"
            : "σ/S approach of ICH Q2(R2) with factors chosen by the caller (not the ICH defaults 3.3 and 10)";
        return new IchLimitResult(
            Concentration.From(kd * perSlope, unit),
            Concentration.From(kq * perSlope, unit),
            sigma,
            slope,
            kd,
            kq,
            formula,
            source);
    }
}
