using System;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>
/// One row of an <see cref="UncertaintyBudget"/>: an input quantity, its standard uncertainty, its sensitivity
/// coefficient and what it contributes to the combined standard uncertainty of the result.
/// </summary>
/// <remarks>
/// Preparation results are products and quotients of their inputs, y = k·Π xᵢ^sᵢ, so the law of propagation
/// (JCGM 100:2008 §5.1.2) reduces to relative terms added in quadrature (§5.1.6; EURACHEM/CITAC Guide CG 4, QUAM, rule for products and quotients):
/// (u(y)/y)² = Σ (sᵢ·u(xᵢ)/xᵢ)². Immutable; reference equality (a report row, not a value).
/// </remarks>
public sealed class UncertaintyContribution
{
    private readonly double resultValue;

    internal UncertaintyContribution(BudgetTerm term, double contribution, double share, double resultValue)
    {
        Stage = term.Stage;
        Component = term.Component;
        Value = term.Value;
        StandardUncertainty = term.StandardUncertainty;
        Unit = term.Unit;
        Evaluation = term.Evaluation;
        DegreesOfFreedom = term.DegreesOfFreedom;
        Sensitivity = term.Sensitivity;
        ContributionToStandardUncertainty = contribution;
        Share = share;
        this.resultValue = resultValue;
    }

    /// <summary>Where the input enters, e.g. the stock solution's name or "Step 2: 10 mL into 100 mL".</summary>
    public string Stage { get; }

    /// <summary>The input quantity, e.g. "aliquot volume", "purity", "certified value".</summary>
    public string Component { get; }

    /// <summary>The input's value xᵢ, in <see cref="Unit"/>.</summary>
    public double Value { get; }

    /// <summary>The input's standard uncertainty u(xᵢ), in <see cref="Unit"/>, ≥ 0.</summary>
    public double StandardUncertainty { get; }

    /// <summary>Unit symbol of <see cref="Value"/> and <see cref="StandardUncertainty"/> ("mL", "mg", "g/g", "mg/L", …).</summary>
    public string Unit { get; }

    /// <summary>How u(xᵢ) was obtained (Type A, Type B rectangular, …).</summary>
    public UncertaintyEvaluation Evaluation { get; }

    /// <summary>Degrees of freedom of u(xᵢ); null means infinite.</summary>
    public double? DegreesOfFreedom { get; }

    /// <summary>u(xᵢ)/|xᵢ|, dimensionless.</summary>
    /// <exception cref="InvalidOperationException"><see cref="Value"/> is zero (possible only for a measured
    /// concentration of exactly zero), so a relative uncertainty is undefined.</exception>
    public double RelativeStandardUncertainty =>
        Value != 0
            ? StandardUncertainty / Math.Abs(Value)
            : throw new InvalidOperationException($"The input '{Component}' is zero; its relative uncertainty is undefined.");

    /// <summary>Relative sensitivity coefficient ∂ln y/∂ln xᵢ = (∂y/∂xᵢ)·xᵢ/y: the exponent of xᵢ in the product
    /// model (+1 for a factor in the numerator, −1 in the denominator).</summary>
    public double Sensitivity { get; }

    /// <summary>uᵢ(y) = |∂y/∂xᵢ|·u(xᵢ), in the unit of the budget's result (JCGM 100:2008 §5.1.3).</summary>
    public double ContributionToStandardUncertainty { get; }

    /// <summary>(uᵢ(y)/y)² = (sᵢ·u(xᵢ)/xᵢ)²: this input's term in the relative combined variance.</summary>
    /// <exception cref="InvalidOperationException">The result is zero, so relative terms are undefined.</exception>
    public double ContributionToRelativeVariance
    {
        get
        {
            if (resultValue == 0)
            {
                throw new InvalidOperationException("The result is zero; relative variance contributions are undefined (use ContributionToStandardUncertainty).");
            }

            double r = ContributionToStandardUncertainty / Math.Abs(resultValue);
            return r * r;
        }
    }

    /// <summary>uᵢ²(y)/u_c²(y), in [0, 1]: the fraction of the combined variance due to this input (0 for every
    /// row when u_c is 0).</summary>
    public double Share { get; }

    /// <summary><see cref="Share"/> in percent, [0, 100].</summary>
    public double SharePercent => 100 * Share;
}
