using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using InternalStdCal.Internal;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Uncertainty;

/// <summary>
/// The GUM evaluation of a <see cref="MeasurementModel"/> (JCGM 100:2008, law of propagation of uncertainty): the
/// estimate, its combined standard uncertainty, effective degrees of freedom, coverage factor, expanded uncertainty
/// and the budget.
/// </summary>
/// <remarks>
/// <para>u_c²(y) = Σ cᵢ²u²(xᵢ) + 2 Σ_{i&lt;j} cᵢcⱼ r(xᵢ,xⱼ) u(xᵢ)u(xⱼ) (JCGM 100:2008 eqs. 10 and 16).
/// ν_eff = u_c⁴/Σ (cᵢu(xᵢ))⁴/νᵢ (Welch–Satterthwaite, eq. G.2b); with correlated inputs the GUM gives no formula and
/// the same expression is used as an approximation (common practice). k = t_p(ν), with ν_eff truncated to the next
/// lower integer (JCGM 100:2008 §G.6.4), the normal quantile when ν_eff is infinite or above 10⁶. U = k·u_c.</para>
/// <para>Immutable; reference equality.</para>
/// </remarks>
public sealed class GumEvaluation
{
    private static readonly string[] Header = { "Input", "Value", "u(x)", "ν", "Distribution", "c = ∂f/∂x", "|c|·u(x)", "Share" };
    private static readonly bool[] RightAligned = { false, true, true, true, false, true, true, true };

    private GumEvaluation(MeasurementModel model, double value, double u, double nu, double p, double k, IReadOnlyList<InputContribution> contributions, double correlationVariance)
    {
        Model = model;
        Value = value;
        StandardUncertainty = u;
        EffectiveDegreesOfFreedom = nu;
        CoverageProbability = p;
        CoverageFactor = k;
        Contributions = contributions;
        CorrelationVariance = correlationVariance;
    }

    /// <summary>The model evaluated.</summary>
    public MeasurementModel Model { get; }

    /// <summary>The estimate y = f(x), in the model's output unit.</summary>
    public double Value { get; }

    /// <summary>Combined standard uncertainty u_c(y) ≥ 0, in the output unit.</summary>
    public double StandardUncertainty { get; }

    /// <summary>u_c(y)/|y|.</summary>
    /// <exception cref="InvalidOperationException">y is zero.</exception>
    public double RelativeStandardUncertainty => Value != 0
        ? StandardUncertainty / Math.Abs(Value)
        : throw new InvalidOperationException("The estimate is zero; a relative uncertainty is undefined.");

    /// <summary>Welch–Satterthwaite ν_eff ≥ 1 (not truncated), or +∞ when every contributing input has infinite νᵢ.</summary>
    public double EffectiveDegreesOfFreedom { get; }

    /// <summary>Coverage probability p.</summary>
    public double CoverageProbability { get; }

    /// <summary>k = t_p(⌊ν_eff⌋) (normal quantile for ν_eff &gt; 10⁶).</summary>
    public double CoverageFactor { get; }

    /// <summary>U = k·u_c, in the output unit.</summary>
    public double ExpandedUncertainty => CoverageFactor * StandardUncertainty;

    /// <summary>The coverage interval y ± U.</summary>
    public CoverageInterval Interval => new(Value - ExpandedUncertainty, Value + ExpandedUncertainty, CoverageProbability, Model.OutputUnit);

    /// <summary>One row per input, in model order.</summary>
    public IReadOnlyList<InputContribution> Contributions { get; }

    /// <summary>2 Σ_{i&lt;j} cᵢcⱼ r u(xᵢ)u(xⱼ): the correlation terms of u_c², in output unit squared (0 without correlations).</summary>
    public double CorrelationVariance { get; }

    /// <summary><see cref="CorrelationVariance"/>/u_c² (0 when u_c = 0); may be negative.</summary>
    public double CorrelationShare => StandardUncertainty > 0 ? CorrelationVariance / (StandardUncertainty * StandardUncertainty) : 0;

    /// <summary>The result as a measured concentration (value, u_c, ν_eff, evaluation Combined), e.g. for a
    /// compliance decision together with <see cref="CoverageFactor"/>.</summary>
    /// <param name="unit">The unit the model's output is expressed in (the model's unit text is not parsed).</param>
    /// <returns>The measured value; ν null when ν_eff is infinite.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined.</exception>
    public Measured<Concentration> ToMeasuredConcentration(ConcentrationUnit unit) =>
        Measured.WithStandardUncertainty(
            Concentration.From(Value, unit),
            Concentration.From(StandardUncertainty, unit),
            double.IsPositiveInfinity(EffectiveDegreesOfFreedom) ? null : EffectiveDegreesOfFreedom,
            UncertaintyEvaluation.Combined);

