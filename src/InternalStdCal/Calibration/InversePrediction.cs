namespace InternalStdCal.Calibration;

/// <summary>
/// Result of an inverse prediction: the x (concentration) of an unknown from the mean of its replicate
/// responses, with its standard error and confidence interval (see <see cref="RegressionFit.InversePredict"/>).
/// </summary>
/// <remarks>Immutable. Units: <see cref="Value"/>, <see cref="StandardError"/> and the interval are in x
/// units; <see cref="MeanResponse"/> in y units.</remarks>
public sealed class InversePrediction
{
    private readonly InverseEstimate _estimate;

    internal InversePrediction(InverseEstimate estimate, string method)
    {
        _estimate = estimate;
        Method = method;
    }

    /// <summary>Predicted x0 (x units).</summary>
    public double Value => _estimate.Value;

    /// <summary>Standard error s_x0 of <see cref="Value"/> (x units; ≥ 0, 0 for a perfect fit).</summary>
    public double StandardError => _estimate.StandardError;

    /// <summary>Symmetric interval x0 ± t((1 + P)/2, n − p)·s_x0.</summary>
    public ConfidenceInterval Interval => _estimate.Interval;

    /// <summary>Degrees of freedom of the t quantile, n − p (points minus fitted parameters).</summary>
    public int DegreesOfFreedom => _estimate.DegreesOfFreedom;

    /// <summary>Number m of replicate responses averaged into <see cref="MeanResponse"/> (≥ 1).</summary>
    public int Replicates => _estimate.Replicates;

    /// <summary>Mean response ȳ0 of the unknown (y units).</summary>
    public double MeanResponse => _estimate.MeanResponse;

    /// <summary>
    /// Weight w0 of the unknown on the fit's normalised scale (the scale of <see cref="RegressionFit.Weights"/>,
    /// Σw = n); 1 for an unweighted fit.
    /// </summary>
    public double UnknownWeight => _estimate.UnknownWeight;

    /// <summary>Position of x0 relative to the standards.</summary>
    public ExtrapolationStatus Extrapolation => _estimate.Extrapolation;

    /// <summary>True unless <see cref="Extrapolation"/> is <see cref="ExtrapolationStatus.WithinRange"/>.</summary>
    public bool IsExtrapolated => _estimate.IsExtrapolated;

    /// <summary>Which formula gave <see cref="StandardError"/> and how <see cref="UnknownWeight"/> was chosen.</summary>
    public string Method { get; }

    /// <summary>Invariant text such as <c>6.2072 ± 0.6163 (95%)</c>, shortest round-trip digits.</summary>
    /// <returns>Text for display.</returns>
    public override string ToString() => _estimate.ToString();
}
