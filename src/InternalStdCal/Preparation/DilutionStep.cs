using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>
/// One dilution: an aliquot of a solution made up to a larger final volume or total mass. Create steps with
/// <see cref="Volumetric"/>, <see cref="VolumetricWithDensity"/>, <see cref="Gravimetric"/> or
/// <see cref="GravimetricWithDensity"/>; apply them with <see cref="PreparedSolution.Dilute"/>,
/// <see cref="DilutionChain"/> or <see cref="SampleResult"/>.
/// </summary>
/// <remarks>
/// <para>Concentration after the step: C_after = C_before · aliquot / final (field-reference §0; elementary mass
/// balance). Dilution factor DF = final / aliquot, a ratio of like quantities (dimensionless). Relative
/// uncertainties of aliquot and final amount add in quadrature (JCGM 100:2008 §5.1.6).</para>
/// <para>Kinds: a volumetric step keeps mass or amount concentration; a gravimetric step keeps mass fraction.
/// The "with density" variants change kind through the density ρ of the aliquot solution
/// (γ = w·ρ, ISO 80000-9): volumetric w → γ, gravimetric γ → w. Amount concentrations can only be diluted
/// volumetrically.</para>
/// <para>Immutable; reference equality.</para>
/// </remarks>
public abstract class DilutionStep
{
    private protected DilutionStep(string label, double dilutionFactor, double dilutionFactorRelativeUncertainty)
    {
        Label = label;
        DilutionFactor = dilutionFactor;
        DilutionFactorRelativeStandardUncertainty = dilutionFactorRelativeUncertainty;
    }

    /// <summary>A short description, e.g. "1 mL into 100 mL" (or the caller's label).</summary>
    public string Label { get; }

    /// <summary>DF = final / aliquot (final volume / aliquot volume, or total mass / aliquot mass); &gt; 1.</summary>
    public double DilutionFactor { get; }

    /// <summary>u(DF)/DF = √((u(aliquot)/aliquot)² + (u(final)/final)²) (JCGM 100:2008 §5.1.6); excludes the
    /// density of a kind-changing step.</summary>
    public double DilutionFactorRelativeStandardUncertainty { get; }

    /// <summary>The kind of concentration the step needs in the solution the aliquot is taken from.</summary>
    internal abstract bool Accepts(ConcentrationKind kind);

    /// <summary>Human description of <see cref="Accepts"/> for messages.</summary>
    internal abstract string AcceptedKinds { get; }

    /// <summary>The kind of concentration the diluted solution has.</summary>
    internal abstract bool Produces(ConcentrationKind kind);

    /// <summary>Inputs with their exponents in C_after = C_before · Π xᵢ^sᵢ.</summary>
    internal abstract IReadOnlyList<BudgetTerm> Terms(string stage);

    /// <summary>The concentration in the diluted solution.</summary>
    internal abstract Concentration Apply(Concentration before);

    /// <summary>The concentration in the solution the aliquot was taken from, given the one after the step.</summary>
    internal abstract Concentration Reverse(Concentration after);

    /// <summary>Creates a volumetric dilution: an aliquot (pipette) made up to a final volume (flask).</summary>
    /// <param name="aliquot">Aliquot volume with its standard uncertainty; &gt; 0 and smaller than <paramref name="finalVolume"/>.</param>
    /// <param name="finalVolume">Final volume of the diluted solution with its standard uncertainty; &gt; 0.</param>
    /// <param name="label">A description for budgets and reports; null gives "&lt;aliquot&gt; into &lt;final&gt;".</param>
    /// <returns>The step. It dilutes mass or amount concentrations and keeps their unit.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A volume is 0, or the dilution factor overflows.</exception>
    /// <exception cref="ArgumentException"><paramref name="aliquot"/> ≥ <paramref name="finalVolume"/>.</exception>
    public static VolumetricDilution Volumetric(Measured<Volume> aliquot, Measured<Volume> finalVolume, string? label = null) =>
        new(aliquot, finalVolume, null, 0, label);

