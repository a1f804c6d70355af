using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>
/// A solution of known concentration with its uncertainty budget: a stock made from a weighed substance, a
/// certified solution, or the result of diluting either.
/// </summary>
/// <remarks>
/// <para>Every concentration here is a product/quotient of its inputs, so relative standard uncertainties add in
/// quadrature (JCGM 100:2008 §5.1.6; EURACHEM/CITAC Guide CG 4, QUAM, example A1). The budget keeps every input
/// of the whole preparation history, so a working standard's budget still shows the stock's weighing.</para>
/// <para>Immutable; reference equality.</para>
/// </remarks>
public sealed class PreparedSolution
{
    private readonly IReadOnlyList<BudgetTerm> terms;

    private PreparedSolution(string name, Concentration value, IReadOnlyList<BudgetTerm> terms, int dilutionCount)
    {
        Name = name;
        this.terms = terms;
        DilutionCount = dilutionCount;
        Budget = UncertaintyBudget.ForProduct(value, terms);
    }

    /// <summary>The caller's name for the solution (for a diluted solution: derived from its parent and the step).</summary>
    public string Name { get; }

    /// <summary>The concentration with its combined standard uncertainty (evaluation Combined).</summary>
    public Measured<Concentration> Concentration => Budget.Result;

    /// <summary>The uncertainty budget of <see cref="Concentration"/>, one row per input of the preparation.</summary>
    public UncertaintyBudget Budget { get; }

    /// <summary>How many dilution steps separate this solution from its stock (0 for a stock).</summary>
    public int DilutionCount { get; }

    /// <summary>
    /// A stock made by dissolving a weighed substance and making up to volume: γ = m·P/V
    /// (EURACHEM/CITAC QUAM example A1: c = 1000·m·P/V with m in mg, V in mL, c in mg/L).
    /// </summary>
    /// <param name="name">A name for reports, not blank.</param>
    /// <param name="mass">Mass of substance weighed, with its standard uncertainty; &gt; 0.</param>
    /// <param name="purity">Purity of the substance as a mass fraction in (0, 1], with its uncertainty.</param>
    /// <param name="finalVolume">Volume the solution is made up to, with its standard uncertainty; &gt; 0.</param>
    /// <param name="unit">Unit of the result; must be a mass-concentration unit (g/L, mg/L, µg/L, ng/L).</param>
    /// <returns>The stock; its budget has the rows "substance mass", "purity" and "final volume".</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank, or <paramref name="unit"/> is not a
    /// mass-concentration unit.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="mass"/> or <paramref name="finalVolume"/> is 0,
    /// <paramref name="purity"/> is <c>default</c>, or <paramref name="unit"/> is not defined.</exception>
    public static PreparedSolution FromWeighedSubstance(string name, Measured<Mass> mass, Purity purity, Measured<Volume> finalVolume, ConcentrationUnit unit)
    {
        Guard.NotBlank(name, nameof(name));
        Guard.PositiveQuantity(mass.Value, nameof(mass), "a mass");
        RequirePurity(purity);
        Guard.PositiveQuantity(finalVolume.Value, nameof(finalVolume), "a volume");
        RequireKind(unit, ConcentrationKind.MassConcentration, "the substance is made up to a volume", nameof(unit));

        // g/L = g · 1 / L; one conversion to the caller's unit.
        double gramsPerLitre = Guard.FiniteResult(mass.Value.Grams * purity.MassFraction / finalVolume.Value.Litres, finalVolume.Value, nameof(finalVolume), "m·P/V");
        Concentration value = Quantities.Concentration.From(gramsPerLitre, ConcentrationUnit.GramPerLitre).ConvertTo(unit);
        var inputs = new[]
        {
            BudgetTerm.Of(name, "substance mass", mass, +1),
            BudgetTerm.Of(name, "purity", purity, +1),
            BudgetTerm.Of(name, "final volume", finalVolume, -1),
        };
        return new PreparedSolution(name, value, inputs, 0);
    }

