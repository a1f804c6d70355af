namespace InternalStdCal.Uncertainty;

/// <summary>One row of a <see cref="GumEvaluation"/> budget: an input, its sensitivity coefficient and what it
/// contributes to the combined standard uncertainty (JCGM 100:2008 §5.1.3).</summary>
/// <remarks>Immutable; reference equality (a report row).</remarks>
public sealed class InputContribution
{
    internal InputContribution(UncertainInput input, double sensitivity, double contribution, double share)
    {
        Input = input;
        SensitivityCoefficient = sensitivity;
        Contribution = contribution;
        VarianceShare = share;
    }

    /// <summary>The input.</summary>
    public UncertainInput Input { get; }

    /// <summary>Name of the input.</summary>
    public string Name => Input.Name;

    /// <summary>The input value xᵢ, in the input's unit.</summary>
    public double Value => Input.Value;

    /// <summary>u(xᵢ), in the input's unit.</summary>
    public double StandardUncertainty => Input.StandardUncertainty;

    /// <summary>νᵢ, or +∞.</summary>
    public double DegreesOfFreedom => Input.DegreesOfFreedom;

    /// <summary>cᵢ = ∂f/∂xᵢ at the input values, in output unit per input unit.</summary>
    public double SensitivityCoefficient { get; }

    /// <summary>uᵢ(y) = |cᵢ|·u(xᵢ), in the output unit.</summary>
    public double Contribution { get; }

    /// <summary>uᵢ²(y)/u_c²(y) ≥ 0; the shares sum to 1 when inputs are uncorrelated (with correlations they sum
    /// to 1 − <see cref="GumEvaluation.CorrelationShare"/>); 0 for every row when u_c = 0.</summary>
    public double VarianceShare { get; }
}
