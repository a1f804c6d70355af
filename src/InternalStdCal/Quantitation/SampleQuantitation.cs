using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Quantitation;

/// <summary>
/// Reads unknowns off a <see cref="RatioCalibration"/>: mean response ratio of the injections → x on the calibration
/// axis (inverse prediction with its standard error and interval) → analyte concentration in the measured solution,
/// using the sample's IS concentration.
/// </summary>
/// <remarks>
/// <para>Ratio axis: C_x = x0·C_is(sample). Concentration axis: C_x = x0·C_is(sample)/C_is(calibration), i.e. the
/// result is corrected when the sample carries a different IS concentration than the standards (a note says so).
/// Both follow from y = f(C_x/C_is). The standard error and limits scale by the same positive factor.</para>
/// <para>The result is flagged as extrapolated when x0 lies outside the fitted non-blank standards (below the lowest
/// or above the highest); it is still reported.</para>
/// </remarks>
public static class SampleQuantitation
{
    /// <summary>Quantifies one unknown.</summary>
    /// <param name="calibration">The calibration.</param>
    /// <param name="sample">The unknown; its IS concentration must be of the calibration's kind.</param>
    /// <param name="confidenceLevel">Confidence level of the interval, in (0, 1); default 0.95.</param>
    /// <param name="intervalMethod">Symmetric (default) or Fieller interval (straight lines).</param>
    /// <returns>The result in the calibration's unit.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The IS concentration is of another kind than the calibration's unit, or the
    /// mean response cannot be read off the calibration function (a quadratic that never reaches it).</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="confidenceLevel"/> is not in (0, 1), or
    /// <paramref name="intervalMethod"/> is not defined.</exception>
    /// <exception cref="InvalidOperationException">The calibration's sensitivity is 0 at the result (zero slope, or the
    /// vertex of a parabola), so no standard error exists.</exception>
    public static QuantitationResult Quantify(RatioCalibration calibration, UnknownSample sample, double confidenceLevel = 0.95, InverseIntervalMethod intervalMethod = InverseIntervalMethod.Symmetric)
    {
        if (intervalMethod is not (InverseIntervalMethod.Symmetric or InverseIntervalMethod.Fieller))
        {
            throw new ArgumentOutOfRangeException(nameof(intervalMethod), intervalMethod, $"Parameter 'intervalMethod' was {(int)intervalMethod}; it must be Symmetric or Fieller.");
        }

        double cIs = InternalStandardInCalibrationUnit(calibration, sample, confidenceLevel);
        StandardSet set = calibration.Set;
        var notes = new List<string>();
        if (calibration.Axis == CalibrationAxis.AnalyteConcentration && cIs != set.ReferenceIs)
        {
            notes.Add("The sample's IS concentration (" + sample.InternalStandardConcentration.ToString("G6", null) + ") differs from the calibration's ("
                + Text.G(set.ReferenceIs) + " " + set.Symbol + "); the result is scaled by their ratio " + Text.G(cIs / set.ReferenceIs) + ".");
        }

        double meanRatio = sample.MeanResponse;
        int m = sample.Injections.Count;
        AxisPrediction p;
        try
        {
            p = calibration.PredictAxis(meanRatio, m, confidenceLevel, intervalMethod);
        }
        catch (ArgumentOutOfRangeException e) when (e.ParamName == "response")
        {
            throw Unreadable(sample, e);
        }

        notes.AddRange(p.Notes);
        ExtrapolationStatus status = Extrapolation(calibration, p.X);
        if (status != ExtrapolationStatus.WithinRange)
        {
            notes.Add("x0 = " + Text.G(p.X) + " " + calibration.AxisUnitSymbol + " lies outside the calibrated range "
                + Text.G(calibration.LowestX) + " to " + Text.G(calibration.HighestX) + " " + calibration.AxisUnitSymbol + " (extrapolation).");
        }

        var perInjection = new List<Concentration>(m);
        for (int j = 0; j < m; j++)
        {
            if (calibration.InverseAxis(sample.Injections[j].Ratio) is double xj)
            {
                perInjection.Add(calibration.Conc(set.ToConcentration(xj, cIs)));
            }
            else
            {
                notes.Add("Injection #" + Text.I(j + 1) + " (ratio " + Text.G(sample.Injections[j].Ratio) + ") cannot be read off the calibration function; left out of the per-injection list.");
            }
        }

        Concentration? spread = null;
        if (perInjection.Count > 1)
        {
            double[] values = perInjection.Select(c => c.Value).ToArray();
            spread = calibration.Conc(SampleStatistics.StandardDeviation(values, SampleStatistics.Mean(values)));
        }

        return new QuantitationResult(
            sample,
            calibration.Model,
            meanRatio,
            ToConcentration(calibration, p.X, cIs),
            ToConcentration(calibration, p.StandardError, cIs),
            ToConcentration(calibration, p.Lower, cIs),
            ToConcentration(calibration, p.Upper, cIs),
            confidenceLevel,
            p.DegreesOfFreedom,
            p.Method,
            status,
            perInjection,
            spread,
            notes);
    }

