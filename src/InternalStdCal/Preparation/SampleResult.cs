using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>
/// The analyte content of the original sample, back-calculated from the concentration measured in the final
/// (diluted) solution, with its uncertainty budget.
/// </summary>
/// <remarks>
/// <para>Liquids: C_sample = C_measured · DF_total. Solids digested or extracted and made up to a volume:
/// w = γ_measured · V_digest · DF_total / m_sample (field-reference §0), e.g. mg/L · L / kg = mg/kg. Solids made up to
/// a weighed digest mass: w = w_measured · m_digest · DF_total / m_sample. DF_total = Π DF_j over the dilutions of
/// the digest or liquid sample.</para>
/// <para>Uncertainty: u(y) = √(K²·u²(C_measured) + Σ (sᵢ·y·u(xᵢ)/xᵢ)²) with y = K·C_measured (JCGM 100:2008
/// §5.1.2, §5.1.6), so a measured value of zero or below zero is handled (only relative quantities of such a row
/// are undefined). The measured concentration's own uncertainty (calibration, repeatability) comes from the
/// caller. Immutable; reference equality.</para>
/// </remarks>
public sealed class SampleResult
{
    private SampleResult(Measured<Concentration> measured, IReadOnlyList<DilutionStep> dilutions, double totalDilutionFactor, UncertaintyBudget budget, Measured<Volume>? digestVolume, Measured<Mass>? digestMass, Measured<Mass>? sampleMass)
    {
        MeasuredConcentration = measured;
        Dilutions = dilutions;
        TotalDilutionFactor = totalDilutionFactor;
        Budget = budget;
        DigestVolume = digestVolume;
        DigestMass = digestMass;
        SampleMass = sampleMass;
    }

    /// <summary>The concentration measured in the final solution, as given.</summary>
    public Measured<Concentration> MeasuredConcentration { get; }

    /// <summary>The dilutions between sample (or digest) and measured solution, in the order performed.</summary>
    public IReadOnlyList<DilutionStep> Dilutions { get; }

    /// <summary>Π DF_j (1 when there are no dilutions).</summary>
    public double TotalDilutionFactor { get; }

    /// <summary>The content of the original sample with its combined standard uncertainty.</summary>
    public Measured<Concentration> Result => Budget.Result;

    /// <summary>The budget of <see cref="Result"/>: stage "Measurement", one stage per dilution ("Dilution j: …",
    /// sensitivities reversed: final +1, aliquot −1) and stage "Sample" for digest and sample amounts.</summary>
    public UncertaintyBudget Budget { get; }

    /// <summary>The volume the solid sample's digest/extract was made up to; null for other cases.</summary>
    public Measured<Volume>? DigestVolume { get; }

    /// <summary>The mass the solid sample's digest was made up to; null for other cases.</summary>
    public Measured<Mass>? DigestMass { get; }

    /// <summary>The mass of solid sample taken; null for liquids.</summary>
    public Measured<Mass>? SampleMass { get; }

    /// <summary>Back-calculates a liquid sample: C_sample = C_measured · DF_total.</summary>
    /// <param name="measured">Concentration in the measured solution with its standard uncertainty (any finite value).</param>
    /// <param name="dilutions">Dilutions of the sample in the order performed (may be empty); none null.</param>
    /// <returns>The result, in the unit of <paramref name="measured"/> (or its mass-based counterpart after a
    /// density step, e.g. mg/kg ↔ mg/L).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="dilutions"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The result in the sample overflows.</exception>
    /// <exception cref="ArgumentException">A dilution is null, or a step cannot have produced the kind of
    /// concentration that follows it.</exception>
    public static SampleResult Liquid(Measured<Concentration> measured, IReadOnlyList<DilutionStep> dilutions)
    {
        Guard.NotNull(dilutions, nameof(dilutions));
        return Build(measured, dilutions, c => c, new List<BudgetTerm>(), null, null, null);
    }

    /// <summary>The value <see cref="Liquid"/> gives for an exact measured value, without the budget (same arithmetic).</summary>
    internal static Concentration LiquidValue(Concentration measured, DilutionStep[] dilutions) => Undilute(measured, dilutions);

    /// <summary>The value of <see cref="Solid(Measured{Concentration}, Measured{Volume}, Measured{Mass}, IReadOnlyList{DilutionStep}, ConcentrationUnit)"/>
    /// for an exact measured value, without the budget (same arithmetic; arguments already validated).</summary>
    internal static Concentration SolidValue(Concentration measured, Measured<Volume> digestVolume, Measured<Mass> sampleMass, DilutionStep[] dilutions, ConcentrationUnit resultUnit) =>
        FromVolumeDigest(Undilute(measured, dilutions), LitresPerKilogram(digestVolume, sampleMass), resultUnit);

