using System;
using System.Collections.Generic;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;
using static InternalStdCal.Tests.Hardening.BadInput.BadInput;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>Bad input to every entry point of <c>Preparation</c> (common practice: volumes and masses of a
/// dilution are &gt; 0 and aliquot &lt; total; purity is a mass fraction in (0, 1], EURACHEM/CITAC QUAM A1).</summary>
public class PreparationBadInputTests
{
    private static readonly Type Range = typeof(ArgumentOutOfRangeException);
    private static readonly Type Arg = typeof(ArgumentException);
    private static readonly Type Null = typeof(ArgumentNullException);

    private static Measured<Volume> Ml(double v) => Measured.Exact(Volume.FromMillilitres(v));

    private static Measured<Mass> G(double v) => Measured.Exact(Mass.FromGrams(v));

    private static Measured<Concentration> MgL(double v) => Measured.Exact(Concentration.FromMilligramsPerLitre(v));

    private static PreparedSolution Stock => PreparedSolution.FromCertificate("stock", MgL(1000));

    private static readonly Purity Pure = Purity.FromMassFraction(0.999, 0.0005);

    public static IEnumerable<object[]> Cases => Rows(new BadInputCase[]
    {
        new("Preparation.Balance.Weigh", "zero reading", () => new Balance(Mass.FromMilligrams(0.1), Mass.FromMilligrams(0.05), Mass.FromMilligrams(0.1)).Weigh(Mass.FromGrams(0)), Range, "reading", "0 g", "> 0"),
        new("Preparation.Balance.WeighByDifference", "zero net mass", () => new Balance(Mass.FromMilligrams(0.1), Mass.FromMilligrams(0.05), Mass.FromMilligrams(0.1)).WeighByDifference(Mass.FromGrams(0)), Range, "netMass", "0 g", "> 0"),
        new("Preparation.DilutionStep.Volumetric", "zero aliquot", () => DilutionStep.Volumetric(Ml(0), Ml(10)), Range, "aliquot", "0 mL", "> 0"),
        new("Preparation.DilutionStep.Volumetric", "zero final volume", () => DilutionStep.Volumetric(Ml(1), Ml(0)), Range, "finalVolume", "0 mL", "> 0"),
        new("Preparation.DilutionStep.Volumetric", "aliquot > final", () => DilutionStep.Volumetric(Ml(10), Ml(1)), Arg, "aliquot", "10 mL", "aliquot < finalVolume"),
        new("Preparation.DilutionStep.Volumetric", "aliquot = final", () => DilutionStep.Volumetric(Ml(5), Ml(5)), Arg, "aliquot", "5 mL", "aliquot < finalVolume"),
        new("Preparation.DilutionStep.VolumetricWithDensity", "default density", () => DilutionStep.VolumetricWithDensity(Ml(1), Ml(10), default, 0), Range, "aliquotDensity", "0", FinitePositive),
        new("Preparation.DilutionStep.VolumetricWithDensity", "NaN density u", () => DilutionStep.VolumetricWithDensity(Ml(1), Ml(10), Density.FromGramsPerMillilitre(1), double.NaN), Range, "aliquotDensityStandardUncertainty", "NaN", FiniteNonNegative),
        new("Preparation.DilutionStep.Gravimetric", "zero aliquot mass", () => DilutionStep.Gravimetric(G(0), G(10)), Range, "aliquotMass", "0 g", "> 0"),
        new("Preparation.DilutionStep.Gravimetric", "aliquot > total", () => DilutionStep.Gravimetric(G(20), G(10)), Arg, "aliquotMass", "20 g", "aliquotMass < totalMass"),
        new("Preparation.DilutionStep.GravimetricWithDensity", "negative density u", () => DilutionStep.GravimetricWithDensity(G(1), G(10), Density.FromGramsPerMillilitre(1), -0.1), Range, "aliquotDensityStandardUncertainty", "-0.1", FiniteNonNegative),
        new("Preparation.DilutionStep.GravimetricWithDensity", "default density", () => DilutionStep.GravimetricWithDensity(G(1), G(10), default, 0.001), Range, "aliquotDensity", "0", FinitePositive),
        new("Preparation.DilutionChain.From", "null source", () => DilutionChain.From(null!, DilutionStep.Volumetric(Ml(1), Ml(10))), Null, "source", "source"),
        new("Preparation.DilutionChain.From", "no steps", () => DilutionChain.From(Stock), Arg, "steps", "empty", "at least one"),
        new("Preparation.DilutionChain.From", "null step", () => DilutionChain.From(Stock, new DilutionStep[] { null! }), Arg, "steps", "null at index 0"),
        new("Preparation.DilutionChain.From", "gravimetric step on a mass concentration (wrong kind)", () => DilutionChain.From(Stock, DilutionStep.Gravimetric(G(1), G(10))), Arg, "steps[0]", "MassConcentration", "needs a mass fraction"),
        new("Preparation.InternalStandardSpike.Create", "undefined timing", () => InternalStandardSpike.Create(Stock, DilutionStep.Volumetric(Ml(0.1), Ml(10)), (SpikeTiming)7), Range, "timing", "7", "BeforeSamplePreparation or AfterSamplePreparation"),
        new("Preparation.InternalStandardSpike.Create", "null addition", () => InternalStandardSpike.Create(Stock, null!, SpikeTiming.AfterSamplePreparation), Null, "addition", "addition"),
        new("Preparation.InternalStandardSpike.Create", "gravimetric addition of a mass concentration (wrong kind)", () => InternalStandardSpike.Create(Stock, DilutionStep.Gravimetric(G(0.1), G(10)), SpikeTiming.AfterSamplePreparation), Arg, "addition", "MassConcentration"),
        new("Preparation.PreparedSolution.FromCertificate", "zero certified value", () => PreparedSolution.FromCertificate("stock", MgL(0)), Range, "certified", "0 mg/L", "> 0"),
        new("Preparation.PreparedSolution.FromCertificate", "negative certified value", () => PreparedSolution.FromCertificate("stock", MgL(-5)), Range, "certified", "-5 mg/L", "> 0"),
        new("Preparation.PreparedSolution.FromCertificate", "blank name", () => PreparedSolution.FromCertificate(" ", MgL(1)), Arg, "name", "non-blank"),
        new("Preparation.PreparedSolution.FromWeighedSubstance", "zero mass", () => PreparedSolution.FromWeighedSubstance("s", G(0), Pure, Ml(100), ConcentrationUnit.MilligramPerLitre), Range, "mass", "0 g", "> 0"),
        new("Preparation.PreparedSolution.FromWeighedSubstance", "default purity", () => PreparedSolution.FromWeighedSubstance("s", G(0.1), default, Ml(100), ConcentrationUnit.MilligramPerLitre), Range, "purity", "0", "(0, 1]"),
        new("Preparation.PreparedSolution.FromWeighedSubstance", "amount unit (wrong kind)", () => PreparedSolution.FromWeighedSubstance("s", G(0.1), Pure, Ml(100), ConcentrationUnit.MicromolePerLitre), Arg, "unit", "µmol/L", "MassConcentration"),
        new("Preparation.PreparedSolution.FromWeighedSubstanceByMass", "mass >= solution mass", () => PreparedSolution.FromWeighedSubstanceByMass("s", G(10), Pure, G(5), ConcentrationUnit.MilligramPerKilogram), Arg, "mass", "10 g", "mass < solutionMass"),
        new("Preparation.PreparedSolution.FromWeighedSubstanceByMass", "mass-concentration unit (wrong kind)", () => PreparedSolution.FromWeighedSubstanceByMass("s", G(0.1), Pure, G(100), ConcentrationUnit.MilligramPerLitre), Arg, "unit", "mg/L", "MassFraction"),
        new("Preparation.PreparedSolution.Dilute", "gravimetric step on a mass concentration (wrong kind)", () => Stock.Dilute(DilutionStep.Gravimetric(G(1), G(10))), Arg, "step", "MassConcentration"),
        new("Preparation.PreparedSolution.Dilute", "null step", () => Stock.Dilute(null!), Null, "step", "step"),
        new("Preparation.Purity.FromMassFraction", "1.5", () => Purity.FromMassFraction(1.5, 0), Range, "massFraction", "1.5", "(0, 1]"),
        new("Preparation.Purity.FromMassFraction", "zero", () => Purity.FromMassFraction(0, 0), Range, "massFraction", "0", "(0, 1]"),
        new("Preparation.Purity.FromMassFraction", "NaN", () => Purity.FromMassFraction(double.NaN, 0), Range, "massFraction", "NaN", "(0, 1]"),
        new("Preparation.Purity.FromMassFraction", "negative u", () => Purity.FromMassFraction(0.99, -0.01), Range, "standardUncertainty", "-0.01", FiniteNonNegative),
        new("Preparation.Purity.FromTolerance", "negative half-width", () => Purity.FromTolerance(0.99, -0.01, ToleranceDistribution.Rectangular), Range, "halfWidth", "-0.01", FiniteNonNegative),
        new("Preparation.Purity.FromTolerance", "+inf", () => Purity.FromTolerance(double.PositiveInfinity, 0.01, ToleranceDistribution.Rectangular), Range, "massFraction", "Infinity", "(0, 1]"),
        new("Preparation.Purity.FromTolerance", "undefined distribution", () => Purity.FromTolerance(0.99, 0.01, (ToleranceDistribution)9), Range, "distribution", "9"),
        new("Preparation.SampleResult.Liquid", "null dilutions", () => SampleResult.Liquid(MgL(1), null!), Null, "dilutions", "dilutions"),
        new("Preparation.SampleResult.Liquid", "null dilution", () => SampleResult.Liquid(MgL(1), new DilutionStep[] { null! }), Arg, "dilutions", "null at index 0"),
        new("Preparation.SampleResult.Liquid", "gravimetric step cannot give mg/L (wrong kind)", () => SampleResult.Liquid(MgL(1), new DilutionStep[] { DilutionStep.Gravimetric(G(1), G(10)) }), Arg, "dilutions[0]", "cannot have produced", "MassConcentration"),
        new("Preparation.SampleResult.Solid", "zero digest volume", () => SampleResult.Solid(MgL(1), Ml(0), G(0.25), Array.Empty<DilutionStep>(), ConcentrationUnit.MilligramPerKilogram), Range, "digestVolume", "0 mL", "> 0"),
        new("Preparation.SampleResult.Solid", "zero sample mass", () => SampleResult.Solid(MgL(1), Ml(50), G(0), Array.Empty<DilutionStep>(), ConcentrationUnit.MilligramPerKilogram), Range, "sampleMass", "0 g", "> 0"),
        new("Preparation.SampleResult.Solid", "zero digest mass", () => SampleResult.Solid(MgL(1), G(0), G(0.25), Array.Empty<DilutionStep>(), ConcentrationUnit.MilligramPerKilogram), Range, "digestMass", "0 g", "> 0"),
        new("Preparation.SampleResult.Solid", "mg/L result unit (wrong kind)", () => SampleResult.Solid(MgL(1), Ml(50), G(0.25), Array.Empty<DilutionStep>(), ConcentrationUnit.MilligramPerLitre), Arg, "resultUnit", "mg/L", "MassFraction"),
        new("Preparation.VolumetricEquipment.ClassAOneMarkPipetteTolerance", "7 mL not tabulated", () => VolumetricEquipment.ClassAOneMarkPipetteTolerance(Volume.FromMillilitres(7)), Range, "nominal", "7 mL", "tabulated"),
        new("Preparation.VolumetricEquipment.ClassAOneMarkFlaskTolerance", "0 mL not tabulated", () => VolumetricEquipment.ClassAOneMarkFlaskTolerance(Volume.FromMillilitres(0)), Range, "nominal", "0 mL", "tabulated"),
        new("Preparation.VolumetricEquipment.ClassAOneMarkPipette", "undefined distribution", () => VolumetricEquipment.ClassAOneMarkPipette(Volume.FromMillilitres(10), (ToleranceDistribution)9), Range, "distribution", "9"),
        new("Preparation.VolumetricEquipment.ClassAOneMarkFlask", "1e300 mL not tabulated", () => VolumetricEquipment.ClassAOneMarkFlask(Volume.FromMillilitres(1e300), ToleranceDistribution.Triangular), Range, "nominal", "1E+300 mL", "tabulated"),
        new("Preparation.VolumetricEquipment.AdjustablePipette", "zero set volume", () => VolumetricEquipment.AdjustablePipette(Volume.FromMicrolitres(0), Volume.FromMicrolitres(1), Volume.FromMicrolitres(0.5), ToleranceDistribution.Rectangular), Range, "setVolume", "0 µL", "> 0"),
        new("Preparation.VolumetricEquipment.TemperatureEffect", "NaN ΔT", () => VolumetricEquipment.TemperatureEffect(Volume.FromMillilitres(100), double.NaN, 2.1e-4), Range, "temperatureHalfRangeKelvin", "NaN", FiniteNonNegative),
        new("Preparation.VolumetricEquipment.TemperatureEffect", "negative α", () => VolumetricEquipment.TemperatureEffect(Volume.FromMillilitres(100), 4, -2.1e-4), Range, "expansionCoefficientPerKelvin", "-0.00021", FiniteNonNegative),
        new("Preparation.VolumetricEquipment.TemperatureEffect", "V·α·ΔT overflows", () => VolumetricEquipment.TemperatureEffect(Volume.FromLitres(1e300), 1e300, 1), Range, "temperatureHalfRangeKelvin", "1E+300", "stays finite"),
        new("Preparation.VolumetricEquipment.Combine", "zero nominal", () => VolumetricEquipment.Combine(Volume.FromMillilitres(0), Volume.FromMillilitres(0.01)), Range, "nominal", "0 mL", "> 0"),
        new("Preparation.VolumetricEquipment.Combine", "no components", () => VolumetricEquipment.Combine(Volume.FromMillilitres(10)), Arg, "standardUncertainties", "empty", "at least one"),
    });

    public static IEnumerable<object[]> Magnitudes => Rows(new MagnitudeCase[]
    {
        new("Preparation.Balance.#ctor", "1e300 g limits", () => new[] { new Balance(Mass.FromGrams(1e300), Mass.FromGrams(1e300), Mass.FromGrams(1e300)).SingleReadingStandardUncertainty.Grams }),
        new("Preparation.Balance.Weigh", "1e-300 g reading", () => new[] { new Balance(Mass.FromMilligrams(0.1), Mass.FromMilligrams(0.05), Mass.FromMilligrams(0.1)).Weigh(Mass.FromGrams(1e-300)).StandardUncertainty.Grams }),
        new("Preparation.DilutionStep.Volumetric", "1e-300 mL into 1e300 mL", () => { var s = DilutionStep.Volumetric(Ml(1e-300), Ml(1e300)); return new[] { s.DilutionFactor, s.DilutionFactorRelativeStandardUncertainty }; }),
        new("Preparation.DilutionStep.Gravimetric", "1e-300 g into 1e300 g", () => { var s = DilutionStep.Gravimetric(G(1e-300), G(1e300)); return new[] { s.DilutionFactor, s.DilutionFactorRelativeStandardUncertainty }; }),
        new("Preparation.PreparedSolution.FromWeighedSubstance", "1e300 g in 1e-300 mL", () => new[] { PreparedSolution.FromWeighedSubstance("s", G(1e300), Pure, Ml(1e-300), ConcentrationUnit.MilligramPerLitre).Concentration.Value.Value }),
        new("Preparation.PreparedSolution.FromCertificate", "1e300 mg/L with u = 1e300", () => { var c = PreparedSolution.FromCertificate("s", Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(1e300), Concentration.FromMilligramsPerLitre(1e300))).Concentration; return new[] { c.Value.Value, c.StandardUncertainty.Value }; }),
        new("Preparation.PreparedSolution.Dilute", "1e-300 mg/L diluted by 1e300", () => new[] { PreparedSolution.FromCertificate("s", MgL(1e-300)).Dilute(DilutionStep.Volumetric(Ml(1e-150), Ml(1e150))).Concentration.Value.Value }),
        new("Preparation.SampleResult.Liquid", "1e300 mg/L measured after a 1e300 dilution", () => new[] { SampleResult.Liquid(MgL(1e300), new DilutionStep[] { DilutionStep.Volumetric(Ml(1e-150), Ml(1e150)) }).Result.Value.Value }),
        new("Preparation.SampleResult.Solid", "1e300 mL digest of 1e-300 g", () => new[] { SampleResult.Solid(MgL(1), Ml(1e300), G(1e-300), Array.Empty<DilutionStep>(), ConcentrationUnit.MilligramPerKilogram).Result.Value.Value }),
        new("Preparation.VolumetricEquipment.Combine", "1e300 mL components", () => new[] { VolumetricEquipment.Combine(Volume.FromMillilitres(1), Volume.FromMillilitres(1e300), Volume.FromMillilitres(1e300)).StandardUncertainty.Value }),
        new("Preparation.VolumetricEquipment.AdjustablePipette", "1e305 L limit on a µL setting", () => new[] { VolumetricEquipment.AdjustablePipette(Volume.FromMicrolitres(100), Volume.FromLitres(1e305), Volume.FromMicrolitres(0.5), ToleranceDistribution.Rectangular).StandardUncertainty.Value }),
        new("Preparation.Purity.FromMassFraction", "u = 1e300", () => new[] { Purity.FromMassFraction(1e-300, 1e300).StandardUncertainty }),
    });

    [Theory]
    [MemberData(nameof(Cases))]
    public void EntryPoint_BadInput_ThrowsDocumentedExceptionNamingParameterValueAndRange(string name, BadInputCase c)
    {
        Assert.NotNull(name);
        AssertRejected(c);
    }

    [Theory]
    [MemberData(nameof(Magnitudes))]
    public void EntryPoint_AbsurdMagnitude_FiniteOrDocumentedException(string name, MagnitudeCase c)
    {
        Assert.NotNull(name);
        AssertFiniteOrRejected(c);
    }
}
