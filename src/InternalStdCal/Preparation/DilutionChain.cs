using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>One stage of a <see cref="DilutionChain"/>: the step and the solution it produced.</summary>
/// <remarks>Immutable; reference equality.</remarks>
public sealed class DilutionStage
{
    internal DilutionStage(int number, DilutionStep step, PreparedSolution solution, double cumulativeDilutionFactor)
    {
        Number = number;
        Step = step;
        Solution = solution;
        CumulativeDilutionFactor = cumulativeDilutionFactor;
    }

    /// <summary>1 for the first dilution, 2 for the second, ….</summary>
    public int Number { get; }

    /// <summary>The dilution step of this stage.</summary>
    public DilutionStep Step { get; }

    /// <summary>The solution after this step, with its concentration and full budget (stock and steps 1…<see cref="Number"/>).</summary>
    public PreparedSolution Solution { get; }

    /// <summary>The step's own dilution factor (final / aliquot).</summary>
    public double DilutionFactor => Step.DilutionFactor;

    /// <summary>Product of the dilution factors of steps 1…<see cref="Number"/>.</summary>
    public double CumulativeDilutionFactor { get; }
}

/// <summary>
/// A stock (or any prepared solution) diluted in successive steps, with the concentration, its uncertainty and a
/// per-step, per-component budget after every step.
/// </summary>
/// <remarks>
/// <para>C_k = C_0 · Π_{j≤k} aliquot_j / final_j and DF_total = Π DF_j (field-reference §0). The relative combined
/// uncertainty after step k adds the stock's relative variance and every step's aliquot and final terms in
/// quadrature (JCGM 100:2008 §5.1.6); steps are assumed independent (see <see cref="UncertaintyBudget"/>).</para>
/// <para>When a step changes kind through a density, the concentration ratio also contains that density, so
/// C_0 / C_k equals DF_total only for chains without density steps.</para>
/// <para>Immutable; reference equality.</para>
/// </remarks>
public sealed class DilutionChain
{
    private static readonly string[] Header = { "Stage", "Operation", "DF", "Cumulative DF", "Concentration", "u", "u_rel" };
    private static readonly bool[] RightAligned = { true, false, true, true, true, true, true };

    private DilutionChain(PreparedSolution source, IReadOnlyList<DilutionStage> stages)
    {
        Source = source;
        Stages = stages;
    }

    /// <summary>The solution the first aliquot is taken from.</summary>
    public PreparedSolution Source { get; }

    /// <summary>One stage per step, in order.</summary>
    public IReadOnlyList<DilutionStage> Stages { get; }

    /// <summary>The solution after the last step.</summary>
    public PreparedSolution Final => Stages[Stages.Count - 1].Solution;

    /// <summary>Π DF_j over all steps; &gt; 1.</summary>
    public double TotalDilutionFactor => Stages[Stages.Count - 1].CumulativeDilutionFactor;

    /// <summary>u(DF_total)/DF_total = √Σ (u(DF_j)/DF_j)² (JCGM 100:2008 §5.1.6; densities excluded).</summary>
    public double TotalDilutionFactorRelativeStandardUncertainty
    {
        get
        {
            double sum = 0;
            foreach (DilutionStage stage in Stages)
            {
                double r = stage.Step.DilutionFactorRelativeStandardUncertainty;
                sum += r * r;
            }

            return Math.Sqrt(sum);
        }
    }

    /// <summary>Dilutes <paramref name="source"/> by each step in turn.</summary>
    /// <param name="source">The stock or other solution the first aliquot is taken from.</param>
    /// <param name="steps">At least one step, in the order performed; none null.</param>
    /// <returns>The chain.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="source"/> or <paramref name="steps"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="steps"/> is empty or holds a null, or a step does not accept
    /// the kind of concentration it receives (the message names the step's index).</exception>
    public static DilutionChain From(PreparedSolution source, params DilutionStep[] steps)
    {
        Guard.NotNull(source, nameof(source));
        Guard.NotEmpty(steps, nameof(steps));
        var stages = new DilutionStage[steps.Length];
        PreparedSolution current = source;
        double cumulative = 1;
        for (int i = 0; i < steps.Length; i++)
        {
            DilutionStep step = steps[i] ?? throw new ArgumentException(FormattableString.Invariant($"Parameter 'steps' has null at index {i}; every step must be given."), nameof(steps));
            int number = source.DilutionCount + i + 1;
            string label = "Step " + number.ToString(CultureInfo.InvariantCulture) + ": " + step.Label;
            current = current.DiluteAs(step, label, current.Name + " / " + step.Label, number, FormattableString.Invariant($"steps[{i}]"));
            cumulative *= step.DilutionFactor;
            stages[i] = new DilutionStage(i + 1, step, current, cumulative);
        }

        return new DilutionChain(source, stages);
    }

    /// <summary>A table of the chain: one line for the source and one per step with the step's dilution factor,
    /// the cumulative factor, the concentration, its standard uncertainty and relative uncertainty.</summary>
    /// <returns>The text (invariant culture).</returns>
    public override string ToString()
    {
        var rows = new List<string[]>
        {
            Header,
            Row("0", Source.Name, 1, 1, Source.Concentration),
        };
        foreach (DilutionStage s in Stages)
        {
            rows.Add(Row(s.Number.ToString(CultureInfo.InvariantCulture), s.Step.Label, s.DilutionFactor, s.CumulativeDilutionFactor, s.Solution.Concentration));
        }

        var text = new StringBuilder();
        text.Append("Dilution chain from ").Append(Source.Name).Append(": total DF = ")
            .Append(TotalDilutionFactor.ToString("G6", CultureInfo.InvariantCulture)).AppendLine();
        ResultText.AppendTable(text, rows, RightAligned);
        return text.ToString();
    }

    private static string[] Row(string number, string operation, double df, double cumulative, Measured<Concentration> c) => new[]
    {
        number,
        operation,
        df.ToString("G6", CultureInfo.InvariantCulture),
        cumulative.ToString("G6", CultureInfo.InvariantCulture),
        c.Value.ToString("G7", CultureInfo.InvariantCulture),
        c.StandardUncertainty.ToString("G4", CultureInfo.InvariantCulture),
        (100 * c.RelativeStandardUncertainty).ToString("G4", CultureInfo.InvariantCulture) + " %",
    };
}
