using InternalStdCal.Calibration;

namespace InternalStdCal.Limits;

/// <summary>Currie's L_C, L_D and L_Q (<see cref="CurrieLimits"/>), in the units of σ, with the factors used. Immutable.</summary>
public sealed class CurrieLimitResult
{
    internal CurrieLimitResult(double sigma, int? degreesOfFreedom, double alpha, double beta, double criticalFactor, double detectionFactor, double criticalLevel, double detectionLimit, double? detectionLimitApproximation, double quantificationFactor, double quantificationSigma, double quantificationLimit, string formula)
    {
        Sigma = sigma;
        DegreesOfFreedom = degreesOfFreedom;
        Alpha = alpha;
        Beta = beta;
        CriticalFactor = criticalFactor;
        DetectionFactor = detectionFactor;
        CriticalLevel = criticalLevel;
        DetectionLimit = detectionLimit;
        DetectionLimitApproximation = detectionLimitApproximation;
        QuantificationFactor = quantificationFactor;
        QuantificationSigma = quantificationSigma;
        QuantificationLimit = quantificationLimit;
        Formula = formula;
    }

    /// <summary>σ0 (known) or s0 (estimated) used.</summary>
    public double Sigma { get; }

    /// <summary>Whether σ was known (z quantiles) or estimated (t, δ).</summary>
    public bool SigmaIsKnown => DegreesOfFreedom is null;

    /// <summary>ν of the estimated s0; null for a known σ0.</summary>
    public int? DegreesOfFreedom { get; }

    /// <summary>False-positive probability α.</summary>
    public double Alpha { get; }

    /// <summary>False-negative probability β.</summary>
    public double Beta { get; }

    /// <summary>z(1−α) or t(1−α, ν): L_C / σ.</summary>
    public double CriticalFactor { get; }

    /// <summary>z(1−α) + z(1−β) or the exact δ(α, β, ν): L_D / σ.</summary>
    public double DetectionFactor { get; }

    /// <summary>L_C (units of σ).</summary>
    public double CriticalLevel { get; }

    /// <summary>L_D (units of σ).</summary>
    public double DetectionLimit { get; }

    /// <summary>(t(1−α, ν) + t(1−β, ν))·s0, the usual approximation of L_D (2t·s0 when α = β); null for a known σ0.</summary>
    public double? DetectionLimitApproximation { get; }

    /// <summary>k_Q.</summary>
    public double QuantificationFactor { get; }

    /// <summary>σ_Q used for L_Q.</summary>
    public double QuantificationSigma { get; }

    /// <summary>L_Q = k_Q·σ_Q (units of σ).</summary>
    public double QuantificationLimit { get; }

    /// <summary>The formulas with the numbers used.</summary>
    public string Formula { get; }

    /// <summary>The published source.</summary>
    public string Source { get; } = "L. A. Currie, IUPAC Recommendations 1995, Pure Appl. Chem. 67 (1995) 1699–1723";

    /// <summary>Prints "L_C = …, L_D = …, L_Q = … (formula; source)".</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "L_C = " + Text.G(CriticalLevel) + ", L_D = " + Text.G(DetectionLimit) + ", L_Q = " + Text.G(QuantificationLimit) + " (" + Formula + "; " + Source + ")";
}
