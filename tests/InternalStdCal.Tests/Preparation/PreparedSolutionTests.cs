using System;
using System.Linq;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class PreparedSolutionTests
{
    // EURACHEM/CITAC QUAM example A1 (Cd calibration standard), VERIFIED (field-reference §7.4,
    // measurementuncertainty.org/guide/app_a_example1.html): c = 1000·m·P/V, m = 100.28 mg (u 0.05 mg),
    // P = 0.9999 (u 0.000058), V = 100.0 mL (u 0.07 mL).
    private static PreparedSolution QuamA1(double volumeUncertaintyMillilitres) =>
        PreparedSolution.FromWeighedSubstance(
            "Cd stock",
            Measured.WithStandardUncertainty(Mass.FromMilligrams(100.28), Mass.FromMilligrams(0.05)),
            Purity.FromMassFraction(0.9999, 0.000058),
            Measured.WithStandardUncertainty(Volume.FromMillilitres(100.0), Volume.FromMillilitres(volumeUncertaintyMillilitres)),
            ConcentrationUnit.MilligramPerLitre);

    [Fact]
    public void FromWeighedSubstance_QuamA1_ValueAndCombinedUncertainty()
    {
        PreparedSolution stock = QuamA1(0.07);

        // c = 1002.6997 mg/L, u_c = 0.8637 mg/L, u_rel = 0.0008614 — computed (field-reference §7.4);
        // QUAM itself reports 1002.7 ± 0.9 mg/L (u) — VERIFIED (field-reference §7.4).
        Assert.Equal(ConcentrationUnit.MilligramPerLitre, stock.Concentration.Value.Unit);
        Assert.Equal(1002.6997, stock.Concentration.Value.Value, 4);
        Assert.Equal(0.8637, stock.Concentration.StandardUncertainty.Value, 4);
        Assert.Equal(0.0008614, stock.Concentration.RelativeStandardUncertainty, 7);
        Assert.Equal(1002.7, stock.Concentration.Value.Value, 1);
        Assert.Equal(0.9, stock.Concentration.StandardUncertainty.Value, 1);
        Assert.Equal(UncertaintyEvaluation.Combined, stock.Concentration.Evaluation);
        Assert.Null(stock.Concentration.DegreesOfFreedom);

        // Expanded U (k = 2) = 1.73 mg/L — computed (field-reference §7.4).
        Assert.Equal(1.73, stock.Concentration.ExpandedUncertainty(2).Value, 2);
    }

    [Fact]
    public void FromWeighedSubstance_QuamA1WithCombinedVolumeUncertainty_0_8352()
    {
        // u(V) = 0.06647 mL (QUAM's volume components, from memory, field-reference §7.4) → u_c = 0.8352 mg/L,
        // computed (field-reference §7.4).
        Assert.Equal(0.8352, QuamA1(0.06647).Concentration.StandardUncertainty.Value, 4);
    }

    [Fact]
    public void FromWeighedSubstance_QuamA1FromComponents_0_8352()
    {
        // The same volume built from its components (QUAM A1, from memory, field-reference §7.4): flask calibration
        // ±0.1 mL triangular, filling repeatability 0.02 mL, temperature ±4 °C × 2.1e-4 °C⁻¹ rectangular.
        Volume nominal = Volume.FromMillilitres(100);
        Measured<Volume> volume = VolumetricEquipment.Combine(
            nominal,
            VolumetricEquipment.ClassAOneMarkFlask(nominal, ToleranceDistribution.Triangular).StandardUncertainty,
            Volume.FromMillilitres(0.02),
            VolumetricEquipment.TemperatureEffect(nominal, 4, VolumetricEquipment.WaterExpansionCoefficientPerKelvin));
        Assert.Equal(0.06647, volume.StandardUncertainty.Millilitres, 5);

        PreparedSolution stock = PreparedSolution.FromWeighedSubstance(
            "Cd stock",
            Measured.WithStandardUncertainty(Mass.FromMilligrams(100.28), Mass.FromMilligrams(0.05)),
            Purity.FromTolerance(0.9999, 0.0001, ToleranceDistribution.Rectangular), // QUAM A1: 99.99 ± 0.01 %, rectangular → 0.000058 (VERIFIED, §7.4)
            volume,
            ConcentrationUnit.MilligramPerLitre);
        Assert.Equal(0.8352, stock.Concentration.StandardUncertainty.Value, 4);
    }

    [Fact]
    public void FromWeighedSubstance_QuamA1_BudgetRows()
    {
        UncertaintyBudget budget = QuamA1(0.07).Budget;
        Assert.Equal(new[] { "substance mass", "purity", "final volume" }, budget.Contributions.Select(c => c.Component));
        Assert.All(budget.Contributions, c => Assert.Equal("Cd stock", c.Stage));
        Assert.Equal(new[] { 1.0, 1.0, -1.0 }, budget.Contributions.Select(c => c.Sensitivity));

        // Relative terms of QUAM A1 (inputs of field-reference §7.4, ratios computed here): m 0.05/100.28,
        // P 0.000058/0.9999, V 0.07/100.
        Assert.Equal(0.05 / 100.28, budget.Contributions[0].RelativeStandardUncertainty, 15);
        Assert.Equal(0.000058 / 0.9999, budget.Contributions[1].RelativeStandardUncertainty, 15);
        Assert.Equal(0.0007, budget.Contributions[2].RelativeStandardUncertainty, 15);
        double total = budget.Contributions.Sum(c => c.ContributionToRelativeVariance);
        Assert.Equal(budget.RelativeStandardUncertainty * budget.RelativeStandardUncertainty, total, 15);
        Assert.Equal(100, budget.Contributions.Sum(c => c.SharePercent), 10);

        // The volume dominates: 0.0007² / 0.0008614² = 66.0 % (computed from the §7.4 inputs).
        Assert.Equal(66.04, budget.Contributions[2].SharePercent, 2);
        Assert.Equal(1002.69972 * 0.0007, budget.Contributions[2].ContributionToStandardUncertainty, 9);
    }

    [Fact]
    public void FromWeighedSubstance_UnitOfTheCallersChoice()
    {
        PreparedSolution stock = PreparedSolution.FromWeighedSubstance(
            "Cd stock",
            Measured.WithStandardUncertainty(Mass.FromMilligrams(100.28), Mass.FromMilligrams(0.05)),
            Purity.FromMassFraction(0.9999, 0.000058),
            Measured.WithStandardUncertainty(Volume.FromMillilitres(100.0), Volume.FromMillilitres(0.07)),
            ConcentrationUnit.GramPerLitre);
        Assert.Equal(ConcentrationUnit.GramPerLitre, stock.Concentration.Value.Unit);
        Assert.Equal(1.0026997, stock.Concentration.Value.Value, 7);
        Assert.Equal(0.0008637, stock.Concentration.StandardUncertainty.Value, 7);
    }

    [Fact]
    public void FromWeighedSubstance_MassFractionUnit_ThrowsNamingUnit()
    {
        var ex = Assert.Throws<ArgumentException>(() => PreparedSolution.FromWeighedSubstance(
            "x", Measured.Exact(Mass.FromMilligrams(100)), Purity.FromMassFraction(1, 0), Measured.Exact(Volume.FromMillilitres(100)), ConcentrationUnit.MilligramPerKilogram));
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was mg/kg (MassFraction); it must be a MassConcentration unit (g/L, mg/L, µg/L, ng/L) because the substance is made up to a volume.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FromWeighedSubstance_ZeroMassOrVolume_ThrowsNamingParameterAndValue()
    {
        var mass = Assert.Throws<ArgumentOutOfRangeException>(() => PreparedSolution.FromWeighedSubstance(
            "x", Measured.Exact(Mass.FromMilligrams(0)), Purity.FromMassFraction(1, 0), Measured.Exact(Volume.FromMillilitres(100)), ConcentrationUnit.MilligramPerLitre));
        Assert.Equal("mass", mass.ParamName);
        Assert.StartsWith("Parameter 'mass' was 0 mg; it must be a mass > 0.", mass.Message, StringComparison.Ordinal);

        var volume = Assert.Throws<ArgumentOutOfRangeException>(() => PreparedSolution.FromWeighedSubstance(
            "x", Measured.Exact(Mass.FromMilligrams(1)), Purity.FromMassFraction(1, 0), Measured.Exact(Volume.FromMillilitres(0)), ConcentrationUnit.MilligramPerLitre));
        Assert.Equal("finalVolume", volume.ParamName);
        Assert.StartsWith("Parameter 'finalVolume' was 0 mL; it must be a volume > 0.", volume.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FromWeighedSubstance_DefaultPurity_ThrowsNamingPurityAndRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => PreparedSolution.FromWeighedSubstance(
            "x", Measured.Exact(Mass.FromMilligrams(1)), default, Measured.Exact(Volume.FromMillilitres(100)), ConcentrationUnit.MilligramPerLitre));
        Assert.Equal("purity", ex.ParamName);
        Assert.StartsWith("Parameter 'purity' was 0; it must be a number in the interval (0, 1].", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(null)]
    [InlineData("  ")]
    public void FromWeighedSubstance_BlankName_Throws(string? name)
    {
        var ex = Assert.ThrowsAny<ArgumentException>(() => PreparedSolution.FromWeighedSubstance(
            name!, Measured.Exact(Mass.FromMilligrams(1)), Purity.FromMassFraction(1, 0), Measured.Exact(Volume.FromMillilitres(100)), ConcentrationUnit.MilligramPerLitre));
        Assert.Equal("name", ex.ParamName);
    }

    [Fact]
    public void FromWeighedSubstanceByMass_GivesMassFraction()
    {
        // w = m·P/m_solution (mass balance, common practice): 50.00 mg of 0.998 pure salt in 100.00 g solution
        // = 0.499 mg/g = 499 mg/kg, computed by hand; relative terms in quadrature (JCGM 100:2008 §5.1.6).
        PreparedSolution stock = PreparedSolution.FromWeighedSubstanceByMass(
            "Pb stock (w)",
            Measured.WithStandardUncertainty(Mass.FromMilligrams(50.00), Mass.FromMilligrams(0.02)),
            Purity.FromMassFraction(0.998, 0.001),
            Measured.WithStandardUncertainty(Mass.FromGrams(100.00), Mass.FromGrams(0.005)),
            ConcentrationUnit.MilligramPerKilogram);
        Assert.Equal(ConcentrationUnit.MilligramPerKilogram, stock.Concentration.Value.Unit);
        Assert.Equal(499, stock.Concentration.Value.Value, 10);
        double rel = Math.Sqrt(Math.Pow(0.02 / 50, 2) + Math.Pow(0.001 / 0.998, 2) + Math.Pow(0.005 / 100, 2));
        Assert.Equal(rel, stock.Concentration.RelativeStandardUncertainty, 15);
        Assert.Equal("solution mass", stock.Budget.Contributions[2].Component);
    }

    [Fact]
    public void FromWeighedSubstanceByMass_SubstanceNotLighterThanSolution_ThrowsNamingBoth()
    {
        var ex = Assert.Throws<ArgumentException>(() => PreparedSolution.FromWeighedSubstanceByMass(
            "x", Measured.Exact(Mass.FromGrams(2)), Purity.FromMassFraction(1, 0), Measured.Exact(Mass.FromMilligrams(2000)), ConcentrationUnit.MilligramPerKilogram));
        Assert.Equal("mass", ex.ParamName);
        Assert.StartsWith("Parameter 'mass' was 2 g, which is not smaller than 'solutionMass' (2000 mg)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FromWeighedSubstanceByMass_VolumeUnit_ThrowsNamingUnit()
    {
        var ex = Assert.Throws<ArgumentException>(() => PreparedSolution.FromWeighedSubstanceByMass(
            "x", Measured.Exact(Mass.FromMilligrams(2)), Purity.FromMassFraction(1, 0), Measured.Exact(Mass.FromGrams(100)), ConcentrationUnit.MilligramPerLitre));
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was mg/L (MassConcentration); it must be a MassFraction unit (g/kg, mg/kg, µg/kg, ng/kg, %) because the solution is weighed.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FromCertificate_KeepsValueAndUncertainty()
    {
        // Certificate 1000 ± 2 mg/L (k = 2) → u = 1 mg/L (JCGM 100:2008 §4.3.3).
        PreparedSolution stock = PreparedSolution.FromCertificate("Rh IS stock",
            Measured.FromExpandedUncertainty(Concentration.FromMilligramsPerLitre(1000), Concentration.FromMilligramsPerLitre(2), 2));
        Assert.Equal(Concentration.FromMilligramsPerLitre(1000), stock.Concentration.Value);
        Assert.Equal(1, stock.Concentration.StandardUncertainty.Value);
        UncertaintyContribution row = Assert.Single(stock.Budget.Contributions);
        Assert.Equal("certified value", row.Component);
        Assert.Equal(UncertaintyEvaluation.TypeBExpanded, row.Evaluation);
        Assert.Equal("mg/L", row.Unit);
        Assert.Equal(0, stock.DilutionCount);
    }

    [Fact]
    public void FromCertificate_NonPositiveValue_ThrowsNamingCertified()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => PreparedSolution.FromCertificate("x", Measured.Exact(Concentration.FromMilligramsPerLitre(0))));
        Assert.Equal("certified", ex.ParamName);
        Assert.StartsWith("Parameter 'certified' was 0 mg/L; a stock concentration must be > 0.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Dilute_KindTheStepDoesNotAccept_ThrowsNamingStep()
    {
        PreparedSolution w = PreparedSolution.FromCertificate("w stock", Measured.Exact(Concentration.FromMilligramsPerKilogram(1000)));
        DilutionStep step = DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(1)), Measured.Exact(Volume.FromMillilitres(100)));
        var ex = Assert.Throws<ArgumentException>(() => w.Dilute(step));
        Assert.Equal("step", ex.ParamName);
        Assert.StartsWith("Parameter 'step' (1 mL into 100 mL) needs a mass or amount concentration (per volume); for a mass fraction use VolumetricWithDensity or a gravimetric step, but 'w stock' is 1000 mg/kg (MassFraction).", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Dilute_NamesAndStagesFollowTheHistory()
    {
        PreparedSolution stock = PreparedSolution.FromCertificate("Stock", Measured.Exact(Concentration.FromMilligramsPerLitre(1000)));
        PreparedSolution a = stock.Dilute(DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(1)), Measured.Exact(Volume.FromMillilitres(100))));
        PreparedSolution b = a.Dilute(DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(10)), Measured.Exact(Volume.FromMillilitres(100)), "working"), "Working standard");
        Assert.Equal("Stock / 1 mL into 100 mL", a.Name);
        Assert.Equal("Working standard", b.Name);
        Assert.Equal(2, b.DilutionCount);
        Assert.Equal(new[] { "Stock", "Step 1: 1 mL into 100 mL", "Step 1: 1 mL into 100 mL", "Step 2: working", "Step 2: working" }, b.Budget.Contributions.Select(c => c.Stage));
        Assert.Equal(1, b.Concentration.Value.Value, 15);
    }

    [Fact]
    public void ToString_ShowsNameValueUncertaintyAndUnits()
    {
        // u to three significant digits, the value to the same decimal place (GUM §7.2.6 style reporting).
        Assert.Equal("Cd stock: 1002.700 mg/L, u = 0.864 mg/L (0.0861 %)", QuamA1(0.07).ToString());
        Assert.Equal("Exact: 5 mg/L, u = 0 mg/L", PreparedSolution.FromCertificate("Exact", Measured.Exact(Concentration.FromMilligramsPerLitre(5))).ToString());
    }

    [Fact]
    public void FromWeighedSubstance_PurityRow_InGramsPerGram()
    {
        UncertaintyContribution purity = QuamA1(0.07).Budget.Contributions[1];
        Assert.Equal("purity", purity.Component);
        Assert.Equal("g/g", purity.Unit);
        Assert.Equal(0.9999, purity.Value);
        Assert.Equal(0.000058, purity.StandardUncertainty);
    }

    [Fact]
    public void FromWeighedSubstanceByMass_BudgetRowsAndSensitivities()
    {
        // w = m·P/m_solution: relative sensitivities +1, +1, −1 (exponents of a product/quotient model, JCGM 100:2008 §5.1.3).
        PreparedSolution stock = PreparedSolution.FromWeighedSubstanceByMass(
            "Pb stock (w)",
            Measured.WithStandardUncertainty(Mass.FromMilligrams(50.00), Mass.FromMilligrams(0.02)),
            Purity.FromMassFraction(0.998, 0.001),
            Measured.WithStandardUncertainty(Mass.FromGrams(100.00), Mass.FromGrams(0.005)),
            ConcentrationUnit.MilligramPerKilogram);
        Assert.Equal(new[] { "substance mass", "purity", "solution mass" }, stock.Budget.Contributions.Select(c => c.Component));
        Assert.Equal(new[] { 1.0, 1.0, -1.0 }, stock.Budget.Contributions.Select(c => c.Sensitivity));
        Assert.All(stock.Budget.Contributions, c => Assert.Equal("Pb stock (w)", c.Stage));
        Assert.Equal("g/g", stock.Budget.Contributions[1].Unit);
    }

    [Fact]
    public void RequireKind_AmountConcentrationExpected_ListsAmountUnits()
    {
        // No public factory asks for an amount concentration yet; the shared check is reached directly (internal).
        var ex = Assert.Throws<ArgumentException>(() => PreparedSolution.RequireKind(
            ConcentrationUnit.MilligramPerLitre, ConcentrationKind.AmountConcentration, "the test says so", "unit"));
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was mg/L (MassConcentration); it must be a AmountConcentration unit (mol/L, mmol/L, µmol/L, nmol/L) because the test says so.", ex.Message, StringComparison.Ordinal);
    }
}
