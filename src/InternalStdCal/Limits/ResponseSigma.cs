using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;

namespace InternalStdCal.Limits;

/// <summary>
/// The standard deviation σ of the response (response-ratio units of the calibration) that <see cref="IchLimits"/>
/// divides by the slope, together with where it came from. Immutable; σ is finite and &gt; 0.
/// </summary>
/// <remarks>The four choices are those ICH Q2(R2) lists for the "standard deviation of the response and the slope"
/// approach; the caller picks one and the result says which (<see cref="Source"/>).</remarks>
public sealed class ResponseSigma
{
    private ResponseSigma(double value, SigmaSource source, int? degreesOfFreedom, string description)
    {
        Value = value;
        Source = source;
        DegreesOfFreedom = degreesOfFreedom;
        Description = description;
    }

    /// <summary>σ in response units (the calibration's y, i.e. response ratio analyte/IS); &gt; 0.</summary>
    public double Value { get; }

    /// <summary>Which of the ICH choices σ is.</summary>
    public SigmaSource Source { get; }

    /// <summary>Degrees of freedom of σ when known (n − 1 for a set of values, n − p for a calibration); null when σ
    /// was given as a number.</summary>
    public int? DegreesOfFreedom { get; }

    /// <summary>Short human-readable description, e.g. "residual SD s_y/x of the calibration (ν = 5)".</summary>
    public string Description { get; }

    /// <summary>σ = the standard deviation of blank responses, computed from the responses (sample SD, n − 1).</summary>
    /// <param name="responses">Responses of at least 2 blanks, response-ratio units; finite, not all equal.</param>
    /// <returns>σ with <see cref="SigmaSource.BlankResponses"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="responses"/> is null.</exception>
    /// <exception cref="ArgumentException">Fewer than 2 responses, a value not finite, or all values equal (SD 0).</exception>
    public static ResponseSigma FromBlankResponses(IReadOnlyList<double> responses) =>
        FromValues(responses, nameof(responses), SigmaSource.BlankResponses, "SD of {0} blank responses");

    /// <summary>σ = a standard deviation of blank responses the caller has already determined.</summary>
    /// <param name="standardDeviation">SD of the blank responses, response-ratio units; finite and &gt; 0.</param>
    /// <returns>σ with <see cref="SigmaSource.BlankResponses"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="standardDeviation"/> is not finite and &gt; 0.</exception>
    public static ResponseSigma FromBlankStandardDeviation(double standardDeviation) =>
        new(Guard.Positive(standardDeviation, nameof(standardDeviation)), SigmaSource.BlankResponses, null, "SD of blank responses (given)");

    /// <summary>σ = the residual standard deviation s_y/x of an unweighted straight-line calibration.</summary>
    /// <param name="calibration">An unweighted straight line (with intercept or through the origin) with s_y/x &gt; 0.</param>
    /// <returns>σ with <see cref="SigmaSource.ResidualStandardDeviation"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="calibration"/> is null.</exception>
    /// <exception cref="ArgumentException">Not a straight line, weighted (the weighted s_y/x is not the SD of one
    /// response), a slope ≤ 0, or s_y/x = 0 (perfect fit).</exception>
    public static ResponseSigma FromResidual(RegressionCalibration calibration)
    {
        RegressionFit fit = LimitCalibration.StraightLine(calibration, nameof(calibration), "σ = s_y/x", allowThroughOrigin: true, requireOrdinaryLeastSquares: false);
        if (fit.Weighting.Scheme != WeightingScheme.None)
        {
            throw new ArgumentException(
                $"Parameter 'calibration' is weighted ('{fit.Weighting.Name}'); its s_y/x is on the normalised-weight scale, not the SD of one response. Use an unweighted line or another σ.",
                nameof(calibration));
        }

        return new ResponseSigma(PositiveSd(fit.ResidualStandardDeviation, "s_y/x", nameof(calibration)), SigmaSource.ResidualStandardDeviation, fit.DegreesOfFreedom, FormattableString.Invariant($"residual SD s_y/x of the calibration (ν = {fit.DegreesOfFreedom})"));
    }

    /// <summary>σ = the standard error of the intercept of a straight-line calibration with intercept.</summary>
    /// <param name="calibration">A straight line with intercept (weighted or not) whose intercept SE is &gt; 0.</param>
    /// <returns>σ with <see cref="SigmaSource.InterceptStandardError"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="calibration"/> is null.</exception>
    /// <exception cref="ArgumentException">Not a straight line with intercept, a slope ≤ 0, or the SE is 0 (perfect fit).</exception>
    public static ResponseSigma FromInterceptStandardError(RegressionCalibration calibration)
    {
        RegressionFit fit = LimitCalibration.StraightLine(calibration, nameof(calibration), "σ = SE of the intercept", allowThroughOrigin: false, requireOrdinaryLeastSquares: false);
        return new ResponseSigma(PositiveSd(fit.StandardErrors[0], "the intercept's standard error", nameof(calibration)), SigmaSource.InterceptStandardError, fit.DegreesOfFreedom, FormattableString.Invariant($"standard error of the intercept (ν = {fit.DegreesOfFreedom})"));
    }

    /// <summary>σ = the standard deviation of the intercepts of several calibration lines (sample SD, n − 1).</summary>
    /// <param name="intercepts">Intercepts of at least 2 lines, response-ratio units; finite, not all equal.</param>
    /// <returns>σ with <see cref="SigmaSource.InterceptsOfSeveralLines"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="intercepts"/> is null.</exception>
    /// <exception cref="ArgumentException">Fewer than 2 intercepts, a value not finite, or all equal (SD 0).</exception>
    public static ResponseSigma FromInterceptsOfLines(IReadOnlyList<double> intercepts) =>
        FromValues(intercepts, nameof(intercepts), SigmaSource.InterceptsOfSeveralLines, "SD of the intercepts of {0} calibration lines");

    /// <summary>Prints "σ = 0.432848 (residual SD s_y/x of the calibration (ν = 5))".</summary>
    /// <returns>The text.</returns>
    public override string ToString() => "σ = " + Text.G(Value) + " (" + Description + ")";

    private static ResponseSigma FromValues(IReadOnlyList<double> values, string paramName, SigmaSource source, string what)
    {
        double[] v = LimitCalibration.Finite(values, 2, paramName);
        double sd = LimitCalibration.StandardDeviation(v);
        if (!(sd > 0) || Array.TrueForAll(v, x => x == v[0]))
        {
            throw new ArgumentException($"Parameter '{paramName}' holds {Text.I(v.Length)} equal values; their SD is 0 and gives no limit.", paramName);
        }

        return new ResponseSigma(sd, source, v.Length - 1, string.Format(System.Globalization.CultureInfo.InvariantCulture, what, v.Length) + FormattableString.Invariant($" (ν = {v.Length - 1})"));
    }

    private static double PositiveSd(double value, string what, string paramName)
    {
        if (!(value > 0))
        {
            throw new ArgumentException($"Parameter 'calibration' has {what} = {Guard.Format(value)} (a perfect fit); it gives no limit.", paramName);
        }

        return value;
    }
}
