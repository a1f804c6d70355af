using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Hardening.Properties;

// Preparation across modules: a solution diluted in Preparation (PreparedSolution.Dilute) and carried back through
// the run's SamplePreparation (Run) returns to where it started (volumetric steps on concentrations per volume,
// gravimetric steps on mass fractions — the library refuses the mixed cases); the back-calculation is a product model, so the
// order of its steps changes neither value nor uncertainty (JCGM 100:2008 §5.1.6); an IS spike is the same
// dilution as any other. Invented values; tolerances count the roundings of the products (k steps → ≤ (2k+2) ε).
public class PreparationChainPropertyTests
{
    private static Arbitrary<Plan> Plans =>
        (from value in Gen.Choose(1, 1_000_000)
         from gravimetric in Gen.Elements(false, true)
         from unit in gravimetric
             ? Gen.Elements(ConcentrationUnit.MilligramPerKilogram, ConcentrationUnit.MicrogramPerKilogram, ConcentrationUnit.NanogramPerKilogram)
             : Gen.Elements(ConcentrationUnit.MilligramPerLitre, ConcentrationUnit.MicrogramPerLitre, ConcentrationUnit.MicromolePerLitre, ConcentrationUnit.GramPerLitre)
         from relU in Gen.Choose(0, 300)
         from count in Gen.Choose(1, 5)
         from kinds in Gen.ArrayOf(Gen.Choose(0, 1), count)
         from aliquots in Gen.ArrayOf(Gen.Choose(1, 500), count)
         from finals in Gen.ArrayOf(Gen.Choose(2, 200), count)
         from keys in Gen.ArrayOf(Gen.Choose(0, 1000), count)
         from sampleMass in Gen.Choose(100, 5000)
         from digest in Gen.Choose(10, 250)
         select new Plan(
             Measured.WithStandardUncertainty(Concentration.From(value / 100.0, unit), Concentration.From(value / 100.0 * relU / 10_000.0, unit)),
             Enumerable.Range(0, count).Select(i => Step(kinds[i] + (gravimetric ? 2 : 0), aliquots[i], finals[i])).ToArray(),
             Enumerable.Range(0, count).OrderBy(i => keys[i]).ToArray(),
             sampleMass / 1000.0,
             digest))
        .ToArbitrary();

    [Property(MaxTest = 200)]
    public Property DiluteThenSamplePreparationToSample_ReturnsTheStock() =>
        Prop.ForAll(Plans, p =>
        {
            PreparedSolution diluted = p.Steps.Aggregate(PreparedSolution.FromCertificate("stock", p.Stock), (s, step) => s.Dilute(step));
            SampleResult back = SamplePreparation.Liquid(p.Steps).ToSample(Measured.Exact(diluted.Concentration.Value));

            Assert.Equal(p.Stock.Value.Unit, back.Result.Value.Unit);
            Numeric.AssertWithinRoundings(p.Stock.Value.Value, back.Result.Value.Value, (4 * p.Steps.Length) + 2);
            Numeric.AssertWithinRoundings(p.Steps.Aggregate(1.0, (f, s) => f * s.DilutionFactor), back.TotalDilutionFactor, (2 * p.Steps.Length) + 2);
        });

    [Property(MaxTest = 200)]
    public Property ToSample_StepsInAnyOrder_SameValueAndUncertainty() =>
        Prop.ForAll(Plans, p =>
        {
            SampleResult given = SamplePreparation.Liquid(p.Steps).ToSample(p.Stock);
            SampleResult shuffled = SamplePreparation.Liquid(p.Order.Select(i => p.Steps[i]).ToArray()).ToSample(p.Stock);

            Numeric.AssertWithinRoundings(given.Result.Value.Value, shuffled.Result.Value.Value, (4 * p.Steps.Length) + 2);
            Numeric.AssertRelative(given.Result.StandardUncertainty.Value, shuffled.Result.StandardUncertainty.Value, 1e-12);
            Numeric.AssertRelative(given.Result.RelativeStandardUncertainty, shuffled.Result.RelativeStandardUncertainty, 1e-12);
        });