    /// <summary>
    /// The numbers <see cref="Quantify"/> gives (concentration, interval, extrapolation), bit for bit and with the same exceptions, without notes, method text or per-injection values:
    /// for batch processing that builds the full result only when it is asked for. Takes the parts of a valid
    /// <see cref="UnknownSample"/>: its label (<paramref name="sample"/>, so that exceptions name the same parameter), IS
    /// concentration, mean ratio (as <see cref="UnknownSample.MeanResponse"/> forms it) and number of injections.
    /// </summary>
    internal static QuantitationEstimate Estimate(RatioCalibration calibration, string sample, Concentration internalStandardConcentration, double meanRatio, int injections, double confidenceLevel, InverseIntervalMethod intervalMethod)
    {
        double cIs = InternalStandardInCalibrationUnit(calibration, sample, internalStandardConcentration, confidenceLevel);
        AxisEstimate p;
        try
        {
            p = calibration.EstimateAxis(meanRatio, injections, confidenceLevel, intervalMethod);
        }
        catch (ArgumentOutOfRangeException e) when (e.ParamName == "response")
        {
            throw Unreadable(sample, e);
        }

        return new QuantitationEstimate(
            meanRatio,
            ToConcentration(calibration, p.X, cIs),
            ToConcentration(calibration, p.Lower, cIs),
            ToConcentration(calibration, p.Upper, cIs),
            Extrapolation(calibration, p.X));
    }

    /// <summary>Quantifies several unknowns with the same calibration.</summary>
    /// <param name="calibration">The calibration.</param>
    /// <param name="samples">The unknowns.</param>
    /// <param name="confidenceLevel">Confidence level, in (0, 1).</param>
    /// <param name="intervalMethod">Symmetric (default) or Fieller interval.</param>
    /// <returns>One result per sample, in order.</returns>
    /// <exception cref="ArgumentNullException">An argument or element is null.</exception>
    /// <exception cref="ArgumentException">As for <see cref="Quantify"/>.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="confidenceLevel"/> is not in (0, 1).</exception>
    /// <exception cref="InvalidOperationException">As for <see cref="Quantify"/>.</exception>
    public static IReadOnlyList<QuantitationResult> QuantifyAll(RatioCalibration calibration, IEnumerable<UnknownSample> samples, double confidenceLevel = 0.95, InverseIntervalMethod intervalMethod = InverseIntervalMethod.Symmetric) =>
        Guard.NotNull(samples, nameof(samples)).Select(s => Quantify(calibration, s, confidenceLevel, intervalMethod)).ToList();

    // Checks shared by Quantify and Estimate; the sample's IS concentration in the calibration's unit.
    private static double InternalStandardInCalibrationUnit(RatioCalibration calibration, UnknownSample sample, double confidenceLevel)
    {
        Guard.NotNull(calibration, nameof(calibration));
        Guard.NotNull(sample, nameof(sample));
        return InternalStandardInCalibrationUnit(calibration, sample.Label, sample.InternalStandardConcentration, confidenceLevel);
    }

    // sample: the sample's label.
    private static double InternalStandardInCalibrationUnit(RatioCalibration calibration, string sample, Concentration isConc, double confidenceLevel)
    {
        Guard.InOpenRange(confidenceLevel, 0, 1, nameof(confidenceLevel));
        if (isConc.Kind != Concentration.KindOf(calibration.Unit))
        {
            throw new ArgumentException(
                $"Parameter 'sample': the IS concentration of '{sample}' is {isConc} ({isConc.Kind}) but the calibration is in {Concentration.SymbolOf(calibration.Unit)} ({Concentration.KindOf(calibration.Unit)}); the kinds must match.",
                nameof(sample));
        }

        return isConc.In(calibration.Unit);
    }

    private static ArgumentException Unreadable(UnknownSample sample, ArgumentOutOfRangeException e) => Unreadable(sample.Label, e);

    // sample: the sample's label.
    private static ArgumentException Unreadable(string sample, ArgumentOutOfRangeException e) =>
        new($"Parameter 'sample': the mean ratio of '{sample}' cannot be read off the calibration function. {e.Message}", nameof(sample), e);

    private static ExtrapolationStatus Extrapolation(RatioCalibration calibration, double x) =>
        x < calibration.LowestX ? ExtrapolationStatus.BelowLowestStandard
        : x > calibration.HighestX ? ExtrapolationStatus.AboveHighestStandard
        : ExtrapolationStatus.WithinRange;

    private static Concentration ToConcentration(RatioCalibration calibration, double axisValue, double cIs) =>
        calibration.Conc(calibration.Set.ToConcentration(axisValue, cIs));

    private static Concentration? ToConcentration(RatioCalibration calibration, double? axisValue, double cIs) =>
        axisValue is double v ? ToConcentration(calibration, v, cIs) : null;
}
