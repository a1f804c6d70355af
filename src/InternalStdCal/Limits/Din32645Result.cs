using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>DIN 32645 limits from the calibration curve (<see cref="Din32645Limits"/>). Immutable.</summary>
public sealed class Din32645Result
{
    internal Din32645Result(Concentration decisionLimit, Concentration detectionCapability, Concentration quantificationLimit, Concentration quickQuantificationEstimate, int iterations, int sampleReplicates, double alpha, double k, double residualStandardDeviation, Concentration procedureStandardDeviation, string formula)
    {
        DecisionLimit = decisionLimit;
        DetectionCapability = detectionCapability;
        QuantificationLimit = quantificationLimit;
        QuickQuantificationEstimate = quickQuantificationEstimate;
        Iterations = iterations;
        SampleReplicates = sampleReplicates;
        Alpha = alpha;
        K = k;
        ResidualStandardDeviation = residualStandardDeviation;
        ProcedureStandardDeviation = procedureStandardDeviation;
        Formula = formula;
    }

    /// <summary>x_NG, decision limit (Nachweisgrenze), calibration's unit.</summary>
    public Concentration DecisionLimit { get; }

    /// <summary>x_EG = 2·x_NG, detection capability (Erfassungsgrenze), for β = α.</summary>
    public Concentration DetectionCapability { get; }

    /// <summary>x_BG, quantification limit (Bestimmungsgrenze), the iterated solution.</summary>
    public Concentration QuantificationLimit { get; }

    /// <summary>k·x_NG, the quick estimate of x_BG.</summary>
    public Concentration QuickQuantificationEstimate { get; }

    /// <summary>Fixed-point steps used for x_BG.</summary>
    public int Iterations { get; }

    /// <summary>m, measurements of the sample.</summary>
    public int SampleReplicates { get; }

    /// <summary>α.</summary>
    public double Alpha { get; }

    /// <summary>k (3 for 33 % relative uncertainty at x_BG).</summary>
    public double K { get; }

    /// <summary>σ used: the residual SD s_y/x of the calibration (response units).</summary>
    public double ResidualStandardDeviation { get; }

    /// <summary>σ source: always the residual SD of the calibration.</summary>
    public string SigmaSource { get; } = "residual standard deviation s_y/x of the calibration line";

    /// <summary>s_x0 = s_y/x / b, the procedural SD (calibration's unit).</summary>
    public Concentration ProcedureStandardDeviation { get; }

    /// <summary>The formulas with the numbers used.</summary>
    public string Formula { get; }

    /// <summary>The standard (formulas recalled, not checked against its text).</summary>
    public string Source { get; } = "DIN 32645 (calibration-curve method); formulas from memory";

    /// <summary>Prints "x_NG = …, x_EG = …, x_BG = … (formula; source)".</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "x_NG = " + DecisionLimit.ToString("G6", null) + ", x_EG = " + DetectionCapability.ToString("G6", null) + ", x_BG = " + QuantificationLimit.ToString("G6", null)
        + " (quick estimate " + QuickQuantificationEstimate.ToString("G6", null) + "; " + Formula + "; " + Source + ")";
}
