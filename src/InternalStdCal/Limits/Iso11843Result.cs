using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>ISO 11843-2 critical value and minimum detectable value (<see cref="Iso11843Limits"/>). Immutable.</summary>
public sealed class Iso11843Result
{
    internal Iso11843Result(Concentration criticalValue, Concentration minimumDetectableValue, int levels, int replicatesPerLevel, int testSampleReplicates, int degreesOfFreedom, double alpha, double beta, double tQuantile, double noncentrality, double residualStandardDeviation, string formula)
    {
        CriticalValue = criticalValue;
        MinimumDetectableValue = minimumDetectableValue;
        Levels = levels;
        ReplicatesPerLevel = replicatesPerLevel;
        TestSampleReplicates = testSampleReplicates;
        DegreesOfFreedom = degreesOfFreedom;
        Alpha = alpha;
        Beta = beta;
        TQuantile = tQuantile;
        Noncentrality = noncentrality;
        ResidualStandardDeviation = residualStandardDeviation;
        Formula = formula;
    }

    /// <summary>x_c, critical value of the net concentration (calibration's unit).</summary>
    public Concentration CriticalValue { get; }

    /// <summary>x_d, minimum detectable value of the net concentration (same unit).</summary>
    public Concentration MinimumDetectableValue { get; }

    /// <summary>I, number of reference levels.</summary>
    public int Levels { get; }

    /// <summary>J, replicates per level.</summary>
    public int ReplicatesPerLevel { get; }

    /// <summary>K, replicate measurements of the test sample.</summary>
    public int TestSampleReplicates { get; }

    /// <summary>ν = I·J − 2.</summary>
    public int DegreesOfFreedom { get; }

    /// <summary>α.</summary>
    public double Alpha { get; }

    /// <summary>β.</summary>
    public double Beta { get; }

    /// <summary>t(1−α, ν).</summary>
    public double TQuantile { get; }

    /// <summary>δ(ν, α, β), exact non-central-t non-centrality.</summary>
    public double Noncentrality { get; }

    /// <summary>σ used: the residual SD s_y/x of the calibration (response units).</summary>
    public double ResidualStandardDeviation { get; }

    /// <summary>σ source: always the residual SD of the calibration.</summary>
    public string SigmaSource { get; } = "residual standard deviation s_y/x of the calibration line";

    /// <summary>The formula with the numbers used.</summary>
    public string Formula { get; }

    /// <summary>The standard (formulas recalled, not checked against its text).</summary>
    public string Source { get; } = "ISO 11843-2 (capability of detection, linear calibration case); formulas from memory";

    /// <summary>Prints "x_c = …, x_d = … (formula; source)".</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "x_c = " + CriticalValue.ToString("G6", null) + ", x_d = " + MinimumDetectableValue.ToString("G6", null) + " (" + Formula + "; " + Source + ")";
}