    /// <summary>Creates a volumetric dilution of a solution whose content is a mass fraction, using the aliquot
    /// solution's density: γ_after = w_before · ρ · V_aliquot / V_final (γ = w·ρ, ISO 80000-9).</summary>
    /// <param name="aliquot">Aliquot volume; &gt; 0 and smaller than <paramref name="finalVolume"/>.</param>
    /// <param name="finalVolume">Final volume; &gt; 0.</param>
    /// <param name="aliquotDensity">Density of the solution the aliquot is taken from (not <c>default</c>).</param>
    /// <param name="aliquotDensityStandardUncertainty">Standard uncertainty of the density in g/mL, finite and ≥ 0.</param>
    /// <param name="label">A description; null gives "&lt;aliquot&gt; into &lt;final&gt;".</param>
    /// <returns>The step. It turns a mass fraction (e.g. mg/kg) into a mass concentration (mg/L; % becomes g/L).</returns>
    /// <exception cref="ArgumentOutOfRangeException">A volume is 0, the density is <c>default</c>, or its
    /// uncertainty is negative or not finite.</exception>
    /// <exception cref="ArgumentException"><paramref name="aliquot"/> ≥ <paramref name="finalVolume"/>.</exception>
    public static VolumetricDilution VolumetricWithDensity(Measured<Volume> aliquot, Measured<Volume> finalVolume, Density aliquotDensity, double aliquotDensityStandardUncertainty, string? label = null)
    {
        Guard.Positive(aliquotDensity.GramsPerMillilitre, nameof(aliquotDensity));
        Guard.NonNegative(aliquotDensityStandardUncertainty, nameof(aliquotDensityStandardUncertainty));
        return new(aliquot, finalVolume, aliquotDensity, aliquotDensityStandardUncertainty, label);
    }

    /// <summary>Creates a gravimetric dilution: an aliquot weighed into a vessel and made up to a weighed total mass.</summary>
    /// <param name="aliquotMass">Mass of the aliquot; &gt; 0 and smaller than <paramref name="totalMass"/>.</param>
    /// <param name="totalMass">Total mass of the diluted solution (aliquot included); &gt; 0.</param>
    /// <param name="label">A description; null gives "&lt;aliquot&gt; into &lt;total&gt;".</param>
    /// <returns>The step. It dilutes mass fractions and keeps their unit.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A mass is 0, or the dilution factor overflows.</exception>
    /// <exception cref="ArgumentException"><paramref name="aliquotMass"/> ≥ <paramref name="totalMass"/>.</exception>
    public static GravimetricDilution Gravimetric(Measured<Mass> aliquotMass, Measured<Mass> totalMass, string? label = null) =>
        new(aliquotMass, totalMass, null, 0, label);

    /// <summary>Creates a gravimetric dilution of a solution whose content is a mass concentration, using the
    /// aliquot solution's density: w_after = γ_before · m_aliquot / (ρ · m_total).</summary>
    /// <param name="aliquotMass">Mass of the aliquot; &gt; 0 and smaller than <paramref name="totalMass"/>.</param>
    /// <param name="totalMass">Total mass of the diluted solution; &gt; 0.</param>
    /// <param name="aliquotDensity">Density of the solution the aliquot is taken from (not <c>default</c>).</param>
    /// <param name="aliquotDensityStandardUncertainty">Standard uncertainty of the density in g/mL, finite and ≥ 0.</param>
    /// <param name="label">A description; null gives "&lt;aliquot&gt; into &lt;total&gt;".</param>
    /// <returns>The step. It turns a mass concentration (e.g. mg/L) into a mass fraction (mg/kg).</returns>
    /// <exception cref="ArgumentOutOfRangeException">A mass is 0, the density is <c>default</c>, or its
    /// uncertainty is negative or not finite.</exception>
    /// <exception cref="ArgumentException"><paramref name="aliquotMass"/> ≥ <paramref name="totalMass"/>.</exception>
    public static GravimetricDilution GravimetricWithDensity(Measured<Mass> aliquotMass, Measured<Mass> totalMass, Density aliquotDensity, double aliquotDensityStandardUncertainty, string? label = null)
    {
        Guard.Positive(aliquotDensity.GramsPerMillilitre, nameof(aliquotDensity));
        Guard.NonNegative(aliquotDensityStandardUncertainty, nameof(aliquotDensityStandardUncertainty));
        return new(aliquotMass, totalMass, aliquotDensity, aliquotDensityStandardUncertainty, label);
    }

    /// <summary>Prints e.g. "10 mL into 100 mL: DF = 10 (u_rel 0.108 %)".</summary>
    /// <returns>The text (invariant culture).</returns>
    public override string ToString() =>
        FormattableString.Invariant($"{Label}: DF = {DilutionFactor.ToString("G6", CultureInfo.InvariantCulture)} (u_rel {(100 * DilutionFactorRelativeStandardUncertainty).ToString("G3", CultureInfo.InvariantCulture)} %)");

    /// <summary>Checks aliquot &lt; final and returns the ratio aliquot/final.</summary>
    private protected static double Ratio<T>(T aliquot, T final, string aliquotName, string finalName)
        where T : struct, IQuantity<T>
    {
        double ratio = aliquot.RatioTo(final);
        Guard.FiniteResult(1 / ratio, aliquot, aliquotName, "the dilution factor " + finalName + "/" + aliquotName);
        if (!(ratio < 1))
        {
            throw new ArgumentException(
                $"Parameter '{aliquotName}' was {aliquot}, which is not smaller than '{finalName}' ({final}); a dilution needs {aliquotName} < {finalName}.",
                aliquotName);
        }

        return ratio;
    }

