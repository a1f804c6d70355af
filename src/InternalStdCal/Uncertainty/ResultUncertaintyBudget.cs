using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Preparation;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Uncertainty;

/// <summary>
/// The uncertainty budget of a quantified result: the concentration read off the calibration (x₀ with its standard
/// error), the preparation back-calculation (dilutions, digest and sample amounts), optionally the IS concentration,
/// the replicate repeatability and caller components such as recovery or a matrix factor, combined in one product
/// model y = k·x₀·Π fᵢ^pᵢ (JCGM 100:2008 §5.1.6; EURACHEM/CITAC Guide CG 4, QUAM).
/// </summary>
/// <remarks>
/// <para>A thin layer over <see cref="MeasurementModel.Product"/>: <see cref="Model"/> can also be evaluated by Monte
/// Carlo (<see cref="MonteCarlo"/>). Inputs are taken as uncorrelated; glassware used in several steps is correlated
/// in reality (JCGM 100:2008 §5.2) — build the model by hand with <see cref="InputCorrelation"/> for that case.</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide which components belong in the budget and how the result is reported. Immutable; reference equality.</para>
/// </remarks>
public sealed class ResultUncertaintyBudget
{
    private ResultUncertaintyBudget(MeasurementModel model, ConcentrationUnit unit, GumEvaluation gum)
    {
        Model = model;
        Unit = unit;
        Gum = gum;
    }

    /// <summary>The product model; input order: x₀, replicate repeatability (if added), preparation rows, IS
    /// concentration (if given), caller factors.</summary>
    public MeasurementModel Model { get; }

    /// <summary>The unit of the result: that of the back-calculated sample content, or the calibration's unit
    /// without a preparation.</summary>
    public ConcentrationUnit Unit { get; }

    /// <summary>The GUM evaluation of <see cref="Model"/>.</summary>
    public GumEvaluation Gum { get; }

    /// <summary>The result with u_c and ν_eff as a measured concentration in <see cref="Unit"/>, e.g. for a compliance
    /// decision with <see cref="GumEvaluation.CoverageFactor"/>.</summary>
    /// <returns>The measured value.</returns>
    public Measured<Concentration> ToMeasured() => Gum.ToMeasuredConcentration(Unit);

    /// <summary>Adaptive Monte Carlo evaluation of the same model (see <see cref="MeasurementModel.EvaluateMonteCarloAdaptive"/>).</summary>
    /// <param name="seed">Seed of the generator.</param>
    /// <param name="significantDigits">n_dig, 1 to 4 (default 2).</param>
    /// <returns>The evaluation, at the coverage probability of <see cref="Gum"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="significantDigits"/> is outside 1 to 4.</exception>
    /// <exception cref="InvalidOperationException">The model is not finite for some trial.</exception>
    public MonteCarloEvaluation MonteCarlo(long seed, int significantDigits = 2) =>
        Model.EvaluateMonteCarloAdaptive(seed, Gum.CoverageProbability, significantDigits);

    /// <summary>The budget table of <see cref="Gum"/>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Gum.ToString();

