using System;
using System.Linq;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class SampleResultTests
{
    private static Measured<Volume> Ml(double v, double u = 0) => Measured.WithStandardUncertainty(Volume.FromMillilitres(v), Volume.FromMillilitres(u));

    private static readonly DilutionStep[] TenFold = { DilutionStep.Volumetric(Ml(5, 0.01), Ml(50, 0.05)) };

    [Fact]
    public void Solid_Section0Formula_MilligramsPerKilogram()
    {
        // sample result = C_measured · V_digest / m_sample · DF (field-reference §0), invented scenario:
        // 0.0250 mg/L measured, digest 50 mL, sample 0.5000 g, DF 10 → 0.025 · 0.05 L / 0.0005 kg · 10 = 25 mg/kg (by hand).
        SampleResult r = SampleResult.Solid(
            Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(0.0250), Concentration.FromMilligramsPerLitre(0.0005)),
            Ml(50, 0.05),
            Measured.WithStandardUncertainty(Mass.FromGrams(0.5000), Mass.FromGrams(0.0002)),
            TenFold,
            ConcentrationUnit.MilligramPerKilogram);
        Assert.Equal(ConcentrationUnit.MilligramPerKilogram, r.Result.Value.Unit);
        Assert.Equal(25, r.Result.Value.Value, 12);
        Assert.Equal(10, r.TotalDilutionFactor);

        // Relative terms in quadrature (JCGM 100:2008 §5.1.6): 2 %, 0.2 % (5 mL), 0.1 % (50 mL), 0.1 % (digest), 0.04 % (mass).
        double rel = Math.Sqrt(Math.Pow(0.02, 2) + Math.Pow(0.002, 2) + Math.Pow(0.001, 2) + Math.Pow(0.001, 2) + Math.Pow(0.0004, 2));
        Assert.Equal(rel, r.Result.RelativeStandardUncertainty, 14);
        Assert.Equal(
            new[] { ("Measurement", "measured concentration", 1.0), ("Dilution 1: 5 mL into 50 mL", "aliquot volume", -1.0), ("Dilution 1: 5 mL into 50 mL", "final volume", 1.0), ("Sample", "digest volume", 1.0), ("Sample", "sample mass", -1.0) },
            r.Budget.Contributions.Select(c => (c.Stage, c.Component, c.Sensitivity)));
        Assert.Equal("Sample: 25.000 mg/kg, u = 0.504 mg/kg (2.02 %); measured 0.025000 mg/L, u = 0.000500 mg/L (2 %); total DF = 10; digest volume 50 mL; sample mass 0.5 g", r.ToString());
    }

    [Fact]
    public void Solid_ResultUnitOfCallersChoice()
    {
        // 25 mg/kg = 25 000 µg/kg (SI prefixes).
        SampleResult r = SampleResult.Solid(
            Measured.Exact(Concentration.FromMilligramsPerLitre(0.0250)), Ml(50), Measured.Exact(Mass.FromGrams(0.5)), TenFold, ConcentrationUnit.MicrogramPerKilogram);
        Assert.Equal(25_000, r.Result.Value.Value, 9);
    }

    [Fact]
    public void Solid_MeasuredZero_ResultZeroWithMeasurementUncertaintyOnly()
    {
        // y = K·C with K = V·DF/m = 0.05 L · 10 / 0.0005 kg = 1000 L/kg; u(y) = K·u(C) = 1000 · 0.0005 = 0.5 mg/kg.
        SampleResult r = SampleResult.Solid(
            Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(0), Concentration.FromMilligramsPerLitre(0.0005)),
            Ml(50, 0.05),
            Measured.WithStandardUncertainty(Mass.FromGrams(0.5), Mass.FromGrams(0.0002)),
            TenFold,
            ConcentrationUnit.MilligramPerKilogram);
        Assert.Equal(0, r.Result.Value.Value);
        Assert.Equal(0.5, r.Result.StandardUncertainty.Value, 12);
        Assert.Equal(100, r.Budget.Contributions[0].SharePercent, 12);
        Assert.Throws<InvalidOperationException>(() => r.Budget.Contributions[0].ContributionToRelativeVariance);
        Assert.Throws<InvalidOperationException>(() => r.Budget.Contributions[0].RelativeStandardUncertainty);
        Assert.Contains("n/a", r.Budget.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Solid_NegativeMeasured_PropagatesWithMagnitude()
    {
        SampleResult r = SampleResult.Solid(
            Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(-0.001), Concentration.FromMilligramsPerLitre(0.0005)),
            Ml(50), Measured.Exact(Mass.FromGrams(0.5)), TenFold, ConcentrationUnit.MilligramPerKilogram);
        Assert.Equal(-1, r.Result.Value.Value, 12);

        // u² = (K·u(C))² + (y·0.002)² + (y·0.001)² with |y| = 1 mg/kg (the ten-fold step's relative terms).
        Assert.Equal(Math.Sqrt(0.25 + 0.000004 + 0.000001), r.Result.StandardUncertainty.Value, 12);
    }

    [Fact]
    public void Solid_ByDigestMass_UsesMassRatio()
    {
        // w = w_measured · m_digest · DF / m_sample: 0.02 mg/kg · 50 g / 0.25 g · 1 = 4 mg/kg (by hand).
        SampleResult r = SampleResult.Solid(
            Measured.Exact(Concentration.FromMilligramsPerKilogram(0.02)),
            Measured.Exact(Mass.FromGrams(50)),
            Measured.Exact(Mass.FromGrams(0.25)),
            Array.Empty<DilutionStep>(),
            ConcentrationUnit.MilligramPerKilogram);
        Assert.Equal(4, r.Result.Value.Value, 12);
        Assert.Equal(1, r.TotalDilutionFactor);
        Assert.NotNull(r.DigestMass);
        Assert.Null(r.DigestVolume);
    }

    [Fact]
    public void Liquid_IsMeasuredTimesDilutionFactor()
    {
        // C_sample = C_measured · DF (field-reference §0): 2.5 µg/L · 10 · 20 = 500 µg/L.
        DilutionStep[] steps = { DilutionStep.Volumetric(Ml(1), Ml(10)), DilutionStep.Volumetric(Ml(0.5), Ml(10)) };
        SampleResult r = SampleResult.Liquid(Measured.Exact(Concentration.FromMicrogramsPerLitre(2.5)), steps);
        Assert.Equal(ConcentrationUnit.MicrogramPerLitre, r.Result.Value.Unit);
        Assert.Equal(500, r.Result.Value.Value, 10);
        Assert.Equal(200, r.TotalDilutionFactor);
        Assert.Null(r.SampleMass);
        Assert.Equal("Dilution 2: 0.5 mL into 10 mL", r.Budget.Contributions[^1].Stage);
    }

    [Fact]
    public void Liquid_ReversesDensityStep()
    {
        // A mass-fraction sample diluted volumetrically with its density: γ = w·ρ·V_a/V_f, so w = γ/(ρ·V_a/V_f).
        // 2 mg/L measured, ρ = 1.25 g/mL, 1 mL into 10 mL → 2 · 10 / 1.25 = 16 mg/kg (by hand).
        DilutionStep[] steps = { DilutionStep.VolumetricWithDensity(Ml(1), Ml(10), Density.FromGramsPerMillilitre(1.25), 0) };
        SampleResult r = SampleResult.Liquid(Measured.Exact(Concentration.FromMilligramsPerLitre(2)), steps);
        Assert.Equal(ConcentrationUnit.MilligramPerKilogram, r.Result.Value.Unit);
        Assert.Equal(16, r.Result.Value.Value, 12);
    }

    [Fact]
    public void Liquid_MeasuredKindNotProducedByLastStep_ThrowsNamingStep()
    {
        DilutionStep[] steps = { DilutionStep.Volumetric(Ml(1), Ml(10)) };
        var ex = Assert.Throws<ArgumentException>(() => SampleResult.Liquid(Measured.Exact(Concentration.FromMilligramsPerKilogram(2)), steps));
        Assert.Equal("dilutions[0]", ex.ParamName);
        Assert.StartsWith("Parameter 'dilutions[0]' (1 mL into 10 mL) cannot have produced 2 mg/kg (MassFraction)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Solid_BadInputs_ThrowNamingParameters()
    {
        Measured<Concentration> c = Measured.Exact(Concentration.FromMilligramsPerLitre(1));
        var unit = Assert.Throws<ArgumentException>(() => SampleResult.Solid(c, Ml(50), Measured.Exact(Mass.FromGrams(0.5)), TenFold, ConcentrationUnit.MilligramPerLitre));
        Assert.Equal("resultUnit", unit.ParamName);
        Assert.StartsWith("Parameter 'resultUnit' was mg/L (MassConcentration); it must be a MassFraction unit (g/kg, mg/kg, µg/kg, ng/kg, %) because the result refers to the mass of sample.", unit.Message, StringComparison.Ordinal);

        var mass = Assert.Throws<ArgumentOutOfRangeException>(() => SampleResult.Solid(c, Ml(50), Measured.Exact(Mass.FromGrams(0)), TenFold, ConcentrationUnit.MilligramPerKilogram));
        Assert.Equal("sampleMass", mass.ParamName);
        Assert.StartsWith("Parameter 'sampleMass' was 0 g; it must be a mass > 0.", mass.Message, StringComparison.Ordinal);

        var volume = Assert.Throws<ArgumentOutOfRangeException>(() => SampleResult.Solid(c, Ml(0), Measured.Exact(Mass.FromGrams(0.5)), TenFold, ConcentrationUnit.MilligramPerKilogram));
        Assert.Equal("digestVolume", volume.ParamName);

        var kind = Assert.Throws<ArgumentException>(() => SampleResult.Solid(
            Measured.Exact(Concentration.FromMicromolesPerLitre(1)), Ml(50), Measured.Exact(Mass.FromGrams(0.5)), TenFold, ConcentrationUnit.MilligramPerKilogram));
        Assert.Equal("measured", kind.ParamName);
        Assert.StartsWith("Parameter 'measured' was µmol/L (AmountConcentration); it must be a MassConcentration unit", kind.Message, StringComparison.Ordinal);

        Assert.Equal("dilutions", Assert.Throws<ArgumentNullException>(() => SampleResult.Liquid(c, null!)).ParamName);
        var nullStep = Assert.Throws<ArgumentException>(() => SampleResult.Liquid(c, new DilutionStep[] { null! }));
        Assert.StartsWith("Parameter 'dilutions' has null at index 0", nullStep.Message, StringComparison.Ordinal);
    }

    private static Measured<Mass> G(double v, double u = 0) => Measured.WithStandardUncertainty(Mass.FromGrams(v), Mass.FromGrams(u));

    [Fact]
    public void Solid_ByDigestMass_BudgetTermsAndText()
    {
        // Invented scenario, computed by hand: w = 0.0200 mg/kg · (10 g / 3 g) · 50 g / 0.25 g = 13.3333 mg/kg.
        SampleResult r = SampleResult.Solid(
            Measured.WithStandardUncertainty(Concentration.FromMilligramsPerKilogram(0.0200), Concentration.FromMilligramsPerKilogram(0.0004)),
            G(50, 0.01),
            G(0.25, 0.0001),
            new DilutionStep[] { DilutionStep.Gravimetric(G(3), G(10)) },
            ConcentrationUnit.MilligramPerKilogram);
        Assert.Equal(40.0 / 3, r.Result.Value.Value, 12);

        // Relative sensitivities of the product/quotient model are the exponents, ±1 (JCGM 100:2008 §5.1.3, §5.1.6):
        // m_digest in the numerator (+1), m_sample in the denominator (−1); the dilution rows are reversed.
        Assert.Equal(
            new[] { ("Measurement", "measured concentration", 1.0), ("Dilution 1: 3 g into 10 g", "aliquot mass", -1.0), ("Dilution 1: 3 g into 10 g", "total mass", 1.0), ("Sample", "digest mass", 1.0), ("Sample", "sample mass", -1.0) },
            r.Budget.Contributions.Select(c => (c.Stage, c.Component, c.Sensitivity)));

        // Relative terms in quadrature: 2 % (measured), 0.02 % (0.01 g of 50 g), 0.04 % (0.0001 g of 0.25 g).
        Assert.Equal(Math.Sqrt(Math.Pow(0.02, 2) + Math.Pow(0.0002, 2) + Math.Pow(0.0004, 2)), r.Result.RelativeStandardUncertainty, 14);

        // Computed: u = 13.333 · √(0.02² + 0.0002² + 0.0004²) = 0.267 mg/kg; DF = 10/3 printed to six significant digits.
        Assert.Equal("Sample: 13.333 mg/kg, u = 0.267 mg/kg (2 %); measured 0.020000 mg/kg, u = 0.000400 mg/kg (2 %); total DF = 3.33333; digest mass 50 g; sample mass 0.25 g", r.ToString());
    }

    [Fact]
    public void Solid_ByDigestMass_BadInputs_ThrowNamingParameters()
    {
        Measured<Concentration> c = Measured.Exact(Concentration.FromMilligramsPerKilogram(1));
        DilutionStep[] none = Array.Empty<DilutionStep>();

        var mass = Assert.Throws<ArgumentOutOfRangeException>(() => SampleResult.Solid(c, G(50), G(0), none, ConcentrationUnit.MilligramPerKilogram));
        Assert.Equal("sampleMass", mass.ParamName);
        Assert.Equal("Parameter 'sampleMass' was 0 g; it must be a mass > 0. (Parameter 'sampleMass')" + Environment.NewLine + "Actual value was 0.", mass.Message);

        Assert.Equal("dilutions", Assert.Throws<ArgumentNullException>(() => SampleResult.Solid(c, G(50), G(0.25), null!, ConcentrationUnit.MilligramPerKilogram)).ParamName);

        var unit = Assert.Throws<ArgumentException>(() => SampleResult.Solid(c, G(50), G(0.25), none, ConcentrationUnit.MilligramPerLitre));
        Assert.Equal("resultUnit", unit.ParamName);
        Assert.Equal("Parameter 'resultUnit' was mg/L (MassConcentration); it must be a MassFraction unit (g/kg, mg/kg, µg/kg, ng/kg, %) because the result refers to the mass of sample. (Parameter 'resultUnit')", unit.Message);

        var kind = Assert.Throws<ArgumentException>(() => SampleResult.Solid(
            Measured.Exact(Concentration.FromMilligramsPerLitre(1)), G(50), G(0.25), none, ConcentrationUnit.MilligramPerKilogram));
        Assert.Equal("measured", kind.ParamName);
        Assert.Equal("Parameter 'measured' was mg/L (MassConcentration); it must be a MassFraction unit (g/kg, mg/kg, µg/kg, ng/kg, %) because a digest made up to a mass must be expressed per mass. (Parameter 'measured')", kind.Message);
    }
}