    private protected static double Quadrature(double a, double b)
    {
        double max = Math.Max(a, b);
        if (max == 0)
        {
            return 0;
        }

        double x = a / max;
        double y = b / max;
        return max * Math.Sqrt((x * x) + (y * y));
    }

    /// <summary>The unit of the other kind with the same prefix: mg/L ↔ mg/kg; % maps to g/L.</summary>
    private protected static ConcentrationUnit Counterpart(ConcentrationUnit unit) => unit switch
    {
        ConcentrationUnit.GramPerLitre => ConcentrationUnit.GramPerKilogram,
        ConcentrationUnit.MilligramPerLitre => ConcentrationUnit.MilligramPerKilogram,
        ConcentrationUnit.MicrogramPerLitre => ConcentrationUnit.MicrogramPerKilogram,
        ConcentrationUnit.NanogramPerLitre => ConcentrationUnit.NanogramPerKilogram,
        ConcentrationUnit.GramPerKilogram or ConcentrationUnit.Percent => ConcentrationUnit.GramPerLitre,
        ConcentrationUnit.MilligramPerKilogram => ConcentrationUnit.MilligramPerLitre,
        ConcentrationUnit.MicrogramPerKilogram => ConcentrationUnit.MicrogramPerLitre,
        ConcentrationUnit.NanogramPerKilogram => ConcentrationUnit.NanogramPerLitre,
        _ => throw new ArgumentOutOfRangeException(nameof(unit), unit, $"Parameter 'unit' was {Concentration.SymbolOf(unit)}; an amount concentration has no mass-based counterpart."),
    };

    private protected static string DefaultLabel(string aliquot, string final) => aliquot + " into " + final;
}

/// <summary>A volumetric dilution step (see <see cref="DilutionStep"/>): aliquot volume made up to a final volume.</summary>
public sealed class VolumetricDilution : DilutionStep
{
    private readonly double ratio;

    internal VolumetricDilution(Measured<Volume> aliquot, Measured<Volume> finalVolume, Density? aliquotDensity, double aliquotDensityStandardUncertainty, string? label)
        : this(aliquot, finalVolume, Ratio(Guard.PositiveQuantity(aliquot.Value, nameof(aliquot), "a volume"), Guard.PositiveQuantity(finalVolume.Value, nameof(finalVolume), "a volume"), nameof(aliquot), nameof(finalVolume)), aliquotDensity, aliquotDensityStandardUncertainty, label)
    {
    }

    private VolumetricDilution(Measured<Volume> aliquot, Measured<Volume> finalVolume, double ratio, Density? aliquotDensity, double aliquotDensityStandardUncertainty, string? label)
        : base(
            label ?? DefaultLabel(aliquot.Value.ToString(), finalVolume.Value.ToString()),
            finalVolume.Value.RatioTo(aliquot.Value),
            Quadrature(aliquot.RelativeStandardUncertainty, finalVolume.RelativeStandardUncertainty))
    {
        this.ratio = ratio;
        AliquotVolume = aliquot;
        FinalVolume = finalVolume;
        AliquotDensity = aliquotDensity;
        AliquotDensityStandardUncertainty = aliquotDensityStandardUncertainty;
    }

    /// <summary>The aliquot volume with its standard uncertainty.</summary>
    public Measured<Volume> AliquotVolume { get; }

    /// <summary>The final volume with its standard uncertainty.</summary>
    public Measured<Volume> FinalVolume { get; }

    /// <summary>Density of the aliquot solution when the step turns a mass fraction into a mass concentration; else null.</summary>
    public Density? AliquotDensity { get; }

    /// <summary>Standard uncertainty of <see cref="AliquotDensity"/> in g/mL (0 when there is no density).</summary>
    public double AliquotDensityStandardUncertainty { get; }

    internal override bool Accepts(ConcentrationKind kind) =>
        AliquotDensity is null ? kind != ConcentrationKind.MassFraction : kind == ConcentrationKind.MassFraction;

    internal override string AcceptedKinds => AliquotDensity is null
        ? "a mass or amount concentration (per volume); for a mass fraction use VolumetricWithDensity or a gravimetric step"
        : "a mass fraction (VolumetricWithDensity converts it with the density)";

    internal override bool Produces(ConcentrationKind kind) =>
        AliquotDensity is null ? kind != ConcentrationKind.MassFraction : kind == ConcentrationKind.MassConcentration;

