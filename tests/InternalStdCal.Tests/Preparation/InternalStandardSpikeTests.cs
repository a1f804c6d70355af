using System;
using System.Linq;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class InternalStandardSpikeTests
{
    private static PreparedSolution SpikeSolution(double relativeUncertainty = 0) =>
        PreparedSolution.FromCertificate(
            "Rh spike solution",
            Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(10), Concentration.FromMilligramsPerLitre(10 * relativeUncertainty)));

    [Fact]
    public void Create_Section0Example_0_1000MilligramsPerLitre()
    {
        // IS spike: 100 µL of 10 mg/L into 10.00 mL final → C_is = 10 · 0.1 / 10 = 0.1000 mg/L — computed (field-reference §0).
        InternalStandardSpike spike = InternalStandardSpike.Create(
            SpikeSolution(),
            DilutionStep.Volumetric(Measured.Exact(Volume.FromMicrolitres(100)), Measured.Exact(Volume.FromMillilitres(10.00))),
            SpikeTiming.BeforeSamplePreparation);
        Assert.Equal(ConcentrationUnit.MilligramPerLitre, spike.Concentration.Value.Unit);
        Assert.Equal(0.1000, spike.Concentration.Value.Value, 15);
        Assert.True(spike.CorrectsPreparationLosses);
        Assert.Equal(SpikeTiming.BeforeSamplePreparation, spike.Timing);
    }

    [Fact]
    public void Create_Uncertainty_RelativeTermsInQuadrature()
    {
        // u_rel² = u_rel²(spike solution) + u_rel²(V_spike) + u_rel²(V_final) (JCGM 100:2008 §5.1.6):
        // 0.5 %, 0.8 % (100 µL ± 0.8 µL), 0.2 % (10 mL ± 0.02 mL) → √(0.25 + 0.64 + 0.04) % = 0.9644 % (by hand).
        InternalStandardSpike spike = HundredMicrolitresIntoTenMillilitres(SpikeTiming.AfterSamplePreparation);
        Assert.Equal(Math.Sqrt(0.93) / 100, spike.Concentration.RelativeStandardUncertainty, 15);
        Assert.False(spike.CorrectsPreparationLosses);
        Assert.Equal(
            new[] { "Rh spike solution", "IS addition: 100 µL into 10 mL", "IS addition: 100 µL into 10 mL" },
            spike.Budget.Contributions.Select(c => c.Stage));
        Assert.Equal("IS 0.100000 mg/L, u = 0.000964 mg/L (0.964 %) in the measured solution; 100 µL into 10 mL; added after sample preparation", spike.ToString());
    }

    [Fact]
    public void Create_ByMass_GivesMassFraction()
    {
        // 0.1000 g of 10 mg/kg IS solution into 10.000 g total → 0.1 mg/kg (w = w_s·m_s/m_t, mass balance).
        PreparedSolution solution = PreparedSolution.FromCertificate("IS (w)", Measured.Exact(Concentration.FromMilligramsPerKilogram(10)));
        InternalStandardSpike spike = InternalStandardSpike.Create(
            solution,
            DilutionStep.Gravimetric(Measured.Exact(Mass.FromGrams(0.1)), Measured.Exact(Mass.FromGrams(10))),
            SpikeTiming.BeforeSamplePreparation);
        Assert.Equal(ConcentrationUnit.MilligramPerKilogram, spike.Concentration.Value.Unit);
        Assert.Equal(0.1, spike.Concentration.Value.Value, 15);
    }

    [Fact]
    public void Create_UndefinedTiming_ThrowsNamingTiming()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => InternalStandardSpike.Create(
            SpikeSolution(), DilutionStep.Volumetric(Measured.Exact(Volume.FromMicrolitres(100)), Measured.Exact(Volume.FromMillilitres(10))), (SpikeTiming)5));
        Assert.Equal("timing", ex.ParamName);
        Assert.StartsWith("Parameter 'timing' was 5; it must be BeforeSamplePreparation or AfterSamplePreparation.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_NullsAndKindMismatch_Throw()
    {
        DilutionStep addition = DilutionStep.Volumetric(Measured.Exact(Volume.FromMicrolitres(100)), Measured.Exact(Volume.FromMillilitres(10)));
        Assert.Equal("spikeSolution", Assert.Throws<ArgumentNullException>(() => InternalStandardSpike.Create(null!, addition, SpikeTiming.BeforeSamplePreparation)).ParamName);
        Assert.Equal("addition", Assert.Throws<ArgumentNullException>(() => InternalStandardSpike.Create(SpikeSolution(), null!, SpikeTiming.BeforeSamplePreparation)).ParamName);
        var ex = Assert.Throws<ArgumentException>(() => InternalStandardSpike.Create(
            SpikeSolution(), DilutionStep.Gravimetric(Measured.Exact(Mass.FromGrams(0.1)), Measured.Exact(Mass.FromGrams(10))), SpikeTiming.BeforeSamplePreparation));
        Assert.Equal("addition", ex.ParamName);
    }

    [Fact]
    public void ToString_AddedBeforePreparation_SaysBefore()
    {
        InternalStandardSpike spike = HundredMicrolitresIntoTenMillilitres(SpikeTiming.BeforeSamplePreparation);
        Assert.Equal("IS 0.100000 mg/L, u = 0.000964 mg/L (0.964 %) in the measured solution; 100 µL into 10 mL; added before sample preparation", spike.ToString());
    }

    // 100 µL ± 0.8 µL of a spike solution with u_rel 0.5 % made up to 10 mL ± 0.02 mL.
    private static InternalStandardSpike HundredMicrolitresIntoTenMillilitres(SpikeTiming timing) => InternalStandardSpike.Create(
        SpikeSolution(0.005),
        DilutionStep.Volumetric(
            Measured.WithStandardUncertainty(Volume.FromMicrolitres(100), Volume.FromMicrolitres(0.8)),
            Measured.WithStandardUncertainty(Volume.FromMillilitres(10), Volume.FromMillilitres(0.02))),
        timing);
}
