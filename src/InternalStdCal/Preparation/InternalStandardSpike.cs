using System;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>When the internal standard (IS) is added relative to sample preparation (digestion, extraction, clean-up).</summary>
/// <remarks>
/// The timing decides what the IS ratio corrects for (common practice). Added before preparation, the IS goes through
/// the same losses as the analyte, so the ratio A_x/A_is also corrects incomplete recovery, evaporation and transfer
/// losses (as far as IS and analyte behave alike), besides instrument drift and matrix effects. Added after
/// preparation (to the digest, extract or on line), it corrects only what happens from then on: drift, sample
/// introduction and matrix effects in the measurement; preparation losses must then be assessed separately, e.g. by
/// recovery experiments.
/// </remarks>
public enum SpikeTiming
{
    /// <summary>Added to the sample before digestion/extraction: corrects preparation losses and measurement effects.</summary>
    BeforeSamplePreparation = 0,

    /// <summary>Added to the prepared digest/extract (or on line): corrects measurement effects only.</summary>
    AfterSamplePreparation = 1,
}

/// <summary>
/// An internal-standard spike: a known volume (or mass) of IS solution added to a sample or calibration standard,
/// giving the IS concentration in the measured solution.
/// </summary>
/// <remarks>
/// <para>The addition is a <see cref="DilutionStep"/> of the spike solution: aliquot = spike volume (or mass),
/// final = volume (or mass) of the measured solution, which includes the spike. C_IS = C_spike · V_spike / V_final
/// (field-reference §0: 100 µL of 10 mg/L into 10.00 mL gives 0.1000 mg/L). If the spike is added to a sample
/// without making up to a mark, the final volume is sample + spike (volumes assumed additive, common practice for
/// dilute aqueous solutions) and its uncertainty must be stated by the caller.</para>
/// <para>Uncertainty: relative terms of spike solution, spike volume and final volume in quadrature
/// (JCGM 100:2008 §5.1.6). Immutable; reference equality.</para>
/// </remarks>
public sealed class InternalStandardSpike
{
    private InternalStandardSpike(PreparedSolution spikeSolution, DilutionStep addition, SpikeTiming timing, PreparedSolution inMeasuredSolution)
    {
        SpikeSolution = spikeSolution;
        Addition = addition;
        Timing = timing;
        InMeasuredSolution = inMeasuredSolution;
    }

    /// <summary>The IS solution that was added.</summary>
    public PreparedSolution SpikeSolution { get; }

    /// <summary>The addition: spike volume (or mass) into the final volume (or mass) of the measured solution.</summary>
    public DilutionStep Addition { get; }

    /// <summary>Whether the IS was added before or after sample preparation.</summary>
    public SpikeTiming Timing { get; }

    /// <summary>True when the IS was added before sample preparation, so its ratio also corrects preparation losses.</summary>
    public bool CorrectsPreparationLosses => Timing == SpikeTiming.BeforeSamplePreparation;

    /// <summary>The IS concentration in the measured solution, with its standard uncertainty.</summary>
    public Measured<Concentration> Concentration => InMeasuredSolution.Concentration;

    /// <summary>The budget of <see cref="Concentration"/>: the spike solution's history plus the rows of the addition
    /// (stage "IS addition: …").</summary>
    public UncertaintyBudget Budget => InMeasuredSolution.Budget;

    private PreparedSolution InMeasuredSolution { get; }

    /// <summary>Records a spike and computes the IS concentration in the measured solution.</summary>
    /// <param name="spikeSolution">The IS solution (a stock, certified solution or dilution of one).</param>
    /// <param name="addition">The spike volume into the final volume of the measured solution
    /// (<see cref="DilutionStep.Volumetric"/>), or the spike mass into its total mass
    /// (<see cref="DilutionStep.Gravimetric"/>); the final amount includes the spike.</param>
    /// <param name="timing">Whether the IS was added before or after sample preparation.</param>
    /// <returns>The spike.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="spikeSolution"/> or <paramref name="addition"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="addition"/> does not accept the spike solution's kind of concentration.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="timing"/> is not defined.</exception>
    public static InternalStandardSpike Create(PreparedSolution spikeSolution, DilutionStep addition, SpikeTiming timing)
    {
        Guard.NotNull(spikeSolution, nameof(spikeSolution));
        Guard.NotNull(addition, nameof(addition));
        if (timing != SpikeTiming.BeforeSamplePreparation && timing != SpikeTiming.AfterSamplePreparation)
        {
            throw new ArgumentOutOfRangeException(nameof(timing), timing, $"Parameter 'timing' was {(int)timing}; it must be BeforeSamplePreparation or AfterSamplePreparation.");
        }

        PreparedSolution measured = spikeSolution.DiluteAs(
            addition, "IS addition: " + addition.Label, "IS in measured solution", spikeSolution.DilutionCount + 1, nameof(addition));
        return new InternalStandardSpike(spikeSolution, addition, timing, measured);
    }

    /// <summary>Prints e.g. "IS 0.100000 mg/L, u = 0.000964 mg/L (0.964 %) in the measured solution; 100 µL into
    /// 10 mL; added after sample preparation" (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "IS " + ResultText.Format(Concentration) + " in the measured solution; " + Addition.Label + "; added "
        + (CorrectsPreparationLosses ? "before" : "after") + " sample preparation";
}