    /// <summary>
    /// A stock made by dissolving a weighed substance and weighing the whole solution: w = m·P/m_solution.
    /// </summary>
    /// <param name="name">A name for reports, not blank.</param>
    /// <param name="mass">Mass of substance weighed, with its standard uncertainty; &gt; 0 and smaller than
    /// <paramref name="solutionMass"/>.</param>
    /// <param name="purity">Purity of the substance as a mass fraction in (0, 1], with its uncertainty.</param>
    /// <param name="solutionMass">Total mass of the solution (substance included), with its standard uncertainty; &gt; 0.</param>
    /// <param name="unit">Unit of the result; must be a mass-fraction unit (g/kg, mg/kg, µg/kg, ng/kg, %).</param>
    /// <returns>The stock; its budget has the rows "substance mass", "purity" and "solution mass".</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank, <paramref name="mass"/> ≥
    /// <paramref name="solutionMass"/>, or <paramref name="unit"/> is not a mass-fraction unit.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A mass is 0, <paramref name="purity"/> is <c>default</c>, or
    /// <paramref name="unit"/> is not defined.</exception>
    public static PreparedSolution FromWeighedSubstanceByMass(string name, Measured<Mass> mass, Purity purity, Measured<Mass> solutionMass, ConcentrationUnit unit)
    {
        Guard.NotBlank(name, nameof(name));
        Guard.PositiveQuantity(mass.Value, nameof(mass), "a mass");
        RequirePurity(purity);
        Guard.PositiveQuantity(solutionMass.Value, nameof(solutionMass), "a mass");
        if (!(mass.Value < solutionMass.Value))
        {
            throw new ArgumentException(
                $"Parameter 'mass' was {mass.Value}, which is not smaller than 'solutionMass' ({solutionMass.Value}); the solution includes the substance, so mass < solutionMass.",
                nameof(mass));
        }

        RequireKind(unit, ConcentrationKind.MassFraction, "the solution is weighed", nameof(unit));

        // g/kg = g · 1 / kg.
        double gramsPerKilogram = mass.Value.Grams * purity.MassFraction / solutionMass.Value.Kilograms;
        Concentration value = Quantities.Concentration.From(gramsPerKilogram, ConcentrationUnit.GramPerKilogram).ConvertTo(unit);
        var inputs = new[]
        {
            BudgetTerm.Of(name, "substance mass", mass, +1),
            BudgetTerm.Of(name, "purity", purity, +1),
            BudgetTerm.Of(name, "solution mass", solutionMass, -1),
        };
        return new PreparedSolution(name, value, inputs, 0);
    }

    /// <summary>
    /// A stock whose concentration is taken from a certificate (certified reference material or a purchased
    /// standard solution), e.g. 1000 mg/L ± 2 mg/L (k = 2) via <see cref="Measured.FromExpandedUncertainty{T}"/>.
    /// </summary>
    /// <param name="name">A name for reports, not blank.</param>
    /// <param name="certified">The certified value with its standard uncertainty; the value must be &gt; 0 (any kind).</param>
    /// <returns>The stock; its budget has the single row "certified value".</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The certified value is ≤ 0.</exception>
    public static PreparedSolution FromCertificate(string name, Measured<Concentration> certified)
    {
        Guard.NotBlank(name, nameof(name));
        if (!(certified.Value.Value > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(certified), certified.Value.Value, $"Parameter 'certified' was {certified.Value}; a stock concentration must be > 0.");
        }

        return new PreparedSolution(name, certified.Value, new[] { BudgetTerm.Of(name, "certified value", certified, +1) }, 0);
    }

    /// <summary>The solution obtained by one dilution step: C_after = C_before · aliquot / final.</summary>
    /// <param name="step">The step; it must accept this solution's kind of concentration (see <see cref="DilutionStep"/>).</param>
    /// <param name="name">Name of the new solution; null gives "&lt;this name&gt; / &lt;step label&gt;".</param>
    /// <returns>The diluted solution; its budget adds the step's rows under the stage "Step n: &lt;label&gt;".</returns>
    /// <exception cref="ArgumentNullException"><paramref name="step"/> is null.</exception>
    /// <exception cref="ArgumentException">The step does not accept this solution's kind of concentration.</exception>
    public PreparedSolution Dilute(DilutionStep step, string? name = null)
    {
        Guard.NotNull(step, nameof(step));
        int number = DilutionCount + 1;
        return DiluteAs(step, "Step " + number.ToString(CultureInfo.InvariantCulture) + ": " + step.Label, name ?? Name + " / " + step.Label, number, nameof(step));
    }

    /// <summary>Prints e.g. "Cd stock: 1002.700 mg/L, u = 0.864 mg/L (0.0861 %)" (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Name + ": " + ResultText.Format(Concentration);

    /// <summary>Applies a step whose budget rows go under <paramref name="stage"/>.</summary>
    internal PreparedSolution DiluteAs(DilutionStep step, string stage, string name, int dilutionCount, string paramName)
    {
        Concentration before = Concentration.Value;
        if (!step.Accepts(before.Kind))
        {
            throw new ArgumentException(
                $"Parameter '{paramName}' ({step.Label}) needs {step.AcceptedKinds}, but '{Name}' is {before} ({before.Kind}).",
                paramName);
        }

        var all = new List<BudgetTerm>(terms);
        all.AddRange(step.Terms(stage));
        return new PreparedSolution(name, step.Apply(before), all, dilutionCount);
    }

    private static void RequirePurity(Purity purity) =>
        Guard.InLeftOpenRange(purity.MassFraction, 0, 1, nameof(purity));

    internal static void RequireKind(ConcentrationUnit unit, ConcentrationKind kind, string reason, string paramName)
    {
        ConcentrationKind actual = Quantities.Concentration.KindOf(unit);
        if (actual != kind)
        {
            string allowed = kind switch
            {
                ConcentrationKind.MassConcentration => "g/L, mg/L, µg/L, ng/L",
                ConcentrationKind.AmountConcentration => "mol/L, mmol/L, µmol/L, nmol/L",
                _ => "g/kg, mg/kg, µg/kg, ng/kg, %",
            };
            throw new ArgumentException(
                $"Parameter '{paramName}' was {Quantities.Concentration.SymbolOf(unit)} ({actual}); it must be a {kind} unit ({allowed}) because {reason}.",
                paramName);
        }
    }
}
