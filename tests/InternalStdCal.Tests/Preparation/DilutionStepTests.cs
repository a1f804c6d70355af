using System;
using System.Linq;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class DilutionStepTests
{
    private static Measured<Volume> Ml(double v, double u = 0) => Measured.WithStandardUncertainty(Volume.FromMillilitres(v), Volume.FromMillilitres(u));

    private static Measured<Mass> G(double m, double u = 0) => Measured.WithStandardUncertainty(Mass.FromGrams(m), Mass.FromGrams(u));

    [Fact]
    public void Volumetric_FactorLabelAndRelativeUncertainty()
    {
        // DF = V_final/V_aliquot (field-reference §0); u(DF)/DF = √(0.01² + 0.002²) (JCGM 100:2008 §5.1.6).
        VolumetricDilution step = DilutionStep.Volumetric(Ml(10, 0.1), Ml(100, 0.2));
        Assert.Equal(10, step.DilutionFactor);
        Assert.Equal("10 mL into 100 mL", step.Label);
        Assert.Equal(Math.Sqrt((0.01 * 0.01) + (0.002 * 0.002)), step.DilutionFactorRelativeStandardUncertainty, 15);
        Assert.Null(step.AliquotDensity);
        Assert.Equal("10 mL into 100 mL: DF = 10 (u_rel 1.02 %)", step.ToString());
    }

    [Fact]
    public void Volumetric_MixedUnits_FactorIsUnitFree()
    {
        // 100 µL into 10.00 mL: DF = 100 (field-reference §0 spike example).
        VolumetricDilution step = DilutionStep.Volumetric(Measured.Exact(Volume.FromMicrolitres(100)), Ml(10.00), "IS spike");
        Assert.Equal(100, step.DilutionFactor, 12);
        Assert.Equal("IS spike", step.Label);
    }

    [Theory]
    [InlineData(10, 10)]
    [InlineData(10.5, 10)]
    public void Volumetric_AliquotNotSmallerThanFinal_ThrowsNamingBoth(double aliquot, double final)
    {
        var ex = Assert.Throws<ArgumentException>(() => DilutionStep.Volumetric(Ml(aliquot), Ml(final)));
        Assert.Equal("aliquot", ex.ParamName);
        Assert.StartsWith(
            FormattableString.Invariant($"Parameter 'aliquot' was {aliquot} mL, which is not smaller than 'finalVolume' ({final} mL); a dilution needs aliquot < finalVolume."),
            ex.Message,
            StringComparison.Ordinal);
    }

    [Fact]
    public void Volumetric_AliquotInOtherUnit_ComparedByAmount()
    {
        var ex = Assert.Throws<ArgumentException>(() => DilutionStep.Volumetric(Measured.Exact(Volume.FromLitres(0.1)), Ml(100)));
        Assert.StartsWith("Parameter 'aliquot' was 0.1 L, which is not smaller than 'finalVolume' (100 mL)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Volumetric_ZeroVolumes_ThrowNamingParameter()
    {
        var a = Assert.Throws<ArgumentOutOfRangeException>(() => DilutionStep.Volumetric(Ml(0), Ml(100)));
        Assert.Equal("aliquot", a.ParamName);
        Assert.StartsWith("Parameter 'aliquot' was 0 mL; it must be a volume > 0.", a.Message, StringComparison.Ordinal);
        var f = Assert.Throws<ArgumentOutOfRangeException>(() => DilutionStep.Volumetric(Ml(1), Ml(0)));
        Assert.Equal("finalVolume", f.ParamName);
        Assert.StartsWith("Parameter 'finalVolume' was 0 mL; it must be a volume > 0.", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Gravimetric_FactorAndValidation()
    {
        GravimetricDilution step = DilutionStep.Gravimetric(G(2.5, 0.0001), G(50, 0.0002));
        Assert.Equal(20, step.DilutionFactor);
        Assert.Equal("2.5 g into 50 g", step.Label);

        var ex = Assert.Throws<ArgumentException>(() => DilutionStep.Gravimetric(G(50), G(50)));
        Assert.Equal("aliquotMass", ex.ParamName);
        Assert.StartsWith("Parameter 'aliquotMass' was 50 g, which is not smaller than 'totalMass' (50 g); a dilution needs aliquotMass < totalMass.", ex.Message, StringComparison.Ordinal);

        var zero = Assert.Throws<ArgumentOutOfRangeException>(() => DilutionStep.Gravimetric(G(0), G(50)));
        Assert.Equal("aliquotMass", zero.ParamName);
        Assert.StartsWith("Parameter 'aliquotMass' was 0 g; it must be a mass > 0.", zero.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void WithDensity_InvalidDensityArguments_ThrowNamingThem()
    {
        var d = Assert.Throws<ArgumentOutOfRangeException>(() => DilutionStep.VolumetricWithDensity(Ml(1), Ml(10), default, 0));
        Assert.Equal("aliquotDensity", d.ParamName);
        Assert.StartsWith("Parameter 'aliquotDensity' was 0; it must be a finite number > 0.", d.Message, StringComparison.Ordinal);

        var u = Assert.Throws<ArgumentOutOfRangeException>(() => DilutionStep.GravimetricWithDensity(G(1), G(10), Density.FromGramsPerMillilitre(1), double.NaN));
        Assert.Equal("aliquotDensityStandardUncertainty", u.ParamName);
        Assert.StartsWith("Parameter 'aliquotDensityStandardUncertainty' was NaN; it must be a finite number >= 0.", u.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void VolumetricWithDensity_TurnsMassFractionIntoMassConcentration()
    {
        // γ = w·ρ·V_a/V_f (γ = w·ρ, ISO 80000-9): 1000 mg/kg, ρ = 1.02 g/mL, 5 mL into 100 mL → 51 mg/L (by hand).
        PreparedSolution stock = PreparedSolution.FromCertificate("w", Measured.WithStandardUncertainty(Concentration.FromMilligramsPerKilogram(1000), Concentration.FromMilligramsPerKilogram(2)));
        PreparedSolution diluted = stock.Dilute(DilutionStep.VolumetricWithDensity(Ml(5, 0.01), Ml(100, 0.05), Density.FromGramsPerMillilitre(1.02), 0.0051));
        Assert.Equal(ConcentrationUnit.MilligramPerLitre, diluted.Concentration.Value.Unit);
        Assert.Equal(51, diluted.Concentration.Value.Value, 12);
        double rel = Math.Sqrt(Math.Pow(0.002, 2) + Math.Pow(0.002, 2) + Math.Pow(0.0005, 2) + Math.Pow(0.005, 2));
        Assert.Equal(rel, diluted.Concentration.RelativeStandardUncertainty, 15);
        Assert.Equal(new[] { "certified value", "aliquot volume", "final volume", "aliquot density" }, diluted.Budget.Contributions.Select(c => c.Component));
        Assert.Equal(1, diluted.Budget.Contributions[3].Sensitivity);
    }

    [Fact]
    public void VolumetricWithDensity_PercentBecomesGramsPerLitre()
    {
        // 1 % = 10 g/kg; × 1.0 g/mL = 10 g/L; 1 mL into 10 mL → 1 g/L.
        PreparedSolution stock = PreparedSolution.FromCertificate("w", Measured.Exact(Concentration.From(1, ConcentrationUnit.Percent)));
        PreparedSolution diluted = stock.Dilute(DilutionStep.VolumetricWithDensity(Ml(1), Ml(10), Density.FromGramsPerMillilitre(1), 0));
        Assert.Equal(ConcentrationUnit.GramPerLitre, diluted.Concentration.Value.Unit);
        Assert.Equal(1, diluted.Concentration.Value.Value, 14);
    }

    [Fact]
    public void Volumetric_AmountConcentration_KeepsKind()
    {
        PreparedSolution stock = PreparedSolution.FromCertificate("c", Measured.Exact(Concentration.From(10, ConcentrationUnit.MillimolePerLitre)));
        PreparedSolution diluted = stock.Dilute(DilutionStep.Volumetric(Ml(1), Ml(100)));
        Assert.Equal(Concentration.From(0.1, ConcentrationUnit.MillimolePerLitre), diluted.Concentration.Value);
    }

    [Fact]
    public void Gravimetric_AmountConcentration_Refused()
    {
        PreparedSolution stock = PreparedSolution.FromCertificate("c", Measured.Exact(Concentration.From(10, ConcentrationUnit.MillimolePerLitre)));
        var ex = Assert.Throws<ArgumentException>(() => stock.Dilute(DilutionStep.GravimetricWithDensity(G(1), G(10), Density.FromGramsPerMillilitre(1), 0)));
        Assert.Contains("needs a mass concentration (GravimetricWithDensity converts it with the density), but 'c' is 10 mmol/L (AmountConcentration)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ToString_FactorWithManyDigits_SixSignificantDigits()
    {
        // DF = 7/3 = 2.333… computed by hand, printed with six significant digits (G6, as the code formats it).
        Assert.Equal("3 mL into 7 mL: DF = 2.33333 (u_rel 0 %)", DilutionStep.Volumetric(Ml(3), Ml(7)).ToString());
    }

    [Fact]
    public void Volumetric_AliquotLessUncertainThanFinal_RelativeTermsInQuadrature()
    {
        // u(DF)/DF = √(0.002² + 0.01²) (JCGM 100:2008 §5.1.6); here the final volume carries the larger term.
        VolumetricDilution step = DilutionStep.Volumetric(Ml(10, 0.02), Ml(100, 1));
        Assert.Equal(Math.Sqrt((0.002 * 0.002) + (0.01 * 0.01)), step.DilutionFactorRelativeStandardUncertainty, 15);

        // An exact aliquot leaves the final volume's term alone.
        Assert.Equal(0.01, DilutionStep.Volumetric(Ml(10), Ml(100, 1)).DilutionFactorRelativeStandardUncertainty, 15);
    }

    [Theory]
    [InlineData(0.0, UncertaintyEvaluation.Exact)]
    [InlineData(0.0051, UncertaintyEvaluation.TypeBStandard)]
    public void WithDensity_DensityRowEvaluation_ExactOnlyWithoutUncertainty(double densityUncertainty, UncertaintyEvaluation expected)
    {
        // A density with u = 0 is an exact input; a stated u is a Type B standard uncertainty (JCGM 100:2008 §4.3).
        PreparedSolution w = PreparedSolution.FromCertificate("w", Measured.Exact(Concentration.FromMilligramsPerKilogram(1000)));
        PreparedSolution byVolume = w.Dilute(DilutionStep.VolumetricWithDensity(Ml(5), Ml(100), Density.FromGramsPerMillilitre(1.02), densityUncertainty));
        UncertaintyContribution row = byVolume.Budget.Contributions[3];
        Assert.Equal("aliquot density", row.Component);
        Assert.Equal("g/mL", row.Unit);
        Assert.Equal(densityUncertainty, row.StandardUncertainty);
        Assert.Equal(expected, row.Evaluation);

        PreparedSolution g = PreparedSolution.FromCertificate("g", Measured.Exact(Concentration.FromMilligramsPerLitre(1000)));
        PreparedSolution byMass = g.Dilute(DilutionStep.GravimetricWithDensity(G(1), G(10), Density.FromGramsPerMillilitre(1.02), densityUncertainty));
        Assert.Equal(expected, byMass.Budget.Contributions[3].Evaluation);
    }

    [Fact]
    public void VolumetricWithDensity_MassConcentration_RefusedNamingAcceptedKind()
    {
        PreparedSolution stock = PreparedSolution.FromCertificate("c", Measured.Exact(Concentration.FromMilligramsPerLitre(10)));
        var ex = Assert.Throws<ArgumentException>(() => stock.Dilute(DilutionStep.VolumetricWithDensity(Ml(1), Ml(10), Density.FromGramsPerMillilitre(1), 0)));
        Assert.Equal("step", ex.ParamName);
        Assert.StartsWith("Parameter 'step' (1 mL into 10 mL) needs a mass fraction (VolumetricWithDensity converts it with the density), but 'c' is 10 mg/L (MassConcentration).", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Reverse_WithDensity_AmountConcentration_ThrowsNamingUnit()
    {
        // The public paths refuse amount concentrations before a density step converts; the internal reverse
        // (used by SampleResult) is called directly to reach its own check.
        VolumetricDilution step = DilutionStep.VolumetricWithDensity(Ml(1), Ml(10), Density.FromGramsPerMillilitre(1), 0);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => step.Reverse(Concentration.From(1, ConcentrationUnit.MillimolePerLitre)));
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was mmol/L; an amount concentration has no mass-based counterpart.", ex.Message, StringComparison.Ordinal);
    }
}
