using System;
using System.Globalization;

namespace InternalStdCal.Calibration;

/// <summary>
/// Result of an inverse prediction: the x (concentration) of an unknown from the mean of its replicate
/// responses, with its standard error and confidence interval (see <see cref="RegressionFit.InversePredict"/>).
/// </summary>
/// <remarks>Immutable. Units: <see cref="Value"/>, <see cref="StandardError"/> and the interval are in x
/// units; <see cref="MeanResponse"/> in y units.</remarks>
public sealed class InversePrediction
{
    internal InversePrediction(
        double value,
        double standardError,
        ConfidenceInterval interval,
        int degreesOfFreedom,
        int replicates,
        double meanResponse,
        double unknownWeight,
        ExtrapolationStatus extrapolation,
        string method)
    {
        Value = value;
        StandardError = standardError;
        Interval = interval;
        DegreesOfFreedom = degreesOfFreedom;
        Replicates = replicates;
        MeanResponse = meanResponse;
        UnknownWeight = unknownWeight;
        Extrapolation = extrapolation;
        Method = method;
    }

    /// <summary>Predicted x0 (x units).</summary>
    public double Value { get; }

    /// <summary>Standard error s_x0 of <see cref="Value"/> (x units; ≥ 0, 0 for a perfect fit).</summary>
    public double StandardError { get; }

    /// <summary>Symmetric interval x0 ± t((1 + P)/2, n − p)·s_x0.</summary>
    public ConfidenceInterval Interval { get; }

    /// <summary>Degrees of freedom of the t quantile, n − p (points minus fitted parameters).</summary>
    public int DegreesOfFreedom { get; }

    /// <summary>Number m of replicate responses averaged into <see cref="MeanResponse"/> (≥ 1).</summary>
    public int Replicates { get; }

    /// <summary>Mean response ȳ0 of the unknown (y units).</summary>
    public double MeanResponse { get; }

    /// <summary>
    /// Weight w0 of the unknown on the fit's normalised scale (the scale of <see cref="RegressionFit.Weights"/>,
    /// Σw = n); 1 for an unweighted fit.
    /// </summary>
    public double UnknownWeight { get; }

    /// <summary>Position of x0 relative to the standards.</summary>
    public ExtrapolationStatus Extrapolation { get; }

    /// <summary>True unless <see cref="Extrapolation"/> is <see cref="ExtrapolationStatus.WithinRange"/>.</summary>
    public bool IsExtrapolated => Extrapolation != ExtrapolationStatus.WithinRange;

    /// <summary>Which formula gave <see cref="StandardError"/> and how <see cref="UnknownWeight"/> was chosen.</summary>
    public string Method { get; }

    /// <summary>Invariant text such as <c>6.2072 ± 0.6163 (95%)</c>, shortest round-trip digits.</summary>
    /// <returns>Text for display.</returns>
    public override string ToString() =>
        string.Format(
            CultureInfo.InvariantCulture,
            "{0} ± {1} ({2})",
            Value.ToString("R", CultureInfo.InvariantCulture),
            Interval.HalfWidth.ToString("R", CultureInfo.InvariantCulture),
            Interval.ConfidenceLevel.ToString("0.######%", CultureInfo.InvariantCulture));
}