    internal override IReadOnlyList<BudgetTerm> Terms(string stage)
    {
        var terms = new List<BudgetTerm>
        {
            BudgetTerm.Of(stage, "aliquot volume", AliquotVolume, +1),
            BudgetTerm.Of(stage, "final volume", FinalVolume, -1),
        };
        if (AliquotDensity is Density rho)
        {
            terms.Add(BudgetTerm.OfDensity(stage, "aliquot density", rho, AliquotDensityStandardUncertainty, +1));
        }

        return terms;
    }

    internal override Concentration Apply(Concentration before)
    {
        Concentration perVolume = AliquotDensity is Density rho ? before.ConvertTo(Counterpart(before.Unit), rho) : before;
        return Concentration.From(perVolume.Value * ratio, perVolume.Unit);
    }

    internal override Concentration Reverse(Concentration after)
    {
        Concentration undiluted = Concentration.From(after.Value / ratio, after.Unit);
        return AliquotDensity is Density rho ? undiluted.ConvertTo(Counterpart(after.Unit), rho) : undiluted;
    }
}

/// <summary>A gravimetric dilution step (see <see cref="DilutionStep"/>): aliquot mass made up to a total mass.</summary>
public sealed class GravimetricDilution : DilutionStep
{
    private readonly double ratio;

    internal GravimetricDilution(Measured<Mass> aliquotMass, Measured<Mass> totalMass, Density? aliquotDensity, double aliquotDensityStandardUncertainty, string? label)
        : this(aliquotMass, totalMass, Ratio(Guard.PositiveQuantity(aliquotMass.Value, nameof(aliquotMass), "a mass"), Guard.PositiveQuantity(totalMass.Value, nameof(totalMass), "a mass"), nameof(aliquotMass), nameof(totalMass)), aliquotDensity, aliquotDensityStandardUncertainty, label)
    {
    }

    private GravimetricDilution(Measured<Mass> aliquotMass, Measured<Mass> totalMass, double ratio, Density? aliquotDensity, double aliquotDensityStandardUncertainty, string? label)
        : base(
            label ?? DefaultLabel(aliquotMass.Value.ToString(), totalMass.Value.ToString()),
            totalMass.Value.RatioTo(aliquotMass.Value),
            Quadrature(aliquotMass.RelativeStandardUncertainty, totalMass.RelativeStandardUncertainty))
    {
        this.ratio = ratio;
        AliquotMass = aliquotMass;
        TotalMass = totalMass;
        AliquotDensity = aliquotDensity;
        AliquotDensityStandardUncertainty = aliquotDensityStandardUncertainty;
    }

    /// <summary>The aliquot mass with its standard uncertainty.</summary>
    public Measured<Mass> AliquotMass { get; }

    /// <summary>The total mass of the diluted solution with its standard uncertainty.</summary>
    public Measured<Mass> TotalMass { get; }

    /// <summary>Density of the aliquot solution when the step turns a mass concentration into a mass fraction; else null.</summary>
    public Density? AliquotDensity { get; }

    /// <summary>Standard uncertainty of <see cref="AliquotDensity"/> in g/mL (0 when there is no density).</summary>
    public double AliquotDensityStandardUncertainty { get; }

    internal override bool Accepts(ConcentrationKind kind) =>
        AliquotDensity is null ? kind == ConcentrationKind.MassFraction : kind == ConcentrationKind.MassConcentration;

    internal override string AcceptedKinds => AliquotDensity is null
        ? "a mass fraction (per mass); for a mass concentration use GravimetricWithDensity"
        : "a mass concentration (GravimetricWithDensity converts it with the density)";

    internal override bool Produces(ConcentrationKind kind) => kind == ConcentrationKind.MassFraction;

    internal override IReadOnlyList<BudgetTerm> Terms(string stage)
    {
        var terms = new List<BudgetTerm>
        {
            BudgetTerm.Of(stage, "aliquot mass", AliquotMass, +1),
            BudgetTerm.Of(stage, "total mass", TotalMass, -1),
        };
        if (AliquotDensity is Density rho)
        {
            terms.Add(BudgetTerm.OfDensity(stage, "aliquot density", rho, AliquotDensityStandardUncertainty, -1));
        }

        return terms;
    }

    internal override Concentration Apply(Concentration before)
    {
        Concentration perMass = AliquotDensity is Density rho ? before.ConvertTo(Counterpart(before.Unit), rho) : before;
        return Concentration.From(perMass.Value * ratio, perMass.Unit);
    }

    internal override Concentration Reverse(Concentration after)
    {
        Concentration undiluted = Concentration.From(after.Value / ratio, after.Unit);
        return AliquotDensity is Density rho ? undiluted.ConvertTo(Counterpart(after.Unit), rho) : undiluted;
    }
}