    /// <summary>The value of <see cref="Solid(Measured{Concentration}, Measured{Mass}, Measured{Mass}, IReadOnlyList{DilutionStep}, ConcentrationUnit)"/>
    /// for an exact measured value, without the budget (same arithmetic; arguments already validated).</summary>
    internal static Concentration SolidValue(Concentration measured, Measured<Mass> digestMass, Measured<Mass> sampleMass, DilutionStep[] dilutions, ConcentrationUnit resultUnit) =>
        FromMassDigest(Undilute(measured, dilutions), digestMass.Value.RatioTo(sampleMass.Value), resultUnit);

    /// <summary>Back-calculates a solid sample digested (or extracted) and made up to a volume:
    /// w = γ_measured · V_digest · DF_total / m_sample.</summary>
    /// <param name="measured">Mass concentration in the measured solution with its standard uncertainty (any finite value).</param>
    /// <param name="digestVolume">Volume the digest was made up to; &gt; 0.</param>
    /// <param name="sampleMass">Mass of sample digested; &gt; 0.</param>
    /// <param name="dilutions">Dilutions of the digest in the order performed (may be empty); none null.</param>
    /// <param name="resultUnit">A mass-fraction unit for the result (e.g. mg/kg for a measurement in mg/L).</param>
    /// <returns>The result in <paramref name="resultUnit"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="dilutions"/> is null.</exception>
    /// <exception cref="ArgumentException">A dilution is null, a step cannot have produced the kind that follows it,
    /// the digest concentration is not a mass concentration, or <paramref name="resultUnit"/> is not a
    /// mass-fraction unit.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="digestVolume"/> or <paramref name="sampleMass"/> is 0,
    /// or the result in the sample overflows.</exception>
    public static SampleResult Solid(Measured<Concentration> measured, Measured<Volume> digestVolume, Measured<Mass> sampleMass, IReadOnlyList<DilutionStep> dilutions, ConcentrationUnit resultUnit)
    {
        Guard.PositiveQuantity(digestVolume.Value, nameof(digestVolume), "a volume");
        Guard.PositiveQuantity(sampleMass.Value, nameof(sampleMass), "a mass");
        Guard.NotNull(dilutions, nameof(dilutions));
        PreparedSolution.RequireKind(resultUnit, ConcentrationKind.MassFraction, "the result refers to the mass of sample", nameof(resultUnit));
        double litresPerKilogram = LitresPerKilogram(digestVolume, sampleMass);
        var terms = new List<BudgetTerm>
        {
            BudgetTerm.Of(SampleStage, "digest volume", digestVolume, +1),
            BudgetTerm.Of(SampleStage, "sample mass", sampleMass, -1),
        };
        return Build(
            measured,
            dilutions,
            digest => FromVolumeDigest(digest, litresPerKilogram, resultUnit),
            terms,
            digestVolume,
            null,
            sampleMass);
    }

    /// <summary>Back-calculates a solid sample digested and made up to a weighed digest mass:
    /// w = w_measured · m_digest · DF_total / m_sample.</summary>
    /// <param name="measured">Mass fraction in the measured solution with its standard uncertainty (any finite value).</param>
    /// <param name="digestMass">Mass the digest was made up to; &gt; 0.</param>
    /// <param name="sampleMass">Mass of sample digested; &gt; 0.</param>
    /// <param name="dilutions">Dilutions of the digest in the order performed (may be empty); none null.</param>
    /// <param name="resultUnit">A mass-fraction unit for the result.</param>
    /// <returns>The result in <paramref name="resultUnit"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="dilutions"/> is null.</exception>
    /// <exception cref="ArgumentException">A dilution is null, a step cannot have produced the kind that follows it,
    /// the digest concentration is not a mass fraction, or <paramref name="resultUnit"/> is not a mass-fraction unit.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="digestMass"/> or <paramref name="sampleMass"/> is 0,
    /// or the result in the sample overflows.</exception>
    public static SampleResult Solid(Measured<Concentration> measured, Measured<Mass> digestMass, Measured<Mass> sampleMass, IReadOnlyList<DilutionStep> dilutions, ConcentrationUnit resultUnit)
    {
        Guard.PositiveQuantity(digestMass.Value, nameof(digestMass), "a mass");
        Guard.PositiveQuantity(sampleMass.Value, nameof(sampleMass), "a mass");
        Guard.NotNull(dilutions, nameof(dilutions));
        PreparedSolution.RequireKind(resultUnit, ConcentrationKind.MassFraction, "the result refers to the mass of sample", nameof(resultUnit));
        double ratio = digestMass.Value.RatioTo(sampleMass.Value);
        var terms = new List<BudgetTerm>
        {
            BudgetTerm.Of(SampleStage, "digest mass", digestMass, +1),
            BudgetTerm.Of(SampleStage, "sample mass", sampleMass, -1),
        };
        return Build(
            measured,
            dilutions,
            digest => FromMassDigest(digest, ratio, resultUnit),
            terms,
            null,
            digestMass,
            sampleMass);
    }

