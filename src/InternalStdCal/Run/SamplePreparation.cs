using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InternalStdCal.Internal;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>How the original sample became the measured solution: the dilution steps, and for a solid sample the
/// digest (made up to a volume or a mass) and the sample mass. Processing passes the measured concentration through
/// <see cref="SampleResult"/> to report the result in the original sample.</summary>
/// <remarks>
/// <para>Liquid: C_sample = C_measured · Π DF_k. Solid: C_sample = C_digest · V_digest / m_sample (or
/// · m_digest / m_sample), C_digest = C_measured · Π DF_k — see <see cref="SampleResult"/>.</para>
/// <para>Immutable. Equality: same kind, the same dilution-step instances in the same order (steps compare by
/// reference), equal digest and sample quantities and result unit.</para>
/// </remarks>
public sealed class SamplePreparation : IEquatable<SamplePreparation>
{
    private readonly DilutionStep[] _dilutions;

    private SamplePreparation(DilutionStep[] dilutions, Measured<Volume>? digestVolume, Measured<Mass>? digestMass, Measured<Mass>? sampleMass, ConcentrationUnit? resultUnit)
    {
        _dilutions = dilutions;
        DigestVolume = digestVolume;
        DigestMass = digestMass;
        SampleMass = sampleMass;
        ResultUnit = resultUnit;
    }

    /// <summary>The measured solution is the original sample (no dilution, no digestion).</summary>
    public static SamplePreparation None { get; } = new(Array.Empty<DilutionStep>(), null, null, null, null);

    /// <summary>Dilution steps, first (applied to the original sample or digest) to last (giving the measured
    /// solution).</summary>
    public IReadOnlyList<DilutionStep> Dilutions => _dilutions;

    /// <summary>Volume the digest of a solid sample was made up to; null for a liquid or a digest made up to a mass.</summary>
    public Measured<Volume>? DigestVolume { get; }

    /// <summary>Mass the digest of a solid sample was made up to; null for a liquid or a digest made up to a volume.</summary>
    public Measured<Mass>? DigestMass { get; }

    /// <summary>Mass of solid sample digested; null for a liquid.</summary>
    public Measured<Mass>? SampleMass { get; }

    /// <summary>Unit of the result of a solid sample (a mass fraction, e.g. mg/kg); null for a liquid (the result keeps
    /// the calibration's unit).</summary>
    public ConcentrationUnit? ResultUnit { get; }

    /// <summary>True for a solid sample (digest and sample mass given).</summary>
    public bool IsSolid => SampleMass is not null;

    /// <summary>Product of the dilution factors (1 without dilutions).</summary>
    public double TotalDilutionFactor => _dilutions.Aggregate(1.0, (df, s) => df * s.DilutionFactor);

    /// <summary>A liquid sample diluted by the given steps.</summary>
    /// <param name="dilutions">Steps in the order performed; none for an undiluted sample.</param>
    /// <returns>The preparation.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="dilutions"/> or a step is null.</exception>
    public static SamplePreparation Liquid(params DilutionStep[] dilutions) =>
        new(Steps(dilutions), null, null, null, null);

    /// <summary>A solid sample of mass m digested and made up to volume V, then diluted.</summary>
    /// <param name="digestVolume">Final volume of the digest, &gt; 0.</param>
    /// <param name="sampleMass">Mass of sample digested, &gt; 0.</param>
    /// <param name="resultUnit">Unit of the result, a mass fraction (e.g. mg/kg).</param>
    /// <param name="dilutions">Dilutions of the digest, in order.</param>
    /// <returns>The preparation.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="dilutions"/> or a step is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A volume or mass is ≤ 0, or the unit is not a mass fraction.</exception>
    public static SamplePreparation SolidToVolume(Measured<Volume> digestVolume, Measured<Mass> sampleMass, ConcentrationUnit resultUnit, params DilutionStep[] dilutions)
    {
        Guard.PositiveQuantity(digestVolume.Value, nameof(digestVolume), "a volume");
        Guard.PositiveQuantity(sampleMass.Value, nameof(sampleMass), "a mass");
        return new(Steps(dilutions), digestVolume, null, sampleMass, MassFraction(resultUnit));
    }

