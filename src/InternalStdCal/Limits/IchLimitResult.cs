using InternalStdCal.Calibration;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>Detection and quantitation limits by the σ/S approach (<see cref="IchLimits"/>), with everything used to get
/// them. Immutable.</summary>
public sealed class IchLimitResult
{
    internal IchLimitResult(Concentration detectionLimit, Concentration quantificationLimit, ResponseSigma sigma, double slope, double detectionFactor, double quantificationFactor, string formula, string source)
    {
        DetectionLimit = detectionLimit;
        QuantificationLimit = quantificationLimit;
        Sigma = sigma;
        Slope = slope;
        DetectionFactor = detectionFactor;
        QuantificationFactor = quantificationFactor;
        Formula = formula;
        Source = source;
    }

    /// <summary>LOD = k_D·σ/S (calibration's unit).</summary>
    public Concentration DetectionLimit { get; }

    /// <summary>LOQ = k_Q·σ/S (same unit).</summary>
    public Concentration QuantificationLimit { get; }

    /// <summary>σ used, with its source.</summary>
    public ResponseSigma Sigma { get; }

    /// <summary>Which σ was chosen (same as <c>Sigma.Source</c>).</summary>
    public SigmaSource SigmaSource => Sigma.Source;

    /// <summary>S, response units per unit of the calibration axis (or per the given unit).</summary>
    public double Slope { get; }

    /// <summary>k_D (3.3 for ICH Q2(R2)).</summary>
    public double DetectionFactor { get; }

    /// <summary>k_Q (10 for ICH Q2(R2)).</summary>
    public double QuantificationFactor { get; }

    /// <summary>The formula with the numbers used.</summary>
    public string Formula { get; }

    /// <summary>The published source of the method.</summary>
    public string Source { get; }

    /// <summary>The limits as <see cref="ReportingLimits"/> for censored reporting.</summary>
    /// <returns>LOD and LOQ.</returns>
    public ReportingLimits ToReportingLimits() => new(DetectionLimit, QuantificationLimit);

    /// <summary>Prints "LOD = 0.739965 ng/L, LOQ = 2.24232 ng/L (formula; source)".</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "LOD = " + DetectionLimit.ToString("G6", null) + ", LOQ = " + QuantificationLimit.ToString("G6", null) + " (" + Formula + "; " + Source + ")";
}