    /// <summary>Prints the result, the measured value, DF_total and the sample amounts (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var text = new StringBuilder("Sample: ").Append(ResultText.Format(Result));
        text.Append("; measured ").Append(ResultText.Format(MeasuredConcentration));
        text.Append("; total DF = ").Append(TotalDilutionFactor.ToString("G6", CultureInfo.InvariantCulture));
        if (DigestVolume is Measured<Volume> v)
        {
            text.Append("; digest volume ").Append(v.Value);
        }

        if (DigestMass is Measured<Mass> dm)
        {
            text.Append("; digest mass ").Append(dm.Value);
        }

        if (SampleMass is Measured<Mass> m)
        {
            text.Append("; sample mass ").Append(m.Value);
        }

        return text.ToString();
    }

    private const string SampleStage = "Sample";

    private static SampleResult Build(
        Measured<Concentration> measured,
        IReadOnlyList<DilutionStep> dilutions,
        Func<Concentration, Concentration> toSample,
        List<BudgetTerm> sampleTerms,
        Measured<Volume>? digestVolume,
        Measured<Mass>? digestMass,
        Measured<Mass>? sampleMass)
    {
        var steps = new DilutionStep[dilutions.Count];
        var terms = new List<BudgetTerm> { BudgetTerm.Of("Measurement", "measured concentration", measured, +1) };
        double totalDilutionFactor = 1;
        for (int i = 0; i < steps.Length; i++)
        {
            DilutionStep step = dilutions[i] ?? throw new ArgumentException(FormattableString.Invariant($"Parameter 'dilutions' has null at index {i}; every step must be given."), nameof(dilutions));
            steps[i] = step;
            totalDilutionFactor *= step.DilutionFactor;
            string stage = "Dilution " + (i + 1).ToString(CultureInfo.InvariantCulture) + ": " + step.Label;
            foreach (BudgetTerm t in step.Terms(stage))
            {
                terms.Add(t.WithStage(stage, -t.Sensitivity));
            }
        }

        terms.AddRange(sampleTerms);

        // y = K·C_measured is linear, so K·u(C_measured) is the model applied to u(C_measured).
        Concentration Model(Concentration measuredValue) => toSample(Undilute(measuredValue, steps));

        Concentration result;
        try
        {
            result = Model(measured.Value);
        }
        catch (ArgumentOutOfRangeException e) when (e.ParamName == "value")
        {
            // The back-calculated result must be finite (common practice: never ∞ silently).
            throw new ArgumentOutOfRangeException(nameof(measured), $"Parameter 'measured' was {measured.Value}; it must keep the result in the sample finite (the dilution factors make it overflow).");
        }
        var contributions = new double[terms.Count];
        contributions[0] = Math.Abs(Model(Concentration.From(measured.StandardUncertainty.Value, measured.Value.Unit)).Value);
        for (int i = 1; i < terms.Count; i++)
        {
            contributions[i] = Math.Abs(result.Value) * terms[i].RelativeContribution;
        }

        return new SampleResult(measured, steps, totalDilutionFactor, UncertaintyBudget.Create(result, terms, contributions), digestVolume, digestMass, sampleMass);
    }

    // The measured concentration carried back through the dilutions, last step first.
    private static Concentration Undilute(Concentration measured, DilutionStep[] steps)
    {
        Concentration c = measured;
        for (int i = steps.Length - 1; i >= 0; i--)
        {
            if (!steps[i].Produces(c.Kind))
            {
                throw new ArgumentException(
                    FormattableString.Invariant($"Parameter 'dilutions[{i}]' ({steps[i].Label}) cannot have produced {c} ({c.Kind}); check the order of the dilutions and the kind of the measured concentration."),
                    FormattableString.Invariant($"dilutions[{i}]"));
            }

            c = steps[i].Reverse(c);
        }

        return c;
    }

    private static double LitresPerKilogram(Measured<Volume> digestVolume, Measured<Mass> sampleMass) =>
        Guard.FiniteResult(digestVolume.Value.Litres / sampleMass.Value.Kilograms, sampleMass.Value, nameof(sampleMass), "V_digest/m_sample");

    private static Concentration FromVolumeDigest(Concentration digest, double litresPerKilogram, ConcentrationUnit resultUnit)
    {
        PreparedSolution.RequireKind(digest.Unit, ConcentrationKind.MassConcentration, "a digest made up to a volume must be expressed per volume", "measured");
        return Concentration.From(digest.BaseValue * litresPerKilogram, ConcentrationUnit.GramPerKilogram).ConvertTo(resultUnit);
    }

    private static Concentration FromMassDigest(Concentration digest, double ratio, ConcentrationUnit resultUnit)
    {
        PreparedSolution.RequireKind(digest.Unit, ConcentrationKind.MassFraction, "a digest made up to a mass must be expressed per mass", "measured");
        return Concentration.From(digest.Value * ratio, digest.Unit).ConvertTo(resultUnit);
    }
}
