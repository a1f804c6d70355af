using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class DilutionChainTests
{
    // Field-reference §7.5 (COMPUTED; class A tolerances from §7.3, ISO 648/1042 from memory): stock 1000 mg/L with
    // u_rel = 0.10 %; step 1: 1 mL pipette (±0.008) into 100 mL flask (±0.10) → 10 mg/L; step 2: 10 mL pipette
    // (±0.020) into 100 mL flask (±0.10) → 1 mg/L.
    private static DilutionChain Section75Chain(ToleranceDistribution distribution)
    {
        PreparedSolution stock = PreparedSolution.FromCertificate(
            "Stock", Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(1000), Concentration.FromMilligramsPerLitre(1)));
        return DilutionChain.From(
            stock,
            DilutionStep.Volumetric(
                VolumetricEquipment.ClassAOneMarkPipette(Volume.FromMillilitres(1), distribution),
                VolumetricEquipment.ClassAOneMarkFlask(Volume.FromMillilitres(100), distribution)),
            DilutionStep.Volumetric(
                VolumetricEquipment.ClassAOneMarkPipette(Volume.FromMillilitres(10), distribution),
                VolumetricEquipment.ClassAOneMarkFlask(Volume.FromMillilitres(100), distribution)));
    }

    [Theory]
    [InlineData(ToleranceDistribution.Rectangular, 0.4761, 4, 0.49329, 5)] // computed (field-reference §7.5)
    [InlineData(ToleranceDistribution.Triangular, 0.3440, 4, 0.3559, 4)] // computed (field-reference §7.5)
    public void From_Section75Chain_RelativeUncertaintyAfterEachStep(ToleranceDistribution distribution, double step1Percent, int step1Decimals, double step2Percent, int step2Decimals)
    {
        DilutionChain chain = Section75Chain(distribution);

        Assert.Equal(2, chain.Stages.Count);
        Assert.Equal(10, chain.Stages[0].Solution.Concentration.Value.Value, 12);
        Assert.Equal(1, chain.Stages[1].Solution.Concentration.Value.Value, 12);
        Assert.Equal(step1Percent, 100 * chain.Stages[0].Solution.Concentration.RelativeStandardUncertainty, step1Decimals);
        Assert.Equal(step2Percent, 100 * chain.Stages[1].Solution.Concentration.RelativeStandardUncertainty, step2Decimals);
        Assert.Same(chain.Stages[1].Solution, chain.Final);
    }

    [Fact]
    public void From_Section75Chain_DilutionFactors()
    {
        // DF = Π V_final/V_aliquot (field-reference §0): 100 × 10 = 1000.
        DilutionChain chain = Section75Chain(ToleranceDistribution.Rectangular);
        Assert.Equal(100, chain.Stages[0].DilutionFactor);
        Assert.Equal(10, chain.Stages[1].DilutionFactor);
        Assert.Equal(100, chain.Stages[0].CumulativeDilutionFactor);
        Assert.Equal(1000, chain.TotalDilutionFactor);

        // u(DF)/DF without the stock: √(u_rel²(1 mL) + u_rel²(100 mL) + u_rel²(10 mL) + u_rel²(100 mL)), rectangular.
        double r = Math.Sqrt(Math.Pow(0.008 / Math.Sqrt(3), 2) + Math.Pow(0.001 / Math.Sqrt(3), 2) + Math.Pow(0.002 / Math.Sqrt(3), 2) + Math.Pow(0.001 / Math.Sqrt(3), 2));
        Assert.Equal(r, chain.TotalDilutionFactorRelativeStandardUncertainty, 15);
    }

    [Fact]
    public void From_Section75Chain_BudgetPerStepAndComponent()
    {
        UncertaintyBudget budget = Section75Chain(ToleranceDistribution.Rectangular).Final.Budget;
        Assert.Equal(
            new[] { ("Stock", "certified value"), ("Step 1: 1 mL into 100 mL", "aliquot volume"), ("Step 1: 1 mL into 100 mL", "final volume"), ("Step 2: 10 mL into 100 mL", "aliquot volume"), ("Step 2: 10 mL into 100 mL", "final volume") },
            budget.Contributions.Select(c => (c.Stage, c.Component)));
        Assert.Equal(new[] { 1.0, 1.0, -1.0, 1.0, -1.0 }, budget.Contributions.Select(c => c.Sensitivity));
        Assert.Equal(UncertaintyEvaluation.TypeBRectangular, budget.Contributions[1].Evaluation);

        // The 1 mL pipette dominates: (0.008/√3)² / 0.0049329² = 87.7 % (computed from §7.3 tolerances and §7.5).
        Assert.Equal(87.67, budget.Contributions[1].SharePercent, 2);
        Assert.Equal(100, budget.Contributions.Sum(c => c.SharePercent), 10);
        Assert.Equal(Math.Pow(0.0049328828623162475, 2), budget.Contributions.Sum(c => c.ContributionToRelativeVariance), 15);
    }

    [Fact]
    public void ToString_TableWithStagesFactorsAndUnits()
    {
        string text = Section75Chain(ToleranceDistribution.Rectangular).ToString();
        string[] lines = text.Split(new[] { "\r\n", "\n" }, StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("Dilution chain from Stock: total DF = 1000", lines[0]);
        Assert.StartsWith("Stage  Operation", lines[1], StringComparison.Ordinal);
        Assert.Matches("^-+$", lines[2]);
        Assert.Matches(@"^\s*0  Stock\s+1\s+1\s+1000 mg/L\s+1 mg/L\s+0\.1 %$", lines[3]);
        Assert.Matches(@"^\s*1  1 mL into 100 mL\s+100\s+100\s+10 mg/L\s+0\.04761 mg/L\s+0\.4761 %$", lines[4]);
        Assert.Matches(@"^\s*2  10 mL into 100 mL\s+10\s+1000\s+1 mg/L\s+0\.004933 mg/L\s+0\.4933 %$", lines[5]);
    }

    [Fact]
    public void From_NoSteps_ThrowsNamingSteps()
    {
        PreparedSolution stock = PreparedSolution.FromCertificate("Stock", Measured.Exact(Concentration.FromMilligramsPerLitre(1000)));
        var ex = Assert.Throws<ArgumentException>(() => DilutionChain.From(stock));
        Assert.Equal("steps", ex.ParamName);
        Assert.StartsWith("Parameter 'steps' is empty; at least one element is required.", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentNullException>(() => DilutionChain.From(null!, DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(1)), Measured.Exact(Volume.FromMillilitres(10)))));
        var nullStep = Assert.Throws<ArgumentException>(() => DilutionChain.From(stock, new DilutionStep[] { null! }));
        Assert.StartsWith("Parameter 'steps' has null at index 0", nullStep.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void From_StepNotAcceptingKind_ThrowsNamingIndex()
    {
        PreparedSolution stock = PreparedSolution.FromCertificate("Stock", Measured.Exact(Concentration.FromMilligramsPerLitre(1000)));
        DilutionStep volumetric = DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(1)), Measured.Exact(Volume.FromMillilitres(10)));
        DilutionStep gravimetric = DilutionStep.Gravimetric(Measured.Exact(Mass.FromGrams(1)), Measured.Exact(Mass.FromGrams(10)));
        var ex = Assert.Throws<ArgumentException>(() => DilutionChain.From(stock, volumetric, gravimetric));
        Assert.Equal("steps[1]", ex.ParamName);
        Assert.StartsWith("Parameter 'steps[1]' (1 g into 10 g) needs a mass fraction (per mass); for a mass concentration use GravimetricWithDensity, but 'Stock / 1 mL into 10 mL' is 100 mg/L (MassConcentration).", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void From_MixedKindsWithDensity_ChangesKindAndAddsDensityRow()
    {
        // γ → w by weighing an aliquot of known density: w = γ·m_a/(ρ·m_t) (γ = w·ρ, ISO 80000-9).
        // 1000 mg/L, ρ = 1.0 g/mL, 1.000 g into 100.0 g → 10 mg/kg (computed by hand).
        PreparedSolution stock = PreparedSolution.FromCertificate("Stock", Measured.Exact(Concentration.FromMilligramsPerLitre(1000)));
        DilutionChain chain = DilutionChain.From(
            stock,
            DilutionStep.GravimetricWithDensity(Measured.Exact(Mass.FromGrams(1)), Measured.Exact(Mass.FromGrams(100)), Density.FromGramsPerMillilitre(1.0), 0.001),
            DilutionStep.Gravimetric(Measured.Exact(Mass.FromGrams(10)), Measured.Exact(Mass.FromGrams(100))));
        Assert.Equal(ConcentrationUnit.MilligramPerKilogram, chain.Stages[0].Solution.Concentration.Value.Unit);
        Assert.Equal(10, chain.Stages[0].Solution.Concentration.Value.Value, 12);
        Assert.Equal(1, chain.Final.Concentration.Value.Value, 12);
        Assert.Equal(0.001, chain.Final.Concentration.RelativeStandardUncertainty, 15);
        UncertaintyContribution density = chain.Final.Budget.Contributions.Single(c => c.Component == "aliquot density");
        Assert.Equal(-1, density.Sensitivity);
        Assert.Equal("g/mL", density.Unit);
    }

    // ---- Properties ----

    private static readonly Gen<double> AliquotMillilitres = Gen.Choose(1, 5000).Select(i => i / 100.0);
    private static readonly Gen<double> FactorOverOne = Gen.Choose(101, 100_000).Select(i => i / 100.0);

    private static readonly Gen<VolumetricDilution> Steps =
        from aliquot in AliquotMillilitres
        from factor in FactorOverOne
        from ua in Gen.Choose(0, 50).Select(i => i / 10_000.0)
        from uf in Gen.Choose(0, 50).Select(i => i / 10_000.0)
        select DilutionStep.Volumetric(
            Measured.WithStandardUncertainty(Volume.FromMillilitres(aliquot), Volume.FromMillilitres(aliquot * ua)),
            Measured.WithStandardUncertainty(Volume.FromMillilitres(aliquot * factor), Volume.FromMillilitres(aliquot * factor * uf)));

    private static readonly Gen<VolumetricDilution[]> StepLists =
        Gen.Choose(1, 6).SelectMany(n => Gen.ArrayOf(Steps, n));

    private static readonly Gen<Measured<Concentration>> Stocks =
        from value in Gen.Choose(1, 1_000_000).Select(i => i / 100.0)
        from rel in Gen.Choose(0, 100).Select(i => i / 10_000.0)
        select Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(value), Concentration.FromMilligramsPerLitre(value * rel));

    // DF_total = Π DF_j (field-reference §0). The chain multiplies in the same order; compared within n roundings.
    [Property(MaxTest = 200)]
    public Property TotalDilutionFactor_IsProductOfStepFactors() =>
        Prop.ForAll(Stocks.ToArbitrary(), StepLists.ToArbitrary(), (stock, steps) =>
        {
            DilutionChain chain = DilutionChain.From(PreparedSolution.FromCertificate("s", stock), steps);
            double product = steps.Aggregate(1.0, (p, s) => p * (s.FinalVolume.Value.Millilitres / s.AliquotVolume.Value.Millilitres));
            Numeric.AssertWithinRoundings(product, chain.TotalDilutionFactor, 2 * steps.Length + 2);
            for (int i = 0; i < steps.Length; i++)
            {
                Assert.Equal(steps[i].DilutionFactor, chain.Stages[i].DilutionFactor);
            }
        });

    // Relative uncertainty of a product model does not depend on the scale of the stock (JCGM 100:2008 §5.1.6).
    [Property(MaxTest = 200)]
    public Property RelativeUncertainty_InvariantToScalingTheStock() =>
        Prop.ForAll(Stocks.ToArbitrary(), StepLists.ToArbitrary(), Gen.Choose(1, 1000).Select(i => i / 7.0).ToArbitrary(), (stock, steps, k) =>
        {
            Measured<Concentration> scaled = Measured.WithStandardUncertainty(stock.Value.Scale(k), stock.StandardUncertainty.Scale(k));
            double a = DilutionChain.From(PreparedSolution.FromCertificate("a", stock), steps).Final.Concentration.RelativeStandardUncertainty;
            double b = DilutionChain.From(PreparedSolution.FromCertificate("b", scaled), steps).Final.Concentration.RelativeStandardUncertainty;
            Numeric.AssertRelative(a, b, 1e-13);
        });

    // Volumetric steps multiply, so their order changes neither the final concentration nor its uncertainty.
    [Property(MaxTest = 200)]
    public Property FinalConcentration_InvariantToStepOrder() =>
        Prop.ForAll(Stocks.ToArbitrary(), StepLists.ToArbitrary(), (stock, steps) =>
        {
            PreparedSolution source = PreparedSolution.FromCertificate("s", stock);
            Measured<Concentration> forward = DilutionChain.From(source, steps).Final.Concentration;
            Measured<Concentration> reversed = DilutionChain.From(source, steps.Reverse().ToArray()).Final.Concentration;
            Numeric.AssertRelative(forward.Value.Value, reversed.Value.Value, 1e-14);
            Numeric.AssertRelative(forward.StandardUncertainty.Value, reversed.StandardUncertainty.Value, 1e-12);
        });

    // Dilute, then back-calculate with the same steps (× DF): the identity within rounding.
    [Property(MaxTest = 200)]
    public Property DiluteThenBackCalculate_IsIdentity() =>
        Prop.ForAll(Stocks.ToArbitrary(), StepLists.ToArbitrary(), (stock, steps) =>
        {
            DilutionChain chain = DilutionChain.From(PreparedSolution.FromCertificate("s", stock), steps);
            SampleResult back = SampleResult.Liquid(Measured.Exact(chain.Final.Concentration.Value), steps);
            Assert.Equal(stock.Value.Unit, back.Result.Value.Unit);
            Numeric.AssertRelative(stock.Value.Value, back.Result.Value.Value, 1e-14);
            Numeric.AssertRelative(chain.TotalDilutionFactor, back.TotalDilutionFactor, 1e-15);
        });

    [Fact]
    public void ToString_FactorsAndConcentrationWithManyDigits_RoundedToG6AndG7()
    {
        // 3 mL into 7 mL: DF = 7/3 = 2.333… (G6: 2.33333); 1 mg/L · 3/7 = 0.428571428… mg/L (G7: 0.4285714), computed.
        DilutionChain chain = DilutionChain.From(
            PreparedSolution.FromCertificate("Stock", Measured.Exact(Concentration.FromMilligramsPerLitre(1))),
            DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(3)), Measured.Exact(Volume.FromMillilitres(7))));
        string[] lines = chain.ToString().Split(new[] { "\r\n", "\n" }, StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("Dilution chain from Stock: total DF = 2.33333", lines[0]);
        Assert.Matches(@"^\s*1  3 mL into 7 mL\s+2\.33333\s+2\.33333\s+0\.4285714 mg/L\s+0 mg/L\s+0 %$", lines[4]);
    }
}