    /// <summary>A readable budget (invariant culture): result line, then one row per input.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        string unit = Model.OutputUnit.Length > 0 ? " " + Model.OutputUnit : string.Empty;
        var text = new StringBuilder();
        text.Append(Model.OutputName).Append(" = ").Append(G(Value, "G6")).Append(unit)
            .Append(", u_c = ").Append(G(StandardUncertainty, "G4")).Append(unit)
            .Append(", ν_eff = ").Append(UncertainInput.Nu(EffectiveDegreesOfFreedom))
            .Append(", k = ").Append(G(CoverageFactor, "F3"))
            .Append(", U = ").Append(G(ExpandedUncertainty, "G4")).Append(unit)
            .Append(" (p = ").Append(G(100 * CoverageProbability, "G4")).Append(" %)").AppendLine();
        text.Append("GUM law of propagation (JCGM 100:2008); sensitivities ")
            .Append(Model.IsProduct ? "analytic (product model)" : Model.HasAnalyticSensitivities ? "analytic" : "numeric (Richardson-refined central differences)")
            .AppendLine();
        var rows = new List<string[]> { Header };
        foreach (InputContribution c in Contributions)
        {
            string u = c.Input.Unit.Length > 0 ? " " + c.Input.Unit : string.Empty;
            rows.Add(new[]
            {
                c.Name,
                G(c.Value, "G7") + u,
                G(c.StandardUncertainty, "G4") + u,
                UncertainInput.Nu(c.DegreesOfFreedom),
                c.Input.Distribution.ToString(),
                G(c.SensitivityCoefficient, "G4"),
                G(c.Contribution, "G4") + unit,
                G(100 * c.VarianceShare, "F1") + " %",
            });
        }

        if (CorrelationVariance != 0)
        {
            rows.Add(new[] { "(correlation terms)", string.Empty, string.Empty, string.Empty, string.Empty, string.Empty, string.Empty, G(100 * CorrelationShare, "F1") + " %" });
        }

        ResultText.AppendTable(text, rows, RightAligned);
        return text.ToString();
    }

    internal static GumEvaluation Evaluate(MeasurementModel model, double p)
    {
        double[] x = model.InputValues();
        double y = model.Value;
        IReadOnlyList<UncertainInput> inputs = model.Inputs;
        int n = x.Length;
        double[] c = model.AnalyticSensitivities(x) ?? NumericSensitivities(model, x);
        var contributions = new double[n];
        var signed = new double[n];
        var nu = new double[n];
        for (int i = 0; i < n; i++)
        {
            if (double.IsNaN(c[i]) || double.IsInfinity(c[i]))
            {
                throw new InvalidOperationException(FormattableString.Invariant($"The sensitivity of '{model.OutputName}' to '{inputs[i].Name}' is {Guard.Format(c[i])} at the input values; it must be finite."));
            }

            signed[i] = c[i] * inputs[i].StandardUncertainty;
            contributions[i] = Math.Abs(signed[i]);
            nu[i] = inputs[i].DegreesOfFreedom;
        }

        double uncorrelated = Propagation.RootSumSquares(contributions);
        double correlationVariance = 0;
        double combined = uncorrelated;
        if (model.HasCorrelations)
        {
            var sum = default(CompensatedSum);
            for (int i = 0; i < n; i++)
            {
                for (int j = i + 1; j < n; j++)
                {
                    double r = model.CorrelationAt(i, j);
                    if (r != 0)
                    {
                        sum.AddProduct(2 * r * signed[i], signed[j]);
                    }
                }
            }

            correlationVariance = sum.Value;
            double total = (uncorrelated * uncorrelated) + correlationVariance;
            combined = Math.Sqrt(Math.Max(total, 0)); // ≥ 0 for a positive semi-definite matrix up to rounding
        }

        double effective = Propagation.WelchSatterthwaite(contributions, nu, combined);
        double k = Propagation.CoverageFactor(p, effective, nameof(p));
        var rows = new InputContribution[n];
        for (int i = 0; i < n; i++)
        {
            double share = combined > 0 ? (contributions[i] / combined) * (contributions[i] / combined) : 0;
            rows[i] = new InputContribution(inputs[i], c[i], contributions[i], share);
        }

        return new GumEvaluation(model, y, combined, effective, p, k, rows, correlationVariance);
    }

    private static double[] NumericSensitivities(MeasurementModel model, double[] x)
    {
        int n = x.Length;
        var c = new double[n];
        var probe = (double[])x.Clone();
        for (int i = 0; i < n; i++)
        {
            double u = model.Inputs[i].StandardUncertainty;
            double h = u > 0 ? u / 8 : Math.Max(Math.Abs(x[i]), 1) / 1048576.0;
            double d1 = CentralDifference(model, probe, i, h);
            double d2 = CentralDifference(model, probe, i, h / 2);
            c[i] = ((4 * d2) - d1) / 3;
        }

        return c;
    }

    private static double CentralDifference(MeasurementModel model, double[] probe, int i, double h)
    {
        double xi = probe[i];
        string name = model.Inputs[i].Name;
        probe[i] = xi + h;
        double up = model.Evaluate(probe, FormattableString.Invariant($"{name} = {Guard.Format(probe[i])} (numeric sensitivity step)"));
        probe[i] = xi - h;
        double down = model.Evaluate(probe, FormattableString.Invariant($"{name} = {Guard.Format(probe[i])} (numeric sensitivity step)"));
        probe[i] = xi;
        return (up - down) / (2 * h);
    }

    private static string G(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);
}
