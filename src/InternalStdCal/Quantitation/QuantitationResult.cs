using System.Collections.Generic;
using System.Text;
using InternalStdCal.Calibration;
using InternalStdCal.Quantities;

namespace InternalStdCal.Quantitation;

/// <summary>
/// The concentration of an unknown read off a <see cref="RatioCalibration"/>, in the calibration's unit, with its
/// standard error, confidence interval, the method used, and whether it was extrapolated.
/// </summary>
public sealed class QuantitationResult
{
    internal QuantitationResult(
        UnknownSample sample,
        RatioModel model,
        double meanResponse,
        Concentration concentration,
        Concentration? standardError,
        Concentration? lower,
        Concentration? upper,
        double confidenceLevel,
        double? degreesOfFreedom,
        string method,
        ExtrapolationStatus extrapolation,
        IReadOnlyList<Concentration> injectionConcentrations,
        Concentration? injectionStandardDeviation,
        IReadOnlyList<string> notes)
    {
        Sample = sample;
        Model = model;
        MeanResponse = meanResponse;
        Concentration = concentration;
        StandardError = standardError;
        Lower = lower;
        Upper = upper;
        ConfidenceLevel = confidenceLevel;
        DegreesOfFreedom = degreesOfFreedom;
        Method = method;
        Extrapolation = extrapolation;
        InjectionConcentrations = injectionConcentrations;
        InjectionStandardDeviation = injectionStandardDeviation;
        Notes = notes;
    }

    /// <summary>The sample measured.</summary>
    public UnknownSample Sample { get; }

    /// <summary>The calibration function used.</summary>
    public RatioModel Model { get; }

    /// <summary>Mean response ratio analyte/IS of the sample's injections.</summary>
    public double MeanResponse { get; }

    /// <summary>Number of injections averaged (m).</summary>
    public int Replicates => Sample.Injections.Count;

    /// <summary>The analyte concentration in the measured solution, in the calibration's unit.</summary>
    public Concentration Concentration { get; }

    /// <summary>Standard error of <see cref="Concentration"/> (s_x0 for regression models); null when the
    /// calibration gives no spread (single response factor).</summary>
    public Concentration? StandardError { get; }

    /// <summary>Lower confidence limit; null with <see cref="StandardError"/>, or when the interval is unbounded
    /// (Fieller interval with an insignificant slope).</summary>
    public Concentration? Lower { get; }

    /// <summary>Upper confidence limit; null as <see cref="Lower"/>.</summary>
    public Concentration? Upper { get; }

    /// <summary>Confidence level of the interval, in (0, 1).</summary>
    public double ConfidenceLevel { get; }

    /// <summary>Degrees of freedom of the standard error and the t quantile; null when no interval.</summary>
    public double? DegreesOfFreedom { get; }

    /// <summary>How the concentration and its interval were obtained.</summary>
    public string Method { get; }

    /// <summary>Where x0 lies relative to the fitted non-blank standards (a blank is not the lower end of the
    /// calibrated range); anything but <see cref="ExtrapolationStatus.WithinRange"/> is an extrapolation.</summary>
    public ExtrapolationStatus Extrapolation { get; }

    /// <summary>True when <see cref="Extrapolation"/> is not <see cref="ExtrapolationStatus.WithinRange"/>.</summary>
    public bool IsExtrapolated => Extrapolation != ExtrapolationStatus.WithinRange;

    /// <summary>Concentration read off each injection separately (same unit), in injection order. An injection whose
    /// response cannot be inverted (quadratic without a real root) is left out, with a note.</summary>
    public IReadOnlyList<Concentration> InjectionConcentrations { get; }

    /// <summary>Sample standard deviation of <see cref="InjectionConcentrations"/> (replicate spread); null with
    /// fewer than two values.</summary>
    public Concentration? InjectionStandardDeviation { get; }

    /// <summary>Anything a reviewer should know (extrapolation, IS concentration differing from the calibration's, …).</summary>
    public IReadOnlyList<string> Notes { get; }

    /// <summary>The result as a <see cref="Measured{T}"/>: value and standard error as a Type A evaluation (JCGM
    /// 100:2008 §4.2) with the degrees of freedom when ≥ 1.</summary>
    /// <returns>The measured value, or null when there is no standard error (single response factor).</returns>
    public Measured<Concentration>? AsMeasured() => StandardError is Concentration se
        ? (DegreesOfFreedom is double df && df >= 1
            ? Measured.TypeA(Concentration, se, df)
            : Measured.WithStandardUncertainty(Concentration, se, null, UncertaintyEvaluation.TypeA))
        : null;

    /// <summary>Readable report with units: the result line, the method line and any notes.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(Sample.Label).Append(": ").Append(Concentration.ToString("G6", null));
        if (StandardError is Concentration se)
        {
            sb.Append(", s = ").Append(se.ToString("G4", null));
        }

        if (Lower is Concentration lo && Upper is Concentration hi)
        {
            sb.Append(", ").Append(Text.F(100 * ConfidenceLevel, 0)).Append(" % CI [").Append(lo.ToString("G6", null))
                .Append(", ").Append(hi.ToString("G6", null)).Append(']');
        }

        if (DegreesOfFreedom is double df)
        {
            sb.Append(", ν = ").Append(Text.G(df));
        }

        sb.Append(" (m = ").Append(Text.I(Replicates)).Append(", mean ratio ").Append(Text.G(MeanResponse)).Append(')');
        sb.Append(Extrapolation switch
        {
            ExtrapolationStatus.BelowLowestStandard => " — EXTRAPOLATED below the lowest standard",
            ExtrapolationStatus.AboveHighestStandard => " — EXTRAPOLATED above the highest standard",
            _ => string.Empty,
        });
        sb.AppendLine().Append("  method: ").Append(Method);
        foreach (string note in Notes)
        {
            sb.AppendLine().Append("  note: ").Append(note);
        }

        return sb.ToString();
    }
}
