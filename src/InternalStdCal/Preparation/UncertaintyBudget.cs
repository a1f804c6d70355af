using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>
/// The uncertainty budget of a prepared or back-calculated concentration: every input with its standard
/// uncertainty, sensitivity and contribution, and the combined result.
/// </summary>
/// <remarks>
/// <para>The model is a product/quotient y = k·Π xᵢ^sᵢ of uncorrelated inputs, so
/// u_c(y) = √Σ uᵢ²(y) with uᵢ(y) = |sᵢ|·|y|·u(xᵢ)/|xᵢ| (JCGM 100:2008 §5.1.2 and §5.1.6;
/// EURACHEM/CITAC Guide CG 4, QUAM). Effective degrees of freedom follow Welch–Satterthwaite
/// (JCGM 100:2008 eq. G.2b): ν_eff = u_c⁴ / Σ uᵢ⁴/νᵢ over inputs with finite νᵢ; null (infinite) when there are none.</para>
/// <para>Correlations are not modelled: if one item of glassware is used in several steps, its calibration error
/// is common to them (JCGM 100:2008 §5.2) and the budget treats the uses as independent.</para>
/// <para>Immutable; reference equality.</para>
/// </remarks>
public sealed class UncertaintyBudget
{
    private static readonly string[] Header = { "Stage", "Component", "Value", "u(x)", "Evaluation", "ν", "u(x)/x", "Sensitivity", "(uᵢ(y)/y)²", "Share" };
    private static readonly bool[] RightAligned = { false, false, true, true, false, true, true, true, true, true };

    private UncertaintyBudget(Measured<Concentration> result, IReadOnlyList<UncertaintyContribution> contributions)
    {
        Result = result;
        Contributions = contributions;
    }

    /// <summary>The result with its combined standard uncertainty (evaluation <see cref="UncertaintyEvaluation.Combined"/>)
    /// and Welch–Satterthwaite degrees of freedom.</summary>
    public Measured<Concentration> Result { get; }

    /// <summary>One row per input, in the order the inputs entered the preparation.</summary>
    public IReadOnlyList<UncertaintyContribution> Contributions { get; }

    /// <summary>u_c(y)/|y|, dimensionless.</summary>
    /// <exception cref="InvalidOperationException">The result is zero.</exception>
    public double RelativeStandardUncertainty => Result.RelativeStandardUncertainty;

    /// <summary>Welch–Satterthwaite effective degrees of freedom (JCGM 100:2008 eq. G.2b); null means infinite.</summary>
    public double? EffectiveDegreesOfFreedom => Result.DegreesOfFreedom;

    /// <summary>Builds a budget for a product/quotient result from relative terms (all inputs non-zero).</summary>
    internal static UncertaintyBudget ForProduct(Concentration result, IReadOnlyList<BudgetTerm> terms)
    {
        double magnitude = Math.Abs(result.Value);
        var contributions = new double[terms.Count];
        for (int i = 0; i < terms.Count; i++)
        {
            contributions[i] = magnitude * terms[i].RelativeContribution;
        }

        return Create(result, terms, contributions);
    }

    /// <summary>Builds a budget from contributions uᵢ(y) already in the unit of the result.</summary>
    internal static UncertaintyBudget Create(Concentration result, IReadOnlyList<BudgetTerm> terms, IReadOnlyList<double> contributions)
    {
        double combined = Propagation.RootSumSquares(contributions);
        double? nu = WelchSatterthwaite(terms, contributions, combined);
        var rows = new UncertaintyContribution[terms.Count];
        for (int i = 0; i < rows.Length; i++)
        {
            double share = combined > 0 ? Square(contributions[i] / combined) : 0;
            rows[i] = new UncertaintyContribution(terms[i], contributions[i], share, result.Value);
        }

        Measured<Concentration> measured = Measured.WithStandardUncertainty(
            result, Concentration.From(combined, result.Unit), nu, UncertaintyEvaluation.Combined);
        return new UncertaintyBudget(measured, rows);
    }

    /// <summary>A table with one line per input, invariant culture, for a console or notebook.</summary>
    /// <returns>The budget as text: a heading with the result, then the columns stage, component, value, u(x),
    /// evaluation, ν, u(x)/x, sensitivity, (uᵢ(y)/y)² and share.</returns>
    public override string ToString()
    {
        var table = new List<string[]> { Header };
        foreach (UncertaintyContribution c in Contributions)
        {
            table.Add(new[]
            {
                c.Stage,
                c.Component,
                Number(c.Value, "G7") + " " + c.Unit,
                Number(c.StandardUncertainty, "G4") + " " + c.Unit,
                c.Evaluation.ToString(),
                c.DegreesOfFreedom is double nu ? Number(nu, "G4") : "∞",
                c.Value != 0 ? Percent(c.RelativeStandardUncertainty) : "n/a",
                Number(c.Sensitivity, "+0.###;-0.###;0"),
                Result.Value.Value != 0 ? Number(c.ContributionToRelativeVariance, "0.000E+00") : "n/a",
                Number(c.SharePercent, "F1") + " %",
            });
        }

        var text = new StringBuilder();
        text.Append("Uncertainty budget: ").Append(ResultText.Format(Result));
        text.Append(", ν_eff = ").Append(EffectiveDegreesOfFreedom is double n ? Number(n, "G4") : "∞").AppendLine();
        text.AppendLine("Model: product/quotient of uncorrelated inputs; relative terms added in quadrature (JCGM 100:2008 §5.1.6).");
        ResultText.AppendTable(text, table, RightAligned);
        return text.ToString();
    }

    private static string Number(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);

    private static string Percent(double fraction) => Number(100 * fraction, "G4") + " %";

    private static double Square(double x) => x * x;

    private static double? WelchSatterthwaite(IReadOnlyList<BudgetTerm> terms, IReadOnlyList<double> contributions, double combined)
    {
        var nu = new double[terms.Count];
        for (int i = 0; i < nu.Length; i++)
        {
            nu[i] = terms[i].DegreesOfFreedom ?? double.PositiveInfinity;
        }

        double effective = Propagation.WelchSatterthwaite(contributions, nu, combined);
        return double.IsPositiveInfinity(effective) ? null : effective;
    }
}