    /// <summary>Builds the budget of a quantified result.</summary>
    /// <param name="quantitation">The concentration in the measured solution: x₀ with its standard error (Type A,
    /// ν from the calibration; u = 0 when the calibration gives no standard error).</param>
    /// <param name="preparation">Optional: the back-calculation used as a template; its dilutions, digest and sample
    /// amounts enter with their uncertainties (its own measured concentration is not used: x₀ replaces it).</param>
    /// <param name="internalStandard">Optional: enter the IS concentration in the measured solution as a factor with
    /// its relative uncertainty (value unchanged). Use it when x₀ is proportional to the sample's own IS concentration
    /// (ratio axis, or an IS amount differing from the standards'); leave it out when one IS addition is common to
    /// standards and samples, where its error cancels (common practice).</param>
    /// <param name="factors">Optional caller components, e.g. recovery R (exponent −1 corrects for it) or a matrix factor
    /// with value 1 and its uncertainty; names must differ from the generated ones.</param>
    /// <param name="factorExponents">Exponents of <paramref name="factors"/>; null means +1 for each.</param>
    /// <param name="addReplicateRepeatability">Adds a factor 1 ± s_inj/(√m·|x₀|), ν = m − 1, from the spread of the
    /// sample's injections. The standard error of an inverse prediction already contains a 1/m repeatability term, so
    /// add it only when that term does not represent the sample's own scatter (e.g. a single-point response factor).</param>
    /// <param name="coverageProbability">p for the GUM evaluation, in (0, 1); default 0.95.</param>
    /// <param name="correlations">Optional correlations between the budget's inputs by name, e.g. r = 1 between the
    /// aliquot volumes of two dilution steps made with the same pipette, or between two standards from one stock
    /// (JCGM 100:2008 §5.2). Input names are those the budget generates (see <see cref="Model"/>): "x0 (calibration)",
    /// "Dilution i: …: aliquot volume" and so on, plus the names of <paramref name="factors"/>.</param>
    /// <returns>The budget.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="quantitation"/> is null, or an item of <paramref name="factors"/> is null.</exception>
    /// <exception cref="ArgumentException">The preparation does not accept the calibration's kind of concentration;
    /// <paramref name="factorExponents"/> has another length than <paramref name="factors"/>; duplicate names; a correlation
    /// naming an unknown input or giving a correlation matrix that is not positive semi-definite; a factor
    /// with a bad value for its exponent; or the replicate term was asked for but x₀ is 0 or fewer than two injections
    /// were read.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="coverageProbability"/> or an exponent is out of range.</exception>
    public static ResultUncertaintyBudget Create(
        QuantitationResult quantitation,
        SampleResult? preparation = null,
        InternalStandardSpike? internalStandard = null,
        IReadOnlyList<UncertainInput>? factors = null,
        IReadOnlyList<double>? factorExponents = null,
        bool addReplicateRepeatability = false,
        double coverageProbability = 0.95,
        IReadOnlyList<InputCorrelation>? correlations = null)
    {
        Guard.NotNull(quantitation, nameof(quantitation));
        Guard.InOpenRange(coverageProbability, 0, 1, nameof(coverageProbability));
        ConcentrationUnit calibrationUnit = quantitation.Concentration.Unit;
        double x0 = quantitation.Concentration.Value;
        var inputs = new List<UncertainInput>();
        var exponents = new List<double>();
        double k = 1;

        double u0 = quantitation.StandardError is Concentration se ? se.In(calibrationUnit) : 0;
        double? nu0 = quantitation.DegreesOfFreedom is double df && df >= 1 ? df : null;
        inputs.Add(UncertainInput.FromMeasured("x0 (calibration)", x0, u0, nu0, UncertaintyEvaluation.TypeA, Concentration.SymbolOf(calibrationUnit)));
        exponents.Add(1);

        if (addReplicateRepeatability)
        {
            int m = quantitation.Replicates;
            if (quantitation.InjectionStandardDeviation is not Concentration sInj || m < 2 || x0 == 0)
            {
                throw new ArgumentException(
                    FormattableString.Invariant($"Parameter 'addReplicateRepeatability': the replicate term needs at least two injections and x0 != 0 (m = {m}, x0 = {Guard.Format(x0)})."),
                    nameof(addReplicateRepeatability));
            }

            double relative = sInj.In(calibrationUnit) / Math.Sqrt(m) / Math.Abs(x0);
            inputs.Add(UncertainInput.StudentT("replicate repeatability", 1, relative, m - 1));
            exponents.Add(1);
        }

        ConcentrationUnit unit = calibrationUnit;
        if (preparation is not null)
        {
            SampleResult perUnit = PerUnitPreparation(preparation, calibrationUnit);
            unit = perUnit.Result.Value.Unit;
            k = perUnit.Result.Value.Value;
            var names = new HashSet<string>(StringComparer.Ordinal);
            IReadOnlyList<UncertaintyContribution> rows = perUnit.Budget.Contributions;
            for (int i = 1; i < rows.Count; i++)
            {
                UncertaintyContribution row = rows[i];
                string name = row.Stage + ": " + row.Component;
                for (int copy = 2; !names.Add(name); copy++)
                {
                    name = row.Stage + ": " + row.Component + " (" + copy.ToString(CultureInfo.InvariantCulture) + ")";
                }

                inputs.Add(UncertainInput.FromMeasured(name, row.Value, row.StandardUncertainty, row.DegreesOfFreedom, row.Evaluation, row.Unit));
                exponents.Add(row.Sensitivity);
                k /= MeasurementModel.Power(row.Value, row.Sensitivity);
            }
        }

        if (internalStandard is not null)
        {
            Measured<Concentration> cIs = internalStandard.Concentration;
            inputs.Add(UncertainInput.From("IS concentration (measured solution)", cIs));
            exponents.Add(1);
            k /= cIs.Value.Value;
        }

        if (factors is not null)
        {
            if (factorExponents is not null)
            {
                Guard.SameLength(factors.Count, factorExponents.Count, nameof(factors), nameof(factorExponents));
            }

            for (int i = 0; i < factors.Count; i++)
            {
                inputs.Add(factors[i] ?? throw new ArgumentNullException(nameof(factors), FormattableString.Invariant($"Parameter 'factors' has null at index {i}.")));
                exponents.Add(factorExponents?[i] ?? 1);
            }
        }

        MeasurementModel model = MeasurementModel.Product("result", Concentration.SymbolOf(unit), k, inputs, exponents, correlations);
        return new ResultUncertaintyBudget(model, unit, model.EvaluateGum(coverageProbability));
    }

    /// <summary>The same preparation applied to 1 (calibration unit), exact: its result is the factor K of y = K·x₀.</summary>
    private static SampleResult PerUnitPreparation(SampleResult preparation, ConcentrationUnit calibrationUnit)
    {
        Measured<Concentration> one = Measured.Exact(Concentration.From(1, calibrationUnit));
        try
        {
            if (preparation.SampleMass is Measured<Mass> sampleMass)
            {
                ConcentrationUnit resultUnit = preparation.Result.Value.Unit;
                return preparation.DigestVolume is Measured<Volume> digestVolume
                    ? SampleResult.Solid(one, digestVolume, sampleMass, preparation.Dilutions, resultUnit)
                    : SampleResult.Solid(one, preparation.DigestMass!.Value, sampleMass, preparation.Dilutions, resultUnit);
            }

            return SampleResult.Liquid(one, preparation.Dilutions);
        }
        catch (ArgumentException e)
        {
            throw new ArgumentException(
                $"Parameter 'preparation' cannot take the calibration's concentration ({Concentration.SymbolOf(calibrationUnit)}) as its measured concentration: {e.Message}",
                nameof(preparation),
                e);
        }
    }
}