    [Property(MaxTest = 200)]
    public Property InternalStandardSpike_EqualsDilutingTheSpikeSolutionByTheAddition() =>
        Prop.ForAll(Plans, p =>
        {
            PreparedSolution spikeSolution = PreparedSolution.FromCertificate("IS stock", p.Stock);
            foreach (DilutionStep addition in p.Steps)
            {
                foreach (SpikeTiming timing in Enum.GetValues<SpikeTiming>())
                {
                    Measured<Concentration> spiked = InternalStandardSpike.Create(spikeSolution, addition, timing).Concentration;
                    Measured<Concentration> diluted = spikeSolution.Dilute(addition).Concentration;
                    Assert.Equal(diluted.Value.Unit, spiked.Value.Unit);
                    Numeric.AssertWithinRoundings(diluted.Value.Value, spiked.Value.Value, 4);
                    Numeric.AssertRelative(diluted.StandardUncertainty.Value, spiked.StandardUncertainty.Value, 1e-12);
                }
            }
        });

    // A solid: w = C_measured · DF · V_digest / m_sample, or w_measured · DF · m_digest / m_sample (field-reference §0
    // back-calculation; 1 µg/L · 1 mL / 1 g = 1 µg/kg, 1 µg/kg · 1 g / 1 g = 1 µg/kg). The digest is made from a true
    // mass fraction, diluted volumetrically or gravimetrically, and carried back by the run.
    [Property(MaxTest = 200)]
    public Property SolidDigestDilutedThenToSample_ReturnsTheTrueMassFraction() =>
        Prop.ForAll(Plans, p =>
        {
            double trueMgPerKg = p.Stock.Value.Value;
            double digest = trueMgPerKg * 1000 * p.SampleMassGrams / p.DigestAmount;
            bool byMass = p.Steps[0] is GravimetricDilution;
            PreparedSolution measured = p.Steps.Aggregate(
                PreparedSolution.FromCertificate("digest", Measured.Exact(Concentration.From(digest, byMass ? ConcentrationUnit.MicrogramPerKilogram : ConcentrationUnit.MicrogramPerLitre))),
                (s, step) => s.Dilute(step));
            SamplePreparation prep = byMass
                ? SamplePreparation.SolidToMass(Measured.Exact(Mass.FromGrams(p.DigestAmount)), Measured.Exact(Mass.FromGrams(p.SampleMassGrams)), ConcentrationUnit.MilligramPerKilogram, p.Steps)
                : SamplePreparation.SolidToVolume(Measured.Exact(Volume.FromMillilitres(p.DigestAmount)), Measured.Exact(Mass.FromGrams(p.SampleMassGrams)), ConcentrationUnit.MilligramPerKilogram, p.Steps);

            SampleResult back = prep.ToSample(measured.Concentration);

            Assert.Equal(ConcentrationUnit.MilligramPerKilogram, back.Result.Value.Unit);
            Numeric.AssertWithinRoundings(trueMgPerKg, back.Result.Value.Value, (4 * p.Steps.Length) + 12);
        });

    private static DilutionStep Step(int kind, int aliquot, int final)
    {
        double a = aliquot / 100.0, f = a * (1 + (final / 10.0));
        return kind switch
        {
            0 => DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(a)), Measured.Exact(Volume.FromMillilitres(f))),
            1 => DilutionStep.Volumetric(Measured.WithStandardUncertainty(Volume.FromMillilitres(a), Volume.FromMillilitres(a * 0.003)), Measured.WithStandardUncertainty(Volume.FromMillilitres(f), Volume.FromMillilitres(f * 0.001))),
            2 => DilutionStep.Gravimetric(Measured.Exact(Mass.FromGrams(a)), Measured.WithStandardUncertainty(Mass.FromGrams(f), Mass.FromMilligrams(0.1))),
            _ => DilutionStep.Gravimetric(Measured.WithStandardUncertainty(Mass.FromGrams(a), Mass.FromMilligrams(0.05)), Measured.Exact(Mass.FromGrams(f))),
        };
    }

    internal sealed record Plan(Measured<Concentration> Stock, DilutionStep[] Steps, int[] Order, double SampleMassGrams, double DigestAmount)
    {
        public override string ToString() => Stock + "; steps " + string.Join("; ", Steps.Select(s => s.Label)) + "; order " + string.Join(",", Order) + "; solid " + SampleMassGrams + " g made up to " + DigestAmount + " mL or g";
    }
}