    /// <summary>A solid sample of mass m digested and made up to a total mass, then diluted.</summary>
    /// <param name="digestMass">Final mass of the digest, &gt; 0.</param>
    /// <param name="sampleMass">Mass of sample digested, &gt; 0.</param>
    /// <param name="resultUnit">Unit of the result, a mass fraction (e.g. mg/kg).</param>
    /// <param name="dilutions">Dilutions of the digest, in order.</param>
    /// <returns>The preparation.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="dilutions"/> or a step is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A mass is ≤ 0, or the unit is not a mass fraction.</exception>
    public static SamplePreparation SolidToMass(Measured<Mass> digestMass, Measured<Mass> sampleMass, ConcentrationUnit resultUnit, params DilutionStep[] dilutions)
    {
        Guard.PositiveQuantity(digestMass.Value, nameof(digestMass), "a mass");
        Guard.PositiveQuantity(sampleMass.Value, nameof(sampleMass), "a mass");
        return new(Steps(dilutions), null, digestMass, sampleMass, MassFraction(resultUnit));
    }

    /// <summary>Back-calculates a concentration in the measured solution to the original sample.</summary>
    /// <param name="measured">Concentration in the measured solution, with its uncertainty.</param>
    /// <returns>The sample result with its uncertainty budget.</returns>
    /// <exception cref="ArgumentException">The kinds do not fit the steps (see <see cref="SampleResult"/>).</exception>
    public SampleResult ToSample(Measured<Concentration> measured)
    {
        if (DigestVolume is Measured<Volume> v && SampleMass is Measured<Mass> m1)
        {
            return SampleResult.Solid(measured, v, m1, _dilutions, ResultUnit!.Value);
        }

        if (DigestMass is Measured<Mass> d && SampleMass is Measured<Mass> m2)
        {
            return SampleResult.Solid(measured, d, m2, _dilutions, ResultUnit!.Value);
        }

        return SampleResult.Liquid(measured, _dilutions);
    }

    /// <summary>The value of <see cref="ToSample"/> for an exact measured value, without building the uncertainty
    /// budget (same arithmetic, same exceptions).</summary>
    internal Concentration ToSampleValue(Concentration measured)
    {
        if (DigestVolume is Measured<Volume> v && SampleMass is Measured<Mass> m1)
        {
            return SampleResult.SolidValue(measured, v, m1, _dilutions, ResultUnit!.Value);
        }

        if (DigestMass is Measured<Mass> d && SampleMass is Measured<Mass> m2)
        {
            return SampleResult.SolidValue(measured, d, m2, _dilutions, ResultUnit!.Value);
        }

        return SampleResult.LiquidValue(measured, _dilutions);
    }

    /// <inheritdoc />
    public bool Equals(SamplePreparation? other) =>
        other is not null
        && _dilutions.Length == other._dilutions.Length
        && _dilutions.Zip(other._dilutions, (a, b) => ReferenceEquals(a, b)).All(x => x)
        && Nullable.Equals(DigestVolume, other.DigestVolume)
        && Nullable.Equals(DigestMass, other.DigestMass)
        && Nullable.Equals(SampleMass, other.SampleMass)
        && ResultUnit == other.ResultUnit;

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as SamplePreparation);

    /// <inheritdoc />
    public override int GetHashCode() => (_dilutions.Length, SampleMass).GetHashCode();

    /// <summary>Prints "total DF 50 (2 steps)", with the digest for a solid sample.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        string df = "total DF " + TotalDilutionFactor.ToString("G6", CultureInfo.InvariantCulture) + " (" + _dilutions.Length.ToString(CultureInfo.InvariantCulture) + " step" + (_dilutions.Length == 1 ? ")" : "s)");
        if (SampleMass is Measured<Mass> m)
        {
            string digest = DigestVolume is Measured<Volume> v ? v.Value.ToString() : DigestMass!.Value.Value.ToString();
            return "solid " + m.Value + " digested to " + digest + ", " + df;
        }

        return df;
    }

    private static DilutionStep[] Steps(DilutionStep[] dilutions)
    {
        Guard.NotNull(dilutions, nameof(dilutions));
        var copy = (DilutionStep[])dilutions.Clone();
        for (int i = 0; i < copy.Length; i++)
        {
            if (copy[i] is null)
            {
                throw new ArgumentNullException(nameof(dilutions), FormattableString.Invariant($"Parameter 'dilutions' has null at index {i}; every step must be given."));
            }
        }

        return copy;
    }

    private static ConcentrationUnit MassFraction(ConcentrationUnit resultUnit)
    {
        if (Concentration.KindOf(resultUnit) != ConcentrationKind.MassFraction)
        {
            throw new ArgumentOutOfRangeException(nameof(resultUnit), resultUnit, $"Parameter 'resultUnit' was {Concentration.SymbolOf(resultUnit)}; the result of a solid sample must be a mass fraction (e.g. mg/kg).");
        }

        return resultUnit;
    }
}
